package org.inkgate.admin.core.store.sql;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.function.Consumer;
import org.inkgate.admin.core.rating.DiscrepancyRule;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.RatingResults;
import org.inkgate.admin.core.rating.ResponseScores;

/** {@link RatingResults} in the results store (SQLite or PostgreSQL): control ratings never appear here. */
final class SqlRatingResults implements RatingResults {

    private final RatingSession s;

    SqlRatingResults(RatingSession s) {
        this.s = s;
    }

    @Override
    public void forEachRating(Consumer<RatingRow> sink) throws RatingException {
        s.read("reading ratings", () -> {
            s.db.each("SELECT s.candidate_number, COALESCE(c.level, ''), s.form_id, a.task_id, r.condition_id, a.rater_id,"
                    + " g.criterion_id, g.score, a.kind, g.rated_at FROM ratings g"
                    + " JOIN rating_assignments a ON a.assignment_id = g.assignment_id"
                    + " JOIN sittings s ON s.sitting_id = a.sitting_id"
                    + " JOIN responses r ON r.sitting_id = a.sitting_id AND r.task_id = a.task_id"
                    + " LEFT JOIN candidates c ON c.exam_id = s.exam_id AND c.candidate_number = s.candidate_number"
                    + " WHERE s.exam_id=? AND " + RatingSession.NOT_CONTROL
                    + " ORDER BY s.candidate_number, a.task_id, s.sitting_id, a.rater_id, g.criterion_id",
                    rs -> sink.accept(new RatingRow(rs.getString(1), rs.getString(2), rs.getString(3), rs.getString(4),
                            rs.getString(5), rs.getString(6), rs.getString(7), rs.getInt(8), rs.getString(9),
                            rs.getString(10))), s.examId);
            return null;
        });
    }

    @Override
    public String studyDesign() throws RatingException {
        return s.read("reading the exam's design", () -> {
            String[] design = {""};
            s.db.each("SELECT COALESCE(design, '') FROM exams WHERE exam_id=?", rs -> design[0] = rs.getString(1), s.examId);
            return design[0];
        });
    }

    @Override
    public void forEachFinalScore(Consumer<FinalRow> sink) throws RatingException {
        s.read("reading final scores", () -> {
            s.db.each("SELECT s.candidate_number, COALESCE(c.level, ''), s.form_id, f.task_id, r.condition_id,"
                    + " f.criterion_id, f.score, f.method, d.max_criterion_band_gap, d.max_total_gap, d.adjudicated_score,"
                    + " f.basis, f.decided_at, f.rule_id FROM final_scores f JOIN sittings s ON s.sitting_id = f.sitting_id"
                    + " JOIN responses r ON r.sitting_id = f.sitting_id AND r.task_id = f.task_id"
                    + " LEFT JOIN discrepancy_rules d ON d.rule_id = f.rule_id"
                    + " LEFT JOIN candidates c ON c.exam_id = s.exam_id AND c.candidate_number = s.candidate_number"
                    + " WHERE s.exam_id=? ORDER BY s.candidate_number, f.task_id, s.sitting_id, f.criterion_id",
                    rs -> sink.accept(new FinalRow(rs.getString(1), rs.getString(2), rs.getString(3), rs.getString(4),
                            rs.getString(5), rs.getString(6), rs.getDouble(7), rs.getString(8), rs.getObject(14) == null
                            ? "none" : new DiscrepancyRule(SqlSession.intOrNull(rs, 9), SqlSession.intOrNull(rs, 10),
                            DiscrepancyRule.AdjudicatedScore.of(rs.getString(11))).describe(), rs.getString(12),
                            rs.getString(13))), s.examId);
            return null;
        });
    }

    @Override
    public Map<ResponseScores.Key, ResponseScores> scoresByResponse() throws RatingException {
        return s.read("reading scores", () -> {
            Map<ResponseScores.Key, Map<String, Map<String, Integer>>> ratings = new LinkedHashMap<>();
            Map<ResponseScores.Key, Map<String, RatingDesk.Kind>> kinds = new HashMap<>();
            s.db.each("SELECT a.sitting_id, a.task_id, a.rater_id, a.kind, g.criterion_id, g.score FROM ratings g"
                    + " JOIN rating_assignments a ON a.assignment_id = g.assignment_id"
                    + " JOIN sittings s ON s.sitting_id = a.sitting_id WHERE s.exam_id=? AND " + RatingSession.NOT_CONTROL
                    + " ORDER BY a.sitting_id, a.task_id, a.kind DESC, a.rater_id, g.criterion_id", rs -> {
                        var key = new ResponseScores.Key(rs.getLong(1), rs.getString(2));
                        ratings.computeIfAbsent(key, k -> new LinkedHashMap<>())
                                .computeIfAbsent(rs.getString(3), k -> new TreeMap<>()).put(rs.getString(5), rs.getInt(6));
                        kinds.computeIfAbsent(key, k -> new HashMap<>()).put(rs.getString(3),
                                RatingSession.kind(rs.getString(4)));
                    }, s.examId);
            Map<ResponseScores.Key, Map<String, Double>> finals = new HashMap<>();
            Map<ResponseScores.Key, String> methods = new HashMap<>();
            s.db.each("SELECT f.sitting_id, f.task_id, f.criterion_id, f.score, f.method FROM final_scores f"
                    + " JOIN sittings s ON s.sitting_id = f.sitting_id WHERE s.exam_id=?", rs -> {
                        var key = new ResponseScores.Key(rs.getLong(1), rs.getString(2));
                        finals.computeIfAbsent(key, k -> new TreeMap<>()).put(rs.getString(3), rs.getDouble(4));
                        methods.put(key, rs.getString(5));
                    }, s.examId);
            Map<ResponseScores.Key, ResponseScores> out = new LinkedHashMap<>();
            Set<ResponseScores.Key> keys = new LinkedHashSet<>(ratings.keySet());
            keys.addAll(finals.keySet());
            for (var key : keys) {
                List<ResponseScores.Rating> list = new ArrayList<>();
                ratings.getOrDefault(key, Map.of()).forEach((rater, scores) -> list.add(
                        new ResponseScores.Rating(rater, kinds.get(key).get(rater), scores)));
                out.put(key, new ResponseScores(list, finals.getOrDefault(key, Map.of()), methods.get(key)));
            }
            return out;
        });
    }

    @Override
    public int pendingResponses() throws RatingException {
        return s.read("counting pending responses", () -> s.db.count("SELECT COUNT(*) FROM (SELECT DISTINCT a.sitting_id,"
                + " a.task_id FROM rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id WHERE s.exam_id=?"
                + " AND NOT EXISTS (SELECT 1 FROM final_scores f WHERE f.sitting_id = a.sitting_id"
                + " AND f.task_id = a.task_id)) pending", s.examId));
    }
}
