package org.inkgate.client.sitting.ui;

import org.inkgate.client.sitting.course.FlowScreen;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import javafx.scene.Node;
import javafx.scene.control.ListView;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.sitting.recovery.RecoveryScan;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.store.SittingDatabase;
import org.inkgate.client.testutil.DemoBundles;
import org.inkgate.client.testutil.StageSize;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.trust.TrustPolicy;
import org.testfx.util.WaitForAsyncUtils;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * Issue 13, section 2: the invigilator's actions on the real sitting flow, headless, on the demo
 * sitting bundle (src/demo: D1001 sits form A, neighbour-note then mill-street-shop; D1002 sits
 * form B in the other order). Each test failed on the flow before the fix it names.
 */
@ExtendWith(ApplicationExtension.class)
class InvigilatorActionsTest {

    @TempDir
    Path temp;
    private Stage stage;
    private final List<FlowDriver> drivers = new ArrayList<>();

    private StageSize before;

    /**
     * The smallest window a test centre meets (ScreensFitTest's 1024x768), set here because TestFX
     * shares one stage between test classes: "in view without scrolling" means nothing at whatever
     * size the class before left behind (a filtered run failed so after the typing tests).
     */
    @Start
    void start(Stage primary) {
        this.stage = primary;
        before = StageSize.set(primary, 1024, 768);
    }

    @AfterEach
    void restoreSize(FxRobot robot) {
        robot.interact(before::restore);
    }

    private FlowDriver driver() {
        FlowDriver d = new FlowDriver(new FxRobot(), stage, temp.resolve("data"));
        drivers.add(d);
        return d;
    }

    /** A locked flow left behind would keep the shared stage full screen for every later test class. */
    @AfterEach
    void releaseLocks() {
        drivers.forEach(FlowDriver::releaseLock);
    }

    /** Ending a task cannot be undone: like Exit it asks first, and says what it does to the candidate. */
    @Test
    void endTask_asksForConfirmationSayingWhatItDoesAndOnlyThenEndsTheTask(FxRobot robot) throws Exception {
        FlowDriver d = driver();
        d.open(FlowDriver.buildDemoSitting(temp), new ManualClock(), false);
        d.setUp(FlowDriver.demoPin(), temp.resolve("out"));
        d.signIn("D1001");
        d.press("startButton");
        d.awaitTask("A note to a neighbour");
        d.openInvigilator();

        d.press("endTaskButton");
        // the screen refreshes every 200 ms (SittingFlow.TICK): the question must outlive a few refreshes
        WaitForAsyncUtils.sleep(700, java.util.concurrent.TimeUnit.MILLISECONDS);

        assertEquals(FlowScreen.TASK, d.flow.screen(), "the task ended without confirmation");
        assertFalse(d.workspace().closed(), "the task's workspace was closed without confirmation");
        assertTrue(d.showing("confirmEndTaskButton"), "no confirmation offered");
        String warning = d.text("endTaskWarning");
        assertTrue(warning.contains("cannot go back") && warning.contains("next task"), warning);

        d.press("confirmEndTaskButton");
        d.awaitTask("The empty shop on Mill Street");
        assertTrue(d.workspaces.getFirst().closed(), "the ended task's workspace was not closed");
    }

    /**
     * After the hand-in nothing is running: the invigilator screen says the answers were handed
     * in and where the package is, and offers the next candidate or exit, not pause or end task.
     */
    @Test
    void afterHandIn_invigilatorScreenSaysWhereThePackageIsAndOffersNextCandidateOrExit(FxRobot robot)
            throws Exception {
        FlowDriver d = driver();
        Path out = temp.resolve("out");
        d.open(FlowDriver.buildDemoSitting(temp), new ManualClock(), false);
        d.setUp(FlowDriver.demoPin(), out);
        handIn(d, "D1002");
        Path written = packages(out).getFirst();

        d.openInvigilator();

        String state = d.text("invigilatorState");
        assertTrue(state.contains("handed in"), state);
        assertTrue(state.contains(written.toString()), "package not named: " + state);
        assertFalse(state.contains("exam is running"), state);
        for (String offered : List.of("pauseButton", "addTimeButton", "endTaskButton")) {
            assertFalse(d.showing(offered), offered + " offered after the hand-in");
        }
        assertTrue(d.showing("nextCandidateButton"), "no next candidate offered");
        assertTrue(d.showing("exitButton"), "no exit offered");
        // what the invigilator does next is in view at once, above the logs, not below the scroll fold
        assertTrue(d.inViewOf("invigilatorScroller", "nextCandidateButton"), "next candidate below the fold");
        assertTrue(d.inViewOf("invigilatorScroller", "exitButton"), "exit below the fold");
    }

    /** The same in large print (D1003's accommodation in the demo roster), where the text takes more room. */
    @Test
    void afterHandIn_inLargePrint_nextCandidateAndExitAreInViewWithoutScrolling(FxRobot robot) throws Exception {
        FlowDriver d = driver();
        d.open(FlowDriver.buildDemoSitting(temp), new ManualClock(), false);
        d.setUp(FlowDriver.demoPin(), temp.resolve("out"));
        handIn(d, "D1003");
        d.openInvigilator();
        assertTrue(d.inViewOf("invigilatorScroller", "nextCandidateButton"), "next candidate below the fold");
        assertTrue(d.inViewOf("invigilatorScroller", "exitButton"), "exit below the fold");
    }

    /**
     * The next candidate sits at the same seat without restarting the client, behind the PIN, and
     * gets a sitting of their own: a second database, a second package, nothing left to recover.
     */
    @Test
    void nextCandidate_sameSeatNoRestart_eachSittingHasItsOwnDatabaseAndPackage(FxRobot robot) throws Exception {
        FlowDriver d = driver();
        Path out = temp.resolve("out");
        d.open(FlowDriver.buildDemoSitting(temp), new ManualClock(), false);
        d.setUp(FlowDriver.demoPin(), out);
        handIn(d, "D1002");
        d.openInvigilator();

        d.press("nextCandidateButton");

        d.await("candidateNumber", Node.class);
        assertEquals(FlowScreen.SIGN_IN, d.flow.screen());
        handIn(d, "D1001");
        List<Path> written = packages(out);
        assertEquals(2, written.size(), written.toString());
        ResponsePackageReader reader = new ResponsePackageReader(demoOwnerPrivateKey(), TrustPolicy.anySigner());
        List<String> candidates = written.stream().map(p -> {
            try {
                return reader.open(p).response().candidateNumber() + "/" + reader.open(p).response().formId();
            } catch (Exception e) {
                throw new AssertionError(p + ": " + e.getMessage(), e);
            }
        }).sorted().toList();
        // forms from src/demo/sitting.json
        assertEquals(List.of("D1001/A", "D1002/B"), candidates);
        ClientDataFolder data = new ClientDataFolder(temp.resolve("data"));
        try (Stream<Path> files = Files.list(data.sittings())) {
            assertEquals(2, files.filter(p -> p.toString().endsWith(SittingDatabase.SUFFIX)).count());
        }
        assertTrue(RecoveryScan.find(data).isEmpty(), "a handed-in sitting is offered for recovery");
    }

    /**
     * The focus list holds the candidate's focus losses only: the window settling as it opens is
     * no loss, and pauses, resumes and added time are listed as what they are, elsewhere.
     */
    @Test
    void focusList_onlyTheCandidatesFocusLosses_otherActionsListedAsWhatTheyAre(FxRobot robot) throws Exception {
        FlowDriver d = driver();
        d.open(FlowDriver.buildDemoSitting(temp), new ManualClock(), true);
        // the window manager takes focus away and back while the locked window goes full screen
        robot.interact(() -> com.sun.javafx.stage.WindowHelper.setFocused(stage, false));
        robot.interact(() -> com.sun.javafx.stage.WindowHelper.setFocused(stage, true));
        d.setUp(FlowDriver.demoPin(), temp.resolve("out"));
        d.signIn("D1001");
        d.press("startButton");
        d.awaitTask("A note to a neighbour");
        d.openInvigilator();
        d.press("pauseButton");
        d.press("pauseButton");
        d.press("addTimeButton");

        assertEquals(List.of(), items("focusLog"), "focus list");
        List<String> events = items("sittingEventLog");
        assertEquals(3, events.size(), events.toString());
        assertTrue(events.get(0).contains("Paused"), events.toString());
        assertTrue(events.get(1).contains("Resumed"), events.toString());
        assertTrue(events.get(2).contains("5 minutes added"), events.toString());

        d.press("closePanelButton");
        robot.interact(() -> com.sun.javafx.stage.WindowHelper.setFocused(stage, false));
        robot.interact(() -> com.sun.javafx.stage.WindowHelper.setFocused(stage, true));
        d.openInvigilator();
        List<String> focus = items("focusLog");
        assertEquals(2, focus.size(), focus.toString());
        assertTrue(focus.get(0).contains("Focus lost") && focus.get(1).contains("Focus returned"), focus.toString());
        assertEquals(3, items("sittingEventLog").size());
    }

    /** The time a crashed machine was down is listed as downtime, not as a loss of focus. */
    @Test
    void focusList_afterRecovery_downtimeListedAsDowntime(FxRobot robot) throws Exception {
        Path bundle = FlowDriver.buildDemoSitting(temp);
        ManualClock clock = new ManualClock();
        FlowDriver first = driver();
        first.open(bundle, clock, false);
        first.setUp(FlowDriver.demoPin(), temp.resolve("out"));
        first.signIn("D1002");
        first.press("startButton");
        first.awaitTask("The empty shop on Mill Street");
        WaitForAsyncUtils.sleep(1500, java.util.concurrent.TimeUnit.MILLISECONDS);
        robot.interact(() -> first.flow.closeQuietly());
        clock.advance(java.time.Duration.ofSeconds(200));

        FlowDriver second = driver();
        second.open(bundle, clock, false);
        second.type("recoveryPin", FlowDriver.demoPin());
        second.press("resumeButton");
        second.press("continueButton");
        second.awaitTask("The empty shop on Mill Street");
        second.openInvigilator();

        assertEquals(List.of(), items("focusLog"), "focus list");
        List<String> events = items("sittingEventLog");
        assertEquals(1, events.size(), events.toString());
        assertTrue(events.getFirst().contains("down for 3 minutes"), events.toString());
    }

    /**
     * Candidate numbers are matched as the roster's rules say: letter case does not matter (a
     * roster may not hold two numbers that differ only in case), and the sitting carries the
     * roster's spelling. A number not on the roster is refused in words for the candidate.
     */
    @Test
    void signIn_numberInOtherLetterCase_isTheRostersCandidate_unknownNumberRefusedForTheCandidate(FxRobot robot)
            throws Exception {
        FlowDriver d = driver();
        d.open(FlowDriver.buildDemoSitting(temp), SittingClock.system(), false);
        d.setUp(FlowDriver.demoPin(), temp.resolve("out"));

        d.signIn("x9999");
        d.awaitText("signInError", "is not on the list");
        String refusal = d.text("signInError");
        assertTrue(refusal.contains("your admission details") && refusal.contains("invigilator"), refusal);
        assertFalse(refusal.contains("candidate's") || refusal.contains("test owner"), refusal);

        d.signIn(" d1001 ");
        d.await("startButton", Node.class);
        assertEquals(FlowScreen.INSTRUCTIONS, d.flow.screen());
        assertEquals("Candidate D1001", d.text("stripWho"), "the roster's spelling is kept");
    }

    // ---- helpers ----

    /** One candidate's whole sitting, from sign-in to the finished screen, every task handed in at once. */
    private static void handIn(FlowDriver d, String candidate) {
        d.signIn(candidate);
        d.press("startButton");
        d.await("finishTaskButton", Node.class);
        d.finishTask();
        WaitForAsyncUtils.waitForFxEvents();
        d.await("finishTaskButton", Node.class);
        d.finishTask();
        d.press("questionnaireDone");
        d.check("confirmCheck");
        d.press("submitButton");
        d.await("finishedScreen", Node.class);
    }

    private List<String> items(String id) {
        WaitForAsyncUtils.waitForFxEvents();
        @SuppressWarnings("unchecked")
        ListView<String> list = new FxRobot().lookup("#" + id).queryAs(ListView.class);
        return List.copyOf(list.getItems());
    }

    private static List<Path> packages(Path out) throws Exception {
        try (Stream<Path> files = Files.list(out)) {
            return files.filter(p -> p.toString().endsWith(".inkresp")).sorted().toList();
        }
    }

    private static java.security.PrivateKey demoOwnerPrivateKey() throws Exception {
        return X25519.privateFromRaw(Hex.parse(Files.readString(DemoBundles.SOURCE.resolve(
                "keys/demo-only-not-secret-owner-encryption.x25519.hex")).strip()));
    }
}
