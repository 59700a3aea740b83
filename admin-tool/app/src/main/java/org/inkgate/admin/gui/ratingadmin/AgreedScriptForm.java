package org.inkgate.admin.gui.ratingadmin;

import java.util.Map;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.inkgate.admin.core.rating.RatingStore;

/**
 * The fields that name a response and its agreed scores, and their checks, shared by the control
 * scripts and the qualification set (as the command line's {@code AgreedScriptOptions}).
 */
final class AgreedScriptForm {

    /** The store call that marks the named response, returning the message for the test owner. */
    interface Marking {
        String mark(RatingStore store, String candidate, String task, Map<String, Integer> agreed, String source)
                throws Exception;
    }

    private final StringProperty candidate = new SimpleStringProperty("");
    private final StringProperty task = new SimpleStringProperty("");
    private final StringProperty agreed = new SimpleStringProperty("");
    private final StringProperty source = new SimpleStringProperty("");

    StringProperty candidate() { return candidate; }
    StringProperty task() { return task; }
    /** CRITERION=SCORE pairs separated by commas, as the command's --agreed. */
    StringProperty agreed() { return agreed; }
    StringProperty source() { return source; }

    /**
     * Checks the fields and runs {@code marking} on the model's worker; a bad field is refused with
     * the reason and nothing is marked. {@code what} names the kind of script ("control script").
     */
    void mark(RatingAdminModel model, String what, Marking marking) {
        Map<String, Integer> scores;
        try {
            scores = CriterionScores.parse(agreed.get());
        } catch (IllegalArgumentException e) {
            model.message().set("The " + what + " was not marked: " + e.getMessage());
            return;
        }
        String who = candidate.get().strip();
        String which = task.get().strip();
        String from = source.get().strip();
        if (who.isEmpty() || which.isEmpty() || from.isEmpty()) {
            model.message().set("Name the candidate number, the task and where the agreed scores come from;"
                    + " nothing was marked.");
            return;
        }
        model.call("Marking a " + what, s -> marking.mark(s, who, which, scores, from));
    }
}
