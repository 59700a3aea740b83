package org.inkgate.admin.core.rating;

import java.util.List;
import java.util.Locale;

/**
 * Scripts a rater hands to the test owner instead of (or before) rating them: the text reveals who
 * wrote it, it suggests help the sitting did not allow, or it is off the task. The rater gives a
 * reason and a note ({@link RatingDesk#refer}); the test owner lists the referrals and records a decision. A referral changes
 * no score and no queue: what follows for the candidate is for the test owner's regulations.
 */
public interface Referrals {

    /** Why a script is referred. */
    enum Reason {
        IDENTITY_REVEALED("the text reveals who wrote it"),
        UNALLOWED_HELP("suspected help the sitting did not allow"),
        OFF_TASK("the response is off the task"),
        OTHER("another reason, given in the note");

        private final String meaning;

        Reason(String meaning) {
            this.meaning = meaning;
        }

        /** The stored and typed word, e.g. {@code identity-revealed}. */
        public String word() {
            return name().toLowerCase(Locale.ROOT).replace('_', '-');
        }

        public String meaning() {
            return meaning;
        }

        /** The reason for a typed word, or a {@link RatingException} listing the words. */
        public static Reason of(String word) throws RatingException {
            for (Reason r : values()) {
                if (r.word().equals(word == null ? "" : word.strip().toLowerCase(Locale.ROOT))) {
                    return r;
                }
            }
            throw new RatingException("'" + word + "' is not a referral reason; give one of "
                    + java.util.Arrays.stream(values()).map(Reason::word).toList());
        }
    }

    /**
     * One referral as the test owner sees it.
     *
     * @param candidateNumber whose script it is (for the test owner only; the rater never sees it)
     * @param decision        the test owner's decision, or null while open
     */
    record Referral(long id, String blindId, String taskId, String candidateNumber, String raterId, Reason reason,
            String note, String referredAt, String decision, String decidedBy, String decidedAt) {
        public boolean open() {
            return decision == null;
        }
    }

    /** Every referral of the exam, oldest first; only the open ones when {@code openOnly}. */
    List<Referral> referrals(boolean openOnly) throws RatingException;

    /** Records the test owner's decision on a referral (who and what); a later decision replaces it. */
    void decide(long referralId, String decidedBy, String decision) throws RatingException;
}
