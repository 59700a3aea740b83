package org.inkgate.client.sitting.ui.screen;

import java.util.List;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.VBox;
import org.inkgate.client.practice.PromptText;
import org.inkgate.client.practice.ui.PromptView;
import org.inkgate.client.sitting.ui.parts.Parts;

/** The exam's instructions and the plan of the sitting; the writing tools warm up meanwhile. */
public final class InstructionsScreen {

    private final Label tools = Parts.quiet("");
    private final Button start;
    private final Parent root;

    /**
     * @param candidateLine who is signed in, e.g. "Candidate 1001, form A"
     * @param plan          one line per task, in order
     */
    public InstructionsScreen(String examTitle, String candidateLine, PromptText instructions, List<String> plan,
            Runnable onStart) {
        PromptView text = new PromptView();
        text.setId("instructionsText");
        text.show(instructions);
        VBox planBox = new VBox(6);
        planBox.setId("taskPlan");
        int n = 1;
        for (String line : plan) {
            planBox.getChildren().add(Parts.text(n++ + ". " + line));
        }
        tools.setId("toolsStatus");
        start = Parts.primary("startButton", "_Begin the first task", onStart);
        VBox box = new VBox(14,
                Parts.heading(examTitle),
                Parts.quiet(candidateLine),
                text,
                Parts.heading("Your tasks"),
                planBox,
                Parts.quiet("Each task has its own time. When a task ends, you cannot go back to it."
                        + " Your work is saved on this machine as you type."));
        root = Parts.cardWithActions("instructionsScreen", new VBox(8, tools, start), box);
    }

    public Parent root() {
        return root;
    }

    public void focus() {
        start.requestFocus();
    }

    /** Says how far the writing tools' preparation has come. */
    public void toolsStatus(String status) {
        tools.setText(status);
        tools.setAccessibleText(status);
    }
}
