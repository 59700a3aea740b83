package org.inkgate.admin.core.store.sql;

import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.inkgate.admin.core.rating.DiscrepancyReview;
import org.inkgate.admin.core.rating.DiscrepancyRule;
import org.inkgate.admin.core.rating.FinalScore;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingException;

/**
 * {@link DiscrepancyReview} in the results store (SQLite or PostgreSQL), and the one place a response's flag and final
 * score are worked out ({@link #evaluate}), whichever call changed its ratings.
 */
final class SqlDiscrepancyReview implements DiscrepancyReview {

    private final RatingSession s;
    private final Adjudicators adjudicators;

    SqlDiscrepancyReview(RatingSession s) {
        this.s = s;
        this.adjudicators = new Adjudicators(s);
    }

    @Override
    public int setRule(DiscrepancyRule rule) throws RatingException {
        return s.tx("setting the discrepancy rule", () -> {
            String now = s.now();
            s.db.insert("INSERT INTO discrepancy_rules(exam_id, max_criterion_band_gap, max_total_gap, adjudicated_score,"
                    + " set_at) VALUES (?,?,?,?,?)", s.examId, rule.maxCriterionBandGap(), rule.maxTotalGap(),
                    rule.adjudicatedScore().label(), now);
            return reviewAll(now);
        });
    }

    @Override
    public Optional<DiscrepancyRule> rule() throws RatingException {
        return s.read("reading the discrepancy rule", () -> currentRule().map(RuleRow::rule));
    }

    private record RuleRow(long id, DiscrepancyRule rule) {
    }

    private Optional<RuleRow> currentRule() throws SQLException {
        return s.db.first("SELECT rule_id, max_criterion_band_gap, max_total_gap, adjudicated_score FROM"
                + " discrepancy_rules WHERE exam_id=? ORDER BY rule_id DESC LIMIT 1", rs -> new RuleRow(rs.getLong(1),
                new DiscrepancyRule(SqlSession.intOrNull(rs, 2), SqlSession.intOrNull(rs, 3),
                        DiscrepancyRule.AdjudicatedScore.of(rs.getString(4)))), s.examId);
    }

    @Override
    public int review() throws RatingException {
        return s.tx("reviewing ratings", () -> reviewAll(s.now()));
    }

    private int reviewAll(String now) throws SQLException {
        String flagsOfExam = "SELECT COUNT(*) FROM rating_flags f JOIN sittings s ON s.sitting_id = f.sitting_id"
                + " WHERE s.exam_id=?";
        int before = s.db.count(flagsOfExam, s.examId);
        List<Long> sittings = new ArrayList<>();
        List<String> tasks = new ArrayList<>();
        s.db.each("SELECT DISTINCT a.sitting_id, a.task_id FROM rating_assignments a JOIN sittings s ON s.sitting_id ="
                + " a.sitting_id WHERE s.exam_id=? ORDER BY a.sitting_id, a.task_id", rs -> {
                    sittings.add(rs.getLong(1));
                    tasks.add(rs.getString(2));
                }, s.examId);
        for (int i = 0; i < sittings.size(); i++) {
            evaluate(sittings.get(i), tasks.get(i), now);
        }
        return s.db.count(flagsOfExam, s.examId) - before;
    }

    /** Flags the response if its complete first ratings break the rule, finds it an adjudicator, and updates its final score. */
    void evaluate(long sittingId, String taskId, String now) throws SQLException {
        s.lockResponse(sittingId, taskId); // a desk submitting for this response meanwhile waits, then decides again
        List<FinalScore.Submitted> ratings = new ArrayList<>();
        int expected = s.db.count("SELECT COUNT(*) FROM rating_assignments a WHERE a.sitting_id=? AND a.task_id=?"
                + " AND a.kind='rating' AND " + RatingSession.NOT_CONTROL, sittingId, taskId);
        s.db.each("SELECT a.rater_id, a.kind, (SELECT x.scores_json FROM rating_submissions x WHERE x.assignment_id ="
                + " a.assignment_id ORDER BY x.submission_id DESC LIMIT 1) FROM rating_assignments a"
                + " WHERE a.sitting_id=? AND a.task_id=? AND " + RatingSession.NOT_CONTROL + " ORDER BY a.assignment_id",
                rs -> {
                    if (rs.getString(3) != null) {
                        ratings.add(new FinalScore.Submitted(rs.getString(1), RatingSession.kind(rs.getString(2)),
                                RatingSession.parse(rs.getString(3))));
                    }
                }, sittingId, taskId);
        List<Map<String, Integer>> first = ratings.stream().filter(r -> r.kind() == RatingDesk.Kind.RATING)
                .map(FinalScore.Submitted::scores).toList();
        Optional<RuleRow> rule = currentRule();
        List<Long> flag = s.db.list("SELECT flag_id FROM rating_flags WHERE sitting_id=? AND task_id=?",
                rs -> rs.getLong(1), sittingId, taskId);
        if (flag.isEmpty() && rule.isPresent() && expected >= 2 && first.size() >= expected) {
            Optional<String> why = rule.get().rule().disagreement(first, s.rubric);
            if (why.isPresent()) {
                long id = s.db.insert("INSERT INTO rating_flags(sitting_id, task_id, rule_id, reason, flagged_at) VALUES"
                        + " (?,?,?,?,?)", sittingId, taskId, rule.get().id(), why.get(), now);
                flag = List.of(id);
                adjudicators.assign(sittingId, taskId, now);
            }
        }
        boolean flagged = !flag.isEmpty();
        if (flagged && ratings.stream().noneMatch(r -> r.kind() == RatingDesk.Kind.ADJUDICATION)
                && s.db.count("SELECT COUNT(*) FROM rating_assignments WHERE sitting_id=? AND task_id=? AND"
                        + " kind='adjudication'", sittingId, taskId) == 0
                && s.db.count("SELECT COUNT(*) FROM resolution_entries WHERE flag_id=?", flag.get(0)) == 0) {
            adjudicators.assign(sittingId, taskId, now); // none was free when it was flagged; one may be now
        }
        Map<String, Integer> entry = new TreeMap<>();
        List<String> by = new ArrayList<>();
        if (flagged) {
            s.db.each("SELECT criterion_id, score, resolved_by FROM resolution_entries WHERE flag_id=?", rs -> {
                entry.put(rs.getString(1), rs.getInt(2));
                by.add(rs.getString(3));
            }, flag.get(0));
        }
        DiscrepancyRule.AdjudicatedScore how = rule.map(r -> r.rule().adjudicatedScore())
                .orElse(DiscrepancyRule.AdjudicatedScore.CLOSEST_PAIR_MEAN);
        Optional<FinalScore.Result> result = FinalScore.of(ratings, Math.max(1, expected), flagged,
                entry.isEmpty() ? Optional.empty() : Optional.of(entry), by.isEmpty() ? "" : by.get(0), how);
        s.db.update("DELETE FROM final_scores WHERE sitting_id=? AND task_id=?", sittingId, taskId);
        if (result.isPresent()) {
            Long ruleId = flagged ? s.db.list("SELECT rule_id FROM rating_flags WHERE flag_id=?", rs -> rs.getLong(1),
                    flag.get(0)).get(0) : rule.map(RuleRow::id).orElse(null);
            for (Map.Entry<String, Double> e : result.get().scores().entrySet()) {
                s.db.update("INSERT INTO final_scores(sitting_id, task_id, criterion_id, score, method, rule_id, basis,"
                        + " decided_at) VALUES (?,?,?,?,?,?,?,?)", sittingId, taskId, e.getKey(), e.getValue(),
                        result.get().method(), ruleId, String.join(" ", result.get().basis()), now);
            }
        }
    }

    @Override
    public List<Flag> flags() throws RatingException {
        // string_agg with ORDER BY: the same words in PostgreSQL 9.0+ and SQLite 3.44+ (sqlite.org, "Aggregate Functions")
        return s.read("listing flags", () -> s.db.list("SELECT f.flag_id, f.task_id, f.reason, f.flagged_at,"
                + " (SELECT string_agg(a.rater_id, ' ' ORDER BY a.assignment_id) FROM rating_assignments a WHERE a.sitting_id = f.sitting_id"
                + "   AND a.task_id = f.task_id AND a.kind = 'rating' AND " + RatingSession.NOT_CONTROL + "),"
                + " (SELECT a.rater_id FROM rating_assignments a WHERE a.sitting_id = f.sitting_id AND a.task_id = f.task_id"
                + "   AND a.kind = 'adjudication' ORDER BY a.assignment_id DESC LIMIT 1),"
                + " (SELECT a.blind_id FROM rating_assignments a WHERE a.sitting_id = f.sitting_id AND a.task_id = f.task_id"
                + "   AND a.kind = 'adjudication' ORDER BY a.assignment_id DESC LIMIT 1),"
                + " EXISTS(SELECT 1 FROM rating_assignments a JOIN rating_submissions x ON x.assignment_id = a.assignment_id"
                + "   WHERE a.sitting_id = f.sitting_id AND a.task_id = f.task_id AND a.kind = 'adjudication'),"
                + " (SELECT method FROM final_scores fs WHERE fs.sitting_id = f.sitting_id AND fs.task_id = f.task_id LIMIT 1)"
                + " FROM rating_flags f JOIN sittings s ON s.sitting_id = f.sitting_id WHERE s.exam_id=? ORDER BY f.flag_id",
                rs -> new Flag(rs.getLong(1), rs.getString(2), rs.getString(3), rs.getString(4),
                        List.of(rs.getString(5).split(" ")), rs.getString(6), rs.getString(7), rs.getBoolean(8),
                        rs.getString(9)), s.examId));
    }

    @Override
    public void resolve(long flagId, String resolvedBy, Map<String, Integer> scores, String comment)
            throws RatingException {
        if (resolvedBy == null || resolvedBy.isBlank()) {
            throw new RatingException("say who resolved the response (--by NAME)");
        }
        List<String> problems = s.check(new RatingDesk.RatingSheet(scores, comment), true);
        if (!problems.isEmpty()) {
            throw new RatingException("flag " + flagId + ": " + String.join("; ", problems) + ". Nothing was stored");
        }
        s.tx("storing the resolution of flag " + flagId, () -> {
            List<Object[]> f = s.db.list("SELECT f.sitting_id, f.task_id FROM rating_flags f JOIN sittings s"
                    + " ON s.sitting_id = f.sitting_id WHERE f.flag_id=? AND s.exam_id=?",
                    rs -> new Object[] {rs.getLong(1), rs.getString(2)}, flagId, s.examId);
            if (f.isEmpty()) {
                throw SqlSession.refusal(new RatingException("no flag " + flagId + " in exam " + s.examId
                        + "; list the flags with rate flags"));
            }
            String now = s.now();
            s.db.update("DELETE FROM resolution_entries WHERE flag_id=?", flagId);
            for (Map.Entry<String, Integer> e : scores.entrySet()) {
                s.db.update("INSERT INTO resolution_entries(flag_id, criterion_id, score, resolved_by, comment,"
                        + " resolved_at) VALUES (?,?,?,?,?,?)", flagId, e.getKey(), e.getValue(), resolvedBy.strip(),
                        comment == null ? "" : comment, now);
            }
            evaluate((Long) f.get(0)[0], (String) f.get(0)[1], now);
            return null;
        });
    }
}
