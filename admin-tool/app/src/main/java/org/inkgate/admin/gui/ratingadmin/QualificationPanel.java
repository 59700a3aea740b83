package org.inkgate.admin.gui.ratingadmin;

import static org.inkgate.admin.gui.ratingadmin.QualityPanels.limit;
import static org.inkgate.admin.gui.ratingadmin.QualityPanels.share;
import static org.inkgate.admin.gui.ratingadmin.QualityPanels.sized;
import static org.inkgate.admin.gui.ratingadmin.QualityPanels.wrapped;
import static org.inkgate.admin.gui.ratingadmin.RatingAdminView.button;
import static org.inkgate.admin.gui.ratingadmin.RatingAdminView.column;
import static org.inkgate.admin.gui.ratingadmin.RatingAdminView.field;
import static org.inkgate.admin.gui.ratingadmin.RatingAdminView.table;

import java.util.Locale;
import java.util.TreeMap;
import java.util.stream.Collectors;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import org.inkgate.admin.core.rating.QualificationSet;
import org.inkgate.admin.core.rating.QualificationStanding;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.Work;
import org.inkgate.format.refusal.FormatRefusal;

/** The qualification set on the rating step's page: its scripts, the rule, each rater's standing, admission. */
final class QualificationPanel {

    private QualificationPanel() {
    }

    static Node of(QualificationQuality model, Work work) {
        TableView<QualificationSet.Script> scripts = table("qualificationScripts",
                "Qualification scripts with their agreed scores");
        scripts.setItems(model.scripts());
        scripts.setPrefHeight(140);
        scripts.setPlaceholder(new Label("No qualification script marked yet."));
        scripts.getColumns().add(sized(column("Candidate", QualificationSet.Script::candidateNumber), 92));
        scripts.getColumns().add(wrapped(column("Task", QualificationSet.Script::taskId), 130));
        scripts.getColumns().add(wrapped(column("Agreed scores", c -> new TreeMap<>(c.agreed()).entrySet().stream()
                .map(e -> e.getKey() + "=" + e.getValue()).collect(Collectors.joining(", "))), 170));
        scripts.getColumns().add(sized(column("Given", c -> Integer.toString(c.given())), 60));
        scripts.getColumns().add(sized(column("Scored", c -> Integer.toString(c.rated())), 64));
        scripts.getColumns().add(wrapped(column("Source", c -> FormatRefusal.printable(c.source())), 130));

        Button mark = button("markQualification", "Mark as qualification script",
                "Mark the response as a qualification script", work);
        mark.setOnAction(e -> model.mark());
        Button give = button("giveQualification", "Give to raters", "Give the qualification set to every rater", work);
        give.setOnAction(e -> model.give());
        GridPane form = Fields.grid();
        Fields.row(form, 0, "Candidate number", field("qualificationCandidate",
                "Candidate number of the qualification script", model.candidate(), 10));
        Fields.row(form, 1, "Task", field("qualificationTask", "Task of the qualification script", model.task(), 16));
        var agreed = field("qualificationAgreed", "Agreed scores of the qualification script, as criterion=score"
                + " separated by commas", model.agreed(), 30);
        agreed.setPromptText("criterion=score, criterion=score");
        Fields.row(form, 2, "Agreed scores", agreed);
        Fields.row(form, 3, "Agreed at", field("qualificationSource", "Where the qualification script's agreed scores"
                + " come from", model.source(), 30));
        form.add(mark, 1, 4);
        form.add(give, 1, 5);

        Button setRule = button("setQualificationRule", "Set rule", "Set the qualification rule", work);
        setRule.setOnAction(e -> model.setRule());
        GridPane limits = Fields.grid();
        Fields.row(limits, 0, "Exact agreement at least", limit("qualificationMinExact",
                "Qualification: minimum exact agreement, 0 to 1 (blank: not checked)", model.minExact()));
        Fields.row(limits, 1, "Adjacent agreement at least", limit("qualificationMinAdjacent",
                "Qualification: minimum adjacent agreement, 0 to 1 (blank: not checked)", model.minAdjacent()));
        Fields.row(limits, 2, "Mean difference within +-", limit("qualificationMaxMean",
                "Qualification: largest mean difference in points (blank: not checked)", model.maxMeanDifference()));
        limits.add(setRule, 1, 3);
        Label rule = new Label();
        rule.setId("qualificationRule");
        rule.setWrapText(true);
        rule.textProperty().bind(model.rule());

        TableView<QualificationStanding> standings = table("qualificationStandings",
                "Each rater's standing with the qualification set");
        standings.setItems(model.standings());
        standings.setPrefHeight(180);
        standings.setPlaceholder(new Label("No raters yet."));
        standings.getColumns().add(sized(column("Rater", QualificationStanding::raterId), 72));
        standings.getColumns().add(sized(column("Scored", q -> q.rated() + " of " + q.given()), 72));
        standings.getColumns().add(sized(column("Exact", q -> q.agreement() == null ? "-"
                : share(q.agreement().exact())), 56));
        standings.getColumns().add(sized(column("Adjacent", q -> q.agreement() == null ? "-"
                : share(q.agreement().adjacent())), 80));
        standings.getColumns().add(sized(column("Mean\ndifference", q -> q.agreement() == null ? "-"
                : String.format(Locale.ROOT, "%+.2f", q.agreement().meanDifference())), 92));
        standings.getColumns().add(wrapped(column("Standing", q -> q.status().words()
                + (q.status() == QualificationStanding.Status.NOT_PASSED ? ":\n" + String.join(";\n", q.agreement().flags())
                : "") + (q.admission() != null ? "\nby " + FormatRefusal.printable(q.admission().by()) + ": "
                + FormatRefusal.printable(q.admission().reason()) : "")), 290));

        Button admit = button("admitRater", "Admit rater", "Admit the rater to live rating", work);
        admit.setOnAction(e -> model.admit());
        GridPane admission = Fields.grid();
        Fields.row(admission, 0, "Rater", field("admitRaterId", "Rater to admit to live rating", model.admitRater(), 10));
        Fields.row(admission, 1, "Decided by", field("admitBy", "Who admits the rater", model.admitBy(), 20));
        Fields.row(admission, 2, "Reason", field("admitReason", "Why the rater is admitted", model.admitReason(), 30));
        admission.add(admit, 1, 3);

        return new VBox(10, Fields.heading("Qualification set"), Fields.note("Scripts with agreed scores that every"
                + " rater scores first, told what they are. Once a rule is set, a rater's live scripts stay closed until"
                + " the rater has scored the whole set within its limits, or you admit the rater; set the limits your"
                + " scoring rules give (there is no default). Qualification ratings never enter a candidate's scores."),
                scripts, form, limits, rule, standings, admission);
    }
}
