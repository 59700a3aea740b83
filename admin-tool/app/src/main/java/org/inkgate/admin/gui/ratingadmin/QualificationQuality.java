package org.inkgate.admin.gui.ratingadmin;

import java.util.List;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.inkgate.admin.core.rating.QualificationSet;
import org.inkgate.admin.core.rating.QualificationStanding;

/**
 * The qualification set of the rating step, as {@code rate qualification mark}, {@code give},
 * {@code rule}, {@code status} and {@code admit}: the same calls on the rating store. The store is
 * read after every action.
 */
public final class QualificationQuality {

    private final RatingAdminModel model;
    private final AgreedScriptForm form = new AgreedScriptForm();
    private final ObservableList<QualificationSet.Script> scripts = FXCollections.observableArrayList();
    private final ObservableList<QualificationStanding> standings = FXCollections.observableArrayList();
    private final StringProperty rule = new SimpleStringProperty("");
    private final StringProperty minExact = new SimpleStringProperty("");
    private final StringProperty minAdjacent = new SimpleStringProperty("");
    private final StringProperty maxMeanDifference = new SimpleStringProperty("");
    private final StringProperty admitRater = new SimpleStringProperty("");
    private final StringProperty admitBy = new SimpleStringProperty("");
    private final StringProperty admitReason = new SimpleStringProperty("");

    QualificationQuality(RatingAdminModel model) {
        this.model = model;
    }

    public ObservableList<QualificationSet.Script> scripts() { return scripts; }
    public ObservableList<QualificationStanding> standings() { return standings; }
    /** The rule in words, or that none is set. */
    public StringProperty rule() { return rule; }
    public StringProperty candidate() { return form.candidate(); }
    public StringProperty task() { return form.task(); }
    /** CRITERION=SCORE pairs separated by commas, as the command's --agreed. */
    public StringProperty agreed() { return form.agreed(); }
    public StringProperty source() { return form.source(); }
    /** Blank: not checked; at least one limit is needed. */
    public StringProperty minExact() { return minExact; }
    public StringProperty minAdjacent() { return minAdjacent; }
    public StringProperty maxMeanDifference() { return maxMeanDifference; }
    public StringProperty admitRater() { return admitRater; }
    public StringProperty admitBy() { return admitBy; }
    public StringProperty admitReason() { return admitReason; }

    /** As {@code rate qualification mark --candidate N --task ID --agreed ... --source TEXT}. */
    public void mark() {
        form.mark(model, "qualification script", (s, who, which, scores, from) -> {
            s.markQualification(who, which, scores, from);
            return "Marked as a qualification script: candidate " + who + ", task " + which
                    + ". Give the set to the raters with Give to raters.";
        });
    }

    /** As {@code rate qualification give}. */
    public void give() {
        model.call("Giving the qualification set", s -> s.giveQualificationSet() + " qualification item(s) given to"
                + " raters." + (s.qualificationRule().isEmpty() ? " No rule is set yet, so live rating stays open." : ""));
    }

    /** As {@code rate qualification rule}; blank limits are not checked. */
    public void setRule() {
        QualificationSet.Rule r;
        try {
            r = new QualificationSet.Rule(ControlQuality.number(minExact, "Exact agreement"),
                    ControlQuality.number(minAdjacent, "Adjacent agreement"),
                    ControlQuality.number(maxMeanDifference, "Mean difference"));
        } catch (IllegalArgumentException e) {
            model.message().set("The qualification rule was not set: " + e.getMessage());
            return;
        }
        model.call("Setting the qualification rule", s -> {
            s.setQualificationRule(r);
            return "Qualification rule set. Live rating is now open only to raters who pass the set or whom you admit.";
        });
    }

    /** As {@code rate qualification admit --rater ID --by NAME --reason TEXT}. */
    public void admit() {
        String rater = admitRater.get().strip();
        String by = admitBy.get().strip();
        String why = admitReason.get().strip();
        if (rater.isEmpty() || by.isEmpty() || why.isEmpty()) {
            model.message().set("Name the rater, who admits them and why; nobody was admitted.");
            return;
        }
        model.call("Admitting rater " + rater, s -> {
            s.admitRater(rater, by, why);
            return "Rater " + rater + " admitted to live rating.";
        });
    }

    /** Called on the JavaFX thread with what the store holds now. */
    void show(List<QualificationSet.Script> now, List<QualificationStanding> standing, String ruleWords) {
        scripts.setAll(now);
        standings.setAll(standing);
        rule.set(ruleWords);
    }
}
