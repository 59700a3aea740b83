package org.inkgate.client.practice.ui;

import javafx.scene.control.ContentDisplay;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.layout.VBox;
import org.inkgate.client.practice.PracticeTask;

/** One task in the task list: its place, title, condition and tools. */
final class TaskCell extends ListCell<PracticeTask> {

    private final Label title = new Label();
    private final Label condition = new Label();
    private final Label tools = new Label();
    private final VBox box = new VBox(4, title, condition, tools);

    TaskCell() {
        getStyleClass().add("task-cell");
        title.getStyleClass().add("task-title");
        title.setWrapText(true);
        condition.getStyleClass().add("task-condition");
        tools.getStyleClass().add("task-tools");
        tools.setWrapText(true);
        box.getStyleClass().add("task-cell-box");
        setText(null);
        setContentDisplay(ContentDisplay.GRAPHIC_ONLY);
        // the list decides the width: no sideways scrolling for a long title
        setPrefWidth(0);
    }

    @Override
    protected void updateItem(PracticeTask task, boolean empty) {
        super.updateItem(task, empty);
        if (empty || task == null) {
            setGraphic(null);
            setAccessibleText(null);
            return;
        }
        title.setText(task.position() + ". " + task.title());
        condition.setText(task.conditionLabel());
        tools.setText(String.join("\n", task.tools()));
        tools.getStyleClass().removeAll("has-tools", "no-tools");
        tools.getStyleClass().add(task.offersTools() ? "has-tools" : "no-tools");
        setGraphic(box);
        setAccessibleText("Task " + task.position() + ": " + task.title() + ". " + task.conditionLabel() + ". "
                + String.join(". ", task.tools()) + ".");
    }
}
