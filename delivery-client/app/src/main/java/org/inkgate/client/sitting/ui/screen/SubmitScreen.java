package org.inkgate.client.sitting.ui.screen;

import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.VBox;
import org.inkgate.client.sitting.ui.parts.Parts;

/**
 * Handing in: says that the answers are being written, and when the output folder fails, says
 * plainly that nothing is lost (the local copy exists) and offers to try again.
 */
public final class SubmitScreen {

    private final Label status = Parts.text("Saving your answers...");
    private final Label problem = Parts.errorLine("submitError");
    private final Button retry;
    private final Parent root;

    public SubmitScreen(Runnable onRetry) {
        status.setId("submitStatus");
        retry = Parts.primary("retryButton", "_Try again", onRetry);
        retry.setVisible(false);
        retry.setManaged(false);
        VBox box = new VBox(14, Parts.heading("Handing in"), status, problem, retry);
        root = Parts.card("submitScreen", box);
    }

    public Parent root() {
        return root;
    }

    /** Writing is under way. */
    public void working() {
        status.setText("Saving your answers...");
        problem.setText("");
        retry.setVisible(false);
        retry.setManaged(false);
    }

    /** The output folder failed; the message says why and that the local copy is kept. */
    public void failed(String message) {
        status.setText("Your answers are safe on this machine, but they could not be written to the output folder."
                + " Please raise your hand: the invigilator will fix the folder and press Try again.");
        problem.setText(message);
        problem.setAccessibleText(message);
        retry.setVisible(true);
        retry.setManaged(true);
        retry.requestFocus();
    }
}
