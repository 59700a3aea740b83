package org.inkgate.admin.core.store.sql;

import java.sql.SQLException;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * The ends of raters' queues: the next queue position and the candidate behind the last item,
 * read from the store, and remembered for the rest of one transaction while adjudicators are
 * assigned (a review of thousands of flags would otherwise sort a rater's whole queue for every
 * flag). Only adjudicator assignment adds to queues while a review runs, and it keeps these up to
 * date through {@link #added}.
 */
final class QueueTails {

    private final RatingSession s;
    private Map<String, Integer> load;
    private Map<String, Optional<String>> tail;
    private Map<String, Integer> nextPosition;

    QueueTails(RatingSession s) {
        this.s = s;
    }

    /** Forgets what was remembered: called at both edges of every transaction. */
    void forget() {
        load = null;
        tail = null;
        nextPosition = null;
    }

    /** Workloads per rater, counted once per transaction. */
    Map<String, Integer> loadInTx() throws SQLException {
        if (load == null) {
            load = s.workloads();
        }
        return load;
    }

    String lastCandidateInTx(String rater) throws SQLException {
        if (tail == null) {
            tail = new HashMap<>();
        }
        Optional<String> t = tail.get(rater);
        if (t == null) {
            t = Optional.ofNullable(lastCandidate(rater));
            tail.put(rater, t);
        }
        return t.orElse(null);
    }

    int nextPositionInTx(String rater) throws SQLException {
        if (nextPosition == null) {
            nextPosition = new HashMap<>();
        }
        Integer next = nextPosition.get(rater);
        if (next == null) {
            next = nextPosition(rater);
            nextPosition.put(rater, next);
        }
        return next;
    }

    /** An item for {@code candidate} was put at the end of {@code rater}'s queue. */
    void added(String rater, String candidate) throws SQLException {
        loadInTx().merge(rater, 1, Integer::sum);
        lastCandidateInTx(rater);
        tail.put(rater, Optional.of(candidate));
        nextPositionInTx(rater);
        nextPosition.merge(rater, 1, Integer::sum);
    }

    /** The next free queue position of a rater in this exam. */
    int nextPosition(String rater) throws SQLException {
        return s.db.count("SELECT COALESCE(MAX(a.queue_position), 0) + 1 FROM rating_assignments a JOIN sittings s"
                + " ON s.sitting_id = a.sitting_id WHERE a.rater_id=? AND s.exam_id=?", rater, s.examId);
    }

    /** The candidate behind the last item of a rater's queue in this exam, or null for an empty queue. */
    String lastCandidate(String rater) throws SQLException {
        // ORDER BY a boolean expression: SQLite and PostgreSQL both sort false before true
        return s.db.first("SELECT s.candidate_number FROM rating_assignments a JOIN sittings s ON s.sitting_id ="
                + " a.sitting_id WHERE a.rater_id=? AND s.exam_id=? ORDER BY a.kind = 'adjudication' DESC,"
                + " a.queue_position DESC LIMIT 1", rs -> rs.getString(1), rater, s.examId).orElse(null);
    }

    /** The candidate behind the last first-rating item of a rater's queue (new first ratings go after it). */
    String lastOwnCandidate(String rater) throws SQLException {
        return s.db.first("SELECT s.candidate_number FROM rating_assignments a JOIN sittings s ON s.sitting_id ="
                + " a.sitting_id WHERE a.rater_id=? AND s.exam_id=? AND a.kind = 'rating' ORDER BY a.queue_position DESC"
                + " LIMIT 1", rs -> rs.getString(1), rater, s.examId).orElse(null);
    }
}
