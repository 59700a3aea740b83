package org.inkgate.client.sitting.ui.screen;

import javafx.geometry.Pos;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import org.inkgate.client.sitting.ui.parts.Parts;

/**
 * One task of the sitting: the task workspace (prompt, editor, resource panel) with a footer
 * that says where the candidate is and lets them finish the task, after a second, explicit step.
 */
public final class TaskScreen {

    private final BorderPane root = new BorderPane();
    private final Button finish;
    private final Button confirm;
    private final Button keepWriting;
    private final Label question = Parts.text("Finish this task? You cannot come back to it.");
    private final Label where;

    /**
     * @param position  e.g. "Task 1 of 2: A note to a neighbour"
     * @param workspace the workspace's view
     * @param onFinish  the candidate confirmed finishing the task
     */
    public TaskScreen(String position, Parent workspace, Runnable onFinish) {
        root.setId("taskScreen");
        root.setCenter(workspace);
        where = Parts.quiet(position);
        where.setId("taskPosition");
        HBox.setHgrow(where, Priority.ALWAYS);
        where.setMaxWidth(Double.MAX_VALUE);
        finish = Parts.plain("finishTaskButton", "_Finish this task...", this::ask);
        confirm = Parts.plain("confirmFinishButton", "_Yes, finish this task", onFinish);
        confirm.getStyleClass().add("primary");
        keepWriting = Parts.plain("keepWritingButton", "_Keep writing", this::unask);
        question.setId("finishQuestion");
        HBox footer = new HBox(16, where, question, keepWriting, confirm, finish);
        footer.setAlignment(Pos.CENTER_LEFT);
        footer.getStyleClass().add("sitting-strip");
        question.setMinWidth(0);
        HBox.setHgrow(question, Priority.ALWAYS);
        question.setMaxWidth(Double.MAX_VALUE);
        for (Button b : new Button[] {finish, confirm, keepWriting}) {
            b.setMinWidth(Region.USE_PREF_SIZE);
        }
        root.setBottom(footer);
        unask();
    }

    public Parent root() {
        return root;
    }

    /** Disables the footer (pause, time up). */
    public void frozen(boolean frozen) {
        finish.setDisable(frozen);
        confirm.setDisable(frozen);
        keepWriting.setDisable(frozen);
    }

    private void ask() {
        show(true);
        keepWriting.requestFocus();
    }

    private void unask() {
        show(false);
    }

    private void show(boolean asking) {
        question.setVisible(asking);
        question.setManaged(asking);
        confirm.setVisible(asking);
        confirm.setManaged(asking);
        keepWriting.setVisible(asking);
        keepWriting.setManaged(asking);
        finish.setVisible(!asking);
        finish.setManaged(!asking);
        // the question says which task; the position line gives it the room
        where.setVisible(!asking);
        where.setManaged(!asking);
    }
}
