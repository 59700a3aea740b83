package org.inkgate.client.sitting.ui;

import org.inkgate.client.sitting.course.FlowScreen;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.stage.Stage;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.sitting.open.SittingBundleOpener;
import org.inkgate.client.sitting.open.SittingLoad;
import org.inkgate.client.testutil.DemoBundles;
import org.inkgate.client.testutil.Tampering;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.trust.TrustPolicy;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The real sitting flow, headless, on the demo sitting bundle (built from src/demo by the real
 * build step's code) with a plain-text workspace standing in for the editor. Expected values come
 * from the bundle itself (src/demo/exam.json and sitting.json), never from the flow.
 */
@ExtendWith(ApplicationExtension.class)
class SittingFlowTest {

    @TempDir
    Path temp;
    private Stage stage;
    private final List<FlowDriver> drivers = new ArrayList<>();

    @Start
    void start(Stage primary) {
        this.stage = primary;
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

    @Test
    void open_tamperedBundle_showsTheReadersRefusalAndNothingElse(FxRobot robot) throws Exception {
        Path tampered = temp.resolve("tampered.inkexam");
        Tampering.flipByteInEntry(FlowDriver.buildDemoSitting(temp), "prompts/task-1-neighbour-note.md", tampered);
        FlowDriver d = driver();
        d.open(tampered, SittingClock.system(), false);

        String message = d.text("refusalMessage");
        assertTrue(message.contains("tampered.inkexam"), message);
        assertTrue(robot.lookup("#setupPin").tryQuery().isEmpty(), "set-up shown for a refused bundle");
        assertEquals(FlowScreen.REFUSED, d.flow.screen());
    }

    @Test
    void open_practiceBundle_isRefusedAsNotForALiveSitting(FxRobot robot) throws Exception {
        FlowDriver d = driver();
        d.open(DemoBundles.buildInto(temp), SittingClock.system(), false);

        assertTrue(d.text("refusalMessage").contains("practice bundle"), d.text("refusalMessage"));
    }

    @Test
    void open_bundleSignedByAnotherKey_isRefusedNamingTheFingerprint(FxRobot robot) throws Exception {
        Path bundle = FlowDriver.buildDemoSitting(temp);
        SittingLoad load = new SittingBundleOpener(Set.of("0000-0000-0000-0000-0000-0000-0000-0000")).open(bundle);

        assertTrue(load instanceof SittingLoad.Refused refused && refused.message().contains(FlowDriver.demoOwnerKey()),
                String.valueOf(load));
    }

    @Test
    void setUp_wrongPin_saysSoAndStaysOnSetUp(FxRobot robot) throws Exception {
        FlowDriver d = driver();
        d.open(FlowDriver.buildDemoSitting(temp), SittingClock.system(), false);

        d.setUp("000000", temp.resolve("out"));

        d.awaitText("setupError", "not this exam's invigilator PIN");
        assertEquals(FlowScreen.SETUP, d.flow.screen());
    }

    @Test
    void setUp_showsTheInstallationFingerprintAndWritesAnEnrolmentFileTheAdminToolAccepts(FxRobot robot)
            throws Exception {
        FlowDriver d = driver();
        d.open(FlowDriver.buildDemoSitting(temp), SittingClock.system(), false);
        d.await("setupPin", Node.class);
        // the key the client signs packages with, read independently of the screen
        String fingerprint = org.inkgate.client.sitting.submit.InstallationKey
                .loadOrCreate(new org.inkgate.client.sitting.store.ClientDataFolder(temp.resolve("data"))).fingerprint();

        assertEquals(fingerprint, d.text("setupInstallationFingerprint"));
        Path out = temp.resolve("out");
        d.type("setupOutput", out.toString());
        d.type("setupSeat", "Room 2, seat 14");
        d.press("setupWriteEnrolment");

        d.awaitText("setupEnrolmentStatus", "Enrolment file written");
        Path file = out.resolve("installation-" + fingerprint + ".inkenrol");
        var enrolment = org.inkgate.format.enrolment.InstallationEnrolment.read(file);
        assertEquals(fingerprint, enrolment.fingerprint());
        assertEquals("Room 2, seat 14", enrolment.machine());
        assertEquals(FlowScreen.SETUP, d.flow.screen(), "writing the file does not start the sitting");
    }

    @Test
    void setUp_exit_closesTheLockedWindowWithoutStartingASitting(FxRobot robot) throws Exception {
        FlowDriver d = driver();
        d.open(FlowDriver.buildDemoSitting(temp), SittingClock.system(), true);
        d.await("setupPin", Node.class);

        d.press("setupExit");

        assertTrue(d.exited.get(), "exit did not end the client");
        assertFalse(d.flow.lock().locked(), "the lock outlived the exit");
        assertFalse(stage.isShowing());
    }

    @Test
    void signIn_unknownCandidateNumber_saysItIsNotOnTheList(FxRobot robot) throws Exception {
        FlowDriver d = driver();
        d.open(FlowDriver.buildDemoSitting(temp), SittingClock.system(), false);
        d.setUp(FlowDriver.demoPin(), temp.resolve("out"));

        d.signIn("X9999");

        d.awaitText("signInError", "not on the list for this exam");
        assertEquals(FlowScreen.SIGN_IN, d.flow.screen());
    }

    @Test
    void fullSitting_demoCandidate_handsInAPackageTheFormatReaderOpens(FxRobot robot) throws Exception {
        FlowDriver d = driver();
        Path out = temp.resolve("out");
        d.open(FlowDriver.buildDemoSitting(temp), SittingClock.system(), true);
        d.setUp(FlowDriver.demoPin(), out);
        // D1001 sits form A (src/demo/sitting.json): neighbour-note, then mill-street-shop (exam.json)
        d.signIn("D1001");
        d.press("startButton");

        d.awaitTask("A note to a neighbour");
        d.typeInEditor("Dear Sam, thank you.");
        String first = d.workspace().text();
        // another program takes the screen and gives it back (set as the platform does; Monocle cannot switch windows)
        robot.interact(() -> com.sun.javafx.stage.WindowHelper.setFocused(stage, false));
        robot.interact(() -> com.sun.javafx.stage.WindowHelper.setFocused(stage, true));
        assertEquals(2, d.flow.focusLines().size(), d.flow.focusLines().toString());
        d.finishTask();

        d.awaitTask("The empty shop on Mill Street");
        d.typeInEditor("The shop could be a cafe.");
        String second = d.workspace().text();
        d.finishTask();

        // post-task questionnaire "after-the-tasks" (exam.json): answer the first item with point 4
        d.press("q-clear-instructions-4");
        d.press("questionnaireDone");

        // review shows each task's word count (WCAG 3.3.4) and hands in only after the confirmation
        Node submit = d.await("submitButton", Node.class);
        assertTrue(submit.isDisabled(), "hand-in possible without confirming");
        List<String> rows = robot.lookup("#reviewRows").queryAs(javafx.scene.layout.VBox.class).getChildren().stream()
                .map(n -> n.getAccessibleText()).toList();
        assertEquals(2, rows.size());
        assertTrue(rows.get(0).contains("4 words"), rows.get(0));
        assertTrue(rows.get(1).contains("6 words"), rows.get(1));
        d.check("confirmCheck");
        d.press("submitButton");
        d.await("finishedScreen", Node.class);

        Path[] packages;
        try (Stream<Path> files = Files.list(out)) {
            packages = files.filter(p -> p.toString().endsWith(".inkresp")).toArray(Path[]::new);
        }
        assertEquals(1, packages.length);
        OpenedResponse opened = new ResponsePackageReader(demoOwnerPrivateKey(), TrustPolicy.anySigner()).open(packages[0]);
        assertEquals("D1001", opened.response().candidateNumber());
        assertEquals("A", opened.response().formId());
        List<TaskResponse> tasks = opened.response().tasks();
        assertEquals(List.of("neighbour-note", "mill-street-shop"), tasks.stream().map(TaskResponse::taskId).toList());
        assertEquals(List.of("with-resources", "without-resources"), tasks.stream().map(TaskResponse::conditionId).toList());
        assertEquals(first, tasks.get(0).text());
        assertEquals(second, tasks.get(1).text());
        assertEquals(TaskResponse.EndReason.SUBMITTED, tasks.get(0).endReason());
        assertEquals("4", opened.response().questionnaires().getFirst().answers().get("clear-instructions"));
        List<String> types = opened.events().stream().map(ProcessEvent::type).toList();
        assertTrue(types.containsAll(List.of("sitting.start", "task.start", "text.insert", "task.end", "sitting.end",
                "focus.lost", "focus.returned")), types.toString());
    }

    @Test
    void handIn_outputFolderGone_showsRetryAndDeliversOnceItIsBack(FxRobot robot) throws Exception {
        FlowDriver d = driver();
        Path out = temp.resolve("stick");
        d.open(FlowDriver.buildDemoSitting(temp), SittingClock.system(), false);
        d.setUp(FlowDriver.demoPin(), out);
        d.signIn("D1002");
        d.press("startButton");
        d.awaitTask("The empty shop on Mill Street");
        d.finishTask();
        d.awaitTask("A note to a neighbour");
        d.finishTask();
        d.press("questionnaireDone");
        d.check("confirmCheck");
        // the stick is pulled out before the hand-in
        Files.delete(out);
        d.press("submitButton");

        d.awaitText("submitError", "not there");
        assertTrue(d.text("submitStatus").contains("safe on this machine"), d.text("submitStatus"));
        Files.createDirectories(out);
        d.press("retryButton");
        d.await("finishedScreen", Node.class);
        try (Stream<Path> files = Files.list(out)) {
            assertEquals(1, files.filter(p -> p.toString().endsWith(".inkresp")).count());
        }
    }

    @Test
    void invigilator_pauseAddTimeAndEndTask_stopTheClockAddTimeAndMoveOn(FxRobot robot) throws Exception {
        ManualClock clock = new ManualClock();
        FlowDriver d = driver();
        d.open(FlowDriver.buildDemoSitting(temp), clock, false);
        d.setUp(FlowDriver.demoPin(), temp.resolve("out"));
        d.signIn("D1001");
        d.press("startButton");
        d.awaitTask("A note to a neighbour");
        // the caret is in the editor without anyone clicking it
        WaitForAsyncUtils.waitFor(10, java.util.concurrent.TimeUnit.SECONDS,
                () -> stage.getScene().getFocusOwner() != null && "editor".equals(stage.getScene().getFocusOwner().getId()));
        // the first task allows 1200 s (exam.json) and D1001 has no extra time (sitting.json)
        d.awaitText("timeLeft", "20:00");

        clock.advance(java.time.Duration.ofSeconds(100));
        d.awaitText("timeLeft", "18:20");

        robot.press(javafx.scene.input.KeyCode.CONTROL, javafx.scene.input.KeyCode.SHIFT, javafx.scene.input.KeyCode.F12)
                .release(javafx.scene.input.KeyCode.F12, javafx.scene.input.KeyCode.SHIFT, javafx.scene.input.KeyCode.CONTROL);
        d.type("pinField", "111111");
        d.press("pinOk");
        d.awaitText("pinError", "not the invigilator PIN");
        d.type("pinField", FlowDriver.demoPin());
        d.press("pinOk");
        d.await("invigilatorPanel", Node.class);

        d.press("pauseButton");
        assertTrue(robot.lookup("#pausedCover").tryQuery().isPresent(), "no pause cover");
        assertTrue(d.text("invigilatorState").contains("PAUSED"), d.text("invigilatorState"));
        assertFalse(d.workspace().textEditable(), "editor still editable while paused");
        clock.advance(java.time.Duration.ofSeconds(300));
        WaitForAsyncUtils.sleep(500, java.util.concurrent.TimeUnit.MILLISECONDS);
        d.awaitText("timeLeft", "18:20");

        d.press("pauseButton");
        assertTrue(robot.lookup("#pausedCover").tryQuery().isEmpty(), "pause cover still shown");
        assertTrue(d.workspace().textEditable());

        robot.interact(() -> robot.lookup("#addMinutes").queryAs(javafx.scene.control.Spinner.class).getValueFactory()
                .setValue(5));
        d.press("addTimeButton");
        d.awaitText("timeLeft", "23:20");
        d.awaitText("announcement", "5 minutes were added");

        d.press("endTaskButton");
        d.press("confirmEndTaskButton");
        d.awaitTask("The empty shop on Mill Street");
        assertTrue(d.workspaces.getFirst().closed(), "the ended task's workspace was not closed");
    }

    @Test
    void timer_warningsAndTimeUp_announceThenEndTheTask(FxRobot robot) throws Exception {
        ManualClock clock = new ManualClock();
        FlowDriver d = driver();
        d.open(FlowDriver.buildDemoSitting(temp), clock, false);
        d.setUp(FlowDriver.demoPin(), temp.resolve("out"));
        d.signIn("D1001");
        d.press("startButton");
        d.awaitTask("A note to a neighbour");

        // warnings at 5 and 1 minutes before the end of 1200 s (exam.json)
        clock.advance(java.time.Duration.ofSeconds(1200 - 300));
        d.awaitText("announcement", "5 minutes left");
        clock.advance(java.time.Duration.ofSeconds(240));
        d.awaitText("announcement", "1 minute left");
        clock.advance(java.time.Duration.ofSeconds(60));
        d.awaitText("announcement", "time for this task is up");
        assertFalse(d.workspace().textEditable(), "editor editable after time-up");
        d.awaitTask("The empty shop on Mill Street");
    }

    @Test
    void recovery_abandonedSitting_resumesTheSameTaskWithItsText(FxRobot robot) throws Exception {
        Path bundle = FlowDriver.buildDemoSitting(temp);
        ManualClock clock = new ManualClock();
        FlowDriver first = driver();
        first.open(bundle, clock, false);
        first.setUp(FlowDriver.demoPin(), temp.resolve("out"));
        first.signIn("D1002");
        first.press("startButton");
        // D1002 sits form B: mill-street-shop first (sitting.json, exam.json)
        first.awaitTask("The empty shop on Mill Street");
        first.typeInEditor("Saved before the crash.");
        String typed = first.workspace().text();
        clock.advance(java.time.Duration.ofSeconds(100));
        // the log is durable within 0.5 s; wait well past that, then drop the window as a crash would
        WaitForAsyncUtils.sleep(1500, java.util.concurrent.TimeUnit.MILLISECONDS);
        robot.interact(() -> first.flow.closeQuietly());
        // the machine stays down for 200 s
        clock.advance(java.time.Duration.ofSeconds(200));

        FlowDriver second = driver();
        second.open(bundle, clock, false);
        second.await("recoveryScreen", Node.class);
        List<String> facts = robot.lookup("#recoveryFacts").queryAs(javafx.scene.layout.VBox.class).getChildren()
                .stream().map(n -> ((Label) n).getText()).toList();
        assertTrue(facts.get(0).contains("D1002"), facts.toString());
        assertTrue(facts.get(1).contains("The empty shop on Mill Street"), facts.toString());
        second.type("recoveryPin", "999999");
        second.press("resumeButton");
        second.awaitText("recoveryError", "not this exam's invigilator PIN");
        assertTrue(facts.get(2).contains("3 minutes ago"), facts.toString());
        // not credited: 1800 s (exam.json) - 100 s written - 200 s down = 1500 s = 25 minutes left
        second.type("recoveryPin", FlowDriver.demoPin());
        second.press("resumeButton");
        second.await("continueButton", Node.class);
        assertTrue(robot.lookup("#resumedScreen").queryAs(javafx.scene.Parent.class).lookupAll(".label").stream()
                .anyMatch(n -> ((Label) n).getText().contains("25 minutes left")), "time left after no credit");
        second.press("continueButton");
        second.awaitTask("The empty shop on Mill Street");
        assertEquals(typed, second.workspace().text());
    }

    /**
     * Found by the rehearsal (issue 14): the recovery screen proposed the data folder's outbox
     * rather than the output folder chosen at set-up (so unless retyped the package went somewhere
     * other than the room's stick), and never made it, so the hand-in failed with "not there". It
     * proposes the set-up's folder, remembered in the sitting's database, and makes and checks it
     * as at set-up (here the stick was taken out while the machine was down).
     */
    @Test
    void recovery_proposedOutputFolder_handInAfterResumingDelivers(FxRobot robot) throws Exception {
        Path bundle = FlowDriver.buildDemoSitting(temp);
        ManualClock clock = new ManualClock();
        FlowDriver first = driver();
        first.open(bundle, clock, false);
        first.setUp(FlowDriver.demoPin(), temp.resolve("stick"));
        first.signIn("D1002");
        first.press("startButton");
        first.awaitTask("The empty shop on Mill Street");
        first.typeInEditor("Written before the crash.");
        WaitForAsyncUtils.sleep(1500, java.util.concurrent.TimeUnit.MILLISECONDS);
        robot.interact(() -> first.flow.closeQuietly());
        Path stick = temp.resolve("stick");
        Files.delete(stick); // empty: nothing was handed in yet

        FlowDriver second = driver();
        second.open(bundle, clock, false);
        second.await("recoveryScreen", Node.class);
        Path proposed = Path.of(second.await("recoveryOutput", javafx.scene.control.TextField.class).getText());
        assertEquals(stick.toAbsolutePath(), proposed.toAbsolutePath(), "the recovery proposes the set-up's output folder");
        assertFalse(Files.exists(proposed), "the test needs a proposed folder that does not exist yet: " + proposed);
        second.type("recoveryPin", FlowDriver.demoPin());
        second.press("resumeButton");
        second.press("continueButton");
        second.awaitTask("The empty shop on Mill Street");
        second.finishTask();
        second.awaitTask("A note to a neighbour");
        second.finishTask();
        second.press("questionnaireDone");
        second.check("confirmCheck");
        second.press("submitButton");

        second.await("finishedScreen", Node.class);
        try (Stream<Path> files = Files.list(proposed)) {
            assertEquals(1, files.filter(p -> p.toString().endsWith(".inkresp")).count());
        }
    }

    private static java.security.PrivateKey demoOwnerPrivateKey() throws Exception {
        return X25519.privateFromRaw(Hex.parse(Files.readString(DemoBundles.SOURCE.resolve(
                "keys/demo-only-not-secret-owner-encryption.x25519.hex")).strip()));
    }
}
