package org.inkgate.admin.core.store.sql;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.sql.SQLException;
import java.time.Clock;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.TreeMap;
import org.inkgate.admin.core.rating.BlindIds;
import org.inkgate.admin.core.rating.RaterRegister;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.source.ExamSource;

/**
 * What the parts of one open rating store share: the session on the store, the exam with its
 * rubric, the clock and blind ids, and the look-ups several concerns make (an assignment behind a
 * blind id, a sheet's problems, a response's settlement, the end of a rater's queue). Callers hold
 * the store's lock ({@link SqlRatingStore} serialises every call).
 */
final class RatingSession {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final TypeReference<TreeMap<String, Integer>> SCORES = new TypeReference<>() {
    };

    /** True for an assignment (alias a) whose response the test owner settled by a resolution entry. */
    static final String SETTLED = "EXISTS(SELECT 1 FROM rating_flags sf JOIN resolution_entries se"
            + " ON se.flag_id = sf.flag_id WHERE sf.sitting_id = a.sitting_id AND sf.task_id = a.task_id)";
    static final String SUBMITTED = "EXISTS(SELECT 1 FROM rating_submissions x WHERE x.assignment_id = a.assignment_id)";
    /**
     * True for a real rating assignment (alias a): not a control script mixed into a queue. Control
     * ratings measure the rater; they never enter a candidate's flags, final scores or exports.
     */
    static final String NOT_CONTROL = "a.assignment_id NOT IN (SELECT assignment_id FROM control_assignments)";
    /** Items a queue shows: a settled response leaves it, unless the rater had already rated it (kept as done). */
    static final String IN_QUEUE = "(NOT " + SETTLED + " OR " + SUBMITTED + ")";

    final SqlSession<RatingException> db;
    /** What the store's database does its own way (locks, catalogue, row order). */
    final Dialect dialect;
    final String examId;
    final ExamSource.Rubric rubric;
    final Clock clock;
    final BlindIds blindIds;
    /** Queue ends remembered inside one transaction that assigns adjudicators; forgotten at its edges. */
    final QueueTails tails;

    RatingSession(SqlSession<RatingException> db, Dialect dialect, String examId, ExamSource.Rubric rubric, Clock clock,
            BlindIds blindIds) {
        this.db = db;
        this.dialect = dialect;
        this.examId = examId;
        this.rubric = rubric;
        this.clock = clock;
        this.blindIds = blindIds;
        this.tails = new QueueTails(this);
    }

    /** Runs {@code work} in one transaction of the store; rerun whole when the store is busy. */
    <T> T tx(String what, SqlSession.Work<T> work) throws RatingException {
        return db.transaction(what, () -> {
            tails.forget();
            try {
                return work.run();
            } finally {
                tails.forget();
            }
        });
    }

    <T> T read(String what, SqlSession.Work<T> work) throws RatingException {
        return db.read(what, work);
    }

    String now() {
        return clock.instant().toString();
    }

    // ---------------------------------------------------------------- assignments behind blind ids

    /** One assignment as the store knows it (not shown to raters beyond blind id, task and kind). */
    record Assignment(long id, long sittingId, String taskId, String raterId, RatingDesk.Kind kind) {
    }

    /**
     * The assignment behind a blind id of this exam; with a rater, it must be in that rater's queue
     * and live rating must be open to the rater (the qualification set).
     */
    Assignment assignment(String raterId, String blindId) throws RatingException {
        List<Assignment> found = read("looking up " + blindId, () -> db.list("SELECT a.assignment_id, a.sitting_id,"
                + " a.task_id, a.rater_id, a.kind FROM rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id"
                + " WHERE a.blind_id=? AND s.exam_id=?", rs -> new Assignment(rs.getLong(1), rs.getLong(2),
                rs.getString(3), rs.getString(4), kind(rs.getString(5))), blindId, examId));
        if (found.isEmpty()) {
            throw new RatingException("unknown response id " + blindId + "; check it against the rater's queue");
        }
        Assignment a = found.get(0);
        if (raterId != null && !a.raterId().equals(raterId)) {
            throw new RatingException("response " + blindId + " is not in rater " + raterId + "'s queue");
        }
        if (raterId != null) {
            // a live item: live rating must be open to the rater (qualification scripts have their own table)
            QualificationItems.refuseIfClosed(this, raterId);
        }
        return a;
    }

    /**
     * Inside a transaction: the sitting of a candidate's one response to a task, for marking it as
     * {@code use} (e.g. "a control script"); refused when there is none or a conflict left two.
     */
    long sittingOfResponse(String candidateNumber, String taskId, String use) throws SQLException {
        List<Long> sittings = db.list("SELECT r.sitting_id FROM responses r JOIN sittings s ON s.sitting_id"
                + " = r.sitting_id WHERE s.exam_id=? AND s.candidate_number=? AND r.task_id=?",
                rs -> rs.getLong(1), examId, candidateNumber, taskId);
        if (sittings.size() != 1) {
            throw SqlSession.refusal(new RatingException(sittings.isEmpty()
                    ? "no response of candidate " + candidateNumber + " to task " + taskId + " in exam "
                    + examId + "; check the candidate number and task id"
                    : "candidate " + candidateNumber + " has " + sittings.size() + " responses to task " + taskId
                    + " (a conflict); settle the conflict before using the response as " + use));
        }
        return sittings.get(0);
    }

    /**
     * Inside a transaction, before reading a response's ratings to decide its flag and final score:
     * a second rater's submission for the same response waits here until this one commits, then
     * sees both ratings (PostgreSQL; a SQLite file has one writer anyway), so no final score is
     * decided from half of them.
     */
    void lockResponse(long sittingId, String taskId) throws SQLException {
        db.exists("SELECT 1 FROM responses WHERE sitting_id=? AND task_id=?" + dialect.lockRows(), sittingId, taskId);
    }

    /** Inside a transaction: waits for any other step writing this exam's queues (see {@link Dialect#lockAssignmentRuns}). */
    void lockQueues() throws SQLException {
        try (java.sql.Statement lock = db.connection().createStatement()) {
            dialect.lockAssignmentRuns(lock, examId);
        }
    }

    static RatingDesk.Kind kind(String stored) {
        return switch (stored == null ? "" : stored) {
            case "adjudication" -> RatingDesk.Kind.ADJUDICATION;
            default -> RatingDesk.Kind.RATING;
        };
    }

    /** A rater's latest submission. */
    record Submission(Map<String, Integer> scores, String comment) {
    }

    Optional<Submission> latest(long assignment) throws SQLException {
        return db.first("SELECT scores_json, comment FROM rating_submissions WHERE assignment_id=? ORDER BY"
                + " submission_id DESC LIMIT 1", rs -> new Submission(parse(rs.getString(1)), rs.getString(2)), assignment);
    }

    // ---------------------------------------------------------------- raters and settled responses

    List<RaterRegister.RaterEntry> raterEntries() throws SQLException {
        return db.list("SELECT rater_id, label, capacity FROM raters ORDER BY rater_id",
                rs -> new RaterRegister.RaterEntry(rs.getString(1), rs.getString(2), SqlSession.intOrNull(rs, 3)));
    }

    void requireRater(String raterId) throws RatingException {
        if (!read("looking up rater", () -> db.exists("SELECT 1 FROM raters WHERE rater_id=?", raterId))) {
            throw new RatingException("no rater " + raterId + "; the raters are "
                    + read("listing raters", this::raterEntries).stream().map(RaterRegister.RaterEntry::id).toList());
        }
    }

    Optional<String> settledAt(String blindId) throws RatingException {
        return read("looking up " + blindId, () -> db.list("SELECT MAX(se.resolved_at) FROM rating_assignments a"
                + " JOIN sittings s ON s.sitting_id = a.sitting_id JOIN rating_flags sf ON sf.sitting_id = a.sitting_id"
                + " AND sf.task_id = a.task_id JOIN resolution_entries se ON se.flag_id = sf.flag_id"
                + " WHERE a.blind_id=? AND s.exam_id=?", rs -> rs.getString(1), blindId, examId))
                .stream().filter(Objects::nonNull).findFirst();
    }

    void refuseIfSettled(String blindId) throws RatingException {
        Optional<String> at = settledAt(blindId);
        if (at.isPresent()) {
            throw new RatingException("response " + blindId + " was settled by the test owner's resolution entry ("
                    + at.get() + "); its final score is decided, so this rating is not taken and nothing was stored."
                    + " Go on with the next response in the queue");
        }
    }

    /** Refuses agreed scores (of a control or qualification script) that miss a criterion or leave its range, or have no source. */
    void checkAgreed(Map<String, Integer> agreed, String source) throws RatingException {
        List<String> problems = check(new RatingDesk.RatingSheet(agreed, ""), true);
        if (!problems.isEmpty()) {
            throw new RatingException("agreed scores: " + String.join("; ", problems) + ". Nothing was stored");
        }
        if (source == null || source.isBlank()) {
            throw new RatingException("say where the agreed scores come from (--source, e.g. the standardisation"
                    + " meeting); nothing was stored");
        }
    }

    /**
     * Stores the agreed scores of one response as a control or qualification script, replacing
     * earlier ones. {@code keepFirstMarked} keeps the time it was first marked, which orders a
     * qualification set; a control script takes the newest time.
     *
     * @param table control_scripts or qualification_scripts (a constant of the caller, never outside text)
     * @param what  "a control script", "a qualification script": for messages
     */
    void markAgreed(String table, String what, String candidateNumber, String taskId, Map<String, Integer> agreed,
            String source, boolean keepFirstMarked) throws RatingException {
        checkAgreed(agreed, source);
        tx("marking " + what, () -> {
            long sitting = sittingOfResponse(candidateNumber, taskId, what);
            db.update("INSERT INTO " + table + "(sitting_id, task_id, agreed_scores_json, source, marked_at)"
                    + " VALUES (?,?,?,?,?) ON CONFLICT(sitting_id, task_id) DO UPDATE SET agreed_scores_json ="
                    + " excluded.agreed_scores_json, source = excluded.source"
                    + (keepFirstMarked ? "" : ", marked_at = excluded.marked_at"),
                    sitting, taskId, json(agreed), source.strip(), now());
            return null;
        });
    }

    /** What is wrong with a sheet: unknown criteria, scores out of range, and (if complete) missing criteria. */
    List<String> check(RatingDesk.RatingSheet sheet, boolean complete) {
        List<String> problems = new ArrayList<>();
        Map<String, ExamSource.Criterion> byId = new LinkedHashMap<>();
        rubric.criteria().forEach(cr -> byId.put(cr.id(), cr));
        for (Map.Entry<String, Integer> e : new TreeMap<>(sheet.scores()).entrySet()) {
            ExamSource.Criterion cr = byId.get(e.getKey());
            if (cr == null) {
                problems.add("'" + e.getKey() + "' is not a criterion of the rubric " + byId.keySet());
            } else if (e.getValue() == null || e.getValue() < cr.minScore() || e.getValue() > cr.maxScore()) {
                problems.add(cr.id() + " score " + e.getValue() + " is outside " + cr.minScore() + "-" + cr.maxScore());
            }
        }
        if (complete) {
            for (String id : byId.keySet()) {
                if (!sheet.scores().containsKey(id)) {
                    problems.add(id + " has no score; score every criterion before submitting");
                }
            }
        }
        return problems;
    }

    /** Assigned items per rater in this exam. */
    Map<String, Integer> workloads() throws SQLException {
        Map<String, Integer> out = new HashMap<>();
        db.each("SELECT a.rater_id, COUNT(*) FROM rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id"
                + " WHERE s.exam_id=? GROUP BY a.rater_id", rs -> out.put(rs.getString(1), rs.getInt(2)), examId);
        return out;
    }

    // ---------------------------------------------------------------- scores as stored

    static String json(Map<String, Integer> scores) {
        try {
            return JSON.writeValueAsString(new TreeMap<>(scores));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    static Map<String, Integer> parse(String json) throws SQLException {
        try {
            return JSON.readValue(json, SCORES);
        } catch (JsonProcessingException e) {
            throw new SQLException("stored scores are not JSON; the store may be damaged: " + e.getMessage(), e);
        }
    }
}
