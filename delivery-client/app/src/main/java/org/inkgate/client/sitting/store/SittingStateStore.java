package org.inkgate.client.sitting.store;

import com.fasterxml.jackson.core.type.TypeReference;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.inkgate.format.json.Json;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.TaskResponse.EndReason;
import org.inkgate.format.response.ToolUse;
import org.inkgate.packs.policy.Tool;
import org.sqlite.SQLiteConfig;

/**
 * The sitting's durable state in its database: the {@code sitting} row (who, which bundle, the
 * screen and task on show, timers, submission), the {@code tasks} rows (times, end, final text,
 * tool use) and the {@code answers} to questionnaires. Every SQL statement of the sitting is here,
 * behind a named method; the layout is in docs/formats.md ("The local sitting database").
 *
 * <p>Each write is one change queued on the process log's writer ({@link SqliteProcessLog#persist}),
 * so it commits in order with the events recorded before it and never half-applied: what one
 * method writes lands in one transaction, which is what recovery relies on after a kill. Reads
 * wait until everything queued before them is committed. Only {@link #readSummary} opens a
 * database of its own, for recovery before any log is opened.
 */
public final class SittingStateStore {

    /** What a new sitting's row holds. */
    public record SittingSetup(String sittingId, String bundleSha256, String bundleFile, String examId, String candidate,
            String formId, String seat, int extraPercent, Instant startedAt, String clientVersion, Optional<Path> outputFolder) {
    }

    /** One task of the form as the sitting begins: its place and condition, and its policy as JSON. */
    public record PlannedTask(String taskId, int order, String conditionId, String policyJson) {
    }

    /** A task's timer at a checkpoint: time used, time added, and the warnings already given (minutes left). */
    public record TaskTimes(String taskId, long usedMillis, long addedMillis, Set<Integer> warned) {
    }

    /** The sitting timer and every task timer at one moment. */
    public record TimerCheckpoint(Instant at, long sittingUsedMillis, long sittingAddedMillis, boolean paused,
            List<TaskTimes> tasks) {
    }

    /** A task as stored: its timer, and when and why it began and ended (empty when it has not). */
    public record StoredTask(String taskId, long usedMillis, long addedMillis, Set<Integer> warned, Optional<Instant> startedAt,
            Optional<Instant> endedAt, Optional<EndReason> endReason) {
    }

    /** What a sitting resumed after a restart reads back; {@code tasks} by task id. */
    public record StoredSitting(String seat, int extraPercent, Instant startedAt, long sittingUsedMillis,
            long sittingAddedMillis, SittingScreen screen, Optional<String> currentTask, boolean paused,
            Optional<String> packageId, Optional<Path> localCopy, SittingStatus status, String clientVersion,
            Map<String, StoredTask> tasks) {
    }

    /** An ended task as the response carries it; {@code finalText} is empty for a task never begun. */
    public record TaskOutcome(String taskId, String finalText, int wordCount, Map<Tool, ToolUse> toolUse,
            Optional<Instant> startedAt, Optional<Instant> endedAt, EndReason endReason, long addedMillis) {
    }

    /** Everything stored for the response: the tasks in form order and the answers by questionnaire and item. */
    public record StoredResponses(List<TaskOutcome> tasks, Map<String, Map<String, String>> answers) {
    }

    /** The newest text snapshot of a task: it reflects every event up to {@code afterSeq}. */
    public record StoredSnapshot(String text, int caret, long afterSeq) {
    }

    /** What recovery rebuilds a task's text from: its newest snapshot and all its events, read together. */
    public record TaskLog(Optional<StoredSnapshot> snapshot, List<ProcessEvent> events) {
    }

    /** What the recovery scan reads from a sitting database before any log is opened. */
    public record SittingSummary(String sittingId, String bundleSha256, String bundleFile, String examId, String candidate,
            String formId, Optional<String> currentTask, SittingScreen screen, SittingStatus status, Instant checkpointAt,
            Optional<Instant> lastEventAt, boolean paused, Optional<Path> outputFolder) {
    }

    private final SqliteProcessLog log;

    /** The state store of the sitting whose log this is; it writes through the log's writer thread. */
    public SittingStateStore(SqliteProcessLog log) {
        this.log = Objects.requireNonNull(log, "log");
    }

    // -- writes, each one queued change --

    /** Writes the new sitting's row (status in progress, no screen or task yet) and its tasks, together. */
    public void createSitting(SittingSetup setup, List<PlannedTask> tasks) {
        List<PlannedTask> planned = List.copyOf(tasks);
        log.persist(c -> {
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO sitting(id, sitting_id, bundle_sha256, bundle_file, exam_id,"
                    + " candidate, form_id, seat, extra_percent, started_at, status, checkpoint_at, client_version, screen,"
                    + " current_task, output_folder) VALUES (1, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, '', NULL, ?)")) {
                ps.setString(1, setup.sittingId());
                ps.setString(2, setup.bundleSha256());
                ps.setString(3, setup.bundleFile());
                ps.setString(4, setup.examId());
                ps.setString(5, setup.candidate());
                ps.setString(6, setup.formId());
                ps.setString(7, setup.seat());
                ps.setInt(8, setup.extraPercent());
                ps.setString(9, setup.startedAt().toString());
                ps.setString(10, SittingStatus.IN_PROGRESS.wireName());
                ps.setString(11, setup.startedAt().toString());
                ps.setString(12, setup.clientVersion());
                ps.setString(13, setup.outputFolder().map(p -> p.toAbsolutePath().toString()).orElse(null));
                ps.executeUpdate();
            }
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO tasks(task_id, ord, condition_id, policy) VALUES (?, ?, ?, ?)")) {
                for (PlannedTask t : planned) {
                    ps.setString(1, t.taskId());
                    ps.setInt(2, t.order());
                    ps.setString(3, t.conditionId());
                    ps.setString(4, t.policyJson());
                    ps.executeUpdate();
                }
            }
        });
    }

    /** Remembers the screen shown, so recovery returns to it. */
    public void saveScreen(SittingScreen screen) {
        String name = screen.wireName();
        log.persist(c -> update(c, "UPDATE sitting SET screen = ? WHERE id = 1", name));
    }

    /** Marks a task begun (its first entry; a re-entry after a restart keeps the first time). */
    public void markTaskStarted(String taskId, Instant at) {
        log.persist(c -> update(c, "UPDATE tasks SET started_at = ? WHERE task_id = ?", at.toString(), taskId));
    }

    /** Remembers the task on screen. */
    public void saveCurrentTask(String taskId) {
        log.persist(c -> update(c, "UPDATE sitting SET current_task = ? WHERE id = 1", taskId));
    }

    /**
     * Stores a task's end (time, reason, final text, word count, tool use, time used) and clears
     * the task on screen, in one change: recovery never sees an ended task still on screen.
     */
    public void saveTaskEnd(String taskId, Instant at, EndReason reason, String finalText, int wordCount,
            Map<Tool, ToolUse> toolUse, long usedMillis) {
        Map<String, ToolUse> byName = new TreeMap<>();
        toolUse.forEach((tool, use) -> byName.put(tool.name(), use));
        String useJson = new String(Json.writeLine(byName), StandardCharsets.UTF_8);
        log.persist(c -> {
            try (PreparedStatement ps = c.prepareStatement("UPDATE tasks SET ended_at = ?, end_reason = ?, final_text = ?,"
                    + " word_count = ?, tool_use = ?, used_ms = ? WHERE task_id = ?")) {
                ps.setString(1, at.toString());
                ps.setString(2, reason.name());
                ps.setString(3, finalText);
                ps.setInt(4, wordCount);
                ps.setString(5, useJson);
                ps.setLong(6, usedMillis);
                ps.setString(7, taskId);
                ps.executeUpdate();
            }
            update(c, "UPDATE sitting SET current_task = NULL WHERE id = 1");
        });
    }

    /** Stores the end of a task never begun: empty text, no words, no tool use. */
    public void saveUnstartedTaskEnd(String taskId, Instant at, EndReason reason) {
        log.persist(c -> update(c, "UPDATE tasks SET ended_at = ?, end_reason = ?, final_text = '', word_count = 0,"
                + " tool_use = '{}' WHERE task_id = ?", at.toString(), reason.name(), taskId));
    }

    /** Stores a questionnaire answer, replacing an earlier answer to the same item. */
    public void saveAnswer(String questionnaireId, String itemId, String value) {
        log.persist(c -> update(c, "INSERT OR REPLACE INTO answers(questionnaire_id, item_id, value) VALUES (?, ?, ?)",
                questionnaireId, itemId, value));
    }

    /** Stores every timer's state in one change, so a restart finds sitting and task timers from the same moment. */
    public void saveTimers(TimerCheckpoint checkpoint) {
        List<Object[]> taskRows = checkpoint.tasks().stream().map(t -> new Object[] {t.usedMillis(), t.addedMillis(),
                t.warned().stream().sorted().map(String::valueOf).collect(Collectors.joining(",")), t.taskId()}).toList();
        log.persist(c -> {
            update(c, "UPDATE sitting SET sitting_used_ms = ?, sitting_added_ms = ?, paused = ?, checkpoint_at = ? WHERE id = 1",
                    checkpoint.sittingUsedMillis(), checkpoint.sittingAddedMillis(), checkpoint.paused() ? 1 : 0,
                    checkpoint.at().toString());
            for (Object[] row : taskRows) {
                update(c, "UPDATE tasks SET used_ms = ?, added_ms = ?, warned = ? WHERE task_id = ?", row);
            }
        });
    }

    /** Remembers the response package's id before it is built, so a retry after a crash writes the same package. */
    public void savePackageId(String packageId) {
        log.persist(c -> update(c, "UPDATE sitting SET package_id = ? WHERE id = 1", packageId));
    }

    /** Records that the response package is written to {@code localCopy} and awaits delivery. */
    public void markSubmitted(Instant at, Path localCopy) {
        log.persist(c -> update(c, "UPDATE sitting SET status = ?, submitted_at = ?, local_copy = ? WHERE id = 1",
                SittingStatus.AWAITING_DELIVERY.wireName(), at.toString(), localCopy.toString()));
    }

    /** Records that the response package reached {@code deliveredTo}: the sitting is complete. */
    public void markDelivered(Path deliveredTo) {
        log.persist(c -> update(c, "UPDATE sitting SET status = ?, delivered_to = ? WHERE id = 1",
                SittingStatus.DELIVERED.wireName(), deliveredTo.toString()));
    }

    // -- reads, after everything queued is committed --

    /** The stored sitting, to resume it after a restart. */
    public StoredSitting loadSitting() throws IOException {
        Path file = log.file();
        return log.read(c -> loadSitting(c, file));
    }

    /** The final text of every ended task, by task id. */
    public Map<String, String> finalTexts() throws IOException {
        return log.read(c -> {
            Map<String, String> texts = new TreeMap<>();
            try (PreparedStatement ps = c.prepareStatement("SELECT task_id, final_text FROM tasks WHERE final_text IS NOT NULL");
                    ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    texts.put(rs.getString(1), rs.getString(2));
                }
            }
            return texts;
        });
    }

    /** The tasks' outcomes in form order and the questionnaire answers, read together for the response. */
    public StoredResponses responses() throws IOException {
        return log.read(c -> new StoredResponses(taskOutcomes(c), answers(c)));
    }

    /** A task's newest snapshot and all its logged events, read together (the material of text recovery). */
    public TaskLog taskLog(String taskId) throws IOException {
        return log.read(c -> {
            Optional<StoredSnapshot> snapshot = Optional.empty();
            try (PreparedStatement ps = c.prepareStatement("SELECT text, caret, after_seq FROM snapshots WHERE task = ?")) {
                ps.setString(1, taskId);
                try (ResultSet rs = ps.executeQuery()) {
                    if (rs.next()) {
                        snapshot = Optional.of(new StoredSnapshot(rs.getString(1), rs.getInt(2), rs.getLong(3)));
                    }
                }
            }
            return new TaskLog(snapshot, SqliteProcessLog.readTaskEvents(c, taskId, 0));
        });
    }

    /**
     * Reads a sitting database without a log (the recovery scan, before the invigilator picks a
     * sitting); empty when the file holds no sitting row yet.
     *
     * @throws IOException when the file cannot be read, saying not to delete it
     */
    public static Optional<SittingSummary> readSummary(Path file) throws IOException {
        SQLiteConfig config = new SQLiteConfig();
        config.setBusyTimeout(5_000);
        // not read-only: opening replays the write-ahead log a killed client left behind
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath(), config.toProperties());
                Statement s = c.createStatement()) {
            Optional<Instant> lastEvent = Optional.empty();
            try (ResultSet rs = s.executeQuery("SELECT at FROM events ORDER BY seq DESC LIMIT 1")) {
                if (rs.next()) {
                    lastEvent = Optional.of(Instant.parse(rs.getString(1)));
                }
            }
            Optional<Path> outputFolder = outputFolder(c);
            try (ResultSet rs = s.executeQuery("SELECT sitting_id, bundle_sha256, bundle_file, exam_id, candidate, form_id,"
                    + " current_task, screen, status, checkpoint_at, paused FROM sitting WHERE id = 1")) {
                if (!rs.next()) {
                    return Optional.empty();
                }
                return Optional.of(new SittingSummary(rs.getString(1), rs.getString(2), rs.getString(3), rs.getString(4),
                        rs.getString(5), rs.getString(6), Optional.ofNullable(rs.getString(7)),
                        SittingScreen.fromWire(Objects.requireNonNullElse(rs.getString(8), "")), status(rs.getString(9)),
                        Instant.parse(rs.getString(10)), lastEvent, rs.getInt(11) != 0, outputFolder));
            }
        } catch (SQLException e) {
            throw new IOException(file + ": this sitting database cannot be read (" + e.getMessage() + "). Do not delete it:"
                    + " it may hold a candidate's work; give it to the test owner.", e);
        }
    }

    // -- the statements behind the reads --

    private static StoredSitting loadSitting(Connection c, Path file) throws SQLException {
        Map<String, StoredTask> tasks = new LinkedHashMap<>();
        try (PreparedStatement ps = c.prepareStatement(
                "SELECT task_id, used_ms, added_ms, warned, started_at, ended_at, end_reason FROM tasks ORDER BY ord");
                ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                Set<Integer> warned = new TreeSet<>();
                for (String part : rs.getString(4).split(",")) {
                    if (!part.isBlank()) {
                        warned.add(Integer.parseInt(part.strip()));
                    }
                }
                tasks.put(rs.getString(1), new StoredTask(rs.getString(1), rs.getLong(2), rs.getLong(3), warned,
                        instant(rs.getString(5)), instant(rs.getString(6)),
                        Optional.ofNullable(rs.getString(7)).map(EndReason::valueOf)));
            }
        }
        try (PreparedStatement ps = c.prepareStatement("SELECT seat, extra_percent, started_at, sitting_used_ms, sitting_added_ms,"
                + " screen, current_task, paused, package_id, local_copy, status, client_version FROM sitting WHERE id = 1");
                ResultSet rs = ps.executeQuery()) {
            if (!rs.next()) {
                throw new SQLException(file + " holds no sitting");
            }
            return new StoredSitting(rs.getString(1), rs.getInt(2), Instant.parse(rs.getString(3)), rs.getLong(4), rs.getLong(5),
                    SittingScreen.fromWire(Objects.requireNonNullElse(rs.getString(6), "")),
                    Optional.ofNullable(rs.getString(7)), rs.getInt(8) != 0, Optional.ofNullable(rs.getString(9)),
                    Optional.ofNullable(rs.getString(10)).map(Path::of), status(rs.getString(11)), rs.getString(12), tasks);
        }
    }

    private static List<TaskOutcome> taskOutcomes(Connection c) throws SQLException {
        List<TaskOutcome> outcomes = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT task_id, final_text, word_count, tool_use, started_at, ended_at,"
                + " end_reason, added_ms FROM tasks ORDER BY ord"); ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                String taskId = rs.getString(1);
                Map<String, ToolUse> stored;
                try {
                    stored = Json.mapper().readValue(Objects.requireNonNullElse(rs.getString(4), "{}"),
                            new TypeReference<Map<String, ToolUse>>() { });
                } catch (IOException e) {
                    throw new SQLException("task " + taskId + " has unreadable tool use: " + e.getMessage(), e);
                }
                Map<Tool, ToolUse> use = new EnumMap<>(Tool.class);
                stored.forEach((name, u) -> use.put(Tool.valueOf(name), u));
                outcomes.add(new TaskOutcome(taskId, Objects.requireNonNullElse(rs.getString(2), ""), rs.getInt(3), use,
                        instant(rs.getString(5)), instant(rs.getString(6)), EndReason.valueOf(rs.getString(7)), rs.getLong(8)));
            }
        }
        return outcomes;
    }

    private static Map<String, Map<String, String>> answers(Connection c) throws SQLException {
        Map<String, Map<String, String>> answers = new TreeMap<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT questionnaire_id, item_id, value FROM answers");
                ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                answers.computeIfAbsent(rs.getString(1), k -> new TreeMap<>()).put(rs.getString(2), rs.getString(3));
            }
        }
        return answers;
    }

    /** The output folder chosen at set-up, when the database remembers one (layout 2 on). */
    private static Optional<Path> outputFolder(Connection c) throws SQLException {
        if (!SittingDatabase.hasColumn(c, "sitting", "output_folder")) {
            return Optional.empty();
        }
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT output_folder FROM sitting WHERE id = 1")) {
            String folder = rs.next() ? rs.getString(1) : null;
            if (folder == null || folder.isBlank()) {
                return Optional.empty();
            }
            try {
                return Optional.of(Path.of(folder));
            } catch (InvalidPathException e) {
                return Optional.empty(); // not a path on this machine: the invigilator types it again
            }
        }
    }

    private static SittingStatus status(String stored) throws SQLException {
        return SittingStatus.fromWire(stored).orElseThrow(() -> new SQLException("the sitting's status \"" + stored
                + "\" is not one this client writes (in-progress, awaiting-delivery, delivered)"));
    }

    private static Optional<Instant> instant(String text) {
        return Optional.ofNullable(text).map(Instant::parse);
    }

    private static void update(Connection c, String sql, Object... args) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(sql)) {
            for (int i = 0; i < args.length; i++) {
                ps.setObject(i + 1, args[i]);
            }
            ps.executeUpdate();
        }
    }
}
