package org.inkgate.admin.gui.ratingadmin;

import java.util.function.Function;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.StringProperty;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import org.inkgate.admin.core.rating.DiscrepancyRule;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.Step;
import org.inkgate.admin.gui.Work;

/** Step 7: raters, the seeded assignment, progress, the discrepancy rule, flags and resolution entries. */
public final class RatingAdminView implements Step {

    static final String TITLE = "7. Rating administration";

    private final VBox root;
    private final Node storeField;

    public RatingAdminView(RatingAdminModel model, Work work) {
        GridPane where = Fields.grid();
        storeField = org.inkgate.admin.gui.StoreField.row(where, 0, "ratingStore", "Results store", model.store(),
                model.storePasswordFile(), Fields.Choose.OPEN_FILE);
        TextField exam = field("ratingExam", "Exam id (blank when the store holds one exam)", model.exam(), 16);
        exam.setPromptText("the store's only exam");
        Fields.row(where, 1, "Exam id", exam);
        Button refresh = button("refreshRating", "Show raters and progress", "Read raters, progress and flags", work);
        refresh.setOnAction(e -> model.refresh());

        TableView<RatingStore.RaterEntry> raters = table("raters", "Raters");
        raters.setItems(model.raters());
        raters.getColumns().add(column("Rater", RatingStore.RaterEntry::id));
        raters.getColumns().add(column("Shown as", RatingStore.RaterEntry::label));
        raters.getColumns().add(column("Capacity", r -> r.capacity() == null ? "no limit" : r.capacity().toString()));
        Button add = button("addRater", "Add or update rater", "Add or update the rater", work);
        add.setOnAction(e -> model.addRater());
        HBox addRow = new HBox(8, field("raterId", "Rater id", model.raterId(), 8),
                field("raterLabel", "Rater shown as", model.raterLabel(), 14),
                field("raterCapacity", "Rater capacity (blank for no limit)", model.capacity(), 6), add);
        ((TextField) addRow.getChildren().get(0)).setPromptText("id, e.g. R07");
        ((TextField) addRow.getChildren().get(1)).setPromptText("shown as");
        ((TextField) addRow.getChildren().get(2)).setPromptText("capacity");

        ChoiceBox<String> k = new ChoiceBox<>(javafx.collections.FXCollections.observableArrayList("1", "2", "3"));
        k.setId("ratersPerResponse");
        k.setAccessibleText("Raters per response");
        k.valueProperty().bindBidirectional(model.ratersPerResponse());
        TextField seed = field("ratingSeed", "Assignment seed (blank: a new one is drawn and shown)", model.seed(), 20);
        seed.setPromptText("blank: drawn and shown");
        CheckBox unlinked = new CheckBox("Accept raters in groups that share no response");
        unlinked.setId("allowUnlinked");
        unlinked.setAccessibleText("Accept raters in groups that share no response");
        unlinked.selectedProperty().bindBidirectional(model.allowUnlinked());
        Button assign = button("assignRatings", "Assign responses", "Assign the unassigned responses to raters", work);
        assign.setOnAction(e -> model.assign());
        GridPane design = Fields.grid();
        Fields.row(design, 0, "Raters per response", k);
        Fields.row(design, 1, "Seed", seed);
        design.add(unlinked, 1, 2);
        design.add(assign, 1, 3);

        TableView<RatingStore.ProgressRow> progress = table("ratingProgress", "Progress per rater and task");
        progress.setItems(model.progress());
        progress.getColumns().add(column("Rater", RatingStore.ProgressRow::raterId));
        TableColumn<RatingStore.ProgressRow, String> task = column("Task", RatingStore.ProgressRow::taskId);
        task.setPrefWidth(220);
        Fields.wrap(task);
        progress.getColumns().add(task);
        progress.getColumns().add(column("Assigned", r -> Integer.toString(r.total())));
        progress.getColumns().add(column("Rated", r -> Integer.toString(r.rated())));
        progress.getColumns().add(column("Remaining", r -> Integer.toString(r.remaining())));
        progress.getColumns().add(column("Flagged", r -> Integer.toString(r.flagged())));

        Label state = Fields.result("ratingState", "Rater links, pending responses and the rule in force", model.state());
        Label message = Fields.result("ratingMessage", "Outcome of the last rating action", model.message());

        RuleAndFlags rule = model.rule();
        ChoiceBox<String> method = new ChoiceBox<>();
        for (DiscrepancyRule.AdjudicatedScore a : DiscrepancyRule.AdjudicatedScore.values()) {
            method.getItems().add(a.label());
        }
        method.setId("adjudicatedScore");
        method.setAccessibleText("Final score of an adjudicated response");
        method.valueProperty().bindBidirectional(rule.method());
        Button setRule = button("setRule", "Set rule", "Set the discrepancy rule and apply it", work);
        setRule.setOnAction(e -> rule.setRule());
        GridPane ruleGrid = Fields.grid();
        Fields.row(ruleGrid, 0, "Criterion gap (bands)", field("criterionGap",
                "Flag when a criterion's scores lie more than this many bands apart", rule.criterionGap(), 6));
        Fields.row(ruleGrid, 1, "Total gap (points)", field("totalGap",
                "Flag when totals lie more than this many points apart", rule.totalGap(), 6));
        Fields.row(ruleGrid, 2, "Adjudicated score", method);
        ruleGrid.add(setRule, 1, 3);

        TableView<RatingStore.Flag> flags = table("flags", "Flagged responses");
        flags.setItems(model.flags());
        TableColumn<RatingStore.Flag, String> number = column("Flag", f -> Long.toString(f.flagId()));
        number.setPrefWidth(64);
        number.setMinWidth(60); // the heading "Flag" whole at 1024 pixels
        flags.getColumns().add(number);
        TableColumn<RatingStore.Flag, String> flagTask = column("Task", RatingStore.Flag::taskId);
        flagTask.setPrefWidth(170);
        Fields.wrap(flagTask);
        flags.getColumns().add(flagTask);
        flags.getColumns().add(column("Raters", f -> String.join(" ", f.raters())));
        TableColumn<RatingStore.Flag, String> why = column("Why", RatingStore.Flag::reason);
        TableColumn<RatingStore.Flag, String> status = column("Where it stands", RatingStore.Flag::status);
        why.setPrefWidth(200);
        status.setPrefWidth(220);
        Fields.wrap(why);
        Fields.wrap(status);
        flags.getColumns().add(why);
        flags.getColumns().add(status);
        Button review = button("reviewFlags", "Review flags", "Apply the rule again and list the flags", work);
        review.setOnAction(e -> rule.review());
        Button resolve = button("resolveFlag", "Record resolution entry", "Record the resolution entry", work);
        resolve.setOnAction(e -> rule.resolve());
        GridPane resolution = Fields.grid();
        Fields.row(resolution, 0, "Flag number", field("resolveFlagId", "Flag number to settle", rule.flag(), 6));
        Fields.row(resolution, 1, "Resolved by", field("resolveBy", "Who resolved it", rule.by(), 16));
        TextField scores = field("resolveScores", "Scores, one per criterion, as criterion=score separated by commas", rule.scores(), 30);
        scores.setPromptText("criterion=score, criterion=score");
        Fields.row(resolution, 2, "Scores", scores);
        Fields.row(resolution, 3, "Why", field("resolveComment", "Why it was resolved so", rule.comment(), 30));
        resolution.add(resolve, 1, 4);

        SheetsAndScores files = model.sheets();
        GridPane sheetGrid = Fields.grid();
        Fields.row(sheetGrid, 0, "Rater", field("sheetRater", "Rater whose sheet it is", files.rater(), 8));
        Fields.pathRow(sheetGrid, 1, "sheetFile", "Sheet file", files.sheet(), Fields.Choose.SAVE_FILE);
        Button sheetOut = button("exportSheet", "Write sheet and scripts", "Write the rater's sheet and scripts", work);
        sheetOut.setOnAction(e -> files.exportSheet());
        Button sheetIn = button("importSheet", "Read filled sheet", "Read the rater's filled sheet", work);
        sheetIn.setOnAction(e -> files.importSheet());
        sheetGrid.add(new HBox(8, sheetOut, sheetIn), 1, 2);
        Fields.pathRow(sheetGrid, 3, "scoresFolder", "Scores folder", files.scoresFolder(), Fields.Choose.FOLDER);
        Button scoresOut = button("exportScores", "Write ratings and final scores",
                "Write ratings.csv and final-scores.csv", work);
        scoresOut.setOnAction(e -> files.exportScores());
        sheetGrid.add(scoresOut, 1, 4);

        root = new VBox(14, Fields.heading(TITLE),
                Fields.note("Raters, the seeded assignment and its rater links, progress, the discrepancy rule and"
                        + " the adjudication queue over the results store, as inkgate-admin rate does. Raters score"
                        + " in the rating desk (step 6) or on sheets."),
                where, refresh, message, state,
                Fields.heading("Raters"), raters, addRow,
                Fields.heading("Assignment"), Fields.note("Every response not yet assigned goes to this many raters;"
                        + " the seed is recorded in the store, and the same seed and responses give the same design."),
                design,
                Fields.heading("Progress"), progress,
                Fields.heading("Discrepancy rule"), Fields.note("The thresholds are your decision under your exam's"
                        + " regulations. Flagged responses go to a third rater or wait for a resolution entry."),
                ruleGrid,
                Fields.heading("Flags and resolution entries"), flags, review, resolution,
                QualityPanels.referrals(model.referrals(), work), QualityPanels.controls(model.controls(), work),
                QualificationPanel.of(model.qualification(), work),
                Fields.heading("Rating sheets and final scores"), Fields.note("A sheet lists the rater's queue under"
                        + " blind ids; the scripts folder beside it holds the texts and the rubric. A filled sheet is"
                        + " checked row by row and nothing is stored if any row is bad. ratings.csv and"
                        + " final-scores.csv hold candidate numbers: handle them under your data-protection rules."),
                sheetGrid);
        root.getStyleClass().add("step");
    }

    static TextField field(String id, String accessible, StringProperty value, int columns) {
        TextField f = new TextField();
        f.setId(id);
        f.setAccessibleText(accessible);
        f.setPrefColumnCount(columns);
        f.textProperty().bindBidirectional(value);
        return f;
    }

    static Button button(String id, String text, String accessible, Work work) {
        Button b = new Button(text);
        b.setId(id);
        b.setAccessibleText(accessible);
        b.disableProperty().bind(work.busy());
        return b;
    }

    static <S> TableView<S> table(String id, String accessible) {
        TableView<S> t = new TableView<>();
        t.setId(id);
        t.setAccessibleText(accessible);
        t.setPrefHeight(180);
        t.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        t.setPlaceholder(new Label("Nothing yet: name the store and press Show raters and progress."));
        return t;
    }

    static <S> TableColumn<S, String> column(String name, Function<S, String> value) {
        TableColumn<S, String> c = new TableColumn<>(name);
        c.setCellValueFactory(d -> new ReadOnlyObjectWrapper<>(value.apply(d.getValue())));
        return c;
    }

    @Override
    public String title() {
        return TITLE;
    }

    @Override
    public Node view() {
        return root;
    }

    @Override
    public Node firstFocus() {
        return storeField;
    }
}
