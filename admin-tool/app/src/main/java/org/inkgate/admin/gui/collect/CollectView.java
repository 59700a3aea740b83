package org.inkgate.admin.gui.collect;

import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.PasswordField;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextArea;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.inkgate.admin.core.collection.Outcome;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.Step;
import org.inkgate.admin.gui.Work;

/** Step 4: collect response packages into the results store; counts, refusals with reasons, conflicts. */
public final class CollectView implements Step {

    private final VBox root;
    private final TextArea folders;

    public CollectView(CollectModel model, Work work) {
        GridPane grid = Fields.grid();
        folders = new TextArea();
        folders.setId("packageFolders");
        folders.setPrefRowCount(3);
        folders.setPrefColumnCount(40);
        folders.setAccessibleText("Folders or response package files, one per line");
        folders.textProperty().bindBidirectional(model.folders());
        Fields.row(grid, 0, "Package folders\n(one per line)", folders);
        Fields.pathRow(grid, 1, "collectBundle", "Bundle of the sitting", model.bundle(), Fields.Choose.OPEN_FILE);
        Fields.pathRow(grid, 2, "collectKeys", "Owner key folder", model.keys(), Fields.Choose.FOLDER);
        Fields.pathRow(grid, 3, "collectAssignment", "Assignment table", model.assignment(),
                Fields.Choose.OPEN_FILE);
        Fields.pathRow(grid, 4, "collectRoster", "Roster CSV", model.roster(),
                Fields.Choose.OPEN_FILE);
        org.inkgate.admin.gui.StoreField.row(grid, 5, "storeFile", "Results store", model.store(),
                model.storePasswordFile(), Fields.Choose.SAVE_FILE);
        Fields.pathRow(grid, 6, "installations", "Enrolled installations", model.installations(), Fields.Choose.OPEN_FILE);
        CheckBox any = new CheckBox("Accept any installation (list each package's installation to compare with seat records)");
        any.setId("anyInstallation");
        any.selectedProperty().bindBidirectional(model.anyInstallation());
        grid.add(any, 1, 7);
        PasswordField pass = new PasswordField();
        pass.setId("collectPassphrase");
        pass.setAccessibleText("Key passphrase");
        pass.setMaxWidth(320);
        pass.textProperty().bindBidirectional(model.passphrase());
        Fields.row(grid, 8, "Key passphrase", pass);

        Button collect = new Button("Collect");
        collect.setId("collect");
        collect.disableProperty().bind(work.busy());
        collect.setOnAction(e -> model.collect());
        Label counts = new Label();
        counts.setId("collectCounts");
        counts.setWrapText(true);
        counts.getStyleClass().add("step-result");
        counts.textProperty().bind(model.counts());
        Label details = new Label();
        details.setId("collectDetails");
        details.setWrapText(true);
        details.textProperty().bind(model.details());

        TableView<Outcome.Refused> refused = new TableView<>(model.refused());
        refused.setId("refused");
        refused.setAccessibleText("Refused packages with their reasons");
        refused.setPlaceholder(new Label("No package refused."));
        // the file's name, which the message repeats; the whole path is in the details above and the command's output
        TableColumn<Outcome.Refused, String> file = column("Package file", 210, r -> fileName(r.file()));
        TableColumn<Outcome.Refused, String> message = column("What it means and what to do", 600,
                Outcome.Refused::message);
        Fields.wrap(file);
        Fields.wrap(message);
        refused.getColumns().add(file);
        TableColumn<Outcome.Refused, String> reason = column("Reason", 170, Outcome.Refused::reason);
        reason.setMinWidth(150); // a reason code is one word: never broken across lines
        refused.getColumns().add(reason);
        refused.getColumns().add(message);
        refused.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        refused.setPrefHeight(160);
        VBox.setVgrow(refused, Priority.ALWAYS);

        root = new VBox(14, Fields.heading("4. Collect"),
                Fields.note("Imports every response package found into the results store, one transaction per package."
                        + " Safe to run again: packages already imported change nothing. Name the bundle built for the"
                        + " sitting (here or in step 3); the assignment table, if named, must be the one the bundle was"
                        + " built from; the roster adds levels and personal fields to the store."),
                grid, collect, counts, details, refused);
        root.getStyleClass().add("step");
    }

    /** The last part of a package's path as collect reports it; the text itself when it has no parts. */
    static String fileName(String path) {
        int cut = Math.max(path.lastIndexOf('/'), path.lastIndexOf('\\'));
        return cut < 0 || cut == path.length() - 1 ? path : path.substring(cut + 1);
    }

    private static TableColumn<Outcome.Refused, String> column(String name, double width,
            java.util.function.Function<Outcome.Refused, String> value) {
        TableColumn<Outcome.Refused, String> c = new TableColumn<>(name);
        c.setPrefWidth(width);
        c.setCellValueFactory(d -> new ReadOnlyObjectWrapper<>(value.apply(d.getValue())));
        return c;
    }

    @Override
    public String title() {
        return "4. Collect";
    }

    @Override
    public Node view() {
        return root;
    }

    @Override
    public Node firstFocus() {
        return folders;
    }
}
