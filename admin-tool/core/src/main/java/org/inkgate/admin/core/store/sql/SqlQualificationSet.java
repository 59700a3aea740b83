package org.inkgate.admin.core.store.sql;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.inkgate.admin.core.rating.QualificationSet;
import org.inkgate.admin.core.rating.QualificationStanding;
import org.inkgate.admin.core.rating.RaterRegister;
import org.inkgate.admin.core.rating.RatingException;

/** {@link QualificationSet} in the results store (SQLite or PostgreSQL). */
final class SqlQualificationSet implements QualificationSet {

    private final RatingSession s;

    SqlQualificationSet(RatingSession s) {
        this.s = s;
    }

    @Override
    public void markQualification(String candidateNumber, String taskId, Map<String, Integer> agreed, String source)
            throws RatingException {
        s.markAgreed("qualification_scripts", "a qualification script", candidateNumber, taskId, agreed, source, true);
    }

    @Override
    public void setQualificationRule(Rule rule) throws RatingException {
        s.tx("setting the qualification rule", () -> s.db.update("INSERT INTO qualification_rules(exam_id, min_exact,"
                + " min_adjacent, max_mean_difference, set_at) VALUES (?,?,?,?,?) ON CONFLICT(exam_id) DO UPDATE SET"
                + " min_exact=excluded.min_exact, min_adjacent=excluded.min_adjacent,"
                + " max_mean_difference=excluded.max_mean_difference, set_at=excluded.set_at", s.examId,
                rule.minExact(), rule.minAdjacent(), rule.maxMeanDifference(), s.now()));
    }

    @Override
    public Optional<Rule> qualificationRule() throws RatingException {
        return s.read("reading the qualification rule", () -> QualificationItems.rule(s));
    }

    @Override
    public int giveQualificationSet() throws RatingException {
        return s.tx("giving the qualification set", () -> {
            List<Object[]> scripts = s.db.list("SELECT q.sitting_id, q.task_id FROM qualification_scripts q JOIN"
                    + " sittings s ON s.sitting_id = q.sitting_id WHERE s.exam_id=? ORDER BY q.marked_at, q.sitting_id,"
                    + " q.task_id", rs -> new Object[] {rs.getLong(1), rs.getString(2)}, s.examId);
            if (scripts.isEmpty()) {
                throw org.inkgate.admin.core.store.sql.SqlSession.refusal(new RatingException("no qualification"
                        + " scripts yet; mark them first (rate qualification mark). Nothing was given"));
            }
            List<String> raters = s.raterEntries().stream().map(RaterRegister.RaterEntry::id).toList();
            Set<String> taken = new HashSet<>(s.db.list("SELECT blind_id FROM rating_assignments WHERE blind_id IS NOT"
                    + " NULL UNION SELECT blind_id FROM qualification_items", rs -> rs.getString(1)));
            String now = s.now();
            int added = 0;
            for (int i = 0; i < scripts.size(); i++) {
                long sitting = (Long) scripts.get(i)[0];
                String task = (String) scripts.get(i)[1];
                for (String rater : raters) {
                    added += s.db.update("INSERT INTO qualification_items(sitting_id, task_id, rater_id, blind_id,"
                            + " position, given_at) VALUES (?,?,?,?,?,?) ON CONFLICT(sitting_id, task_id, rater_id) DO"
                            + " NOTHING", sitting, task, rater, s.blindIds.next(taken), i + 1, now);
                }
            }
            return added;
        });
    }

    @Override
    public List<Script> qualificationScripts() throws RatingException {
        return s.read("listing qualification scripts", () -> s.db.list("SELECT s.candidate_number, q.task_id,"
                + " q.agreed_scores_json, q.source, (SELECT COUNT(*) FROM qualification_items i WHERE i.sitting_id ="
                + " q.sitting_id AND i.task_id = q.task_id), (SELECT COUNT(*) FROM qualification_items i WHERE"
                + " i.sitting_id = q.sitting_id AND i.task_id = q.task_id AND EXISTS (SELECT 1 FROM qualification_ratings"
                + " r WHERE r.item_id = i.item_id)) FROM qualification_scripts q JOIN sittings s ON s.sitting_id ="
                + " q.sitting_id WHERE s.exam_id=? ORDER BY q.marked_at, q.sitting_id, q.task_id",
                rs -> new Script(rs.getString(1), rs.getString(2), RatingSession.parse(rs.getString(3)),
                        rs.getString(4), rs.getInt(5), rs.getInt(6)), s.examId));
    }

    @Override
    public List<QualificationStanding> qualificationStandings() throws RatingException {
        return s.read("reading the raters' qualification", () -> {
            List<QualificationStanding> out = new ArrayList<>();
            for (RaterRegister.RaterEntry r : s.raterEntries()) {
                out.add(QualificationItems.standing(s, r.id()));
            }
            return out;
        });
    }

    @Override
    public void admitRater(String raterId, String by, String reason) throws RatingException {
        s.requireRater(raterId);
        if (by == null || by.isBlank() || reason == null || reason.isBlank()) {
            throw new RatingException("say who admits the rater (--by) and why (--reason); nothing was stored");
        }
        s.tx("admitting rater " + raterId, () -> s.db.update("INSERT INTO qualification_admissions(exam_id, rater_id,"
                + " admitted_by, reason, admitted_at) VALUES (?,?,?,?,?) ON CONFLICT(exam_id, rater_id) DO UPDATE SET"
                + " admitted_by=excluded.admitted_by, reason=excluded.reason, admitted_at=excluded.admitted_at",
                s.examId, raterId, by.strip(), reason.strip(), s.now()));
    }
}
