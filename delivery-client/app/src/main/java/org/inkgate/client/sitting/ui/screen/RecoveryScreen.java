package org.inkgate.client.sitting.ui.screen;

import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.PasswordField;
import javafx.scene.control.TextField;
import javafx.scene.layout.VBox;
import org.inkgate.client.sitting.ui.parts.Parts;

/**
 * Shown on start when an unfinished sitting is found on this machine: what was found, and the
 * invigilator's choice whether to give back the time the machine was down. Behind the PIN.
 */
public final class RecoveryScreen {

    /** What the invigilator entered. */
    public record Input(char[] pin, boolean credit, Path outputFolder) {
    }

    private final PasswordField pin = new PasswordField();
    private final CheckBox credit = new CheckBox();
    private final TextField output = new TextField();
    private final Label error = Parts.errorLine("recoveryError");
    private final Button resume;
    private final Parent root;

    /**
     * @param facts     lines describing what was found (candidate, task, time left, time down)
     * @param creditText the check box's text, naming the downtime
     * @param defaultOutput the output folder proposed for the response package
     * @param onResume  PIN, whether to credit the downtime, and the output folder
     */
    public RecoveryScreen(List<String> facts, String creditText, Path defaultOutput, Consumer<Input> onResume,
            Runnable onExit) {
        VBox found = new VBox(6);
        found.setId("recoveryFacts");
        for (String fact : facts) {
            found.getChildren().add(Parts.text(fact));
        }
        pin.setId("recoveryPin");
        pin.setAccessibleText("Invigilator PIN");
        credit.setId("creditDowntime");
        credit.setText(creditText);
        credit.setWrapText(true);
        output.setId("recoveryOutput");
        output.setAccessibleText("Output folder for the response package");
        output.setText(defaultOutput == null ? "" : defaultOutput.toString());
        // disabled until the PIN check answers: a second press would open the sitting's log twice
        resume = Parts.primary("resumeButton", "_Resume the sitting", () -> {
            resumeButton().setDisable(true);
            onResume.accept(new Input(pin.getText().toCharArray(), credit.isSelected(),
                    output.getText().isBlank() ? null : Path.of(output.getText().strip())));
        });
        VBox box = new VBox(12,
                Parts.heading("An unfinished sitting was found"),
                Parts.text("This machine stopped during a sitting. The answers written so far were saved."
                        + " The invigilator must resume it."),
                found,
                credit,
                Parts.quiet("Whether to give back the lost time is the invigilator's decision under the test"
                        + " owner's regulations; the choice is recorded in the sitting's log."),
                Parts.fieldLabel("_Output folder for the response package", output), output,
                Parts.fieldLabel("Invigilator _PIN", pin), pin);
        root = Parts.cardWithActions("recoveryScreen", new VBox(8, error, new javafx.scene.layout.HBox(12, resume,
                Parts.plain("recoveryExit", "E_xit without resuming", onExit))), box);
    }

    public Parent root() {
        return root;
    }

    public void focus() {
        // after the scene has laid the screen out; a request before that can land on the first control
        javafx.application.Platform.runLater(pin::requestFocus);
    }

    private Button resumeButton() {
        return resume;
    }

    public void showError(String message) {
        resume.setDisable(false);
        error.setText(message);
        error.setAccessibleText(message);
        pin.clear();
        pin.requestFocus();
    }
}
