package org.inkgate.client.sitting.ui.screen;

import java.io.File;
import java.nio.file.Path;
import java.util.function.Consumer;
import javafx.scene.Parent;
import java.util.List;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.PasswordField;
import javafx.scene.control.TextField;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.DirectoryChooser;
import org.inkgate.client.sitting.ui.parts.Parts;

/**
 * The invigilator's set-up before any candidate signs in: the PIN, the output folder for the
 * response packages, the seat label and, for a sealed bundle, the release code.
 */
public final class SetupScreen {

    /** What the invigilator entered; the flow checks it and answers with {@link #showError}. */
    public record Input(char[] pin, Path outputFolder, String seat, char[] releaseCode, String formId) {
    }

    private final PasswordField pin = new PasswordField();
    private final TextField output = new TextField();
    private final TextField seat = new TextField();
    private final PasswordField release = new PasswordField();
    private final ComboBox<String> form = new ComboBox<>();
    private final Label error = Parts.errorLine("setupError");
    private final Button go;
    private final VBox fields;
    private final Label enrolmentStatus = Parts.quiet("");
    private final Parent root;

    /**
     * @param examTitle   the bundle's title
     * @param signer      the signer's fingerprint, for comparing with the published one
     * @param sealed      whether a release code is needed
     * @param defaultOutput the folder proposed for response packages
     * @param demoNote    a demo-only hint (PIN of the demo bundle), or null for a real bundle
     * @param openForms   the forms to choose from when the bundle has no roster and several forms; else empty
     * @param onExit      closes the client (nothing has started yet, so nothing is lost)
     */
    public SetupScreen(String examTitle, String signer, boolean sealed, Path defaultOutput, String demoNote,
            List<String> openForms, Consumer<Input> onContinue, Runnable onExit) {
        pin.setId("setupPin");
        pin.setAccessibleText("Invigilator PIN");
        output.setId("setupOutput");
        output.setAccessibleText("Output folder for response packages");
        output.setText(defaultOutput == null ? "" : defaultOutput.toString());
        seat.setId("setupSeat");
        seat.setAccessibleText("Seat or machine label");
        release.setId("setupRelease");
        release.setAccessibleText("Release code");
        form.setId("setupForm");
        form.setAccessibleText("Form for the candidates at this machine");
        form.getItems().setAll(openForms);
        form.getSelectionModel().selectFirst();
        HBox.setHgrow(output, Priority.ALWAYS);
        Button browse = Parts.plain("setupBrowse", "_Choose...", this::browse);
        go = Parts.primary("setupContinue", "_Continue", () -> onContinue.accept(new Input(pin.getText().toCharArray(),
                output.getText().isBlank() ? null : Path.of(output.getText().strip()), seat.getText().strip(),
                sealed ? release.getText().toCharArray() : null, form.getValue())));

        fields = new VBox(10,
                Parts.heading("Invigilator set-up"),
                Parts.text(examTitle),
                Parts.quiet("Signed by key " + signer + ". Compare it with the fingerprint the test owner published."),
                Parts.fieldLabel("Invigilator _PIN", pin), pin,
                Parts.fieldLabel("_Output folder for the response packages", output), new HBox(10, output, browse),
                Parts.quiet("Each candidate's response package is written here when they hand in, and a copy is"
                        + " always kept on this machine as well."),
                Parts.fieldLabel("_Seat or machine label (optional)", seat), seat);
        if (sealed) {
            fields.getChildren().addAll(Parts.fieldLabel("_Release code (as printed, with dashes)", release), release);
        }
        if (!openForms.isEmpty()) {
            fields.getChildren().addAll(Parts.fieldLabel("_Form: this bundle has no roster, so choose the form the"
                    + " test owner assigned to this machine", form), form);
        }
        if (demoNote != null) {
            Label demo = Parts.text(demoNote);
            demo.setId("demoNote");
            demo.getStyleClass().add("demo-note");
            fields.getChildren().add(demo);
        }
        Button exit = Parts.plain("setupExit", "E_xit", onExit);
        root = Parts.cardWithActions("setupScreen", new VBox(8, error, new HBox(12, go, exit)), fields);
    }

    /**
     * Shows this installation's fingerprint, which the test owner enrols so that the collector
     * trusts this machine's packages, and offers to write the enrolment file to the output folder.
     *
     * @param fingerprint the installation key's fingerprint
     * @param onWrite     writes the enrolment file for the output folder and seat label entered,
     *                    and answers with {@link #showEnrolment}
     */
    public void showInstallation(String fingerprint, java.util.function.BiConsumer<Path, String> onWrite) {
        Label print = Parts.text(fingerprint);
        print.setId("setupInstallationFingerprint");
        print.getStyleClass().add("fingerprint");
        print.setAccessibleText("This machine's installation fingerprint: " + fingerprint);
        Button write = Parts.plain("setupWriteEnrolment", "Write _enrolment file", () -> onWrite.accept(
                output.getText().isBlank() ? null : Path.of(output.getText().strip()), seat.getText().strip()));
        enrolmentStatus.setId("setupEnrolmentStatus");
        enrolmentStatus.managedProperty().bind(enrolmentStatus.textProperty().isNotEmpty());
        HBox row = new HBox(12, print, write);
        row.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        // beside the seat label, which the enrolment file records
        int at = fields.getChildren().indexOf(seat) + 1;
        fields.getChildren().addAll(at, List.of(
                Parts.quiet("This machine's installation fingerprint. The test owner enrols it so that response"
                        + " packages from this machine are trusted; the file is written to the output folder above."),
                row, enrolmentStatus));
    }

    /** Says where the enrolment file was written, or why it was not. */
    public void showEnrolment(String message) {
        enrolmentStatus.setText(message);
        enrolmentStatus.setAccessibleText(message);
    }

    public Parent root() {
        return root;
    }

    /** Where focus starts. */
    public void focus() {
        Parts.focusWhenShown(pin);
    }

    /** Says what is wrong and clears the secret fields. */
    public void showError(String message) {
        error.setText(message);
        error.setAccessibleText(message);
        pin.clear();
        release.clear();
        pin.requestFocus();
    }

    /** Disables the form while the flow checks it (PIN hashing takes a moment). */
    public void busy(boolean busy) {
        go.setDisable(busy);
        if (busy) {
            error.setText("Checking...");
        }
    }

    private void browse() {
        DirectoryChooser chooser = new DirectoryChooser();
        chooser.setTitle("Output folder for response packages");
        File current = output.getText().isBlank() ? null : new File(output.getText());
        if (current != null && current.isDirectory()) {
            chooser.setInitialDirectory(current);
        }
        File chosen = chooser.showDialog(root.getScene() == null ? null : root.getScene().getWindow());
        if (chosen != null) {
            output.setText(chosen.getAbsolutePath());
        }
    }
}
