package org.inkgate.client.sitting.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.Statement;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.inkgate.client.sitting.store.SittingStateStore.PlannedTask;
import org.inkgate.client.sitting.store.SittingStateStore.SittingSetup;
import org.inkgate.client.sitting.store.SittingStateStore.SittingSummary;
import org.inkgate.client.sitting.store.SittingStateStore.StoredResponses;
import org.inkgate.client.sitting.store.SittingStateStore.StoredSitting;
import org.inkgate.client.sitting.store.SittingStateStore.StoredTask;
import org.inkgate.client.sitting.store.SittingStateStore.TaskLog;
import org.inkgate.client.sitting.store.SittingStateStore.TaskOutcome;
import org.inkgate.client.sitting.store.SittingStateStore.TaskTimes;
import org.inkgate.client.sitting.store.SittingStateStore.TimerCheckpoint;
import org.inkgate.client.testutil.FakeClock;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.TaskResponse.EndReason;
import org.inkgate.format.response.ToolUse;
import org.inkgate.packs.policy.Tool;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The sitting's state store against a real SQLite file: every named write read back, most of
 * them after the log is closed and the file opened again, as recovery opens it after a crash.
 */
class SittingStateStoreTest {

    private static final Instant START = Instant.parse("2026-05-04T09:00:00Z");

    @TempDir
    Path dir;

    private final FakeClock clock = new FakeClock(START);

    private Path file() {
        return dir.resolve("sittings").resolve("one" + SittingDatabase.SUFFIX);
    }

    private static SittingSetup setup(Optional<Path> outputFolder) {
        return new SittingSetup("sitting-1", "ab".repeat(32), "/exams/ferry.inkexam", "ferry-2026", "C-0042", "form-a", "seat 7",
                25, START, "inkgate-client 0.9 (test)", outputFolder);
    }

    private static List<PlannedTask> twoTasks() {
        return List.of(new PlannedTask("t1", 0, "with-resources", "{\"tools\":[\"spelling\"]}"),
                new PlannedTask("t2", 1, "without", "{\"tools\":[]}"));
    }

    /** Opens the file with a new log, as a restarted client does, and reads it through a new store. */
    private <T> T reopened(StoreRead<T> read) throws IOException {
        try (SqliteProcessLog log = SqliteProcessLog.open(file(), clock)) {
            return read.from(new SittingStateStore(log));
        }
    }

    @FunctionalInterface
    private interface StoreRead<T> {
        T from(SittingStateStore store) throws IOException;
    }

    @Test
    void createSitting_reopened_readsBackTheSetupAndTheTasksInFormOrder() throws Exception {
        try (SqliteProcessLog log = SqliteProcessLog.open(file(), clock)) {
            new SittingStateStore(log).createSitting(setup(Optional.empty()), twoTasks());
        }
        StoredSitting s = reopened(SittingStateStore::loadSitting);
        assertEquals("seat 7", s.seat());
        assertEquals(25, s.extraPercent());
        assertEquals(START, s.startedAt());
        assertEquals(SittingStatus.IN_PROGRESS, s.status());
        assertEquals(SittingScreen.START, s.screen());
        assertEquals(Optional.empty(), s.currentTask());
        assertFalse(s.paused());
        assertEquals(Optional.empty(), s.packageId());
        assertEquals(Optional.empty(), s.localCopy());
        assertEquals("inkgate-client 0.9 (test)", s.clientVersion());
        assertEquals(List.of("t1", "t2"), List.copyOf(s.tasks().keySet()));
        assertEquals(new StoredTask("t1", 0, 0, Set.of(), Optional.empty(), Optional.empty(), Optional.empty()), s.tasks().get("t1"));
    }

    @Test
    void taskStartedScreenAndTimers_reopened_areWhereTheRestartCarriesOn() throws Exception {
        try (SqliteProcessLog log = SqliteProcessLog.open(file(), clock)) {
            SittingStateStore store = new SittingStateStore(log);
            store.createSitting(setup(Optional.empty()), twoTasks());
            store.markTaskStarted("t1", START.plusSeconds(60));
            store.saveCurrentTask("t1");
            store.saveScreen(SittingScreen.TASK);
            store.saveTimers(new TimerCheckpoint(START.plusSeconds(90), 30_000, 5_000, true,
                    List.of(new TaskTimes("t1", 29_000, 60_000, Set.of(10, 5)), new TaskTimes("t2", 0, 0, Set.of()))));
        }
        StoredSitting s = reopened(SittingStateStore::loadSitting);
        assertEquals(SittingScreen.TASK, s.screen());
        assertEquals(Optional.of("t1"), s.currentTask());
        assertTrue(s.paused());
        assertEquals(30_000, s.sittingUsedMillis());
        assertEquals(5_000, s.sittingAddedMillis());
        StoredTask t1 = s.tasks().get("t1");
        assertEquals(Optional.of(START.plusSeconds(60)), t1.startedAt());
        assertEquals(29_000, t1.usedMillis());
        assertEquals(60_000, t1.addedMillis());
        assertEquals(Set.of(5, 10), t1.warned());
        assertEquals(Optional.empty(), t1.endedAt());
        // the recovery scan reads the same file without a log
        SittingSummary summary = SittingStateStore.readSummary(file()).orElseThrow();
        assertEquals(START.plusSeconds(90), summary.checkpointAt());
        assertEquals(Optional.of("t1"), summary.currentTask());
        assertTrue(summary.paused());
    }

    @Test
    void taskEnds_answersAndResponses_reopened_carryTextToolUseAndTheNewestAnswer() throws Exception {
        ToolUse spelling = new ToolUse(3, 0, 0, 4, 2, 1, 0);
        try (SqliteProcessLog log = SqliteProcessLog.open(file(), clock)) {
            SittingStateStore store = new SittingStateStore(log);
            store.createSitting(setup(Optional.empty()), twoTasks());
            store.markTaskStarted("t1", START.plusSeconds(60));
            store.saveCurrentTask("t1");
            store.saveTaskEnd("t1", START.plusSeconds(600), EndReason.SUBMITTED, "The ferry leaves at nine.", 5,
                    Map.of(Tool.SPELLING, spelling), 540_000);
            store.saveUnstartedTaskEnd("t2", START.plusSeconds(700), EndReason.ENDED_BY_INVIGILATOR);
            store.saveAnswer("pre", "q1", "2");
            store.saveAnswer("pre", "q1", "4");
            store.saveAnswer("post", "free", "It was fine.");
        }
        StoredSitting s = reopened(SittingStateStore::loadSitting);
        assertEquals(Optional.empty(), s.currentTask(), "a task's end clears the task on screen in the same change");
        assertEquals(Optional.of(EndReason.SUBMITTED), s.tasks().get("t1").endReason());
        assertEquals(540_000, s.tasks().get("t1").usedMillis());
        assertEquals(Optional.of(EndReason.ENDED_BY_INVIGILATOR), s.tasks().get("t2").endReason());

        assertEquals(Map.of("t1", "The ferry leaves at nine.", "t2", ""), reopened(SittingStateStore::finalTexts));
        StoredResponses r = reopened(SittingStateStore::responses);
        assertEquals(List.of(
                new TaskOutcome("t1", "The ferry leaves at nine.", 5, Map.of(Tool.SPELLING, spelling), Optional.of(START.plusSeconds(60)),
                        Optional.of(START.plusSeconds(600)), EndReason.SUBMITTED, 0),
                new TaskOutcome("t2", "", 0, Map.of(), Optional.empty(), Optional.of(START.plusSeconds(700)),
                        EndReason.ENDED_BY_INVIGILATOR, 0)), r.tasks());
        assertEquals(Map.of("pre", Map.of("q1", "4"), "post", Map.of("free", "It was fine.")), r.answers());
    }

    @Test
    void submittedThenDelivered_theStatusTheRecoveryScanReads() throws Exception {
        Path local = dir.resolve("responses").resolve("ferry-C-0042.inkresp");
        try (SqliteProcessLog log = SqliteProcessLog.open(file(), clock)) {
            SittingStateStore store = new SittingStateStore(log);
            store.createSitting(setup(Optional.of(dir.resolve("usb"))), twoTasks());
            store.savePackageId("package-1");
            store.markSubmitted(START.plusSeconds(900), local);
        }
        StoredSitting s = reopened(SittingStateStore::loadSitting);
        assertEquals(SittingStatus.AWAITING_DELIVERY, s.status());
        assertEquals(Optional.of("package-1"), s.packageId());
        assertEquals(Optional.of(local), s.localCopy());
        SittingSummary awaiting = SittingStateStore.readSummary(file()).orElseThrow();
        assertEquals(SittingStatus.AWAITING_DELIVERY, awaiting.status());
        assertEquals(Optional.of(dir.resolve("usb").toAbsolutePath()), awaiting.outputFolder());

        try (SqliteProcessLog log = SqliteProcessLog.open(file(), clock)) {
            new SittingStateStore(log).markDelivered(dir.resolve("usb").resolve("ferry-C-0042.inkresp"));
        }
        assertEquals(SittingStatus.DELIVERED, SittingStateStore.readSummary(file()).orElseThrow().status());
    }

    @Test
    void taskLog_reopened_holdsTheNewestSnapshotAndEveryEventOfTheTask() throws Exception {
        try (SqliteProcessLog log = SqliteProcessLog.open(file(), clock)) {
            new SittingStateStore(log).createSitting(setup(Optional.empty()), twoTasks());
            log.record(EventType.TEXT_INSERT, "t1", Map.of("pos", 0, "len", 3, "text", "abc", "source", "typing"));
            log.snapshot("t1", "abc", 3);
            log.record(EventType.TEXT_INSERT, "t2", Map.of("pos", 0, "len", 1, "text", "z", "source", "typing"));
            clock.advance(Duration.ofSeconds(3)); // the held snapshot is due
            log.record(EventType.TEXT_INSERT, "t1", Map.of("pos", 3, "len", 1, "text", "d", "source", "typing"));
            log.flush();
        }
        TaskLog t1 = reopened(store -> store.taskLog("t1"));
        assertEquals(Optional.of(new SittingStateStore.StoredSnapshot("abc", 3, 1)), t1.snapshot());
        assertEquals(List.of("abc", "d"), t1.events().stream().map(ProcessEvent::data).map(d -> d.get("text")).toList());
        TaskLog t2 = reopened(store -> store.taskLog("t2"));
        assertEquals(Optional.empty(), t2.snapshot());
        assertEquals(1, t2.events().size());
    }

    @Test
    void readSummary_lastEventAfterTheCheckpoint_isReported() throws Exception {
        try (SqliteProcessLog log = SqliteProcessLog.open(file(), clock)) {
            new SittingStateStore(log).createSitting(setup(Optional.empty()), twoTasks());
            clock.advance(Duration.ofSeconds(42));
            log.record(EventType.FOCUS_LOST, null, Map.of());
        }
        SittingSummary s = SittingStateStore.readSummary(file()).orElseThrow();
        assertEquals("sitting-1", s.sittingId());
        assertEquals("C-0042", s.candidate());
        assertEquals(START, s.checkpointAt());
        assertEquals(Optional.of(START.plusSeconds(42)), s.lastEventAt());
        assertEquals(Optional.empty(), s.outputFolder());
    }

    @Test
    void readSummary_databaseWithoutASittingYet_isEmpty() throws Exception {
        SqliteProcessLog.open(file(), clock).close();
        assertEquals(Optional.empty(), SittingStateStore.readSummary(file()));
    }

    @Test
    void loadSitting_databaseWithoutASitting_isRefusedNamingTheFile() throws Exception {
        SqliteProcessLog.open(file(), clock).close();
        IOException e = assertThrows(IOException.class, () -> reopened(SittingStateStore::loadSitting));
        assertTrue(e.getMessage().contains(file().toString()) && e.getMessage().contains("holds no sitting"), e.getMessage());
    }

    @Test
    void readSummary_statusNoClientWrites_isReportedNotGuessed() throws Exception {
        try (SqliteProcessLog log = SqliteProcessLog.open(file(), clock)) {
            new SittingStateStore(log).createSitting(setup(Optional.empty()), twoTasks());
        }
        try (Connection c = SittingDatabase.open(file()); Statement st = c.createStatement()) {
            st.executeUpdate("UPDATE sitting SET status = 'archived'");
            c.commit();
        }
        IOException e = assertThrows(IOException.class, () -> SittingStateStore.readSummary(file()));
        assertTrue(e.getMessage().contains("\"archived\"") && e.getMessage().contains("Do not delete it"), e.getMessage());
    }
}
