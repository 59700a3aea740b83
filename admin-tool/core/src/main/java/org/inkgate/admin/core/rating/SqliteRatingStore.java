package org.inkgate.admin.core.rating;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Clock;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import java.util.function.Consumer;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.store.Sql;
import org.inkgate.admin.core.store.Sql.RowMapper;
import org.inkgate.admin.core.store.Sql.RowSink;
import org.inkgate.admin.core.store.Migrations;
import org.sqlite.SQLiteConfig;

/**
 * Blind double rating of one exam over the results store: raters, assignment runs, the rating
 * desk ({@link RatingDesk}), discrepancy flags, adjudication, resolution entries, final scores and
 * the rows exports need. Its own connection to the store file uses the client's storage discipline
 * (write-ahead log, synchronous FULL): a draft or rating is on disk when a call returns, so a
 * crash or power cut loses nothing a rater saved. Every submission is kept (history), with who and
 * when; the current rating of an assignment is its latest submission. Public methods are
 * synchronized: one connection serves one call at a time, whichever thread it comes from.
 */
public final class SqliteRatingStore implements RatingDesk, Referrals, AutoCloseable {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final TypeReference<TreeMap<String, Integer>> SCORES = new TypeReference<>() {
    };

    /** True for an assignment (alias a) whose response the test owner settled by a resolution entry. */
    private static final String SETTLED = "EXISTS(SELECT 1 FROM rating_flags sf JOIN resolution_entries se"
            + " ON se.flag_id = sf.flag_id WHERE sf.sitting_id = a.sitting_id AND sf.task_id = a.task_id)";
    private static final String SUBMITTED = "EXISTS(SELECT 1 FROM rating_submissions x WHERE x.assignment_id = a.assignment_id)";
    /** Items a queue shows: a settled response leaves it, unless the rater had already rated it (kept as done). */
    /**
     * True for a real rating assignment (alias a): not a control script mixed into a queue. Control
     * ratings measure the rater; they never enter a candidate's flags, final scores or exports.
     */
    static final String NOT_CONTROL = "a.assignment_id NOT IN (SELECT assignment_id FROM control_assignments)";
    private static final String IN_QUEUE = "(NOT " + SETTLED + " OR " + SUBMITTED + ")";

    private final Connection c;
    private final String examId;
    private final ExamSource.Rubric rubric;
    private final Clock clock;
    private final BlindIds blindIds;

    private SqliteRatingStore(Connection c, String examId, ExamSource.Rubric rubric, Clock clock, BlindIds blindIds) {
        this.c = c;
        this.examId = examId;
        this.rubric = rubric;
        this.clock = clock;
        this.blindIds = blindIds;
    }

    /** Opens rating of {@code examId} in an existing results store (migrating its schema if older). */
    public static SqliteRatingStore open(Path file, String examId) throws RatingException {
        return open(file, examId, Clock.systemUTC(), new BlindIds());
    }

    static SqliteRatingStore open(Path file, String examId, Clock clock, BlindIds ids) throws RatingException {
        if (!Files.isRegularFile(file)) {
            throw new RatingException("no results store at " + file + "; give the store that collect wrote");
        }
        Connection c = null;
        try {
            SQLiteConfig config = new SQLiteConfig();
            config.enforceForeignKeys(true);
            config.setJournalMode(SQLiteConfig.JournalMode.WAL);
            // FULL, unlike collect's NORMAL: a rater's typing cannot be re-imported from a file, so each
            // commit is synced before the call returns (SQLite docs, PRAGMA synchronous, "FULL")
            config.setSynchronous(SQLiteConfig.SynchronousMode.FULL);
            config.setBusyTimeout(10_000);
            if (org.inkgate.admin.core.store.ReadOnlyStore.writable(file)) {
                c = DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath(), config.toProperties());
                Migrations.migrate(c, Migrations.latest());
            } else {
                // read-only media: export and analyse read the ratings; any write is refused by SQLite
                c = org.inkgate.admin.core.store.ReadOnlyStore.connect(file);
            }
            Connection conn = c;
            List<String> exams = query(conn, "SELECT exam_id FROM exams ORDER BY exam_id", rs -> rs.getString(1));
            if (!exams.contains(examId)) {
                throw new RatingException("the store " + file + " holds no exam " + examId + "; it holds " + exams);
            }
            ExamSource.Rubric rubric = loadRubric(conn, examId);
            if (rubric.criteria().isEmpty()) {
                throw new RatingException("the store holds no rubric for exam " + examId + "; run collect again with"
                        + " --exam SOURCE-FOLDER so the rubric is registered");
            }
            return new SqliteRatingStore(conn, examId, rubric, clock, ids);
        } catch (SQLException e) {
            closeQuietly(c);
            throw new RatingException("cannot open the results store " + file + " for rating: " + e.getMessage(), e);
        } catch (RatingException e) {
            closeQuietly(c);
            throw e;
        }
    }

    /** The exams in a store, to choose one when the store holds several. */
    public static List<String> exams(Path file) throws RatingException {
        if (!Files.isRegularFile(file)) {
            throw new RatingException("no results store at " + file + "; give the store that collect wrote");
        }
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath())) {
            return query(c, "SELECT exam_id FROM exams ORDER BY exam_id", rs -> rs.getString(1));
        } catch (SQLException e) {
            throw new RatingException("cannot read the results store " + file + ": " + e.getMessage(), e);
        }
    }

    private static void closeQuietly(Connection c) {
        if (c != null) {
            try {
                c.close();
            } catch (SQLException ignored) {
                // the open failed already; that error is the one to report
            }
        }
    }

    private static ExamSource.Rubric loadRubric(Connection c, String examId) throws SQLException {
        Map<String, List<ExamSource.Band>> bands = new HashMap<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT criterion_id, from_score, to_score, descriptor FROM"
                + " rubric_bands WHERE exam_id=? ORDER BY criterion_id, from_score")) {
            ps.setString(1, examId);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    bands.computeIfAbsent(rs.getString(1), k -> new ArrayList<>())
                            .add(new ExamSource.Band(rs.getInt(2), rs.getInt(3), rs.getString(4)));
                }
            }
        }
        List<ExamSource.Criterion> criteria = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT criterion_id, name, min_score, max_score FROM rubric_criteria"
                + " WHERE exam_id=? ORDER BY rowid")) {
            ps.setString(1, examId);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    criteria.add(new ExamSource.Criterion(rs.getString(1), rs.getString(2), rs.getInt(3), rs.getInt(4),
                            bands.getOrDefault(rs.getString(1), List.of())));
                }
            }
        }
        return new ExamSource.Rubric("results store", criteria);
    }

    /** For tests of the connection's settings, and the services beside this store (under its lock). */
    Connection connection() {
        return c;
    }

    public synchronized String examId() {
        return examId;
    }

    /** The exam's rubric as registered in the store. */
    public synchronized ExamSource.Rubric rubric() {
        return rubric;
    }

    // ---------------------------------------------------------------- raters

    /** A rater with the most responses they may take in this exam (null: no limit). */
    public record RaterEntry(String id, String label, Integer capacity) {
    }

    private static final String RATER_ID = "[A-Za-z0-9][A-Za-z0-9._-]{0,31}";

    /** Adds a rater, or changes the label and capacity of one already there; returns true when new. */
    public synchronized boolean addRater(String id, String label, Integer capacity) throws RatingException {
        if (id == null || !id.matches(RATER_ID)) {
            throw new RatingException("rater id '" + id + "' is not usable; use 1-32 letters, digits, '.', '_' or '-',"
                    + " starting with a letter or digit (e.g. R07)");
        }
        if (capacity != null && capacity < 0) {
            throw new RatingException("capacity " + capacity + " of rater " + id + " is negative; give 0 or more");
        }
        String name = label == null || label.isBlank() ? id : label.strip();
        return tx("adding rater " + id, () -> {
            boolean known = !query("SELECT 1 FROM raters WHERE rater_id=?", rs -> 1, id).isEmpty();
            update("INSERT INTO raters(rater_id, label, capacity) VALUES (?,?,?) ON CONFLICT(rater_id) DO UPDATE SET"
                    + " label=excluded.label, capacity=excluded.capacity", id, name, capacity);
            return !known;
        });
    }

    /** Every rater with label and capacity. */
    public synchronized List<RaterEntry> raterEntries() throws RatingException {
        return read("listing raters", () -> query("SELECT rater_id, label, capacity FROM raters ORDER BY rater_id",
                rs -> new RaterEntry(rs.getString(1), rs.getString(2), intOrNull(rs, 3))));
    }

    @Override
    public synchronized List<Rater> raters() throws RatingException {
        return raterEntries().stream().map(r -> new Rater(r.id(), r.label())).toList();
    }

    // ---------------------------------------------------------------- assignment

    /** What an assignment run did. */
    public record AssignmentOutcome(long runId, RatingAssigner.Plan plan, RaterLinks.Report wholeDesign) {
    }

    /** The exam's responses that no rater has been given yet. */
    public synchronized List<RatingAssigner.Response> unassignedResponses() throws RatingException {
        return read("listing responses", () -> query("SELECT r.sitting_id, r.task_id, s.candidate_number FROM responses r"
                + " JOIN sittings s ON s.sitting_id = r.sitting_id WHERE s.exam_id=? AND NOT EXISTS (SELECT 1 FROM"
                + " rating_assignments a WHERE a.sitting_id = r.sitting_id AND a.task_id = r.task_id)"
                + " ORDER BY r.sitting_id, r.task_id",
                rs -> new RatingAssigner.Response(rs.getLong(1), rs.getString(2), rs.getString(3)), examId));
    }

    /**
     * Assigns every response not yet assigned to {@code k} raters and stores the plan with fresh
     * blind ids. A design whose raters do not all link through shared responses is refused (nothing
     * stored) unless {@code allowUnlinked}; with k = 1 it is always unlinked and only warned about.
     */
    public synchronized AssignmentOutcome assign(int k, long seed, boolean allowUnlinked) throws RatingException {
        List<RatingAssigner.Response> todo = unassignedResponses();
        if (todo.isEmpty()) {
            throw new RatingException("every response of exam " + examId + " already has its raters; nothing to assign");
        }
        List<RaterEntry> raters = raterEntries();
        if (raters.isEmpty()) {
            throw new RatingException("no raters yet; add them first (rate raters add ID --label NAME)");
        }
        List<RatingAssigner.RaterCapacity> capacities = new ArrayList<>();
        Map<String, Integer> load = workloads();
        for (RaterEntry r : raters) {
            Integer left = r.capacity() == null ? null : Math.max(0, r.capacity() - load.getOrDefault(r.id(), 0));
            capacities.add(new RatingAssigner.RaterCapacity(r.id(), left));
        }
        Map<String, String> last = new HashMap<>();
        for (RaterEntry r : raters) {
            String c = read("reading queues", () -> lastOwnCandidate(r.id()));
            if (c != null) {
                last.put(r.id(), c);
            }
        }
        RatingAssigner.Plan plan = RatingAssigner.assign(todo, capacities, load, last, k, seed);
        return tx("storing the rating assignment", () -> {
            String now = clock.instant().toString();
            StringBuilder raterList = new StringBuilder();
            capacities.forEach(r -> raterList.append(raterList.isEmpty() ? "" : " ").append(r.raterId())
                    .append(r.capacity() == null ? "" : ":" + r.capacity()));
            long run = insert("INSERT INTO rating_runs(exam_id, seed, raters_per_response, raters, responses, linked,"
                    + " rater_groups, created_at) VALUES (?,?,?,?,?,?,?,?)", examId, seed, k, raterList.toString(),
                    todo.size(), plan.links().connected() ? 1 : 0, plan.links().components().toString(), now);
            Set<String> taken = new HashSet<>(query("SELECT blind_id FROM rating_assignments WHERE blind_id IS NOT NULL",
                    rs -> rs.getString(1)));
            Map<String, Integer> offset = new HashMap<>();
            for (String r : plan.workload().keySet()) {
                offset.put(r, nextPosition(r) - 1);
            }
            for (RatingAssigner.Placement p : plan.placements()) {
                update("INSERT INTO rating_assignments(sitting_id, task_id, rater_id, seed, created_at, run_id, blind_id,"
                        + " kind, queue_position) VALUES (?,?,?,?,?,?,?,'rating',?)", p.response().sittingId(),
                        p.response().taskId(), p.raterId(), seed, now, run, blindIds.next(taken),
                        offset.get(p.raterId()) + p.queuePosition());
            }
            RaterLinks.Report whole = designNow();
            if (k >= 2 && !whole.connected() && !allowUnlinked) {
                throw new SQLException(new RatingException("the raters would fall into " + whole.components().size()
                        + " groups that share no response " + whole.components() + "; a many-facet Rasch analysis"
                        + " could not put them on one scale. Add responses per rater (fewer raters), raise raters per"
                        + " response, change capacities, or accept the split with --allow-unlinked. Nothing was stored"));
            }
            return new AssignmentOutcome(run, plan, whole);
        });
    }

    /** The linking graph of the exam's whole rating design so far (first ratings and adjudications). */
    public synchronized RaterLinks.Report design() throws RatingException {
        return read("reading the rating design", this::designNow);
    }

    private RaterLinks.Report designNow() throws SQLException {
        {
            Map<String, List<String>> byResponse = new TreeMap<>();
            each("SELECT a.sitting_id || '/' || a.task_id, a.rater_id FROM rating_assignments a JOIN sittings s"
                    + " ON s.sitting_id = a.sitting_id WHERE s.exam_id=? AND " + NOT_CONTROL + " ORDER BY a.assignment_id",
                    rs -> byResponse.computeIfAbsent(rs.getString(1), x -> new ArrayList<>()).add(rs.getString(2)), examId);
            return RaterLinks.ofRaterSets(byResponse);
        }
    }

    private Map<String, Integer> workloads() throws RatingException {
        return read("counting workloads", () -> {
            Map<String, Integer> out = new HashMap<>();
            each("SELECT a.rater_id, COUNT(*) FROM rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id"
                    + " WHERE s.exam_id=? GROUP BY a.rater_id", rs -> out.put(rs.getString(1), rs.getInt(2)), examId);
            return out;
        });
    }

    private int nextPosition(String rater) throws SQLException {
        return query("SELECT COALESCE(MAX(a.queue_position), 0) + 1 FROM rating_assignments a JOIN sittings s"
                + " ON s.sitting_id = a.sitting_id WHERE a.rater_id=? AND s.exam_id=?", rs -> rs.getInt(1), rater, examId)
                .get(0);
    }

    // ---------------------------------------------------------------- the desk

    /** One assignment as the store knows it (not shown to raters beyond blind id, task and kind). */
    private record Assignment(long id, long sittingId, String taskId, String raterId, RatingDesk.Kind kind) {
    }

    private Assignment assignment(String raterId, String blindId) throws RatingException {
        List<Assignment> found = read("looking up " + blindId, () -> query("SELECT a.assignment_id, a.sitting_id, a.task_id,"
                + " a.rater_id, a.kind FROM rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id"
                + " WHERE a.blind_id=? AND s.exam_id=?", rs -> new Assignment(rs.getLong(1), rs.getLong(2),
                rs.getString(3), rs.getString(4), kind(rs.getString(5))), blindId, examId));
        if (found.isEmpty()) {
            throw new RatingException("unknown response id " + blindId + "; check it against the rater's queue");
        }
        Assignment a = found.get(0);
        if (raterId != null && !a.raterId().equals(raterId)) {
            throw new RatingException("response " + blindId + " is not in rater " + raterId + "'s queue");
        }
        return a;
    }

    /**
     * When the response behind a blind id was settled by a resolution entry, if it was: from then
     * on its final score is the test owner's, so no rating for it is taken.
     */
    public synchronized Optional<String> settledAt(String blindId) throws RatingException {
        return read("looking up " + blindId, () -> query("SELECT MAX(se.resolved_at) FROM rating_assignments a"
                + " JOIN sittings s ON s.sitting_id = a.sitting_id JOIN rating_flags sf ON sf.sitting_id = a.sitting_id"
                + " AND sf.task_id = a.task_id JOIN resolution_entries se ON se.flag_id = sf.flag_id"
                + " WHERE a.blind_id=? AND s.exam_id=?", rs -> rs.getString(1), blindId, examId))
                .stream().filter(java.util.Objects::nonNull).findFirst();
    }

    private void refuseIfSettled(String blindId) throws RatingException {
        Optional<String> at = settledAt(blindId);
        if (at.isPresent()) {
            throw new RatingException("response " + blindId + " was settled by the test owner's resolution entry ("
                    + at.get() + "); its final score is decided, so this rating is not taken and nothing was stored."
                    + " Go on with the next response in the queue");
        }
    }

    private static RatingDesk.Kind kind(String stored) {
        return "adjudication".equals(stored) ? RatingDesk.Kind.ADJUDICATION : RatingDesk.Kind.RATING;
    }

    private void requireRater(String raterId) throws RatingException {
        if (read("looking up rater", () -> query("SELECT 1 FROM raters WHERE rater_id=?", rs -> 1, raterId)).isEmpty()) {
            throw new RatingException("no rater " + raterId + "; the raters are " + raters().stream().map(Rater::id).toList());
        }
    }

    /** The rater whose queue holds a blind id, if the id exists in this exam (for the test owner's tools, never raters). */
    public synchronized Optional<String> raterOf(String blindId) throws RatingException {
        return read("looking up " + blindId, () -> query("SELECT a.rater_id FROM rating_assignments a JOIN sittings s"
                + " ON s.sitting_id = a.sitting_id WHERE a.blind_id=? AND s.exam_id=?", rs -> rs.getString(1), blindId, examId))
                .stream().findFirst();
    }

    /** The rater's latest submitted sheet for a response (drafts left out), if any. */
    public synchronized Optional<RatingSheet> submitted(String raterId, String blindId) throws RatingException {
        Assignment a = assignment(raterId, blindId);
        return read("reading the rating of " + blindId, () -> latest(a.id()).map(s -> new RatingSheet(s.scores(), s.comment())));
    }

    @Override
    public synchronized List<QueueItem> queue(String raterId) throws RatingException {
        requireRater(raterId);
        List<QueueItem> raw = read("reading the queue of " + raterId, () -> query("SELECT a.blind_id, a.task_id, a.kind,"
                + " EXISTS(SELECT 1 FROM rating_submissions x WHERE x.assignment_id = a.assignment_id)"
                + " FROM rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id"
                + " WHERE a.rater_id=? AND s.exam_id=? AND " + IN_QUEUE
                + " ORDER BY a.kind = 'adjudication', a.queue_position, a.assignment_id",
                rs -> new QueueItem(0, rs.getString(1), rs.getString(2), kind(rs.getString(3)), rs.getInt(4) == 1),
                raterId, examId));
        List<QueueItem> out = new ArrayList<>(raw.size());
        for (int i = 0; i < raw.size(); i++) {
            QueueItem q = raw.get(i);
            out.add(new QueueItem(i + 1, q.blindId(), q.taskId(), q.kind(), q.done()));
        }
        return out;
    }

    @Override
    public synchronized BlindResponse response(String raterId, String blindId) throws RatingException {
        Assignment a = assignment(raterId, blindId);
        return read("reading response " + blindId, () -> query("SELECT t.title, r.text, t.prompt FROM responses r JOIN sittings s"
                + " ON s.sitting_id = r.sitting_id JOIN tasks t ON t.exam_id = s.exam_id AND t.task_id = r.task_id"
                + " WHERE r.sitting_id=? AND r.task_id=?", rs -> new BlindResponse(blindId, a.taskId(), rs.getString(1),
                rs.getString(2), rs.getString(3)), a.sittingId(), a.taskId()).get(0));
    }

    @Override
    public synchronized ExamSource.Rubric rubric(String blindId) throws RatingException {
        assignment(null, blindId);
        return rubric;
    }

    @Override
    public synchronized Optional<RatingSheet> sheet(String raterId, String blindId) throws RatingException {
        Assignment a = assignment(raterId, blindId);
        return read("reading the sheet of " + blindId, () -> {
            List<RatingSheet> draft = query("SELECT scores_json, comment FROM rating_drafts WHERE assignment_id=?",
                    rs -> new RatingSheet(parse(rs.getString(1)), rs.getString(2)), a.id());
            if (!draft.isEmpty()) {
                return Optional.of(draft.get(0));
            }
            return latest(a.id()).map(s -> new RatingSheet(s.scores(), s.comment()));
        });
    }

    private record Submission(Map<String, Integer> scores, String comment) {
    }

    private Optional<Submission> latest(long assignment) throws SQLException {
        return query("SELECT scores_json, comment FROM rating_submissions WHERE assignment_id=? ORDER BY submission_id DESC"
                + " LIMIT 1", rs -> new Submission(parse(rs.getString(1)), rs.getString(2)), assignment).stream().findFirst();
    }

    @Override
    public synchronized void saveDraft(String raterId, String blindId, RatingSheet sheet) throws RatingException {
        Assignment a = assignment(raterId, blindId);
        refuseIfSettled(blindId);
        List<String> problems = check(sheet, false);
        if (!problems.isEmpty()) {
            throw new RatingException(blindId + ": " + String.join("; ", problems));
        }
        tx("saving the draft of " + blindId, () -> update("INSERT INTO rating_drafts(assignment_id, scores_json, comment,"
                + " saved_at) VALUES (?,?,?,?) ON CONFLICT(assignment_id) DO UPDATE SET scores_json=excluded.scores_json,"
                + " comment=excluded.comment, saved_at=excluded.saved_at", a.id(), json(sheet.scores()), sheet.comment(),
                clock.instant().toString()));
    }

    /** What is wrong with a sheet: unknown criteria, scores out of range, and (if complete) missing criteria. */
    public synchronized List<String> check(RatingSheet sheet, boolean complete) {
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

    @Override
    public synchronized void submit(String raterId, String blindId, RatingSheet sheet) throws RatingException {
        submitAll(raterId, Map.of(blindId, sheet), "desk");
    }

    /**
     * Submits several ratings of one rater in one transaction (all or none), e.g. from a rating
     * sheet; a rating identical to the current one (scores and comment) is left as it is, so a
     * repeated import adds nothing. Returns how many ratings were new or changed.
     */
    public synchronized int submitAll(String raterId, Map<String, RatingSheet> sheets, String via) throws RatingException {
        requireRater(raterId);
        Map<Assignment, RatingSheet> checked = new LinkedHashMap<>();
        for (Map.Entry<String, RatingSheet> e : sheets.entrySet()) {
            Assignment a = assignment(raterId, e.getKey());
            RatingSheet sent = e.getValue();
            boolean unchanged = read("reading the rating of " + e.getKey(), () -> latest(a.id())
                    .filter(l -> l.scores().equals(new TreeMap<>(sent.scores())) && l.comment().equals(sent.comment()))
                    .isPresent());
            if (!unchanged) {
                // the same rating sent again (a sheet imported twice) changes nothing and needs no refusal
                refuseIfSettled(e.getKey());
            }
            List<String> problems = check(e.getValue(), true);
            if (!problems.isEmpty()) {
                throw new RatingException(e.getKey() + ": " + String.join("; ", problems) + ". Nothing was stored");
            }
            checked.put(a, e.getValue());
        }
        return tx("storing ratings of " + raterId, () -> {
            int changed = 0;
            String now = clock.instant().toString();
            for (Map.Entry<Assignment, RatingSheet> e : checked.entrySet()) {
                Assignment a = e.getKey();
                RatingSheet s = e.getValue();
                Optional<Submission> current = latest(a.id());
                if (current.isPresent() && current.get().scores().equals(new TreeMap<>(s.scores()))
                        && current.get().comment().equals(s.comment())) {
                    update("DELETE FROM rating_drafts WHERE assignment_id=?", a.id());
                    continue;
                }
                long submission = insert("INSERT INTO rating_submissions(assignment_id, rater_id, scores_json, comment,"
                        + " submitted_at, via) VALUES (?,?,?,?,?,?)", a.id(), raterId, json(s.scores()), s.comment(), now, via);
                for (Map.Entry<String, Integer> sc : s.scores().entrySet()) {
                    update("INSERT INTO ratings(assignment_id, exam_id, criterion_id, score, rated_at, submission_id)"
                            + " VALUES (?,?,?,?,?,?) ON CONFLICT(assignment_id, criterion_id) DO UPDATE SET"
                            + " score=excluded.score, rated_at=excluded.rated_at, submission_id=excluded.submission_id",
                            a.id(), examId, sc.getKey(), sc.getValue(), now, submission);
                }
                update("DELETE FROM rating_drafts WHERE assignment_id=?", a.id());
                evaluate(a.sittingId(), a.taskId(), now);
                changed++;
            }
            return changed;
        });
    }

    @Override
    public synchronized Progress progress(String raterId) throws RatingException {
        requireRater(raterId);
        int[] p = new int[3];
        for (ProgressRow r : progressRows()) {
            if (r.raterId().equals(raterId)) {
                p[0] += r.total();
                p[1] += r.rated();
                p[2] += r.flagged();
            }
        }
        return new Progress(p[0], p[1], p[0] - p[1], p[2]);
    }

    /** Progress of one rater on one task: assigned, rated, remaining, and how many of them are flagged. */
    public record ProgressRow(String raterId, String taskId, int total, int rated, int remaining, int flagged) {
    }

    /** Progress per rater and task (raters with nothing assigned are left out). */
    public synchronized List<ProgressRow> progressRows() throws RatingException {
        return read("reading progress", () -> query("SELECT a.rater_id, a.task_id, COUNT(*),"
                + " SUM(EXISTS(SELECT 1 FROM rating_submissions x WHERE x.assignment_id = a.assignment_id)),"
                + " SUM(EXISTS(SELECT 1 FROM rating_flags f WHERE f.sitting_id = a.sitting_id AND f.task_id = a.task_id))"
                + " FROM rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id WHERE s.exam_id=?"
                + " AND " + IN_QUEUE + " GROUP BY a.rater_id, a.task_id ORDER BY a.rater_id, a.task_id",
                rs -> new ProgressRow(rs.getString(1), rs.getString(2), rs.getInt(3), rs.getInt(4), rs.getInt(3) - rs.getInt(4),
                        rs.getInt(5)), examId));
    }

    // ---------------------------------------------------------------- discrepancy, adjudication, final scores

    /** Sets the exam's discrepancy rule and applies it to every response whose ratings are complete. */
    public synchronized int setRule(DiscrepancyRule rule) throws RatingException {
        return tx("setting the discrepancy rule", () -> {
            String now = clock.instant().toString();
            insert("INSERT INTO discrepancy_rules(exam_id, max_criterion_band_gap, max_total_gap, adjudicated_score,"
                    + " set_at) VALUES (?,?,?,?,?)", examId, rule.maxCriterionBandGap(), rule.maxTotalGap(),
                    rule.adjudicatedScore().label(), now);
            return reviewAll(now);
        });
    }

    /** The rule in force (the latest set), if any. */
    public synchronized Optional<DiscrepancyRule> rule() throws RatingException {
        return read("reading the discrepancy rule", () -> currentRule().map(RuleRow::rule));
    }

    private record RuleRow(long id, DiscrepancyRule rule) {
    }

    private Optional<RuleRow> currentRule() throws SQLException {
        return query("SELECT rule_id, max_criterion_band_gap, max_total_gap, adjudicated_score FROM discrepancy_rules"
                + " WHERE exam_id=? ORDER BY rule_id DESC LIMIT 1", rs -> new RuleRow(rs.getLong(1), new DiscrepancyRule(
                intOrNull(rs, 2), intOrNull(rs, 3), DiscrepancyRule.AdjudicatedScore.of(rs.getString(4)))),
                examId).stream().findFirst();
    }

    /** Applies the rule to every response (flags, adjudicators, final scores); returns the number of flags raised now. */
    public synchronized int review() throws RatingException {
        return tx("reviewing ratings", () -> reviewAll(clock.instant().toString()));
    }

    private int reviewAll(String now) throws SQLException {
        int before = count("SELECT COUNT(*) FROM rating_flags f JOIN sittings s ON s.sitting_id = f.sitting_id"
                + " WHERE s.exam_id=?", examId);
        List<long[]> keys = new ArrayList<>();
        List<String> tasks = new ArrayList<>();
        each("SELECT DISTINCT a.sitting_id, a.task_id FROM rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id"
                + " WHERE s.exam_id=? ORDER BY a.sitting_id, a.task_id", rs -> {
                    keys.add(new long[] {rs.getLong(1)});
                    tasks.add(rs.getString(2));
                }, examId);
        for (int i = 0; i < keys.size(); i++) {
            evaluate(keys.get(i)[0], tasks.get(i), now);
        }
        return count("SELECT COUNT(*) FROM rating_flags f JOIN sittings s ON s.sitting_id = f.sitting_id"
                + " WHERE s.exam_id=?", examId) - before;
    }

    /** Flags the response if its complete first ratings break the rule, finds it an adjudicator, and updates its final score. */
    private void evaluate(long sittingId, String taskId, String now) throws SQLException {
        List<FinalScore.Submitted> ratings = new ArrayList<>();
        int expected = count("SELECT COUNT(*) FROM rating_assignments a WHERE a.sitting_id=? AND a.task_id=?"
                + " AND a.kind='rating' AND " + NOT_CONTROL,
                sittingId, taskId);
        each("SELECT a.rater_id, a.kind, (SELECT x.scores_json FROM rating_submissions x WHERE x.assignment_id ="
                + " a.assignment_id ORDER BY x.submission_id DESC LIMIT 1) FROM rating_assignments a"
                + " WHERE a.sitting_id=? AND a.task_id=? AND " + NOT_CONTROL + " ORDER BY a.assignment_id", rs -> {
                    if (rs.getString(3) != null) {
                        ratings.add(new FinalScore.Submitted(rs.getString(1), kind(rs.getString(2)), parse(rs.getString(3))));
                    }
                }, sittingId, taskId);
        List<Map<String, Integer>> first = ratings.stream().filter(r -> r.kind() == Kind.RATING)
                .map(FinalScore.Submitted::scores).toList();
        Optional<RuleRow> rule = currentRule();
        List<Long> flag = query("SELECT flag_id FROM rating_flags WHERE sitting_id=? AND task_id=?", rs -> rs.getLong(1),
                sittingId, taskId);
        if (flag.isEmpty() && rule.isPresent() && expected >= 2 && first.size() >= expected) {
            Optional<String> why = rule.get().rule().disagreement(first, rubric);
            if (why.isPresent()) {
                long id = insert("INSERT INTO rating_flags(sitting_id, task_id, rule_id, reason, flagged_at) VALUES (?,?,?,?,?)",
                        sittingId, taskId, rule.get().id(), why.get(), now);
                flag = List.of(id);
                assignAdjudicator(sittingId, taskId, now);
            }
        }
        boolean flagged = !flag.isEmpty();
        if (flagged && ratings.stream().noneMatch(r -> r.kind() == Kind.ADJUDICATION)
                && count("SELECT COUNT(*) FROM rating_assignments WHERE sitting_id=? AND task_id=? AND kind='adjudication'",
                        sittingId, taskId) == 0
                && count("SELECT COUNT(*) FROM resolution_entries WHERE flag_id=?", flag.get(0)) == 0) {
            assignAdjudicator(sittingId, taskId, now); // none was free when it was flagged; one may be now
        }
        Map<String, Integer> entry = new TreeMap<>();
        List<String> by = new ArrayList<>();
        if (flagged) {
            each("SELECT criterion_id, score, resolved_by FROM resolution_entries WHERE flag_id=?", rs -> {
                entry.put(rs.getString(1), rs.getInt(2));
                by.add(rs.getString(3));
            }, flag.get(0));
        }
        DiscrepancyRule.AdjudicatedScore how = rule.map(r -> r.rule().adjudicatedScore())
                .orElse(DiscrepancyRule.AdjudicatedScore.CLOSEST_PAIR_MEAN);
        Optional<FinalScore.Result> result = FinalScore.of(ratings, Math.max(1, expected), flagged,
                entry.isEmpty() ? Optional.empty() : Optional.of(entry), by.isEmpty() ? "" : by.get(0), how);
        update("DELETE FROM final_scores WHERE sitting_id=? AND task_id=?", sittingId, taskId);
        if (result.isPresent()) {
            Long ruleId = flagged ? query("SELECT rule_id FROM rating_flags WHERE flag_id=?", rs -> rs.getLong(1),
                    flag.get(0)).get(0) : rule.map(RuleRow::id).orElse(null);
            for (Map.Entry<String, Double> e : result.get().scores().entrySet()) {
                update("INSERT INTO final_scores(sitting_id, task_id, criterion_id, score, method, rule_id, basis, decided_at)"
                        + " VALUES (?,?,?,?,?,?,?,?)", sittingId, taskId, e.getKey(), e.getValue(), result.get().method(),
                        ruleId, String.join(" ", result.get().basis()), now);
            }
        }
    }

    /**
     * A third rater for a flagged response, by the assignment's balancing: not one of its raters,
     * capacity left, the smallest workload in this exam; among equals one whose queue does not end
     * with the same candidate; remaining ties broken at random from the run's seed and the response,
     * so a review repeated on a copy of the store picks the same rater.
     */
    private void assignAdjudicator(long sittingId, String taskId, String now) throws SQLException {
        Set<String> already = new HashSet<>(query("SELECT rater_id FROM rating_assignments WHERE sitting_id=? AND task_id=?",
                rs -> rs.getString(1), sittingId, taskId));
        if (loadInTx == null) {
            loadInTx = new HashMap<>();
            each("SELECT a.rater_id, COUNT(*) FROM rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id"
                    + " WHERE s.exam_id=? GROUP BY a.rater_id", rs -> loadInTx.put(rs.getString(1), rs.getInt(2)), examId);
        }
        Map<String, Integer> load = loadInTx;
        long seed = query("SELECT COALESCE(MAX(seed), 0) FROM rating_assignments WHERE sitting_id=? AND task_id=?",
                rs -> rs.getLong(1), sittingId, taskId).get(0);
        Random rng = new Random(seed * 31 + sittingId * 1_000_003L + taskId.hashCode());
        String candidate = query("SELECT candidate_number FROM sittings WHERE sitting_id=?", rs -> rs.getString(1),
                sittingId).get(0);
        List<String> eligible = new ArrayList<>();
        int least = Integer.MAX_VALUE;
        for (RaterEntry r : query("SELECT rater_id, label, capacity FROM raters ORDER BY rater_id",
                rs -> new RaterEntry(rs.getString(1), rs.getString(2), intOrNull(rs, 3)))) {
            int l = load.getOrDefault(r.id(), 0);
            if (already.contains(r.id()) || r.capacity() != null && l >= r.capacity()) {
                continue;
            }
            eligible.add(r.id());
            least = Math.min(least, l);
        }
        String best = null;
        long bestKey = Long.MAX_VALUE;
        for (String r : eligible) {
            if (load.getOrDefault(r, 0) != least) {
                continue;
            }
            // among the least loaded, a rater whose queue would end with this candidate's other response is
            // passed over (common practice against the halo effect); then a seeded random choice
            int adjacent = candidate.equals(lastCandidateInTx(r)) ? 1 : 0;
            long key = ((long) adjacent << 20) + rng.nextInt(1 << 20);
            if (key < bestKey) {
                bestKey = key;
                best = r;
            }
        }
        if (best == null) {
            return; // stays in the adjudication queue without a rater: flags() says so, and a resolution entry settles it
        }
        String blind;
        do {
            blind = blindIds.next(new HashSet<>());
        } while (!query("SELECT 1 FROM rating_assignments WHERE blind_id=?", rs -> 1, blind).isEmpty());
        update("INSERT INTO rating_assignments(sitting_id, task_id, rater_id, seed, created_at, run_id, blind_id, kind,"
                + " queue_position) VALUES (?,?,?,?,?,NULL,?,'adjudication',?)", sittingId, taskId, best, seed, now,
                blind, nextPositionInTx(best));
        load.merge(best, 1, Integer::sum);
        // the new item is now the end of that rater's queue
        lastCandidateInTx(best);
        tailInTx.put(best, Optional.of(candidate));
        nextPositionInTx.merge(best, 1, Integer::sum);
    }

    /**
     * {@link #lastCandidate} remembered for the rest of the transaction: a review of thousands of
     * flags would otherwise sort a rater's whole queue for every flag. Only
     * {@link #assignAdjudicator} adds to queues while a review runs, and it keeps this up to date.
     */
    private String lastCandidateInTx(String rater) throws SQLException {
        if (tailInTx == null) {
            tailInTx = new HashMap<>();
        }
        Optional<String> tail = tailInTx.get(rater);
        if (tail == null) {
            tail = Optional.ofNullable(lastCandidate(rater));
            tailInTx.put(rater, tail);
        }
        return tail.orElse(null);
    }

    /** {@link #nextPosition} remembered for the rest of the transaction, like {@link #lastCandidateInTx}. */
    private int nextPositionInTx(String rater) throws SQLException {
        if (nextPositionInTx == null) {
            nextPositionInTx = new HashMap<>();
        }
        Integer next = nextPositionInTx.get(rater);
        if (next == null) {
            next = nextPosition(rater);
            nextPositionInTx.put(rater, next);
        }
        return next;
    }

    /** The candidate behind the last item of a rater's queue in this exam, or null for an empty queue. */
    private String lastCandidate(String rater) throws SQLException {
        return query("SELECT s.candidate_number FROM rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id"
                + " WHERE a.rater_id=? AND s.exam_id=? ORDER BY a.kind = 'adjudication' DESC, a.queue_position DESC"
                + " LIMIT 1", rs -> rs.getString(1), rater, examId).stream().findFirst().orElse(null);
    }

    /** The candidate behind the last first-rating item of a rater's queue (new first ratings go after it). */
    private String lastOwnCandidate(String rater) throws SQLException {
        return query("SELECT s.candidate_number FROM rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id"
                + " WHERE a.rater_id=? AND s.exam_id=? AND a.kind = 'rating' ORDER BY a.queue_position DESC LIMIT 1",
                rs -> rs.getString(1), rater, examId).stream().findFirst().orElse(null);
    }

    /** A flagged response in the adjudication queue (no candidate data: task, raters' blind ids and the reason). */
    public record Flag(long flagId, String taskId, String reason, String flaggedAt, List<String> raters,
            String adjudicator, String adjudicatorBlindId, boolean adjudicated, String finalMethod) {
        /** Where the flag stands, in words. */
        public String status() {
            if (finalMethod != null) {
                return "settled (" + finalMethod + ")";
            }
            if (adjudicator == null) {
                return "no adjudicator available: add a rater with capacity and run rate flags again, or enter a"
                        + " resolution (rate resolve)";
            }
            return adjudicated ? "adjudicated" : "awaiting adjudicator " + adjudicator + " (" + adjudicatorBlindId + ")";
        }
    }

    /** The adjudication queue: every flagged response with its state. */
    public synchronized List<Flag> flags() throws RatingException {
        return read("listing flags", () -> query("SELECT f.flag_id, f.task_id, f.reason, f.flagged_at,"
                + " (SELECT group_concat(a.rater_id, ' ') FROM rating_assignments a WHERE a.sitting_id = f.sitting_id"
                + "   AND a.task_id = f.task_id AND a.kind = 'rating' AND " + NOT_CONTROL + "),"
                + " (SELECT a.rater_id FROM rating_assignments a WHERE a.sitting_id = f.sitting_id AND a.task_id = f.task_id"
                + "   AND a.kind = 'adjudication' ORDER BY a.assignment_id DESC LIMIT 1),"
                + " (SELECT a.blind_id FROM rating_assignments a WHERE a.sitting_id = f.sitting_id AND a.task_id = f.task_id"
                + "   AND a.kind = 'adjudication' ORDER BY a.assignment_id DESC LIMIT 1),"
                + " EXISTS(SELECT 1 FROM rating_assignments a JOIN rating_submissions x ON x.assignment_id = a.assignment_id"
                + "   WHERE a.sitting_id = f.sitting_id AND a.task_id = f.task_id AND a.kind = 'adjudication'),"
                + " (SELECT method FROM final_scores fs WHERE fs.sitting_id = f.sitting_id AND fs.task_id = f.task_id LIMIT 1)"
                + " FROM rating_flags f JOIN sittings s ON s.sitting_id = f.sitting_id WHERE s.exam_id=? ORDER BY f.flag_id",
                rs -> new Flag(rs.getLong(1), rs.getString(2), rs.getString(3), rs.getString(4),
                        List.of(rs.getString(5).split(" ")), rs.getString(6), rs.getString(7), rs.getInt(8) == 1,
                        rs.getString(9)), examId));
    }

    /**
     * Settles a flagged response by a resolution entry (e.g. agreed in discussion): the given scores
     * become its final score, with who and when; the raters' ratings stay as they were.
     */
    public synchronized void resolve(long flagId, String resolvedBy, Map<String, Integer> scores, String comment)
            throws RatingException {
        if (resolvedBy == null || resolvedBy.isBlank()) {
            throw new RatingException("say who resolved the response (--by NAME)");
        }
        List<String> problems = check(new RatingSheet(scores, comment), true);
        if (!problems.isEmpty()) {
            throw new RatingException("flag " + flagId + ": " + String.join("; ", problems) + ". Nothing was stored");
        }
        tx("storing the resolution of flag " + flagId, () -> {
            List<Object[]> f = query("SELECT f.sitting_id, f.task_id FROM rating_flags f JOIN sittings s"
                    + " ON s.sitting_id = f.sitting_id WHERE f.flag_id=? AND s.exam_id=?",
                    rs -> new Object[] {rs.getLong(1), rs.getString(2)}, flagId, examId);
            if (f.isEmpty()) {
                throw new SQLException(new RatingException("no flag " + flagId + " in exam " + examId
                        + "; list the flags with rate flags"));
            }
            String now = clock.instant().toString();
            update("DELETE FROM resolution_entries WHERE flag_id=?", flagId);
            for (Map.Entry<String, Integer> e : scores.entrySet()) {
                update("INSERT INTO resolution_entries(flag_id, criterion_id, score, resolved_by, comment, resolved_at)"
                        + " VALUES (?,?,?,?,?,?)", flagId, e.getKey(), e.getValue(), resolvedBy.strip(),
                        comment == null ? "" : comment, now);
            }
            evaluate((Long) f.get(0)[0], (String) f.get(0)[1], now);
            return null;
        });
    }

    // ---------------------------------------------------------------- exports

    /** One current rating in the analysis's tidy long form, with who and when. */
    public record RatingRow(String candidate, String level, String form, String task, String condition, String rater,
            String criterion, int score, String kind, String ratedAt) {
    }

    /** Every current rating of the exam (first ratings and adjudications), ordered by candidate, task, rater, criterion. */
    public synchronized void forEachRating(Consumer<RatingRow> sink) throws RatingException {
        read("reading ratings", () -> {
            each("SELECT s.candidate_number, COALESCE(c.level, ''), s.form_id, a.task_id, r.condition_id, a.rater_id,"
                    + " g.criterion_id, g.score, a.kind, g.rated_at FROM ratings g"
                    + " JOIN rating_assignments a ON a.assignment_id = g.assignment_id"
                    + " JOIN sittings s ON s.sitting_id = a.sitting_id"
                    + " JOIN responses r ON r.sitting_id = a.sitting_id AND r.task_id = a.task_id"
                    + " LEFT JOIN candidates c ON c.exam_id = s.exam_id AND c.candidate_number = s.candidate_number"
                    + " WHERE s.exam_id=? AND " + NOT_CONTROL
                    + " ORDER BY s.candidate_number, a.task_id, s.sitting_id, a.rater_id, g.criterion_id",
                    rs -> sink.accept(new RatingRow(rs.getString(1), rs.getString(2), rs.getString(3), rs.getString(4),
                            rs.getString(5), rs.getString(6), rs.getString(7), rs.getInt(8), rs.getString(9),
                            rs.getString(10))), examId);
            return null;
        });
    }

    /**
     * The study design the exam's bundle declared ({@code crossover}, {@code latin-square},
     * {@code parallel}), or empty when its bundle predates recorded designs.
     */
    public synchronized String studyDesign() throws RatingException {
        return read("reading the exam's design", () -> {
            String[] design = {""};
            each("SELECT COALESCE(design, '') FROM exams WHERE exam_id=?", rs -> design[0] = rs.getString(1), examId);
            return design[0];
        });
    }

    /** One final score of one criterion of one response, and how it was reached. */
    public record FinalRow(String candidate, String level, String form, String task, String condition, String criterion,
            double score, String method, String rule, String basis, String decidedAt) {
    }

    /** Every final score of the exam; responses still pending have none. */
    public synchronized void forEachFinalScore(Consumer<FinalRow> sink) throws RatingException {
        read("reading final scores", () -> {
            each("SELECT s.candidate_number, COALESCE(c.level, ''), s.form_id, f.task_id, r.condition_id, f.criterion_id,"
                    + " f.score, f.method, d.max_criterion_band_gap, d.max_total_gap, d.adjudicated_score, f.basis,"
                    + " f.decided_at, f.rule_id FROM final_scores f JOIN sittings s ON s.sitting_id = f.sitting_id"
                    + " JOIN responses r ON r.sitting_id = f.sitting_id AND r.task_id = f.task_id"
                    + " LEFT JOIN discrepancy_rules d ON d.rule_id = f.rule_id"
                    + " LEFT JOIN candidates c ON c.exam_id = s.exam_id AND c.candidate_number = s.candidate_number"
                    + " WHERE s.exam_id=? ORDER BY s.candidate_number, f.task_id, s.sitting_id, f.criterion_id",
                    rs -> sink.accept(new FinalRow(rs.getString(1), rs.getString(2), rs.getString(3), rs.getString(4),
                            rs.getString(5), rs.getString(6), rs.getDouble(7), rs.getString(8), rs.getObject(14) == null
                            ? "none" : new DiscrepancyRule(intOrNull(rs, 9), intOrNull(rs, 10),
                            DiscrepancyRule.AdjudicatedScore.of(rs.getString(11))).describe(), rs.getString(12),
                            rs.getString(13))), examId);
            return null;
        });
    }

    /**
     * The current ratings and final scores of every rated response of the exam, by sitting and task
     * (the QTI results export writes them per response package).
     */
    public synchronized Map<ResponseScores.Key, ResponseScores> scoresByResponse() throws RatingException {
        return read("reading scores", () -> {
            Map<ResponseScores.Key, Map<String, Map<String, Integer>>> ratings = new java.util.LinkedHashMap<>();
            Map<ResponseScores.Key, Map<String, RatingDesk.Kind>> kinds = new HashMap<>();
            each("SELECT a.sitting_id, a.task_id, a.rater_id, a.kind, g.criterion_id, g.score FROM ratings g"
                    + " JOIN rating_assignments a ON a.assignment_id = g.assignment_id"
                    + " JOIN sittings s ON s.sitting_id = a.sitting_id WHERE s.exam_id=? AND " + NOT_CONTROL
                    + " ORDER BY a.sitting_id, a.task_id, a.kind DESC, a.rater_id, g.criterion_id", rs -> {
                        var key = new ResponseScores.Key(rs.getLong(1), rs.getString(2));
                        ratings.computeIfAbsent(key, k -> new java.util.LinkedHashMap<>())
                                .computeIfAbsent(rs.getString(3), k -> new TreeMap<>()).put(rs.getString(5), rs.getInt(6));
                        kinds.computeIfAbsent(key, k -> new HashMap<>()).put(rs.getString(3), kind(rs.getString(4)));
                    }, examId);
            Map<ResponseScores.Key, Map<String, Double>> finals = new HashMap<>();
            Map<ResponseScores.Key, String> methods = new HashMap<>();
            each("SELECT f.sitting_id, f.task_id, f.criterion_id, f.score, f.method FROM final_scores f"
                    + " JOIN sittings s ON s.sitting_id = f.sitting_id WHERE s.exam_id=?", rs -> {
                        var key = new ResponseScores.Key(rs.getLong(1), rs.getString(2));
                        finals.computeIfAbsent(key, k -> new TreeMap<>()).put(rs.getString(3), rs.getDouble(4));
                        methods.put(key, rs.getString(5));
                    }, examId);
            Map<ResponseScores.Key, ResponseScores> out = new java.util.LinkedHashMap<>();
            java.util.Set<ResponseScores.Key> keys = new java.util.LinkedHashSet<>(ratings.keySet());
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

    /** Whether the store holds a rubric for the exam, the precondition of {@link #open}; false when there is no store. */
    public static boolean hasRubric(Path file, String examId) throws RatingException {
        if (!Files.isRegularFile(file)) {
            return false;
        }
        try (Connection c = org.inkgate.admin.core.store.ReadOnlyStore.writable(file)
                ? DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath())
                : org.inkgate.admin.core.store.ReadOnlyStore.connect(file)) {
            return !query(c, "SELECT 1 FROM sqlite_master WHERE type='table' AND name='rubric_criteria'", rs -> 1).isEmpty()
                    && !query(c, "SELECT 1 FROM rubric_criteria WHERE exam_id=? LIMIT 1", rs -> 1, examId).isEmpty();
        } catch (SQLException e) {
            throw new RatingException("cannot read the results store " + file + ": " + e.getMessage(), e);
        }
    }

    /** Responses with a rating assignment but no final score yet. */
    public synchronized int pendingResponses() throws RatingException {
        return read("counting pending responses", () -> count("SELECT COUNT(*) FROM (SELECT DISTINCT a.sitting_id, a.task_id"
                + " FROM rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id WHERE s.exam_id=? AND NOT EXISTS"
                + " (SELECT 1 FROM final_scores f WHERE f.sitting_id = a.sitting_id AND f.task_id = a.task_id))", examId));
    }

    /** The submission history of one assignment (every submission, oldest first): for audits and tests. */
    public record HistoryEntry(String raterId, Map<String, Integer> scores, String comment, String submittedAt, String via) {
    }

    public synchronized List<HistoryEntry> history(String blindId) throws RatingException {
        Assignment a = assignment(null, blindId);
        return read("reading history", () -> query("SELECT rater_id, scores_json, comment, submitted_at, via FROM"
                + " rating_submissions WHERE assignment_id=? ORDER BY submission_id", rs -> new HistoryEntry(rs.getString(1),
                parse(rs.getString(2)), rs.getString(3), rs.getString(4), rs.getString(5)), a.id()));
    }

    // ---------------------------------------------------------------- referrals

    @Override
    public synchronized long refer(String raterId, String blindId, Referrals.Reason reason, String note)
            throws RatingException {
        Assignment a = assignment(raterId, blindId);
        if (note == null || note.isBlank()) {
            throw new RatingException("say what you saw in " + blindId + " (a note is needed with every referral);"
                    + " nothing was stored");
        }
        return tx("storing the referral of " + blindId, () -> insert("INSERT INTO referrals(assignment_id, rater_id,"
                + " reason, note, referred_at) VALUES (?,?,?,?,?)", a.id(), raterId, reason.word(), note.strip(),
                clock.instant().toString()));
    }

    @Override
    public synchronized List<Referrals.Referral> referrals(boolean openOnly) throws RatingException {
        return read("listing referrals", () -> query("SELECT x.referral_id, a.blind_id, a.task_id, s.candidate_number,"
                + " x.rater_id, x.reason, x.note, x.referred_at, x.decision, x.decided_by, x.decided_at FROM referrals x"
                + " JOIN rating_assignments a ON a.assignment_id = x.assignment_id JOIN sittings s"
                + " ON s.sitting_id = a.sitting_id WHERE s.exam_id=?" + (openOnly ? " AND x.decision IS NULL" : "")
                + " ORDER BY x.referral_id", rs -> new Referrals.Referral(rs.getLong(1), rs.getString(2), rs.getString(3),
                rs.getString(4), rs.getString(5), Referrals.Reason.valueOf(rs.getString(6).toUpperCase(java.util.Locale.ROOT)
                .replace('-', '_')), rs.getString(7), rs.getString(8), rs.getString(9), rs.getString(10),
                rs.getString(11)), examId));
    }

    @Override
    public synchronized void decide(long referralId, String decidedBy, String decision) throws RatingException {
        if (decidedBy == null || decidedBy.isBlank() || decision == null || decision.isBlank()) {
            throw new RatingException("say who decided (--by NAME) and what (--decision TEXT); nothing was stored");
        }
        tx("storing the decision on referral " + referralId, () -> {
            int n = update("UPDATE referrals SET decision=?, decided_by=?, decided_at=? WHERE referral_id=? AND"
                    + " assignment_id IN (SELECT a.assignment_id FROM rating_assignments a JOIN sittings s"
                    + " ON s.sitting_id = a.sitting_id WHERE s.exam_id=?)", decision.strip(), decidedBy.strip(),
                    clock.instant().toString(), referralId, examId);
            if (n == 0) {
                throw new SQLException(new RatingException("no referral " + referralId + " in exam " + examId
                        + "; list them with rate referrals list"));
            }
            return null;
        });
    }

    // ---------------------------------------------------------------- for the services beside this store

    /** Runs {@code work} in one transaction of this store (callers hold the store's lock). */
    <T> T inTransaction(String what, Work<T> work) throws RatingException {
        return tx(what, work);
    }

    /** Runs a read of this store (callers hold the store's lock). */
    <T> T reading(String what, Work<T> work) throws RatingException {
        return read(what, work);
    }

    Clock clock() {
        return clock;
    }

    BlindIds blindIds() {
        return blindIds;
    }

    @Override
    public synchronized void close() throws RatingException {
        try {
            c.close();
        } catch (SQLException e) {
            throw new RatingException("closing the results store failed: " + e.getMessage(), e);
        }
    }

    // ---------------------------------------------------------------- JDBC helpers

    private static Integer intOrNull(ResultSet rs, int column) throws SQLException {
        int v = rs.getInt(column);
        return rs.wasNull() ? null : v;
    }

    private static String json(Map<String, Integer> scores) {
        try {
            return JSON.writeValueAsString(new TreeMap<>(scores));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    private static Map<String, Integer> parse(String json) throws SQLException {
        try {
            return JSON.readValue(json, SCORES);
        } catch (JsonProcessingException e) {
            throw new SQLException("stored scores are not JSON; the store may be damaged: " + e.getMessage(), e);
        }
    }

    interface Work<T> {
        T run() throws SQLException;
    }

    /** Workloads per rater, counted once per transaction that assigns adjudicators (null outside). */
    private Map<String, Integer> loadInTx;
    private Map<String, Optional<String>> tailInTx;
    private Map<String, Integer> nextPositionInTx;

    private <T> T tx(String what, Work<T> work) throws RatingException {
        loadInTx = null;
        tailInTx = null;
        nextPositionInTx = null;
        try {
            c.setAutoCommit(false);
            try {
                T result = work.run();
                c.commit();
                return result;
            } catch (SQLException | RuntimeException e) {
                c.rollback();
                throw e;
            } finally {
                loadInTx = null;
                tailInTx = null;
                nextPositionInTx = null;
                c.setAutoCommit(true);
            }
        } catch (SQLException e) {
            if (e.getCause() instanceof RatingException r) {
                throw r;
            }
            throw new RatingException(what + " failed; nothing of it was stored: " + e.getMessage(), e);
        }
    }

    private <T> T read(String what, Work<T> work) throws RatingException {
        try {
            return work.run();
        } catch (SQLException e) {
            throw new RatingException(what + " failed: " + e.getMessage(), e);
        }
    }

    private int update(String sql, Object... args) throws SQLException {
        return Sql.update(c, sql, args);
    }

    private long insert(String sql, Object... args) throws SQLException {
        return Sql.insert(c, sql, args);
    }

    private int count(String sql, Object... args) throws SQLException {
        return query(sql, rs -> rs.getInt(1), args).get(0);
    }

    private <T> List<T> query(String sql, RowMapper<T> mapper, Object... args) throws SQLException {
        return Sql.list(c, sql, mapper, args);
    }

    private static <T> List<T> query(Connection c, String sql, RowMapper<T> mapper, Object... args) throws SQLException {
        return Sql.list(c, sql, mapper, args);
    }

    private void each(String sql, RowSink sink, Object... args) throws SQLException {
        Sql.each(c, sql, sink, args);
    }
}
