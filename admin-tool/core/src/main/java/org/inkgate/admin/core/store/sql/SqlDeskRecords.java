package org.inkgate.admin.core.store.sql;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.inkgate.admin.core.rating.DeskRecords;
import org.inkgate.admin.core.rating.RatingDesk.RatingSheet;
import org.inkgate.admin.core.rating.RatingException;

/** {@link DeskRecords} in the results store (SQLite or PostgreSQL). */
final class SqlDeskRecords implements DeskRecords {

    private final RatingSession s;
    private final SqlDiscrepancyReview review;

    SqlDeskRecords(RatingSession s, SqlDiscrepancyReview review) {
        this.s = s;
        this.review = review;
    }

    @Override
    public Optional<String> settledAt(String blindId) throws RatingException {
        return s.settledAt(blindId);
    }

    @Override
    public Optional<String> raterOf(String blindId) throws RatingException {
        Optional<QualificationItems.Item> q = QualificationItems.find(s, blindId);
        if (q.isPresent()) {
            return Optional.of(q.get().raterId());
        }
        return s.read("looking up " + blindId, () -> s.db.first("SELECT a.rater_id FROM rating_assignments a JOIN"
                + " sittings s ON s.sitting_id = a.sitting_id WHERE a.blind_id=? AND s.exam_id=?", rs -> rs.getString(1),
                blindId, s.examId));
    }

    @Override
    public Optional<RatingSheet> submitted(String raterId, String blindId) throws RatingException {
        Optional<QualificationItems.Item> q = QualificationItems.of(s, raterId, blindId);
        if (q.isPresent()) {
            return QualificationItems.latest(s, q.get());
        }
        RatingSession.Assignment a = s.assignment(raterId, blindId);
        return s.read("reading the rating of " + blindId, () -> s.latest(a.id())
                .map(l -> new RatingSheet(l.scores(), l.comment())));
    }

    @Override
    public List<String> check(RatingSheet sheet, boolean complete) {
        return s.check(sheet, complete);
    }

    @Override
    public int submitAll(String raterId, Map<String, RatingSheet> sheets, String via) throws RatingException {
        s.requireRater(raterId);
        Map<QualificationItems.Item, RatingSheet> qualification = new LinkedHashMap<>();
        Map<RatingSession.Assignment, RatingSheet> checked = new LinkedHashMap<>();
        for (Map.Entry<String, RatingSheet> e : sheets.entrySet()) {
            List<String> problems = s.check(e.getValue(), true);
            Optional<QualificationItems.Item> q = QualificationItems.of(s, raterId, e.getKey());
            if (q.isPresent()) {
                if (!problems.isEmpty()) {
                    throw new RatingException(e.getKey() + ": " + String.join("; ", problems) + ". Nothing was stored");
                }
                QualificationItems.refuseIfSettled(s, q.get(), e.getValue());
                qualification.put(q.get(), e.getValue());
                continue;
            }
            RatingSession.Assignment a = s.assignment(raterId, e.getKey());
            RatingSheet sent = e.getValue();
            boolean unchanged = s.read("reading the rating of " + e.getKey(), () -> s.latest(a.id())
                    .filter(l -> same(l, sent)).isPresent());
            if (!unchanged) {
                // the same rating sent again (a sheet imported twice) changes nothing and needs no refusal
                s.refuseIfSettled(e.getKey());
            }
            if (!problems.isEmpty()) {
                throw new RatingException(e.getKey() + ": " + String.join("; ", problems) + ". Nothing was stored");
            }
            checked.put(a, e.getValue());
        }
        return s.tx("storing ratings of " + raterId, () -> {
            int changed = 0;
            String now = s.now();
            for (Map.Entry<QualificationItems.Item, RatingSheet> e : qualification.entrySet()) {
                changed += QualificationItems.store(s, e.getKey(), e.getValue(), via, now) ? 1 : 0;
            }
            for (Map.Entry<RatingSession.Assignment, RatingSheet> e : checked.entrySet()) {
                RatingSession.Assignment a = e.getKey();
                RatingSheet sheet = e.getValue();
                s.lockResponse(a.sittingId(), a.taskId());
                Optional<RatingSession.Submission> current = s.latest(a.id());
                if (current.isPresent() && same(current.get(), sheet)) {
                    s.db.update("DELETE FROM rating_drafts WHERE assignment_id=?", a.id());
                    continue;
                }
                long submission = s.db.insert("INSERT INTO rating_submissions(assignment_id, rater_id, scores_json,"
                        + " comment, submitted_at, via) VALUES (?,?,?,?,?,?)", a.id(), raterId,
                        RatingSession.json(sheet.scores()), sheet.comment(), now, via);
                for (Map.Entry<String, Integer> sc : sheet.scores().entrySet()) {
                    s.db.update("INSERT INTO ratings(assignment_id, exam_id, criterion_id, score, rated_at, submission_id)"
                            + " VALUES (?,?,?,?,?,?) ON CONFLICT(assignment_id, criterion_id) DO UPDATE SET"
                            + " score=excluded.score, rated_at=excluded.rated_at, submission_id=excluded.submission_id",
                            a.id(), s.examId, sc.getKey(), sc.getValue(), now, submission);
                }
                s.db.update("DELETE FROM rating_drafts WHERE assignment_id=?", a.id());
                review.evaluate(a.sittingId(), a.taskId(), now);
                changed++;
            }
            return changed;
        });
    }

    private static boolean same(RatingSession.Submission stored, RatingSheet sheet) {
        return stored.scores().equals(new TreeMap<>(sheet.scores())) && stored.comment().equals(sheet.comment());
    }

    @Override
    public List<HistoryEntry> history(String blindId) throws RatingException {
        if (QualificationItems.find(s, blindId).isPresent()) {
            return List.of(); // a qualification script has no live rating history
        }
        RatingSession.Assignment a = s.assignment(null, blindId);
        return s.read("reading history", () -> s.db.list("SELECT rater_id, scores_json, comment, submitted_at, via FROM"
                + " rating_submissions WHERE assignment_id=? ORDER BY submission_id", rs -> new HistoryEntry(rs.getString(1),
                RatingSession.parse(rs.getString(2)), rs.getString(3), rs.getString(4), rs.getString(5)), a.id()));
    }

    @Override
    public List<ProgressRow> progressRows() throws RatingException {
        // SUM(CASE WHEN ... THEN 1 ELSE 0 END), not SUM(EXISTS(...)): PostgreSQL does not sum booleans
        return s.read("reading progress", () -> s.db.list("SELECT a.rater_id, a.task_id, COUNT(*),"
                + " SUM(CASE WHEN " + RatingSession.SUBMITTED + " THEN 1 ELSE 0 END),"
                + " SUM(CASE WHEN EXISTS(SELECT 1 FROM rating_flags f WHERE f.sitting_id = a.sitting_id"
                + " AND f.task_id = a.task_id) THEN 1 ELSE 0 END)"
                + " FROM rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id WHERE s.exam_id=?"
                + " AND " + RatingSession.IN_QUEUE + " GROUP BY a.rater_id, a.task_id ORDER BY a.rater_id, a.task_id",
                rs -> new ProgressRow(rs.getString(1), rs.getString(2), rs.getInt(3), rs.getInt(4),
                        rs.getInt(3) - rs.getInt(4), rs.getInt(5)), s.examId));
    }
}
