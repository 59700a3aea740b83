package org.inkgate.client.sitting.timing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import org.inkgate.client.sitting.Sitting;
import org.inkgate.client.sitting.SittingPlan;
import org.inkgate.client.sitting.SittingSignal;
import org.inkgate.client.sitting.recovery.RecoveryScan;
import org.inkgate.client.sitting.recovery.UnfinishedSitting;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.testutil.FakeClock;
import org.inkgate.client.testutil.SittingFixtures;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.TaskResponse.EndReason;
import org.inkgate.format.testutil.SampleExam;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Timers on a fake clock. Check values are arithmetic on the sample exam's limits (task t1:
 * 1200 s, warning at 5 min; t2: 1800 s, warnings at 5 and 1 min); extra time as a percentage of
 * each limit is the roster's definition (docs/formats.md, QTI PNP additional-testing-time).
 */
class SittingTimersTest {

    @TempDir
    Path dir;

    @Test
    void poll_atTheWarningMinute_warnsOnceThenExpiresOnce() throws Exception {
        FakeClock clock = new FakeClock();
        try (Sitting s = Sitting.begin(SittingFixtures.candidate1001(), new ClientDataFolder(dir), clock)) {
            s.enterTask("t1");
            clock.advance(Duration.ofSeconds(1200 - 301));
            assertEquals(List.of(), s.poll(), "5 min 1 s left: no warning yet");
            clock.advance(Duration.ofSeconds(1));
            assertEquals(List.of(new SittingSignal.TimeWarning("t1", 5)), s.poll());
            assertEquals(List.of(), s.poll(), "a warning is given once");
            clock.advance(Duration.ofSeconds(299));
            assertEquals(List.of(), s.poll());
            assertEquals(Duration.ofSeconds(1), s.remaining("t1").orElseThrow());
            clock.advance(Duration.ofSeconds(1));
            assertEquals(List.of(new SittingSignal.TaskTimeUp("t1")), s.poll());
            assertEquals(List.of(), s.poll(), "time-up is signalled once");
            List<ProcessEvent> events = s.log().events();
            assertEquals(1, events.stream().filter(e -> e.type().equals(EventType.TIMER_WARNING.wireName())).count());
            assertEquals(5, ((Number) events.stream().filter(e -> e.type().equals(EventType.TIMER_WARNING.wireName())).findFirst()
                    .orElseThrow().data().get("minutesLeft")).intValue());
            assertEquals(1, events.stream().filter(e -> e.type().equals(EventType.TIMER_EXPIRED.wireName())).count());
        }
    }

    @Test
    void rosterExtraTime_25percent_extendsTheLimitAndMovesTheWarnings() throws Exception {
        FakeClock clock = new FakeClock();
        // candidate 1002 sits form B (t1 first, 1200 s) with 25 % extra: 1200 * 1.25 = 1500 s
        try (Sitting s = Sitting.begin(SittingFixtures.candidate1002(), new ClientDataFolder(dir), clock)) {
            s.enterTask("t1");
            assertEquals(Duration.ofSeconds(1500), s.allowed("t1").orElseThrow());
            clock.advance(Duration.ofSeconds(1199));
            assertEquals(List.of(), s.poll(), "5 min before the extended end is at 1200 s");
            clock.advance(Duration.ofSeconds(1));
            assertEquals(List.of(new SittingSignal.TimeWarning("t1", 5)), s.poll());
            clock.advance(Duration.ofSeconds(300));
            assertEquals(List.of(new SittingSignal.TaskTimeUp("t1")), s.poll());
            ProcessEvent added = s.log().events().stream().filter(e -> e.type().equals(EventType.TIME_ADDED.wireName())).findFirst().orElseThrow();
            assertEquals(300.0, ((Number) added.data().get("seconds")).doubleValue());
            assertEquals("roster", added.data().get("reason"));
        }
    }

    @Test
    void pause_stopsTheClockAndIsLogged() throws Exception {
        FakeClock clock = new FakeClock();
        try (Sitting s = Sitting.begin(SittingFixtures.candidate1001(), new ClientDataFolder(dir), clock)) {
            s.enterTask("t1");
            clock.advance(Duration.ofSeconds(100));
            s.pauseAll();
            clock.advance(Duration.ofMinutes(30));
            assertEquals(List.of(), s.poll(), "no time-up while paused although 30 min passed");
            assertEquals(Duration.ofSeconds(1100), s.remaining("t1").orElseThrow());
            s.resumeAll();
            clock.advance(Duration.ofSeconds(100));
            assertEquals(Duration.ofSeconds(1000), s.remaining("t1").orElseThrow());
            ProcessEvent end = s.log().events().stream().filter(e -> e.type().equals(EventType.PAUSE_END.wireName())).findFirst().orElseThrow();
            assertEquals(30 * 60_000L, ((Number) end.data().get("pausedMillis")).longValue());
        }
    }

    @Test
    void addTime_afterTheWarning_rearmsItAndDelaysTimeUp() throws Exception {
        FakeClock clock = new FakeClock();
        try (Sitting s = Sitting.begin(SittingFixtures.candidate1001(), new ClientDataFolder(dir), clock)) {
            s.enterTask("t1");
            clock.advance(Duration.ofSeconds(1000));
            assertEquals(List.of(new SittingSignal.TimeWarning("t1", 5)), s.poll());
            s.addTime(Duration.ofMinutes(10));
            assertEquals(Duration.ofSeconds(800), s.remaining("t1").orElseThrow());
            clock.advance(Duration.ofSeconds(499));
            assertEquals(List.of(), s.poll());
            clock.advance(Duration.ofSeconds(1));
            assertEquals(List.of(new SittingSignal.TimeWarning("t1", 5)), s.poll(), "warned again before the new end");
            clock.advance(Duration.ofSeconds(300));
            assertEquals(List.of(new SittingSignal.TaskTimeUp("t1")), s.poll());
        }
    }

    @Test
    void sittingLimit_runsAcrossTasksWithExtraTimeAndSignalsOnce() throws Exception {
        FakeClock clock = new FakeClock();
        var manifest = SittingFixtures.withSittingLimit(1500);
        SittingPlan plan = SittingPlan.forCandidate(manifest, SittingFixtures.SHA, "x.inkexam", "1001", "", null, "test");
        try (Sitting s = Sitting.begin(plan, new ClientDataFolder(dir), clock)) {
            s.enterTask("t1");
            clock.advance(Duration.ofSeconds(1000));
            s.poll();
            s.endTask("t1", EndReason.SUBMITTED, "", 0, Map.of());
            clock.advance(Duration.ofSeconds(60));
            s.enterTask("t2");
            assertEquals(Duration.ofSeconds(440), s.sittingRemaining().orElseThrow(),
                    "1500 - 1000 - 60 (the time between tasks counts towards the sitting)");
            clock.advance(Duration.ofSeconds(440));
            List<SittingSignal> signals = s.poll();
            assertTrue(signals.contains(new SittingSignal.SittingTimeUp()), signals.toString());
            assertEquals(List.of(), s.poll().stream().filter(SittingSignal.SittingTimeUp.class::isInstance).toList());
        }
    }

    @Test
    void noSittingLimit_inventsNone() throws Exception {
        try (Sitting s = Sitting.begin(SittingFixtures.candidate1001(), new ClientDataFolder(dir), new FakeClock())) {
            assertTrue(s.sittingRemaining().isEmpty());
        }
    }

    @Test
    void restart_remainingTimeSurvivesAndDowntimeCountsUnlessCredited() throws Exception {
        FakeClock clock = new FakeClock();
        ClientDataFolder folder = new ClientDataFolder(dir);
        Sitting s = Sitting.begin(SittingFixtures.candidate1001(), folder, clock);
        s.enterTask("t1");
        clock.advance(Duration.ofSeconds(400));
        s.poll();
        s.close();
        // the machine is off for 2 minutes; the invigilator credits 90 s of them
        clock.advance(Duration.ofSeconds(120));
        UnfinishedSitting found = RecoveryScan.find(folder).getFirst();
        assertEquals(Duration.ofSeconds(120), found.downtime(clock.now()));
        try (Sitting r = Sitting.resume(found, SampleExam.manifest(), SittingFixtures.SHA, Duration.ofSeconds(90), folder, clock)) {
            r.enterTask("t1");
            // 1200 - 400 - 120 + 90
            assertEquals(Duration.ofSeconds(770), r.remaining("t1").orElseThrow());
            assertEquals("test", r.plan().clientVersion(), "the response names the client version the sitting began on");
            ProcessEvent resume = r.log().events().stream().filter(e -> e.type().equals(EventType.SITTING_RESUME.wireName())).findFirst()
                    .orElseThrow();
            assertEquals(120.0, ((Number) resume.data().get("downSeconds")).doubleValue());
            assertEquals(90.0, ((Number) resume.data().get("creditedSeconds")).doubleValue());
            assertEquals("invigilator", resume.data().get("by"));
        }
    }

    @Test
    void restart_warningGivenBefore_isNotRepeated() throws Exception {
        FakeClock clock = new FakeClock();
        ClientDataFolder folder = new ClientDataFolder(dir);
        Sitting s = Sitting.begin(SittingFixtures.candidate1001(), folder, clock);
        s.enterTask("t1");
        clock.advance(Duration.ofSeconds(1000));
        assertEquals(1, s.poll().size());
        s.close();
        UnfinishedSitting found = RecoveryScan.find(folder).getFirst();
        try (Sitting r = Sitting.resume(found, SampleExam.manifest(), SittingFixtures.SHA, Duration.ZERO, folder, clock)) {
            r.enterTask("t1");
            assertEquals(List.of(), r.poll());
        }
    }
}
