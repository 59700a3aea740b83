package org.inkgate.admin.core.store.sql;

import java.util.List;
import java.util.Locale;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.Referrals;

/** {@link Referrals} in the results store (SQLite or PostgreSQL), and the desk's side of them ({@link #refer}). */
final class SqlReferrals implements Referrals {

    private final RatingSession s;

    SqlReferrals(RatingSession s) {
        this.s = s;
    }

    long refer(String raterId, String blindId, Reason reason, String note) throws RatingException {
        RatingSession.Assignment a = s.assignment(raterId, blindId);
        if (note == null || note.isBlank()) {
            throw new RatingException("say what you saw in " + blindId + " (a note is needed with every referral);"
                    + " nothing was stored");
        }
        return s.tx("storing the referral of " + blindId, () -> s.db.insert("INSERT INTO referrals(assignment_id,"
                + " rater_id, reason, note, referred_at) VALUES (?,?,?,?,?)", a.id(), raterId, reason.word(), note.strip(),
                s.now()));
    }

    @Override
    public List<Referral> referrals(boolean openOnly) throws RatingException {
        return s.read("listing referrals", () -> s.db.list("SELECT x.referral_id, a.blind_id, a.task_id,"
                + " s.candidate_number, x.rater_id, x.reason, x.note, x.referred_at, x.decision, x.decided_by,"
                + " x.decided_at FROM referrals x JOIN rating_assignments a ON a.assignment_id = x.assignment_id"
                + " JOIN sittings s ON s.sitting_id = a.sitting_id WHERE s.exam_id=?"
                + (openOnly ? " AND x.decision IS NULL" : "") + " ORDER BY x.referral_id",
                rs -> new Referral(rs.getLong(1), rs.getString(2), rs.getString(3), rs.getString(4), rs.getString(5),
                        Reason.valueOf(rs.getString(6).toUpperCase(Locale.ROOT).replace('-', '_')), rs.getString(7),
                        rs.getString(8), rs.getString(9), rs.getString(10), rs.getString(11)), s.examId));
    }

    @Override
    public void decide(long referralId, String decidedBy, String decision) throws RatingException {
        if (decidedBy == null || decidedBy.isBlank() || decision == null || decision.isBlank()) {
            throw new RatingException("say who decided (--by NAME) and what (--decision TEXT); nothing was stored");
        }
        s.tx("storing the decision on referral " + referralId, () -> {
            int n = s.db.update("UPDATE referrals SET decision=?, decided_by=?, decided_at=? WHERE referral_id=? AND"
                    + " assignment_id IN (SELECT a.assignment_id FROM rating_assignments a JOIN sittings s"
                    + " ON s.sitting_id = a.sitting_id WHERE s.exam_id=?)", decision.strip(), decidedBy.strip(),
                    s.now(), referralId, s.examId);
            if (n == 0) {
                throw SqlSession.refusal(new RatingException("no referral " + referralId + " in exam " + s.examId
                        + "; list them with rate referrals list"));
            }
            return null;
        });
    }
}
