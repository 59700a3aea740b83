package org.inkgate.analysis.scores;

/**
 * How a response's score is formed from its ratings: per criterion the mean over raters; then
 * the mean (or sum) over criteria. The per-criterion score is always the mean over raters.
 */
public enum ScoreRule {
    /** Mean over criteria of the per-criterion rater means (on the rating scale). */
    MEAN,
    /** Sum over criteria of the per-criterion rater means (on the total-score scale). */
    SUM;

    /** The rule in words, for the report. */
    public String describe() {
        return switch (this) {
            case MEAN -> "A response's score is the mean over its criteria of each criterion's mean over raters"
                    + " (equal to the mean over raters and criteria when every rater scored every criterion).";
            case SUM -> "A response's score is the sum over its criteria of each criterion's mean over raters.";
        };
    }
}
