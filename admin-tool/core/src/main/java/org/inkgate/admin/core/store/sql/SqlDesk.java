package org.inkgate.admin.core.store.sql;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.inkgate.admin.core.rating.DeskRecords;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.Referrals;
import org.inkgate.admin.core.source.ExamSource;

/**
 * {@link RatingDesk} in the results store (SQLite or PostgreSQL): queues, blind responses, drafts and submissions. Every
 * submission is kept (history), with who and when; the current rating of an assignment is its
 * latest submission.
 */
final class SqlDesk implements RatingDesk {

    private final RatingSession s;
    private final SqlDeskRecords records;
    private final SqlReferrals referrals;

    SqlDesk(RatingSession s, SqlDeskRecords records, SqlReferrals referrals) {
        this.s = s;
        this.records = records;
        this.referrals = referrals;
    }

    @Override
    public List<Rater> raters() throws RatingException {
        return s.read("listing raters", s::raterEntries).stream().map(r -> new Rater(r.id(), r.label())).toList();
    }

    @Override
    public List<QueueItem> queue(String raterId) throws RatingException {
        s.requireRater(raterId);
        // the qualification set comes first; while live rating is closed to the rater, it is the whole queue
        List<QueueItem> raw = new ArrayList<>(s.read("reading the qualification set of " + raterId,
                () -> QualificationItems.queue(s, raterId)));
        boolean liveOpen = s.read("reading " + raterId + "'s qualification", () -> QualificationItems.rule(s).isEmpty()
                || QualificationItems.standing(s, raterId).liveOpen());
        if (liveOpen) {
            // ORDER BY a boolean expression (own items before adjudications): false sorts first in SQLite and PostgreSQL
            raw.addAll(s.read("reading the queue of " + raterId, () -> s.db.list("SELECT a.blind_id, a.task_id,"
                    + " a.kind, " + RatingSession.SUBMITTED + " FROM rating_assignments a JOIN sittings s"
                    + " ON s.sitting_id = a.sitting_id WHERE a.rater_id=? AND s.exam_id=? AND " + RatingSession.IN_QUEUE
                    + " ORDER BY a.kind = 'adjudication', a.queue_position, a.assignment_id",
                    rs -> new QueueItem(0, rs.getString(1), rs.getString(2), RatingSession.kind(rs.getString(3)),
                            rs.getBoolean(4)), raterId, s.examId)));
        }
        List<QueueItem> out = new ArrayList<>(raw.size());
        for (int i = 0; i < raw.size(); i++) {
            QueueItem q = raw.get(i);
            out.add(new QueueItem(i + 1, q.blindId(), q.taskId(), q.kind(), q.done()));
        }
        return out;
    }

    @Override
    public BlindResponse response(String raterId, String blindId) throws RatingException {
        Optional<QualificationItems.Item> q = QualificationItems.of(s, raterId, blindId);
        if (q.isPresent()) {
            return QualificationItems.response(s, q.get());
        }
        RatingSession.Assignment a = s.assignment(raterId, blindId);
        return s.read("reading response " + blindId, () -> s.db.list("SELECT t.title, r.text, t.prompt FROM responses r"
                + " JOIN sittings s ON s.sitting_id = r.sitting_id JOIN tasks t ON t.exam_id = s.exam_id AND t.task_id ="
                + " r.task_id WHERE r.sitting_id=? AND r.task_id=?", rs -> new BlindResponse(blindId, a.taskId(),
                rs.getString(1), rs.getString(2), rs.getString(3)), a.sittingId(), a.taskId()).get(0));
    }

    @Override
    public ExamSource.Rubric rubric(String blindId) throws RatingException {
        if (QualificationItems.find(s, blindId).isEmpty()) {
            s.assignment(null, blindId);
        }
        return s.rubric;
    }

    @Override
    public Optional<RatingSheet> sheet(String raterId, String blindId) throws RatingException {
        Optional<QualificationItems.Item> q = QualificationItems.of(s, raterId, blindId);
        if (q.isPresent()) {
            return QualificationItems.sheet(s, q.get());
        }
        RatingSession.Assignment a = s.assignment(raterId, blindId);
        return s.read("reading the sheet of " + blindId, () -> {
            Optional<RatingSheet> draft = s.db.first("SELECT scores_json, comment FROM rating_drafts WHERE assignment_id=?",
                    rs -> new RatingSheet(RatingSession.parse(rs.getString(1)), rs.getString(2)), a.id());
            if (draft.isPresent()) {
                return draft;
            }
            return s.latest(a.id()).map(l -> new RatingSheet(l.scores(), l.comment()));
        });
    }

    @Override
    public void saveDraft(String raterId, String blindId, RatingSheet sheet) throws RatingException {
        List<String> problems = s.check(sheet, false);
        if (!problems.isEmpty()) {
            throw new RatingException(blindId + ": " + String.join("; ", problems));
        }
        Optional<QualificationItems.Item> q = QualificationItems.of(s, raterId, blindId);
        if (q.isPresent()) {
            QualificationItems.saveDraft(s, q.get(), sheet);
            return;
        }
        RatingSession.Assignment a = s.assignment(raterId, blindId);
        s.refuseIfSettled(blindId);
        s.tx("saving the draft of " + blindId, () -> s.db.update("INSERT INTO rating_drafts(assignment_id, scores_json,"
                + " comment, saved_at) VALUES (?,?,?,?) ON CONFLICT(assignment_id) DO UPDATE SET"
                + " scores_json=excluded.scores_json, comment=excluded.comment, saved_at=excluded.saved_at", a.id(),
                RatingSession.json(sheet.scores()), sheet.comment(), s.now()));
    }

    @Override
    public void submit(String raterId, String blindId, RatingSheet sheet) throws RatingException {
        records.submitAll(raterId, Map.of(blindId, sheet), "desk");
    }

    @Override
    public long refer(String raterId, String blindId, Referrals.Reason reason, String note) throws RatingException {
        if (QualificationItems.of(s, raterId, blindId).isPresent()) {
            throw new RatingException(blindId + " is a qualification script, not a candidate's live response: tell the"
                    + " test owner what you saw directly; nothing was stored");
        }
        return referrals.refer(raterId, blindId, reason, note);
    }

    @Override
    public Progress progress(String raterId) throws RatingException {
        s.requireRater(raterId);
        int[] p = new int[3];
        for (DeskRecords.ProgressRow r : records.progressRows()) {
            if (r.raterId().equals(raterId)) {
                p[0] += r.total();
                p[1] += r.rated();
                p[2] += r.flagged();
            }
        }
        return new Progress(p[0], p[1], p[0] - p[1], p[2]);
    }
}
