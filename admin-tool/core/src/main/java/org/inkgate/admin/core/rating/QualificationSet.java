package org.inkgate.admin.core.rating;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The qualification set: responses the test owner has scored in advance, which a rater scores
 * first, openly (the desk and the sheet's scripts say they are qualification scripts), before live
 * rating opens. Once a rule is set, a rater's live items stay closed until the rater has scored
 * every qualification script given to them within the rule's limits ({@link QualificationStanding}),
 * or the test owner admits the rater with a reason. Qualification ratings never enter a candidate's
 * flags, final scores or exports. Without a rule nothing is closed.
 */
public interface QualificationSet {

    /**
     * The limits a rater's qualification ratings must keep, over every criterion score (the
     * definitions of {@link ControlMonitor}); null: not checked. The test owner sets them under the
     * programme's scoring rules; the tool has no default.
     */
    record Rule(Double minExact, Double minAdjacent, Double maxMeanDifference) {
        public Rule {
            if (minExact == null && minAdjacent == null && maxMeanDifference == null) {
                throw new IllegalArgumentException("a qualification rule needs at least one limit (exact agreement,"
                        + " adjacent agreement or mean difference)");
            }
            check("exact agreement", minExact);
            check("adjacent agreement", minAdjacent);
            if (maxMeanDifference != null && !(maxMeanDifference >= 0)) {
                throw new IllegalArgumentException("the mean difference limit must be 0 or more, not " + maxMeanDifference);
            }
        }

        private static void check(String what, Double share) {
            if (share != null && !(share >= 0 && share <= 1)) {
                throw new IllegalArgumentException("the " + what + " limit is a share between 0 and 1, not " + share);
            }
        }

        /** The limits in words, e.g. "adjacent agreement at least 0.80, mean difference within +-1.00". */
        public String describe() {
            List<String> parts = new java.util.ArrayList<>();
            if (minExact != null) {
                parts.add(String.format(java.util.Locale.ROOT, "exact agreement at least %.2f", minExact));
            }
            if (minAdjacent != null) {
                parts.add(String.format(java.util.Locale.ROOT, "adjacent agreement at least %.2f", minAdjacent));
            }
            if (maxMeanDifference != null) {
                parts.add(String.format(java.util.Locale.ROOT, "mean difference within +-%.2f", maxMeanDifference));
            }
            return String.join(", ", parts);
        }

        ControlMonitor.Thresholds thresholds() {
            return new ControlMonitor.Thresholds(minExact, minAdjacent, maxMeanDifference, null);
        }
    }

    /** A qualification script as the test owner sees it. */
    record Script(String candidateNumber, String taskId, Map<String, Integer> agreed, String source, int given,
            int rated) {
        public Script {
            agreed = Map.copyOf(agreed);
        }
    }

    /** A test owner's decision to open live rating for a rater whatever the set showed. */
    record Admission(String raterId, String by, String reason, String at) {
    }

    /** Marks a candidate's response to a task as a qualification script; marking again replaces the agreed scores. */
    void markQualification(String candidateNumber, String taskId, Map<String, Integer> agreed, String source)
            throws RatingException;

    /** Sets (or replaces) the rule; from now on live rating opens only for raters who pass or are admitted. */
    void setQualificationRule(Rule rule) throws RatingException;

    Optional<Rule> qualificationRule() throws RatingException;

    /**
     * Puts every qualification script at the front of every rater's queue, in marking order, for
     * each rater who does not hold that response already. Returns the items added.
     */
    int giveQualificationSet() throws RatingException;

    List<Script> qualificationScripts() throws RatingException;

    /** Every rater's standing, in rater order. */
    List<QualificationStanding> qualificationStandings() throws RatingException;

    /** Opens live rating for a rater who did not pass, with who decided and why (kept in the store). */
    void admitRater(String raterId, String by, String reason) throws RatingException;
}
