package org.inkgate.admin.core.rating;

import java.util.List;

/**
 * Where one rater stands with the qualification set, and whether live rating is open to them.
 *
 * @param given     qualification scripts in the rater's queue
 * @param rated     of those, scored
 * @param agreement the rater's agreement with the agreed scores so far (null before the first)
 * @param admission the test owner's admission, if any
 */
public record QualificationStanding(String raterId, Status status, int given, int rated,
        ControlMonitor.RaterReport agreement, QualificationSet.Admission admission) {

    /** The rater's state. */
    public enum Status {
        /** No rule is set: live rating is open to everyone. */
        NO_RULE("no rule set: live rating open"),
        /** A rule is set but the set has not been given to this rater. */
        NOT_GIVEN("qualification set not given yet"),
        /** Some qualification scripts are still to be scored. */
        IN_PROGRESS("scoring the qualification set"),
        /** Every script scored within the rule's limits. */
        PASSED("passed: live rating open"),
        /** Every script scored, outside a limit: live rating stays closed until the test owner decides. */
        NOT_PASSED("not passed: live rating closed"),
        /** Admitted by the test owner. */
        ADMITTED("admitted by the test owner: live rating open");

        private final String words;

        Status(String words) {
            this.words = words;
        }

        public String words() {
            return words;
        }
    }

    /** Whether the rater may rate live items. */
    public boolean liveOpen() {
        return status == Status.NO_RULE || status == Status.PASSED || status == Status.ADMITTED;
    }

    /**
     * The standing from the rule, the scripts given, the rater's qualification ratings and any
     * admission.
     */
    public static QualificationStanding of(String raterId, QualificationSet.Rule rule, int given,
            List<ControlScripts.ControlRating> ratings, QualificationSet.Admission admission) {
        ControlMonitor.RaterReport agreement = ratings.isEmpty() ? null
                : ControlMonitor.of(ratings, rule == null ? new ControlMonitor.Thresholds(null, null, null, null)
                        : rule.thresholds()).get(0);
        int rated = ratings.size();
        Status status;
        if (rule == null) {
            status = Status.NO_RULE;
        } else if (admission != null) {
            status = Status.ADMITTED;
        } else if (given == 0) {
            status = Status.NOT_GIVEN;
        } else if (rated < given) {
            status = Status.IN_PROGRESS;
        } else {
            status = agreement.flagged() ? Status.NOT_PASSED : Status.PASSED;
        }
        return new QualificationStanding(raterId, status, given, rated, agreement, admission);
    }

    /** Why live rating is closed to this rater, for a refusal message; empty when it is open. */
    public String whyClosed() {
        return switch (status) {
            case NO_RULE, PASSED, ADMITTED -> "";
            case NOT_GIVEN -> "rater " + raterId + " must score the qualification set before live rating, and it has"
                    + " not been given to them yet (the test owner runs rate qualification give)";
            case IN_PROGRESS -> "rater " + raterId + " must score the qualification set before live rating: " + rated
                    + " of " + given + " qualification scripts scored so far";
            case NOT_PASSED -> "rater " + raterId + " scored the qualification set outside the test owner's limits ("
                    + String.join("; ", agreement.flags()) + "); live rating stays closed until the test owner decides"
                    + " (rate qualification admit)";
        };
    }
}
