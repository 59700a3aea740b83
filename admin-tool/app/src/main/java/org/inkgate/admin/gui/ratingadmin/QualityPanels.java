package org.inkgate.admin.gui.ratingadmin;

import static org.inkgate.admin.gui.ratingadmin.RatingAdminView.button;
import static org.inkgate.admin.gui.ratingadmin.RatingAdminView.column;
import static org.inkgate.admin.gui.ratingadmin.RatingAdminView.field;
import static org.inkgate.admin.gui.ratingadmin.RatingAdminView.table;

import java.util.Locale;
import java.util.TreeMap;
import java.util.stream.Collectors;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableRow;
import javafx.scene.control.TableView;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import org.inkgate.admin.core.rating.ControlMonitor;
import org.inkgate.admin.core.rating.ControlScripts;
import org.inkgate.admin.core.rating.Referrals;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.Work;
import org.inkgate.format.refusal.FormatRefusal;

/**
 * The referrals list and the control scripts with the per-rater monitor, for the rating step's
 * page; split from {@link RatingAdminView} to keep each class within reach.
 */
final class QualityPanels {

    /** Style class of a monitor row whose rater is flagged; its colours are admin.css's -ig-flag- variables. */
    static final String FLAGGED_ROW = "flagged-rater";

    private QualityPanels() {
    }

    static Node referrals(ReferralDecisions model, Work work) {
        TableView<Referrals.Referral> list = table("referrals", "Scripts raters referred to the test owner");
        list.setItems(model.referrals());
        list.setPlaceholder(new javafx.scene.control.Label("No referral: raters refer from the desk or with rate refer."));
        // five columns fit 1024 pixels with every heading and task name whole: the script column holds id and task
        list.getColumns().add(sized(column("Referral", r -> Long.toString(r.id())), 76));
        list.getColumns().add(wrapped(column("Script", r -> r.blindId() + "\n" + r.taskId()), 140));
        list.getColumns().add(sized(column("Candidate", Referrals.Referral::candidateNumber), 92));
        list.getColumns().add(wrapped(column("Rater, reason, note", r -> r.raterId() + ": "
                + r.reason().meaning() + ": " + FormatRefusal.printable(r.note())), 190));
        list.getColumns().add(wrapped(column("Where it stands", r -> r.open() ? "open: decide under your regulations"
                : "decided by " + FormatRefusal.printable(r.decidedBy()) + ", " + minute(r.decidedAt()) + ": "
                + FormatRefusal.printable(r.decision())), 170));

        Button decide = button("decideReferral", "Record decision", "Record the decision on the referral", work);
        decide.setOnAction(e -> model.decide());
        GridPane form = Fields.grid();
        Fields.row(form, 0, "Referral number", field("referralId", "Referral number to decide", model.referral(), 6));
        Fields.row(form, 1, "Decided by", field("referralBy", "Who decided", model.by(), 16));
        Fields.row(form, 2, "Decision", field("referralDecision", "What was decided", model.decision(), 30));
        form.add(decide, 1, 3);
        return new VBox(10, Fields.heading("Referrals"), Fields.note("Raters refer a script when its text reveals who"
                + " wrote it, suggests help the sitting did not allow, or is off the task. The candidate number is shown"
                + " to you only. A decision changes no score and no queue: what follows is for your regulations;"
                + " a later decision replaces an earlier one."), list, form);
    }

    static Node controls(ControlQuality model, Work work) {
        TableView<ControlScripts.Control> list = table("controlScripts", "Control scripts with their agreed scores");
        list.setItems(model.controls());
        list.setPlaceholder(new javafx.scene.control.Label("No control script marked yet."));
        list.getColumns().add(sized(column("Candidate", ControlScripts.Control::candidateNumber), 92));
        list.getColumns().add(wrapped(column("Task", ControlScripts.Control::taskId), 130));
        list.getColumns().add(wrapped(column("Agreed scores", c -> new TreeMap<>(c.agreed()).entrySet().stream()
                .map(e -> e.getKey() + "=" + e.getValue()).collect(Collectors.joining(", "))), 170));
        list.getColumns().add(sized(column("In queues", c -> Integer.toString(c.inQueues())), 84));
        list.getColumns().add(sized(column("Rated", c -> Integer.toString(c.rated())), 60));
        list.getColumns().add(wrapped(column("Source", c -> FormatRefusal.printable(c.source())), 130));

        Button mark = button("markControl", "Mark as control script", "Mark the response as a control script", work);
        mark.setOnAction(e -> model.mark());
        Button mix = button("mixControls", "Mix into queues", "Mix the control scripts into raters' queues", work);
        mix.setOnAction(e -> model.mix());
        GridPane form = Fields.grid();
        Fields.row(form, 0, "Candidate number", field("controlCandidate", "Candidate number of the control script",
                model.candidate(), 10));
        Fields.row(form, 1, "Task", field("controlTask", "Task of the control script", model.task(), 16));
        var agreed = field("controlAgreed", "Agreed scores, one per criterion, as criterion=score separated by commas",
                model.agreed(), 30);
        agreed.setPromptText("criterion=score, criterion=score");
        Fields.row(form, 2, "Agreed scores", agreed);
        Fields.row(form, 3, "Agreed at", field("controlSource", "Where the agreed scores come from", model.source(), 30));
        form.add(mark, 1, 4);
        var seed = field("controlSeed", "Mixing seed (blank: a new one is drawn and shown)", model.mixSeed(), 20);
        seed.setPromptText("blank: drawn and shown");
        Fields.row(form, 5, "Mixing seed", seed);
        form.add(mix, 1, 6);

        return new VBox(10, Fields.heading("Control scripts and rater monitor"), Fields.note("A control script is a"
                + " response with agreed scores (e.g. from a standardisation meeting). Mixed into raters' queues, it"
                + " looks like any other script; its ratings measure the rater and never enter a candidate's scores."),
                list, form, monitor(model, work));
    }

    private static Node monitor(ControlQuality model, Work work) {
        TableView<ControlMonitor.RaterReport> table = table("raterMonitor",
                "Each rater against the agreed scores of the control scripts");
        table.setItems(model.monitor());
        table.setPrefHeight(250); // a flagged rater's reasons, one a line, without scrolling
        table.setPlaceholder(new javafx.scene.control.Label("No control script rated yet."));
        // 670 pixels in all: every heading and figure whole in a 1024-pixel window
        table.getColumns().add(sized(column("Rater", ControlMonitor.RaterReport::raterId), 72));
        table.getColumns().add(sized(column("Scripts", r -> Integer.toString(r.scripts())), 64));
        table.getColumns().add(sized(column("Exact", r -> share(r.exact())), 56));
        table.getColumns().add(sized(column("Adjacent", r -> share(r.adjacent())), 80));
        table.getColumns().add(sized(column("Mean\ndifference", r -> signed(r.meanDifference())), 92));
        table.getColumns().add(sized(column("Drift", r -> signed(r.drift())), 60));
        table.getColumns().add(wrapped(column("Over time", r -> r.timeline().stream()
                .map(p -> signed(p.meanDifference())).collect(Collectors.joining(" "))), 100));
        table.getColumns().add(wrapped(column("Flag", r -> r.flagged() ? "FLAGGED:\n" + String.join(";\n", r.flags())
                : "within the limits"), 146));
        table.setRowFactory(t -> new TableRow<>() {
            @Override
            protected void updateItem(ControlMonitor.RaterReport item, boolean empty) {
                super.updateItem(item, empty);
                getStyleClass().remove(FLAGGED_ROW);
                if (!empty && item != null && item.flagged()) {
                    getStyleClass().add(FLAGGED_ROW);
                }
            }
        });

        Button apply = button("applyMonitorLimits", "Apply limits", "Apply the monitor limits", work);
        apply.setOnAction(e -> model.applyLimits());
        apply.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        GridPane labels = Fields.grid();
        labelled(labels, 0, 0, "Exact agreement at least",
                limit("monitorMinExact", "Minimum exact agreement, 0 to 1 (blank: not checked)", model.minExact()));
        labelled(labels, 0, 1, "Adjacent agreement at least",
                limit("monitorMinAdjacent", "Minimum adjacent agreement, 0 to 1 (blank: not checked)", model.minAdjacent()));
        labelled(labels, 2, 0, "Mean difference within +-", limit("monitorMaxMean",
                "Largest mean difference in points (blank: not checked)", model.maxMeanDifference()));
        labelled(labels, 2, 1, "Drift within +-",
                limit("monitorMaxDrift", "Largest drift in points (blank: not checked)", model.maxDrift()));
        labels.add(apply, 4, 1);
        return new VBox(10, Fields.heading("Rater monitor"), Fields.note("Over every criterion score of the control"
                + " scripts each rater submitted: exact and adjacent agreement (|score - agreed| of 0, of at most 1),"
                + " mean difference (score - agreed; positive is more lenient), and drift: the later half of the"
                + " rater's control scripts minus the earlier half; over time, each control script's mean difference,"
                + " earliest first. The starting limits are placeholders, not a"
                + " standard: set your own. A flag asks you to look (retraining, re-rating) under your rules."),
                labels, table);
    }

    /** A label and its field side by side in the grid, the label never cut short. */
    private static void labelled(GridPane grid, int column, int row, String text, javafx.scene.Node field) {
        javafx.scene.control.Label l = new javafx.scene.control.Label(text);
        l.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        l.setLabelFor(field);
        grid.add(l, column, row);
        grid.add(field, column + 1, row);
    }

    static javafx.scene.control.TextField limit(String id, String accessible,
            javafx.beans.property.StringProperty value) {
        var f = field(id, accessible, value, 4);
        f.setPromptText("none");
        return f;
    }

    static <S> TableColumn<S, String> wrapped(TableColumn<S, String> c, double width) {
        c.setPrefWidth(width);
        Fields.wrap(c);
        return c;
    }

    static <S> TableColumn<S, String> sized(TableColumn<S, String> c, double width) {
        c.setPrefWidth(width);
        c.setMinWidth(width);
        return c;
    }

    /** A stored UTC time (ISO 8601) to the minute, for reading; the command line prints it whole. */
    private static String minute(String iso) {
        return iso != null && iso.length() >= 16 && iso.charAt(10) == 'T' ? iso.substring(0, 10) + " " + iso.substring(11, 16)
                + " UTC" : String.valueOf(iso);
    }

    static String share(double d) {
        return Double.isNaN(d) ? "-" : String.format(Locale.ROOT, "%.2f", d);
    }

    private static String signed(double d) {
        return Double.isNaN(d) ? "-" : String.format(Locale.ROOT, "%+.2f", d);
    }
}
