package org.inkgate.client.practice.ui;

import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.inkgate.client.practice.PracticeTask;

/** The tasks of the chosen form in order; selecting one shows it. */
final class TaskListPane extends VBox {

    private final ListView<PracticeTask> list = new ListView<>();

    TaskListPane(PracticeViewModel vm) {
        getStyleClass().add("task-pane");
        Label heading = new Label("_Tasks in this form");
        heading.setMnemonicParsing(true);
        heading.setLabelFor(list);
        heading.getStyleClass().add("pane-heading");

        list.setId("taskList");
        list.setItems(vm.tasks());
        list.setCellFactory(view -> new TaskCell());
        list.setAccessibleText("Tasks in this form, in the order they are sat");
        VBox.setVgrow(list, Priority.ALWAYS);
        syncSelection(vm);

        Label afterTasks = new Label();
        afterTasks.setId("afterTasks");
        afterTasks.getStyleClass().add("after-tasks");
        afterTasks.setWrapText(true);
        afterTasks.textProperty().bind(vm.afterTasksTextProperty());
        afterTasks.visibleProperty().bind(afterTasks.textProperty().isNotEmpty());
        afterTasks.managedProperty().bind(afterTasks.visibleProperty());

        getChildren().addAll(heading, list, afterTasks);
    }

    ListView<PracticeTask> list() {
        return list;
    }

    private void syncSelection(PracticeViewModel vm) {
        list.getSelectionModel().selectedItemProperty().addListener((obs, old, task) -> vm.selectTask(task));
        vm.selectedTaskProperty().addListener((obs, old, task) -> select(task));
        select(vm.selectedTaskProperty().get());
    }

    private void select(PracticeTask task) {
        if (task != null && list.getSelectionModel().getSelectedItem() != task) {
            list.getSelectionModel().select(task);
            list.getFocusModel().focus(list.getSelectionModel().getSelectedIndex());
        }
    }
}
