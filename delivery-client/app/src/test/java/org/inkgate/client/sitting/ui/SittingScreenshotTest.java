package org.inkgate.client.sitting.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.Node;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.testutil.PngSnapshots;
import org.inkgate.client.testutil.StageSize;
import org.inkgate.client.testutil.Tampering;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Screenshots of every screen of the sitting at 1280x800 with the real task workspace, written to
 * target/screenshots on every build; {@code -Dinkgate.screenshots.dir=/abs/path/docs/screenshots}
 * refreshes the committed ones (docs/screenshots/README.md). The sample answers are invented.
 */
@ExtendWith(ApplicationExtension.class)
class SittingScreenshotTest {

    static final String DIR_PROPERTY = "inkgate.screenshots.dir";
    static final int WIDTH = 1280;
    static final int HEIGHT = 800;

    @TempDir
    Path temp;
    private Stage stage;
    private StageSize before;

    /** The pictures are 1280x800 whatever an earlier test class left on the shared stage. */
    @Start
    void start(Stage primary) {
        this.stage = primary;
        before = StageSize.set(primary, WIDTH, HEIGHT);
    }

    @AfterEach
    void restore(FxRobot robot) {
        robot.interact(before::restore);
    }

    @Test
    void snapshots_wholeDemoSitting_writesOnePngPerScreen(FxRobot robot) throws Exception {
        ManualClock clock = new ManualClock();
        FlowDriver d = new FlowDriver(robot, stage, temp.resolve("data"));
        Path out = temp.resolve("out");
        d.openReal(FlowDriver.buildDemoSitting(temp), clock);
        d.await("setupPin", Node.class);
        save(robot, "sitting-1-setup.png");
        d.setUp(FlowDriver.demoPin(), out);

        d.await("candidateNumber", Node.class);
        d.type("candidateNumber", "D1001");
        save(robot, "sitting-2-sign-in.png");
        d.press("signInButton");

        d.await("startButton", Node.class);
        d.awaitText("toolsStatus", "ready");
        save(robot, "sitting-3-instructions.png");
        d.press("startButton");

        d.awaitTask("A note to a neighbour");
        d.typeInEditor("Dear Sam,\n\nThank you for offering to help while I am away. I leave on Saturday mornng"
                + " and I will be back on Sunday evening.");
        // 5-minute warning of the 1200 s task (exam.json)
        clock.advance(Duration.ofSeconds(1200 - 299));
        d.awaitText("announcement", "5 minutes left");
        WaitForAsyncUtils.sleep(1500, TimeUnit.MILLISECONDS);
        save(robot, "sitting-4-task-with-tools.png");

        robot.press(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.F12).release(KeyCode.F12, KeyCode.SHIFT, KeyCode.CONTROL);
        d.await("pinField", Node.class);
        save(robot, "sitting-5-invigilator-pin.png");
        d.type("pinField", FlowDriver.demoPin());
        d.press("pinOk");
        d.await("invigilatorPanel", Node.class);
        d.press("pauseButton");
        save(robot, "sitting-6-invigilator-panel.png");
        d.press("closePanelButton");
        save(robot, "sitting-7-paused.png");
        robot.press(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.F12).release(KeyCode.F12, KeyCode.SHIFT, KeyCode.CONTROL);
        d.type("pinField", FlowDriver.demoPin());
        d.press("pinOk");
        d.press("pauseButton");
        d.press("closePanelButton");
        d.finishTask();

        d.awaitTask("The empty shop on Mill Street");
        d.typeInEditor("The empty shop on Mill Street should become a repair cafe.");
        save(robot, "sitting-8-task-without-tools.png");
        d.finishTask();

        d.await("questionnaireDone", Node.class);
        d.press("q-clear-instructions-4");
        save(robot, "sitting-9-questionnaire.png");
        d.press("questionnaireDone");

        d.check("confirmCheck");
        save(robot, "sitting-10-review.png");
        Files.delete(out);
        d.press("submitButton");
        d.awaitText("submitError", "not there");
        save(robot, "sitting-11-hand-in-retry.png");
        Files.createDirectories(out);
        d.press("retryButton");
        d.await("finishedScreen", Node.class);
        save(robot, "sitting-12-finished.png");
        d.openInvigilator();
        save(robot, "sitting-16-invigilator-after-hand-in.png");
    }

    @Test
    void snapshots_accommodationsAndRecovery_writePngs(FxRobot robot) throws Exception {
        Path bundle = FlowDriver.buildDemoSitting(temp);
        ManualClock clock = new ManualClock();
        FlowDriver d = new FlowDriver(robot, stage, temp.resolve("data"));
        d.openReal(bundle, clock);
        d.setUp(FlowDriver.demoPin(), temp.resolve("out"));
        // D1003: large print, high contrast, 25% extra time (src/demo/sitting.json)
        d.signIn("D1003");
        // closing below while the spelling check is still warming up would interrupt LanguageTool's
        // class set-up and leave it unusable for every later test in this JVM
        d.awaitText("toolsStatus", "ready");
        d.press("startButton");
        d.awaitTask("A note to a neighbour");
        d.typeInEditor("Dear Sam,\n\nI am writing to ask a favour.");
        WaitForAsyncUtils.sleep(1500, TimeUnit.MILLISECONDS);
        save(robot, "sitting-13-large-print-high-contrast.png");
        robot.interact(() -> d.flow.closeQuietly());
        // the machine is down for three minutes (invented, for the picture)
        clock.advance(Duration.ofMinutes(3));

        FlowDriver again = new FlowDriver(robot, stage, temp.resolve("data"));
        again.openReal(bundle, clock);
        again.await("recoveryScreen", Node.class);
        again.check("creditDowntime");
        save(robot, "sitting-14-recovery.png");
        again.type("recoveryPin", FlowDriver.demoPin());
        again.press("resumeButton");
        again.await("continueButton", Node.class);
        save(robot, "sitting-15-resumed.png");
    }

    @Test
    void snapshot_tamperedBundle_writesRefusalPng(FxRobot robot) throws Exception {
        Path tampered = temp.resolve("exam.inkexam");
        Tampering.flipByteInEntry(FlowDriver.buildDemoSitting(temp), "prompts/task-1-neighbour-note.md", tampered);
        FlowDriver d = new FlowDriver(robot, stage, temp.resolve("data"));
        d.openReal(tampered, SittingClock.system());
        d.await("refusalMessage", Node.class);
        save(robot, "sitting-0-refused.png");
    }

    private void save(FxRobot robot, String name) throws Exception {
        WaitForAsyncUtils.waitForFxEvents();
        AtomicReference<BufferedImage> image = new AtomicReference<>();
        robot.interact(() -> image.set(PngSnapshots.snapshot(stage.getScene())));
        assertEquals(WIDTH, image.get().getWidth(), "picture width");
        assertEquals(HEIGHT, image.get().getHeight(), "picture height");
        String dir = System.getProperty(DIR_PROPERTY);
        Path folder = dir == null ? Path.of("target", "screenshots") : Path.of(dir);
        PngSnapshots.write(image.get(), folder.resolve(name));
    }
}
