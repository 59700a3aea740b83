package org.inkgate.admin.core.store.sql;

import java.sql.SQLException;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.SplittableRandom;
import org.inkgate.admin.core.rating.ControlScripts;
import org.inkgate.admin.core.rating.RatingException;

/** {@link ControlScripts} in the results store (SQLite or PostgreSQL). */
final class SqlControlScripts implements ControlScripts {

    private final RatingSession s;

    SqlControlScripts(RatingSession s) {
        this.s = s;
    }

    @Override
    public void markControl(String candidateNumber, String taskId, Map<String, Integer> agreed, String source)
            throws RatingException {
        s.markAgreed("control_scripts", "a control script", candidateNumber, taskId, agreed, source, false);
    }

    @Override
    public int mixControls(long seed) throws RatingException {
        SplittableRandom random = new SplittableRandom(seed);
        return s.tx("mixing control scripts into the queues", () -> {
            s.lockQueues();
            List<Object[]> controls = s.db.list("SELECT cs.sitting_id, cs.task_id FROM control_scripts cs JOIN"
                    + " sittings s ON s.sitting_id = cs.sitting_id WHERE s.exam_id=? ORDER BY cs.sitting_id,"
                    + " cs.task_id", rs -> new Object[] {rs.getLong(1), rs.getString(2)}, s.examId);
            List<String> raters = s.db.list("SELECT rater_id FROM raters ORDER BY rater_id", rs -> rs.getString(1));
            Set<String> taken = new HashSet<>(s.db.list("SELECT blind_id FROM rating_assignments WHERE blind_id"
                    + " IS NOT NULL", rs -> rs.getString(1)));
            for (Object[] control : controls) {
                // a control response must have its own raters first: a later assignment run could otherwise
                // hand it to a rater who already holds it as a control item
                if (s.db.list("SELECT 1 FROM rating_assignments a WHERE a.sitting_id=? AND a.task_id=? AND "
                        + RatingSession.NOT_CONTROL, rs -> 1, control[0], control[1]).isEmpty()) {
                    String candidate = s.db.list("SELECT candidate_number FROM sittings WHERE sitting_id=?",
                            rs -> rs.getString(1), control[0]).get(0);
                    throw SqlSession.refusal(new RatingException("the control script of candidate " + candidate
                            + ", task " + control[1] + " has no raters of its own yet; run rate assign first, then"
                            + " mix. Nothing was added"));
                }
            }
            String now = s.now();
            int added = 0;
            for (Object[] control : controls) {
                long sitting = (Long) control[0];
                String task = (String) control[1];
                for (String rater : raters) {
                    if (!s.db.list("SELECT 1 FROM rating_assignments WHERE sitting_id=? AND task_id=? AND"
                            + " rater_id=?", rs -> 1, sitting, task, rater).isEmpty()) {
                        continue;
                    }
                    long id = s.db.insert("INSERT INTO rating_assignments(sitting_id, task_id, rater_id, seed,"
                            + " created_at, blind_id, kind, queue_position) VALUES (?,?,?,?,?,?,'rating',?)",
                            sitting, task, rater, seed, now, s.blindIds.next(taken),
                            place(rater, random));
                    s.db.update("INSERT INTO control_assignments(assignment_id, sitting_id, task_id) VALUES"
                            + " (?,?,?)", id, sitting, task);
                    added++;
                }
            }
            return added;
        });
    }

    /** A queue place among the rater's unrated first ratings (the new item follows the one drawn), else the end. */
    private int place(String rater, SplittableRandom random) throws SQLException {
        List<Integer> open = s.db.list("SELECT a.queue_position FROM rating_assignments a JOIN sittings s ON"
                + " s.sitting_id = a.sitting_id WHERE s.exam_id=? AND a.rater_id=? AND a.kind='rating' AND a.queue_position IS NOT NULL AND NOT EXISTS (SELECT 1 FROM rating_submissions x"
                + " WHERE x.assignment_id = a.assignment_id) ORDER BY a.queue_position", rs -> rs.getInt(1), s.examId, rater);
        if (!open.isEmpty()) {
            return open.get(random.nextInt(open.size()));
        }
        return s.db.list("SELECT COALESCE(MAX(a.queue_position), 0) + 1 FROM rating_assignments a JOIN sittings s ON"
                + " s.sitting_id = a.sitting_id WHERE s.exam_id=? AND a.rater_id=?", rs -> rs.getInt(1), s.examId,
                rater).get(0);
    }

    @Override
    public List<Control> controls() throws RatingException {
        return s.read("listing control scripts", () -> s.db.list("SELECT s.candidate_number,"
                + " cs.task_id, cs.agreed_scores_json, cs.source, (SELECT COUNT(*) FROM control_assignments ca WHERE"
                + " ca.sitting_id = cs.sitting_id AND ca.task_id = cs.task_id), (SELECT COUNT(*) FROM"
                + " control_assignments ca WHERE ca.sitting_id = cs.sitting_id AND ca.task_id = cs.task_id AND EXISTS"
                + " (SELECT 1 FROM rating_submissions x WHERE x.assignment_id = ca.assignment_id)) FROM control_scripts"
                + " cs JOIN sittings s ON s.sitting_id = cs.sitting_id WHERE s.exam_id=? ORDER BY s.candidate_number,"
                + " cs.task_id", rs -> new Control(rs.getString(1), rs.getString(2), RatingSession.parse(rs.getString(3)),
                rs.getString(4), rs.getInt(5), rs.getInt(6)), s.examId));
    }

    @Override
    public List<ControlRating> controlRatings() throws RatingException {
        return s.read("reading control ratings", () -> s.db.list("SELECT a.rater_id,"
                + " a.blind_id, x.submitted_at, x.scores_json, cs.agreed_scores_json FROM control_assignments ca"
                + " JOIN rating_assignments a ON a.assignment_id = ca.assignment_id JOIN control_scripts cs"
                + " ON cs.sitting_id = ca.sitting_id AND cs.task_id = ca.task_id JOIN sittings s ON s.sitting_id ="
                + " ca.sitting_id JOIN rating_submissions x ON x.submission_id = (SELECT MAX(y.submission_id) FROM"
                + " rating_submissions y WHERE y.assignment_id = ca.assignment_id) WHERE s.exam_id=?"
                + " ORDER BY x.submission_id", rs -> new ControlRating(rs.getString(1),
                rs.getString(2), rs.getString(3), RatingSession.parse(rs.getString(4)), RatingSession.parse(rs.getString(5))), s.examId));
    }
}
