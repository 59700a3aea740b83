package org.inkgate.admin.gui.forms;

import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.AssignmentCounts;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.Step;

/** Step 2: forms, roster and the assignment table with counts per level. */
public final class FormsView implements Step {

    private final VBox root;
    private final TextField rosterField;
    private final GridPane countsGrid = new GridPane();
    private final Label taskConditions = new Label();

    public FormsView(FormsModel model) {
        Label forms = new Label();
        forms.setId("formsText");
        forms.textProperty().bind(model.formsText());
        forms.getStyleClass().add("mono");
        forms.setWrapText(true);

        GridPane grid = Fields.grid();
        rosterField = Fields.pathRow(grid, 0, "roster", "Roster CSV", model.roster(), Fields.Choose.OPEN_FILE);
        TextField seed = new TextField();
        seed.setId("seed");
        seed.setPrefColumnCount(22);
        seed.setAccessibleText("Seed (blank: draw a new one)");
        seed.textProperty().bindBidirectional(model.seed());
        seed.setMaxWidth(260);
        Fields.row(grid, 1, "Seed (blank: new)", seed);
        Fields.pathRow(grid, 2, "assignmentOut", "Save table to", model.out(), Fields.Choose.SAVE_FILE);
        CheckBox replace = new CheckBox("Replace an existing table (a bundle built from it would no longer match)");
        replace.setId("replaceAssignment");
        replace.setAccessibleText("Replace an existing assignment table");
        replace.selectedProperty().bindBidirectional(model.replace());
        grid.add(replace, 1, 3);
        Button assign = new Button("Assign candidates to forms");
        assign.setId("assign");
        assign.setOnAction(e -> model.assign());
        Label result = new Label();
        result.setId("formsResult");
        result.setWrapText(true);
        result.getStyleClass().add("step-result");
        result.textProperty().bind(model.result());

        countsGrid.setId("levelCounts");
        countsGrid.getStyleClass().add("counts");
        countsGrid.setAccessibleText("Candidates per level and form");
        taskConditions.setId("taskConditionCounts");
        taskConditions.getStyleClass().add("mono");
        model.counts().addListener((o, was, counts) -> showCounts(counts, model));

        TableView<Assignment.Row> table = new TableView<>(model.rows());
        table.setId("assignmentTable");
        table.setAccessibleText("Assignment table: one row per candidate");
        table.setPlaceholder(new Label("No assignment yet."));
        table.getColumns().add(column("Candidate", r -> r.candidateNumber()));
        table.getColumns().add(column("Level", r -> r.level()));
        table.getColumns().add(column("Form", r -> r.formId()));
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        table.setPrefHeight(220);
        VBox.setVgrow(table, Priority.ALWAYS);

        // the balance lines below the grid, not beside it: a parallel design's stratum x condition
        // table and long condition ids need the full width
        VBox countsRow = new VBox(14, countsGrid, taskConditions);
        root = new VBox(14, Fields.heading("2. Forms and assignment"), forms, grid, assign, result, countsRow, table);
        root.getStyleClass().add("step");
    }

    private void showCounts(AssignmentCounts counts, FormsModel model) {
        countsGrid.getChildren().clear();
        taskConditions.setText("");
        if (counts == null) {
            return;
        }
        countsGrid.add(cell("level", true), 0, 0);
        for (int f = 0; f < model.formIds().size(); f++) {
            countsGrid.add(cell(model.formIds().get(f), true), f + 1, 0);
        }
        int r = 1;
        for (String level : counts.byLevel().keySet()) {
            countsGrid.add(cell(level, true), 0, r);
            for (int f = 0; f < model.formIds().size(); f++) {
                Label c = cell(Integer.toString(counts.count(level, model.formIds().get(f))), false);
                c.setId("count-" + level + "-" + model.formIds().get(f));
                countsGrid.add(c, f + 1, r);
            }
            r++;
        }
        taskConditions.setText(String.join("\n", model.balance()));
    }

    private static Label cell(String text, boolean head) {
        Label l = new Label(text);
        l.getStyleClass().add(head ? "count-head" : "count-cell");
        return l;
    }

    private static TableColumn<Assignment.Row, String> column(String name,
            java.util.function.Function<Assignment.Row, String> value) {
        TableColumn<Assignment.Row, String> c = new TableColumn<>(name);
        c.setPrefWidth(180);
        c.setCellValueFactory(d -> new ReadOnlyObjectWrapper<>(value.apply(d.getValue())));
        return c;
    }

    @Override
    public String title() {
        return "2. Forms and assignment";
    }

    @Override
    public Node view() {
        return root;
    }

    @Override
    public Node firstFocus() {
        return rosterField;
    }
}
