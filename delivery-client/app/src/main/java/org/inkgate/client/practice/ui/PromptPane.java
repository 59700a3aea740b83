package org.inkgate.client.practice.ui;

import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TitledPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

/** The selected task: heading, condition, tools, time and the prompt; the exam instructions above, folded. */
final class PromptPane extends VBox {

    PromptPane(PracticeViewModel vm) {
        getStyleClass().add("prompt-pane");

        Label heading = boundLabel("taskHeading", "task-heading", vm.taskHeadingProperty());
        Label condition = boundLabel("taskCondition", "condition-chip", vm.conditionTextProperty());
        Label tools = boundLabel("taskTools", "tools-text", vm.toolsTextProperty());
        vm.toolsOfferedProperty().addListener((obs, old, offered) -> markTools(tools, offered));
        markTools(tools, vm.toolsOfferedProperty().get());
        Label time = boundLabel("taskTime", "time-text", vm.timeTextProperty());

        PromptView prompt = new PromptView();
        prompt.setId("promptText");
        vm.promptProperty().addListener((obs, old, text) -> prompt.show(text));
        prompt.show(vm.promptProperty().get());
        ScrollPane scroller = new ScrollPane(prompt);
        scroller.setId("promptScroller");
        scroller.setFitToWidth(true);
        scroller.setFocusTraversable(true);
        scroller.setAccessibleText("Task prompt");
        scroller.getStyleClass().add("prompt-scroller");
        VBox.setVgrow(scroller, Priority.ALWAYS);

        getChildren().addAll(instructions(vm), heading, condition, tools, time, scroller);
    }

    private static TitledPane instructions(PracticeViewModel vm) {
        PromptView text = new PromptView();
        text.show(vm.instructions());
        ScrollPane scroller = new ScrollPane(text);
        scroller.setFitToWidth(true);
        scroller.setMaxHeight(260);
        TitledPane pane = new TitledPane("Instructions for this exam", scroller);
        pane.setId("instructions");
        pane.setExpanded(false);
        pane.getStyleClass().add("instructions");
        pane.setVisible(!vm.instructions().blocks().isEmpty());
        pane.setManaged(pane.isVisible());
        return pane;
    }

    private static Label boundLabel(String id, String styleClass, javafx.beans.value.ObservableValue<String> text) {
        Label label = new Label();
        label.setId(id);
        label.getStyleClass().add(styleClass);
        label.setWrapText(true);
        label.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        label.textProperty().bind(text);
        return label;
    }

    private static void markTools(Label tools, boolean offered) {
        tools.getStyleClass().removeAll("has-tools", "no-tools");
        tools.getStyleClass().add(offered ? "has-tools" : "no-tools");
    }
}
