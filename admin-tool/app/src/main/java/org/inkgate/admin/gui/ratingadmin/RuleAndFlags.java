package org.inkgate.admin.gui.ratingadmin;

import java.util.Map;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.inkgate.admin.core.rating.DiscrepancyRule;

/**
 * The discrepancy rule, the adjudication queue and resolution entries of the rating step, as
 * {@code rate rule}, {@code rate flags} and {@code rate resolve}. The thresholds are the test
 * owner's decision under the exam's regulations; the window only applies them.
 */
public final class RuleAndFlags {

    private final RatingAdminModel model;
    private final StringProperty criterionGap = new SimpleStringProperty("");
    private final StringProperty totalGap = new SimpleStringProperty("");
    private final StringProperty method = new SimpleStringProperty(DiscrepancyRule.AdjudicatedScore.values()[0].label());
    private final StringProperty flag = new SimpleStringProperty("");
    private final StringProperty by = new SimpleStringProperty("");
    private final StringProperty scores = new SimpleStringProperty("");
    private final StringProperty comment = new SimpleStringProperty("");

    RuleAndFlags(RatingAdminModel model) {
        this.model = model;
    }

    /** Flag when a criterion's scores lie more than this many bands apart; blank for no such check. */
    public StringProperty criterionGap() { return criterionGap; }
    /** Flag when totals lie more than this many points apart; blank for no such check. */
    public StringProperty totalGap() { return totalGap; }
    /** How a flagged response's final score is made once adjudicated. */
    public StringProperty method() { return method; }
    public StringProperty flag() { return flag; }
    public StringProperty by() { return by; }
    /** CRITERION=SCORE pairs separated by commas, as the command's --score. */
    public StringProperty scores() { return scores; }
    public StringProperty comment() { return comment; }

    /** As {@code rate rule}: sets the rule and applies it to every completely rated response. */
    public void setRule() {
        DiscrepancyRule rule;
        try {
            rule = new DiscrepancyRule(whole(criterionGap.get()), whole(totalGap.get()),
                    DiscrepancyRule.AdjudicatedScore.of(method.get()));
        } catch (IllegalArgumentException e) {
            model.message().set("The rule was not set: " + e.getMessage());
            return;
        }
        model.call("Setting the discrepancy rule", s -> {
            int flagged = s.setRule(rule);
            return "Rule set: flag " + rule.describe() + ".\n" + flagged + " response(s) flagged now.";
        });
    }

    /** As {@code rate flags}: runs the rule again and lists the queue. */
    public void review() {
        model.call("Reviewing flags", s -> {
            int fresh = s.review();
            return fresh + " new flag(s) raised by this review.";
        });
    }

    /** As {@code rate resolve}: settles a flagged response by a resolution entry. */
    public void resolve() {
        long id;
        Map<String, Integer> parsed;
        try {
            id = Long.parseLong(flag.get().strip());
        } catch (NumberFormatException e) {
            model.message().set("Give the flag number (a whole number from the Flag column), and " + CriterionScores.HOW
                    + ".");
            return;
        }
        try {
            parsed = CriterionScores.parse(scores.get());
        } catch (IllegalArgumentException e) {
            model.message().set("The resolution entry was not recorded: " + e.getMessage());
            return;
        }
        String who = by.get().strip();
        String why = comment.get().strip();
        model.call("Recording the resolution entry", s -> {
            s.resolve(id, who, parsed, why);
            return "Flag " + id + " settled by resolution entry of " + who + ".";
        });
    }

    private static Integer whole(String text) {
        if (text == null || text.isBlank()) {
            return null;
        }
        try {
            return Integer.valueOf(text.strip());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("\"" + text.strip() + "\" is not a whole number; leave it blank for no"
                    + " such check", e);
        }
    }
}
