package org.inkgate.client.sitting.recovery;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.Statement;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import org.inkgate.client.sitting.Sitting;
import org.inkgate.client.sitting.TaskStart;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.store.SittingDatabase;
import org.inkgate.client.testutil.FakeClock;
import org.inkgate.client.testutil.SittingFixtures;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.TaskResponse.EndReason;
import org.inkgate.format.testutil.SampleExam;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RecoveryTest {

    @TempDir
    Path dir;

    @Test
    void resume_textChangedAfterTheLastSnapshot_rebuildsTextFromSnapshotAndTheEventsAfterIt() throws Exception {
        FakeClock clock = new FakeClock();
        ClientDataFolder folder = new ClientDataFolder(dir);
        Sitting s = Sitting.begin(SittingFixtures.candidate1001(), folder, clock);
        s.enterTask("t1");
        insert(s, 0, "The ferry");
        s.log().snapshot("t1", "The ferry", 9);
        clock.advance(Duration.ofSeconds(3));
        s.log().flush();
        insert(s, 9, " leaves");
        s.log().record(EventType.TEXT_DELETE, "t1", Map.of("pos", 0, "len", 4, "text", "The ", "source", "typing"));
        // no snapshot was offered after the last two changes, so closing leaves the snapshot as it was:
        // the state a killed process leaves (the kill tests do it for real)
        s.close();
        List<UnfinishedSitting> found = RecoveryScan.find(folder);
        assertEquals(1, found.size());
        assertEquals(List.of("t1"), found.getFirst().currentTask().stream().toList());
        assertEquals(UnfinishedSitting.Stage.IN_PROGRESS, found.getFirst().stage());
        try (Sitting r = Sitting.resume(found.getFirst(), SampleExam.manifest(), SittingFixtures.SHA, Duration.ZERO, folder, clock)) {
            TaskStart t = r.enterTask("t1");
            assertTrue(t.resumed());
            assertEquals("ferry leaves", t.text());
            assertEquals(0, t.caret(), "the caret where the last change (the delete at 0) left it");
            assertTrue(t.mismatch().isEmpty());
        }
    }

    @Test
    void resume_snapshotThatDisagreesWithTheLog_isReportedAndTheSnapshotKept() throws Exception {
        FakeClock clock = new FakeClock();
        ClientDataFolder folder = new ClientDataFolder(dir);
        Path db;
        try (Sitting s = Sitting.begin(SittingFixtures.candidate1001(), folder, clock)) {
            s.enterTask("t1");
            insert(s, 0, "abc");
            s.log().snapshot("t1", "abc", 3);
            db = s.log().file();
        }
        try (Connection c = SittingDatabase.open(db); Statement st = c.createStatement()) {
            st.executeUpdate("UPDATE snapshots SET text = 'abX' WHERE task = 't1'");
            c.commit();
        }
        UnfinishedSitting found = RecoveryScan.find(folder).getFirst();
        try (Sitting r = Sitting.resume(found, SampleExam.manifest(), SittingFixtures.SHA, Duration.ZERO, folder, clock)) {
            TaskStart t = r.enterTask("t1");
            assertEquals("abX", t.text());
            assertEquals(2, t.mismatch().orElseThrow().firstDifference());
        }
    }

    @Test
    void resume_withAnotherBundle_isRefused() throws Exception {
        ClientDataFolder folder = new ClientDataFolder(dir);
        FakeClock clock = new FakeClock();
        Sitting.begin(SittingFixtures.candidate1001(), folder, clock).close();
        UnfinishedSitting found = RecoveryScan.find(folder).getFirst();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Sitting.resume(found, SampleExam.manifest(), "cd".repeat(32), Duration.ZERO, folder, clock));
        assertTrue(e.getMessage().contains("not the bundle"), e.getMessage());
    }

    @Test
    void find_deliveredSitting_isNotUnfinished() throws Exception {
        ClientDataFolder folder = new ClientDataFolder(dir);
        FakeClock clock = new FakeClock();
        try (Sitting s = Sitting.begin(SittingFixtures.candidate1001(), folder, clock)) {
            s.enterTask("t1");
            s.endTask("t1", EndReason.SUBMITTED, "", 0, Map.of());
            s.endUnstartedTasks(EndReason.ENDED_BY_INVIGILATOR);
            var key = org.inkgate.client.sitting.submit.InstallationKey.loadOrCreate(folder);
            s.submit(dir.resolve("nowhere"), key);
            assertEquals(UnfinishedSitting.Stage.AWAITING_DELIVERY, RecoveryScan.find(folder).getFirst().stage(),
                    "saved locally, not delivered: still listed");
            java.nio.file.Files.createDirectories(dir.resolve("nowhere"));
            assertTrue(s.retryDelivery(dir.resolve("nowhere")).complete());
        }
        assertEquals(List.of(), RecoveryScan.find(folder));
    }

    private static void insert(Sitting s, int pos, String text) {
        s.log().record(EventType.TEXT_INSERT, "t1", Map.of("pos", pos, "len", text.length(), "text", text, "source", "typing"));
    }
}
