package org.inkgate.admin.gui.exam;

import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import org.inkgate.admin.core.source.Problem;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.Step;
import org.inkgate.admin.gui.preview.PreviewStage;

/** Step 1: choose the exam folder and check it; every problem in a table. */
public final class ExamCheckView implements Step {

    private final VBox root;
    private final TextField folder;

    public ExamCheckView(ExamCheckModel model) {
        GridPane grid = Fields.grid();
        folder = Fields.pathRow(grid, 0, "examFolder", "Exam folder", model.folder(), Fields.Choose.FOLDER);
        Button check = new Button("Check the exam folder");
        check.setId("checkExam");
        check.setDefaultButton(false);
        check.setOnAction(e -> model.check());
        Label summary = new Label();
        summary.setId("examSummary");
        summary.setWrapText(true);
        summary.textProperty().bind(model.summary());
        summary.getStyleClass().add("step-result");

        TableView<Problem> table = new TableView<>(model.problems());
        table.setId("problems");
        table.setAccessibleText("Problems found in the exam folder");
        table.setPlaceholder(new Label("No problems listed."));
        // file and field are read whole at a glance: the message column gives way, never they
        TableColumn<Problem, String> file = column("File", 120, p -> p.file());
        file.setMinWidth(110);
        table.getColumns().add(file);
        table.getColumns().add(column("Line", 48, p -> p.line() == 0 ? "" : String.valueOf(p.line())));
        table.getColumns().add(column("Col", 44, p -> p.column() == 0 ? "" : String.valueOf(p.column())));
        TableColumn<Problem, String> field = column("Field", 210, p -> p.field());
        field.setMinWidth(190);
        table.getColumns().add(field);
        TableColumn<Problem, String> fix = column("Problem and how to fix it", 300, p -> p.message());
        Fields.wrap(fix);
        table.getColumns().add(fix);
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        table.setPrefHeight(260);
        VBox.setVgrow(table, Priority.ALWAYS);

        root = new VBox(14, Fields.heading("1. Exam check"),
                Fields.note("The whole folder is checked at once: exam.yaml, the prompts, the rubric and the packs it names."),
                grid, check, summary, table, previewRow(model));
        root.getStyleClass().add("step");
    }

    /** Preview one task under one condition in the client's practice window (as {@code inkgate-admin preview}). */
    private static Node previewRow(ExamCheckModel model) {
        ComboBox<String> task = new ComboBox<>(model.taskIds());
        task.setId("previewTask");
        task.setAccessibleText("Task to preview");
        task.valueProperty().bindBidirectional(model.previewTask());
        ComboBox<String> condition = new ComboBox<>(model.conditionIds());
        condition.setId("previewCondition");
        condition.setAccessibleText("Condition whose resource policy applies");
        condition.valueProperty().bindBidirectional(model.previewCondition());
        Button open = new Button("Preview this task");
        open.setId("openPreview");
        open.disableProperty().bind(javafx.beans.binding.Bindings.isEmpty(model.taskIds()));
        open.setOnAction(e -> model.preview().ifPresent(p -> {
            Stage stage = new Stage();
            stage.initOwner(open.getScene().getWindow());
            PreviewStage.show(stage, p.load(), p.taskId(), p.conditionId());
        }));
        Label taskLabel = new Label("Task");
        taskLabel.setLabelFor(task);
        Label conditionLabel = new Label("under");
        conditionLabel.setLabelFor(condition);
        HBox row = new HBox(10, taskLabel, task, conditionLabel, condition, open);
        row.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        Label message = new Label();
        message.setId("previewMessage");
        message.setWrapText(true);
        message.textProperty().bind(model.previewMessage());
        VBox box = new VBox(8, Fields.note("Preview: opens one task in the client's practice window under a condition's"
                + " resource policy. A preview for you, not a locked sitting."), row, message);
        box.visibleProperty().bind(javafx.beans.binding.Bindings.isNotEmpty(model.taskIds()));
        box.managedProperty().bind(box.visibleProperty());
        return box;
    }

    private static TableColumn<Problem, String> column(String name, double width,
            java.util.function.Function<Problem, String> value) {
        TableColumn<Problem, String> c = new TableColumn<>(name);
        c.setPrefWidth(width);
        c.setCellValueFactory(d -> new ReadOnlyObjectWrapper<>(value.apply(d.getValue())));
        return c;
    }

    @Override
    public String title() {
        return "1. Exam check";
    }

    @Override
    public Node view() {
        return root;
    }

    @Override
    public Node firstFocus() {
        return folder;
    }
}
