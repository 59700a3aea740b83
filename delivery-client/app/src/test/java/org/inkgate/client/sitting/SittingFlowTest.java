package org.inkgate.client.sitting;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.submit.InstallationKey;
import org.inkgate.client.sitting.submit.SubmissionResult;
import org.inkgate.client.testutil.FakeClock;
import org.inkgate.client.testutil.SittingFixtures;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.response.TaskResponse.EndReason;
import org.inkgate.format.response.ToolUse;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.format.trust.TrustPolicy;
import org.inkgate.packs.policy.Tool;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A whole sitting through the core, checked by the format module's reader (the collector's view):
 * signature, encryption, hash chain, toolsOffered against the policy, and the texts.
 */
class SittingFlowTest {

    @TempDir
    Path dir;

    @Test
    void wholeSitting_submitted_packageOpensWithTheOwnerKeyAndHoldsEverything() throws Exception {
        FakeClock clock = new FakeClock();
        ClientDataFolder folder = new ClientDataFolder(dir.resolve("data"));
        Path output = Files.createDirectories(dir.resolve("usb"));
        InstallationKey key = InstallationKey.loadOrCreate(folder);
        SubmissionResult result;
        try (Sitting s = Sitting.begin(SittingFixtures.candidate1001(), folder, clock)) {
            s.showScreen(org.inkgate.client.sitting.store.SittingScreen.INSTRUCTIONS);
            TaskStart t1 = s.enterTask("t1");
            assertEquals("", t1.text());
            assertFalse(t1.resumed());
            type(s, "t1", "Dear Sam, plans changed.", clock);
            s.log().record(EventType.TEXT_DELETE, "t1", Map.of("pos", 16, "len", 7, "text", "changed", "source", "typing"));
            s.log().record(EventType.TEXT_INSERT, "t1", Map.of("pos", 16, "len", 5, "text", "moved", "source", "typing"));
            s.endTask("t1", EndReason.SUBMITTED, "Dear Sam, plans moved.", 4,
                    Map.of(Tool.SPELLING, new ToolUse(0, 0, 0, 2, 1, 0, 0), Tool.GLOSSARY, new ToolUse(9, 9, 9, 9, 9, 9, 9)));
            s.enterTask("t2");
            type(s, "t2", "Yes, on Sundays.", clock);
            clock.advance(Duration.ofSeconds(1800));
            assertEquals(List.of(new SittingSignal.TaskTimeUp("t2")), s.poll());
            s.endTask("t2", EndReason.TIME_UP, "Yes, on Sundays.", 3, Map.of());
            s.answer("after", "q1", "3");
            assertThrows(IllegalArgumentException.class, () -> s.answer("after", "q1", "4"), "the scale has 3 points");
            assertEquals(List.of(), s.verifyReplay());
            result = s.submit(output, key);
        }
        assertTrue(result.complete(), result.toString());
        assertTrue(Files.exists(result.localCopy()), "the local copy is kept");
        assertArrayEquals(Files.readAllBytes(result.localCopy()), Files.readAllBytes(result.delivered().orElseThrow()));

        OpenedResponse opened = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TrustPolicy.trusting(Set.of(key.fingerprint())))
                .open(result.delivered().orElseThrow());
        assertEquals("1001", opened.response().candidateNumber());
        assertEquals("A", opened.response().formId());
        assertEquals("seat 4", opened.response().seat());
        assertEquals("test", opened.response().clientVersion());
        assertEquals(SittingFixtures.SHA, opened.response().bundleManifestSha256());
        TaskResponse r1 = opened.response().tasks().get(0);
        assertEquals("t1", r1.taskId());
        assertEquals("Dear Sam, plans moved.", r1.text());
        assertEquals(Set.of(Tool.SPELLING), r1.toolsOffered(), "form A's t1 offers spelling suggestions only");
        assertEquals(Set.of(Tool.SPELLING), r1.toolUse().keySet(), "use of a tool not offered is dropped");
        TaskResponse r2 = opened.response().tasks().get(1);
        assertEquals(EndReason.TIME_UP, r2.endReason());
        assertEquals(Set.of(), r2.toolsOffered());
        assertEquals(Map.of("q1", "3"), opened.response().questionnaires().getFirst().answers());
        List<String> types = opened.events().stream().map(ProcessEvent::type).toList();
        assertEquals(EventType.SITTING_START.wireName(), types.getFirst());
        assertEquals(EventType.SITTING_END.wireName(), types.getLast());
        assertTrue(types.containsAll(List.of(EventType.TASK_START.wireName(), EventType.TASK_END.wireName(), EventType.TIMER_EXPIRED.wireName(), EventType.NAV_SCREEN.wireName())));
    }

    @Test
    void poll_whileTheDatabaseRefusesWrites_signalsTroubleThenRecovery() throws Exception {
        try (Sitting s = Sitting.begin(SittingFixtures.candidate1001(), new ClientDataFolder(dir), new FakeClock())) {
            java.util.concurrent.atomic.AtomicBoolean broken = new java.util.concurrent.atomic.AtomicBoolean(true);
            org.inkgate.client.sitting.store.FailingDisk.refuseWritesWhile(s.log(), broken::get);
            List<SittingSignal> signals = pollUntil(s, SittingSignal.StorageTrouble.class);
            assertTrue(((SittingSignal.StorageTrouble) signals.getFirst()).message().contains("kept in memory"), signals.toString());
            broken.set(false);
            pollUntil(s, SittingSignal.StorageRecovered.class);
        }
    }

    /** Polls until a signal of the type comes (the writer thread retries every 250 ms); gives up after 30 s. */
    private static List<SittingSignal> pollUntil(Sitting s, Class<? extends SittingSignal> type) throws InterruptedException {
        long until = System.nanoTime() + java.util.concurrent.TimeUnit.SECONDS.toNanos(30);
        while (System.nanoTime() < until) {
            List<SittingSignal> signals = s.poll().stream().filter(type::isInstance).toList();
            if (!signals.isEmpty()) {
                return signals;
            }
            Thread.sleep(20);
        }
        throw new AssertionError("no " + type.getSimpleName() + " within 30 s");
    }

    @Test
    void enterTask_outOfFormOrder_isRefused() throws Exception {
        try (Sitting s = Sitting.begin(SittingFixtures.candidate1001(), new ClientDataFolder(dir), new FakeClock())) {
            IllegalStateException e = assertThrows(IllegalStateException.class, () -> s.enterTask("t2"));
            assertTrue(e.getMessage().contains("t1"), e.getMessage());
        }
    }

    @Test
    void submit_withATaskNotEnded_isRefusedUntilUnstartedTasksAreEnded() throws Exception {
        try (Sitting s = Sitting.begin(SittingFixtures.candidate1001(), new ClientDataFolder(dir), new FakeClock())) {
            s.enterTask("t1");
            s.endTask("t1", EndReason.TIME_UP, "", 0, Map.of());
            InstallationKey key = InstallationKey.loadOrCreate(new ClientDataFolder(dir));
            assertThrows(IllegalStateException.class, () -> s.submit(dir, key));
            s.endUnstartedTasks(EndReason.TIME_UP);
            assertTrue(s.submit(dir, key).complete());
        }
    }

    @Test
    void forCandidate_numberNotOnTheRoster_saysSo() {
        IllegalArgumentException e = assertThrows(SittingPlan.NotOnRoster.class, () -> SittingPlan.forCandidate(
                org.inkgate.format.testutil.SampleExam.manifest(), SittingFixtures.SHA, "x", "9999", "", null, "test"));
        assertTrue(e.getMessage().contains("9999") && e.getMessage().contains("not on the list"), e.getMessage());
    }

    private static void type(Sitting s, String task, String text, FakeClock clock) {
        for (int i = 0; i < text.length(); i++) {
            s.log().record(EventType.TEXT_INSERT, task, Map.of("pos", i, "len", 1, "text", text.substring(i, i + 1), "source", "typing"));
            s.log().snapshot(task, text.substring(0, i + 1), i + 1);
            clock.advance(Duration.ofMillis(150));
        }
    }
}
