package org.inkgate.admin.core.store.sql;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.List;
import java.util.Optional;
import java.util.TreeMap;
import org.inkgate.admin.core.rating.ControlScripts;
import org.inkgate.admin.core.rating.QualificationSet;
import org.inkgate.admin.core.rating.QualificationStanding;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingException;

/**
 * The qualification scripts in raters' queues, kept apart from live assignments (their own items,
 * ratings and drafts), so a response can be a qualification script for every rater and still be
 * rated live by its own raters; and the gate that keeps live items closed until a rater passes.
 */
final class QualificationItems {

    /** One qualification script given to one rater, behind its own blind id. */
    record Item(long id, long sittingId, String taskId, String raterId, String blindId) {
    }

    private QualificationItems() {
    }

    /** The item behind a blind id of this exam, if it is a qualification item. */
    static Optional<Item> find(RatingSession s, String blindId) throws RatingException {
        return s.read("looking up " + blindId, () -> s.db.first("SELECT q.item_id, q.sitting_id, q.task_id, q.rater_id,"
                + " q.blind_id FROM qualification_items q JOIN sittings s ON s.sitting_id = q.sitting_id WHERE"
                + " q.blind_id=? AND s.exam_id=?", QualificationItems::item, blindId, s.examId));
    }

    /** As {@link #find}, refusing an item of another rater. */
    static Optional<Item> of(RatingSession s, String raterId, String blindId) throws RatingException {
        Optional<Item> item = find(s, blindId);
        if (item.isPresent() && raterId != null && !item.get().raterId().equals(raterId)) {
            throw new RatingException("response " + blindId + " is not in rater " + raterId + "'s queue");
        }
        return item;
    }

    /** The rater's qualification items in set order (positions are numbered by the caller). */
    static List<RatingDesk.QueueItem> queue(RatingSession s, String raterId) throws SQLException {
        return s.db.list("SELECT q.blind_id, q.task_id, EXISTS(SELECT 1 FROM qualification_ratings r WHERE r.item_id ="
                + " q.item_id) FROM qualification_items q JOIN sittings s ON s.sitting_id = q.sitting_id WHERE"
                + " q.rater_id=? AND s.exam_id=? ORDER BY q.position, q.item_id", rs -> new RatingDesk.QueueItem(0,
                rs.getString(1), rs.getString(2), RatingDesk.Kind.QUALIFICATION, rs.getBoolean(3)), raterId, s.examId);
    }

    static RatingDesk.BlindResponse response(RatingSession s, Item item) throws RatingException {
        return s.read("reading response " + item.blindId(), () -> s.db.list("SELECT t.title, r.text, t.prompt FROM"
                + " responses r JOIN sittings s ON s.sitting_id = r.sitting_id JOIN tasks t ON t.exam_id = s.exam_id AND"
                + " t.task_id = r.task_id WHERE r.sitting_id=? AND r.task_id=?", rs -> new RatingDesk.BlindResponse(
                item.blindId(), item.taskId(), rs.getString(1), rs.getString(2), rs.getString(3)), item.sittingId(),
                item.taskId()).get(0));
    }

    static Optional<RatingDesk.RatingSheet> latest(RatingSession s, Item item) throws RatingException {
        return s.read("reading the rating of " + item.blindId(), () -> latestNow(s, item.id()));
    }

    private static Optional<RatingDesk.RatingSheet> latestNow(RatingSession s, long itemId) throws SQLException {
        return s.db.first("SELECT scores_json, comment FROM qualification_ratings WHERE item_id=? ORDER BY rating_id"
                + " DESC LIMIT 1", rs -> new RatingDesk.RatingSheet(RatingSession.parse(rs.getString(1)),
                rs.getString(2)), itemId);
    }

    /** The draft, else the latest rating. */
    static Optional<RatingDesk.RatingSheet> sheet(RatingSession s, Item item) throws RatingException {
        Optional<RatingDesk.RatingSheet> draft = s.read("reading the sheet of " + item.blindId(), () -> s.db.first(
                "SELECT scores_json, comment FROM qualification_drafts WHERE item_id=?", rs -> new RatingDesk.RatingSheet(
                RatingSession.parse(rs.getString(1)), rs.getString(2)), item.id()));
        return draft.isPresent() ? draft : latest(s, item);
    }

    static void saveDraft(RatingSession s, Item item, RatingDesk.RatingSheet sheet) throws RatingException {
        s.tx("saving the draft of " + item.blindId(), () -> s.db.update("INSERT INTO qualification_drafts(item_id,"
                + " scores_json, comment, saved_at) VALUES (?,?,?,?) ON CONFLICT(item_id) DO UPDATE SET"
                + " scores_json=excluded.scores_json, comment=excluded.comment, saved_at=excluded.saved_at", item.id(),
                RatingSession.json(sheet.scores()), sheet.comment(), s.now()));
    }

    /**
     * Refuses a changed rating of a qualification script once the rater has passed or was admitted:
     * the set that opened live rating stays as it was scored.
     */
    static void refuseIfSettled(RatingSession s, Item item, RatingDesk.RatingSheet sheet) throws RatingException {
        Optional<RatingDesk.RatingSheet> now = latest(s, item);
        if (now.isPresent() && same(now.get(), sheet)) {
            return;
        }
        QualificationStanding standing = s.read("reading " + item.raterId() + "'s qualification",
                () -> standing(s, item.raterId()));
        if (standing.status() == QualificationStanding.Status.PASSED
                || standing.status() == QualificationStanding.Status.ADMITTED) {
            throw new RatingException(item.blindId() + " is a qualification script and rater " + item.raterId()
                    + " has " + (standing.status() == QualificationStanding.Status.PASSED ? "passed" : "been admitted")
                    + "; its rating is kept as it was. Nothing was stored");
        }
    }

    /** Inside a transaction: stores the rating unless it equals the latest; true when stored. */
    static boolean store(RatingSession s, Item item, RatingDesk.RatingSheet sheet, String via, String now)
            throws SQLException {
        s.db.update("DELETE FROM qualification_drafts WHERE item_id=?", item.id());
        Optional<RatingDesk.RatingSheet> current = latestNow(s, item.id());
        if (current.isPresent() && same(current.get(), sheet)) {
            return false;
        }
        s.db.update("INSERT INTO qualification_ratings(item_id, scores_json, comment, submitted_at, via) VALUES"
                + " (?,?,?,?,?)", item.id(), RatingSession.json(sheet.scores()), sheet.comment(), now, via);
        return true;
    }

    private static boolean same(RatingDesk.RatingSheet a, RatingDesk.RatingSheet b) {
        return new TreeMap<>(a.scores()).equals(new TreeMap<>(b.scores())) && a.comment().equals(b.comment());
    }

    // ---------------------------------------------------------------- the gate

    static QualificationStanding standing(RatingSession s, String raterId) throws SQLException {
        QualificationSet.Rule rule = rule(s).orElse(null);
        int given = s.db.list("SELECT COUNT(*) FROM qualification_items q JOIN sittings s ON s.sitting_id ="
                + " q.sitting_id WHERE s.exam_id=? AND q.rater_id=?", rs -> rs.getInt(1), s.examId, raterId).get(0);
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
        return s.db.list("SELECT q.rater_id, q.blind_id, r.submitted_at, r.scores_json, qs.agreed_scores_json FROM"
                + " qualification_items q JOIN qualification_scripts qs ON qs.sitting_id = q.sitting_id AND"
                + " qs.task_id = q.task_id JOIN sittings s ON s.sitting_id = q.sitting_id JOIN qualification_ratings r"
                + " ON r.rating_id = (SELECT MAX(y.rating_id) FROM qualification_ratings y WHERE y.item_id = q.item_id)"
                + " WHERE s.exam_id=? AND q.rater_id=? ORDER BY r.rating_id",
                rs -> new ControlScripts.ControlRating(rs.getString(1), rs.getString(2), rs.getString(3),
                        RatingSession.parse(rs.getString(4)), RatingSession.parse(rs.getString(5))), s.examId, raterId);
    }

    /** Refuses a live item of a rater for whom live rating is still closed; nothing to do without a rule. */
    static void refuseIfClosed(RatingSession s, String raterId) throws RatingException {
        QualificationStanding standing = s.read("reading " + raterId + "'s qualification", () -> rule(s).isEmpty()
                ? null : standing(s, raterId));
        if (standing != null && !standing.liveOpen()) {
            throw new RatingException(standing.whyClosed());
        }
    }

    private static Item item(ResultSet rs) throws SQLException {
        return new Item(rs.getLong(1), rs.getLong(2), rs.getString(3), rs.getString(4), rs.getString(5));
    }

    private static Double real(ResultSet rs, int column) throws SQLException {
        double v = rs.getDouble(column);
        return rs.wasNull() ? null : v;
    }
}
