package org.inkgate.admin.core.rating;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Discrepancy review and adjudication: the exam's rule, flags raised where first ratings
 * disagree, third raters found for them, and resolution entries that settle a flag.
 */
public interface DiscrepancyReview {

    /** A flagged response in the adjudication queue (no candidate data: task, raters' blind ids and the reason). */
    record Flag(long flagId, String taskId, String reason, String flaggedAt, List<String> raters,
            String adjudicator, String adjudicatorBlindId, boolean adjudicated, String finalMethod) {
        /** Where the flag stands, in words. */
        public String status() {
            if (finalMethod != null) {
                return "settled (" + finalMethod + ")";
            }
            if (adjudicator == null) {
                return "no adjudicator available: add a rater with capacity and run rate flags again, or enter a"
                        + " resolution (rate resolve)";
            }
            return adjudicated ? "adjudicated" : "awaiting adjudicator " + adjudicator + " (" + adjudicatorBlindId + ")";
        }
    }

    /** Sets the exam's discrepancy rule and applies it to every response whose ratings are complete. */
    int setRule(DiscrepancyRule rule) throws RatingException;

    /** The rule in force (the latest set), if any. */
    Optional<DiscrepancyRule> rule() throws RatingException;

    /** Applies the rule to every response (flags, adjudicators, final scores); returns the number of flags raised now. */
    int review() throws RatingException;

    /** The adjudication queue: every flagged response with its state. */
    List<Flag> flags() throws RatingException;

    /**
     * Settles a flagged response by a resolution entry (e.g. agreed in discussion): the given scores
     * become its final score, with who and when; the raters' ratings stay as they were.
     */
    void resolve(long flagId, String resolvedBy, Map<String, Integer> scores, String comment) throws RatingException;
}
