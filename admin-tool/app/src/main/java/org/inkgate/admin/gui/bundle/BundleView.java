package org.inkgate.admin.gui.bundle;

import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.PasswordField;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.Step;
import org.inkgate.admin.gui.Work;

/** Step 3: build the signed (optionally sealed) bundle; the release code is shown once. */
public final class BundleView implements Step {

    static final String CODE_WARNING = "Store this release code now, somewhere apart from the bundle file (for example"
            + " sealed in an envelope for the invigilators). It is shown only once and kept nowhere: without it the"
            + " sealed bundle cannot be opened, and anyone who has both can read the prompts early.";

    private final VBox root;
    private final TextField keysField;

    public BundleView(BundleModel model, Work work) {
        GridPane grid = Fields.grid();
        keysField = Fields.pathRow(grid, 0, "keys", "Owner key folder", model.keys(), Fields.Choose.FOLDER);
        Fields.pathRow(grid, 1, "bundleOut", "Bundle file to write", model.out(), Fields.Choose.SAVE_FILE);
        Fields.row(grid, 2, "Key passphrase", secret("passphrase", "Key passphrase", model.passphrase()));
        Fields.row(grid, 3, "Invigilator PIN", secret("pin", "Invigilator PIN", model.pin()));
        Fields.row(grid, 4, "PIN again", secret("pinAgain", "Invigilator PIN again", model.pinAgain()));
        CheckBox seal = new CheckBox("Seal: encrypt prompts and packs under a new release code");
        seal.setId("seal");
        seal.selectedProperty().bindBidirectional(model.seal());
        grid.add(seal, 1, 5);

        Button build = new Button("Build the bundle");
        build.setId("buildBundle");
        build.disableProperty().bind(work.busy());
        build.setOnAction(e -> model.build());
        Label result = new Label();
        result.setId("bundleResult");
        result.setWrapText(true);
        result.getStyleClass().add("step-result");
        result.textProperty().bind(model.result());

        Label code = new Label();
        code.setId("releaseCode");
        code.getStyleClass().add("release-code");
        code.textProperty().bind(model.releaseCode());
        code.setAccessibleText("Release code");
        Label warning = new Label(CODE_WARNING);
        warning.setWrapText(true);
        Button stored = new Button("I have stored the release code");
        stored.setId("codeStored");
        stored.setOnAction(e -> model.releaseCodeStored());
        VBox codeBox = new VBox(10, new Label("Release code (shown once):"), code, warning, stored);
        codeBox.getStyleClass().add("warning-box");
        codeBox.visibleProperty().bind(model.releaseCode().isNotEmpty());
        codeBox.managedProperty().bind(codeBox.visibleProperty());

        PasswordField again = secret("passphraseAgain", "Passphrase again, for new keys", model.passphraseAgain());
        Button create = new Button("Create new keys in this folder");
        create.setId("createKeys");
        create.disableProperty().bind(work.busy());
        create.setOnAction(e -> model.createKeys());
        Label keysResult = new Label();
        keysResult.setId("keysResult");
        keysResult.setWrapText(true);
        keysResult.textProperty().bind(model.keysResult());
        javafx.scene.layout.HBox newKeysRow = new javafx.scene.layout.HBox(10, new Label("Passphrase again"), again, create);
        newKeysRow.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        ((Label) newKeysRow.getChildren().get(0)).setLabelFor(again);
        javafx.scene.control.TitledPane newKeys = new javafx.scene.control.TitledPane("No keys yet? Create them (once)",
                new VBox(10, Fields.note("Type a new passphrase of " + org.inkgate.admin.core.keys.OwnerKeyStore.MIN_PASSPHRASE
                        + " characters or more in \"Key passphrase\" above and again here. Existing keys are never"
                        + " overwritten."), newKeysRow, keysResult));
        newKeys.setId("newKeys");
        newKeys.setExpanded(false);

        root = new VBox(14, Fields.heading("3. Bundle"),
                Fields.note("Builds the signed exam bundle from the checked folder, the roster and the assignment of step 2."
                        + " The passphrase opens your signing key; the PIN lets invigilators start the sitting."),
                grid, newKeys, build, result, codeBox);
        root.getStyleClass().add("step");
    }

    private static PasswordField secret(String id, String name, javafx.beans.property.StringProperty value) {
        PasswordField f = new PasswordField();
        f.setId(id);
        f.setAccessibleText(name);
        f.setMaxWidth(320);
        f.textProperty().bindBidirectional(value);
        return f;
    }

    @Override
    public String title() {
        return "3. Bundle";
    }

    @Override
    public Node view() {
        return root;
    }

    @Override
    public Node firstFocus() {
        return keysField;
    }
}
