package org.inkgate.admin.gui.rating;

import org.inkgate.admin.core.source.ExamSource;

/**
 * What a score field holds as the rater types: nothing yet, the start of a longer score, a score
 * within the criterion's range, or text that can never become one (refused, with a message that
 * says which scores the criterion takes). Pure logic, so the rules are tested without a window.
 */
public sealed interface ScoreEntry {

    /** The field is empty: the criterion is not scored yet. */
    record Empty() implements ScoreEntry {
    }

    /** Digits that begin a valid score but are not one yet (e.g. "1" when scores run 10-20). */
    record Partial(String digits) implements ScoreEntry {
    }

    /** A score within the criterion's range. */
    record Valid(int score) implements ScoreEntry {
    }

    /** Text the field refuses; the field keeps what it held before. */
    record Refused(String message) implements ScoreEntry {
    }

    /** Reads {@code text} as a score for {@code criterion}. */
    static ScoreEntry of(ExamSource.Criterion criterion, String text) {
        String range = criterion.minScore() + " to " + criterion.maxScore();
        if (text == null || text.isEmpty()) {
            return new Empty();
        }
        if (!text.chars().allMatch(c -> c >= '0' && c <= '9')) {
            return new Refused(criterion.name() + " takes whole numbers only, from " + range
                    + ". Type digits; use the Up and Down arrows to step.");
        }
        // a leading zero or more digits than the largest score has is never valid (and keeps parseInt safe)
        if (text.length() > Integer.toString(criterion.maxScore()).length()
                || (text.length() > 1 && text.charAt(0) == '0')) {
            return new Refused(text + " is outside " + criterion.name() + ": scores run from " + range + ".");
        }
        int value = Integer.parseInt(text);
        if (value >= criterion.minScore() && value <= criterion.maxScore()) {
            return new Valid(value);
        }
        for (int s = criterion.minScore(); s <= criterion.maxScore(); s++) {
            if (Integer.toString(s).startsWith(text)) {
                return new Partial(text);
            }
        }
        return new Refused(text + " is outside " + criterion.name() + ": scores run from " + range + ".");
    }

    /** One step up or down from the current score, kept within the range; an empty field starts at the lowest score. */
    static int step(ExamSource.Criterion criterion, ScoreEntry current, int delta) {
        if (current instanceof Valid v) {
            return Math.max(criterion.minScore(), Math.min(criterion.maxScore(), v.score() + delta));
        }
        return criterion.minScore();
    }
}
