package org.inkgate.admin.core.store.sqlite;

import java.sql.SQLException;
import java.util.List;
import java.util.Optional;
import org.inkgate.admin.core.rating.ControlScripts;
import org.inkgate.admin.core.rating.QualificationSet;
import org.inkgate.admin.core.rating.QualificationStanding;
import org.inkgate.admin.core.rating.RatingException;

/**
 * Reads a rater's standing with the qualification set and keeps live items closed while it says
 * so: the one place the desk, the sheets and referrals ask before they show or take a live item.
 */
final class QualificationGate {

    private QualificationGate() {
    }

    static QualificationStanding standing(RatingSession s, String raterId) throws SQLException {
        QualificationSet.Rule rule = rule(s).orElse(null);
        int given = s.db.list("SELECT COUNT(*) FROM qualification_assignments qa JOIN rating_assignments a ON"
                + " a.assignment_id = qa.assignment_id JOIN sittings s ON s.sitting_id = a.sitting_id WHERE"
                + " s.exam_id=? AND a.rater_id=?", rs -> rs.getInt(1), s.examId, raterId).get(0);
        QualificationSet.Admission admission = s.db.first("SELECT rater_id, admitted_by, reason, admitted_at FROM"
                + " qualification_admissions WHERE exam_id=? AND rater_id=?", rs -> new QualificationSet.Admission(
                rs.getString(1), rs.getString(2), rs.getString(3), rs.getString(4)), s.examId, raterId).orElse(null);
        return QualificationStanding.of(raterId, rule, given, ratings(s, raterId), admission);
    }

    static Optional<QualificationSet.Rule> rule(RatingSession s) throws SQLException {
        return s.db.first("SELECT min_exact, min_adjacent, max_mean_difference FROM qualification_rules WHERE"
                + " exam_id=?", rs -> new QualificationSet.Rule(real(rs, 1), real(rs, 2), real(rs, 3)), s.examId);
    }

    /** The rater's latest rating of each qualification script, in submission order. */
    static List<ControlScripts.ControlRating> ratings(RatingSession s, String raterId) throws SQLException {
        return s.db.list("SELECT a.rater_id, a.blind_id, x.submitted_at, x.scores_json, q.agreed_scores_json FROM"
                + " qualification_assignments qa JOIN rating_assignments a ON a.assignment_id = qa.assignment_id"
                + " JOIN qualification_scripts q ON q.sitting_id = qa.sitting_id AND q.task_id = qa.task_id JOIN"
                + " sittings s ON s.sitting_id = qa.sitting_id JOIN rating_submissions x ON x.submission_id ="
                + " (SELECT MAX(y.submission_id) FROM rating_submissions y WHERE y.assignment_id = qa.assignment_id)"
                + " WHERE s.exam_id=? AND a.rater_id=? ORDER BY x.submission_id",
                rs -> new ControlScripts.ControlRating(rs.getString(1), rs.getString(2), rs.getString(3),
                        RatingSession.parse(rs.getString(4)), RatingSession.parse(rs.getString(5))), s.examId, raterId);
    }

    /** Refuses a live item of a rater for whom live rating is still closed. */
    static void refuseIfClosed(RatingSession s, String raterId, long assignmentId) throws RatingException {
        boolean live = s.read("looking up " + raterId + "'s item", () -> !s.db.exists("SELECT 1 FROM"
                + " qualification_assignments WHERE assignment_id=?", assignmentId));
        if (!live) {
            return;
        }
        QualificationStanding standing = s.read("reading " + raterId + "'s qualification", () -> standing(s, raterId));
        if (!standing.liveOpen()) {
            throw new RatingException(standing.whyClosed() + "; nothing was stored");
        }
    }

    private static Double real(java.sql.ResultSet rs, int column) throws SQLException {
        double v = rs.getDouble(column);
        return rs.wasNull() ? null : v;
    }
}
