package org.inkgate.admin.core.rating;

import java.util.List;
import java.util.Map;

/**
 * Control scripts: responses the test owner has scored in advance (e.g. agreed at a
 * standardisation meeting), mixed into raters' queues without notice. They look like every other
 * item (a fresh blind id, kind "rating"); their ratings measure the rater against the agreed
 * scores ({@link ControlMonitor}) and never enter a candidate's flags, final scores or exports.
 */
public interface ControlScripts {

    /** A control script as the test owner sees it. */
    record Control(String candidateNumber, String taskId, Map<String, Integer> agreed, String source, int inQueues,
            int rated) {
        public Control {
            agreed = Map.copyOf(agreed);
        }
    }

    /** One rater's latest rating of a control script, with the agreed scores and when it was submitted. */
    record ControlRating(String raterId, String blindId, String submittedAt, Map<String, Integer> scores,
            Map<String, Integer> agreed) {
        public ControlRating {
            scores = Map.copyOf(scores);
            agreed = Map.copyOf(agreed);
        }
    }

    /**
     * Marks a candidate's response to a task as a control script with its agreed score on every
     * criterion; marking it again replaces the agreed scores.
     */
    void markControl(String candidateNumber, String taskId, Map<String, Integer> agreed, String source)
            throws RatingException;

    /**
     * Puts every control script into the queue of every rater who does not hold that response yet,
     * at a place drawn with {@code seed} among the rater's unrated items. Returns the items added.
     */
    int mixControls(long seed) throws RatingException;

    List<Control> controls() throws RatingException;

    /** Every current control rating, in submission order (oldest first). */
    List<ControlRating> controlRatings() throws RatingException;
}
