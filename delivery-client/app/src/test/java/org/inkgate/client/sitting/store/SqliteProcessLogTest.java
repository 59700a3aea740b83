package org.inkgate.client.sitting.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.inkgate.client.testutil.FakeClock;
import org.inkgate.format.response.EventChain;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ProcessEvent;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SqliteProcessLogTest {

    @TempDir
    Path dir;

    @Test
    void record_twoThreads_gaplessSequenceThatTheFormatReaderAccepts() throws Exception {
        FakeClock clock = new FakeClock();
        Path file = dir.resolve("s" + SittingDatabase.SUFFIX);
        try (SqliteProcessLog log = SqliteProcessLog.open(file, clock)) {
            Runnable typist = () -> {
                for (int i = 0; i < 300; i++) {
                    log.record(EventType.TEXT_INSERT, "t1", Map.of("pos", 0, "len", 1, "text", "a", "source", "typing"));
                }
            };
            Thread a = new Thread(typist);
            Thread b = new Thread(typist);
            a.start();
            b.start();
            a.join();
            b.join();
        }
        try (SqliteProcessLog log = SqliteProcessLog.open(file, clock)) {
            List<ProcessEvent> events = log.events();
            assertEquals(600, events.size());
            for (int i = 0; i < events.size(); i++) {
                assertEquals(i + 1, events.get(i).seq(), "seq runs 1, 2, 3... (docs/formats.md, events.jsonl)");
            }
            // the format module's own reader checks numbering and the hash chain
            byte[] encoded = EventChain.encode(events);
            List<ProcessEvent> decoded = EventChain.decode("test", "events.jsonl", encoded);
            assertEquals(events, decoded);
        }
    }

    @Test
    void open_existingLog_numberingContinuesAfterTheLastEvent() throws Exception {
        FakeClock clock = new FakeClock();
        Path file = dir.resolve("s" + SittingDatabase.SUFFIX);
        try (SqliteProcessLog log = SqliteProcessLog.open(file, clock)) {
            log.record(EventType.FOCUS_LOST, null, Map.of());
            log.record(EventType.FOCUS_RETURNED, null, Map.of("awayMillis", 1200));
        }
        try (SqliteProcessLog log = SqliteProcessLog.open(file, clock)) {
            log.record(EventType.NAV_SCREEN, null, Map.of("screen", "task"));
            List<ProcessEvent> events = log.events();
            assertEquals(List.of(1L, 2L, 3L), events.stream().map(ProcessEvent::seq).toList());
            assertEquals(1200, ((Number) events.get(1).data().get("awayMillis")).intValue());
        }
    }

    @Test
    void record_stampsBothClocksAtCallTime() throws Exception {
        FakeClock clock = new FakeClock();
        try (SqliteProcessLog log = SqliteProcessLog.open(dir.resolve("s" + SittingDatabase.SUFFIX), clock)) {
            long mono = clock.monoNanos();
            var at = clock.now();
            log.record(EventType.FOCUS_LOST, null, Map.of());
            clock.advance(Duration.ofSeconds(5));
            ProcessEvent e = log.events().getFirst();
            assertEquals(mono, e.mono());
            assertEquals(at, e.at());
        }
    }

    @Test
    void record_eventAgainstTheContract_isRefusedAndNothingWritten() throws Exception {
        // the vocabulary itself is a type now (EventType): what a writer can still get wrong is a type's keys or level
        try (SqliteProcessLog log = SqliteProcessLog.open(dir.resolve("s" + SittingDatabase.SUFFIX), new FakeClock())) {
            IllegalArgumentException missing = assertThrows(IllegalArgumentException.class,
                    () -> log.record(EventType.TOOL_QUERY, "t1", Map.of("tool", "glossary", "pack", "p", "hits", 0, "micros", 3)));
            assertTrue(missing.getMessage().contains("data key \"query\" missing"), missing.getMessage());
            IllegalArgumentException noTask = assertThrows(IllegalArgumentException.class,
                    () -> log.record(EventType.PANEL_OPEN, null, Map.of("tool", "glossary")));
            assertTrue(noTask.getMessage().contains("without a task"), noTask.getMessage());
            assertThrows(IllegalArgumentException.class,
                    () -> log.record(EventType.TEXT_INSERT, "t1", Map.of("pos", List.of(1))));
            assertEquals(0, log.events().size());
        }
    }

    @Test
    void snapshot_whileTyping_writtenAtMostEveryTwoSecondsAndAtOnceOnAPause() throws Exception {
        FakeClock clock = new FakeClock();
        try (SqliteProcessLog log = SqliteProcessLog.open(dir.resolve("s" + SittingDatabase.SUFFIX), clock)) {
            log.snapshot("t1", "a", 1);
            log.flush();
            assertEquals("a", stored(log), "the first snapshot of a task is written at once");
            List<String> seen = new ArrayList<>();
            // typing every 200 ms for 3 s: offers every keystroke, written at most every 2 s
            StringBuilder text = new StringBuilder("a");
            for (int i = 0; i < 15; i++) {
                clock.advance(Duration.ofMillis(200));
                text.append('b');
                log.record(EventType.TEXT_INSERT, "t1", Map.of("pos", text.length() - 1, "len", 1, "text", "b", "source", "typing"));
                log.snapshot("t1", text.toString(), text.length());
                log.flush();
                seen.add(stored(log));
            }
            // at 2.0 s (the 10th keystroke) the held snapshot is written; before it the first one stays
            for (int i = 0; i < 9; i++) {
                assertEquals("a", seen.get(i), "keystroke " + (i + 1));
            }
            assertEquals("a" + "b".repeat(10), seen.get(9));
            assertEquals("a" + "b".repeat(10), seen.get(14), "less than 2 s since the last write and no pause");
            clock.advance(Duration.ofMillis(1000));
            log.flush();
            assertEquals(text.toString(), stored(log), "a 1 s pause writes the newest snapshot");
            long afterSeq = log.read(c -> {
                try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT after_seq FROM snapshots")) {
                    return rs.getLong(1);
                }
            });
            assertEquals(15, afterSeq, "the snapshot follows the 15 events recorded before it");
        }
    }

    @Test
    void close_writesTheHeldSnapshot() throws Exception {
        FakeClock clock = new FakeClock();
        Path file = dir.resolve("s" + SittingDatabase.SUFFIX);
        try (SqliteProcessLog log = SqliteProcessLog.open(file, clock)) {
            log.snapshot("t1", "one", 3);
            log.flush();
            log.snapshot("t1", "one two", 7);
        }
        try (Connection c = SittingDatabase.open(file);
                PreparedStatement ps = c.prepareStatement("SELECT text, caret FROM snapshots WHERE task = 't1'");
                ResultSet rs = ps.executeQuery()) {
            assertEquals("one two", rs.getString(1));
            assertEquals(7, rs.getInt(2));
        }
    }

    @Test
    void open_databaseOfANewerClient_isRefusedWithTheFileNamed() throws Exception {
        Path file = dir.resolve("s" + SittingDatabase.SUFFIX);
        try (Connection c = SittingDatabase.open(file); Statement s = c.createStatement()) {
            c.setAutoCommit(true);
            s.execute("PRAGMA user_version = " + (SittingDatabase.SCHEMA_VERSION + 1));
        }
        java.io.IOException e = assertThrows(java.io.IOException.class, () -> SqliteProcessLog.open(file, new FakeClock()));
        assertTrue(e.getMessage().contains(file.toString()) && e.getMessage().contains("newer client"), e.getMessage());
    }

    @Test
    void open_database_usesWriteAheadLogAndFullSync() throws Exception {
        try (Connection c = SittingDatabase.open(dir.resolve("s" + SittingDatabase.SUFFIX)); Statement s = c.createStatement()) {
            try (ResultSet rs = s.executeQuery("PRAGMA journal_mode")) {
                assertEquals("wal", rs.getString(1));
            }
            try (ResultSet rs = s.executeQuery("PRAGMA synchronous")) {
                assertEquals(2, rs.getInt(1), "2 = FULL (SQLite documentation, PRAGMA synchronous)");
            }
        }
    }

    @Test
    void writeFails_eventsKeptInMemoryProblemReportedThenWrittenWhenTheDiskRecovers() throws Exception {
        FakeClock clock = new FakeClock();
        try (SqliteProcessLog log = SqliteProcessLog.open(dir.resolve("s" + SittingDatabase.SUFFIX), clock)) {
            log.record(EventType.FOCUS_LOST, null, Map.of());
            java.util.concurrent.CountDownLatch failing = new java.util.concurrent.CountDownLatch(2); // the second failure comes after the first was reported
            java.util.concurrent.atomic.AtomicBoolean diskBroken = new java.util.concurrent.atomic.AtomicBoolean(true);
            // a state write that fails until the test "repairs the disk", as a disk refusing writes would (SQLITE_IOERR)
            log.persist(c -> {
                if (diskBroken.get()) {
                    failing.countDown();
                    throw new java.sql.SQLException("disk I/O error (simulated)");
                }
            });
            log.record(EventType.FOCUS_RETURNED, null, Map.of("awayMillis", 5));
            failing.await();
            assertTrue(log.problem().orElseThrow().contains("disk I/O error"), log.problem().toString());
            log.record(EventType.NAV_SCREEN, null, Map.of("screen", "task"));
            diskBroken.set(false);
            List<ProcessEvent> events = log.events();
            assertTrue(log.problem().isEmpty(), "a successful write clears the problem");
            assertEquals(List.of(EventType.FOCUS_LOST.wireName(), EventType.FOCUS_RETURNED.wireName(), EventType.NAV_SCREEN.wireName()),
                    events.stream().map(ProcessEvent::type).toList());
            assertEquals(List.of(1L, 2L, 3L), events.stream().map(ProcessEvent::seq).toList(), "no gap from the failed batches");
        }
    }

    @Test
    void open_sittingAlreadyOpen_isRefusedUntilTheFirstLogCloses() throws Exception {
        Path file = dir.resolve("s" + SittingDatabase.SUFFIX);
        FakeClock clock = new FakeClock();
        try (SqliteProcessLog first = SqliteProcessLog.open(file, clock)) {
            first.record(EventType.FOCUS_LOST, null, Map.of());
            java.io.IOException e = assertThrows(java.io.IOException.class, () -> SqliteProcessLog.open(file, clock));
            assertTrue(e.getMessage().contains("already open"), e.getMessage());
        }
        try (SqliteProcessLog again = SqliteProcessLog.open(file, clock)) {
            assertEquals(1, again.events().size());
        }
    }

    private static String stored(SqliteProcessLog log) throws Exception {
        return log.read(c -> {
            try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT text FROM snapshots WHERE task = 't1'")) {
                return rs.next() ? rs.getString(1) : null;
            }
        });
    }
}
