package org.inkgate.client.sitting.ui;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.Node;
import javafx.scene.control.ListView;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.client.testutil.LayoutCheck;
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
 * Issue 13, "screens that fit": every screen of the demo sitting, through the real flow and the
 * real task workspace, at the three window sizes a test centre meets (1024x768, the smallest
 * laptop or projector mode; 1280x800; 1920x1080), in normal print (D1001) and in large print with
 * high contrast (D1003, src/demo/sitting.json), checked by {@link LayoutCheck}: no control cut off
 * or below the fold, no text shortened. Every screen at every size is also written to
 * target/screenshots/fit/ so a person can look. The resource panel's glossary and dictionary
 * pages, which the demo sitting does not offer, are walked the same way by
 * {@code task.PanelFitTest}. Every problem is collected before the test fails, so one run names them all.
 */
@ExtendWith(ApplicationExtension.class)
class ScreensFitTest {

    private static final int WORKING_WIDTH = 1280;
    private static final int WORKING_HEIGHT = 800;

    @TempDir
    Path temp;
    private Stage stage;
    private StageSize before;
    private final List<String> problems = new ArrayList<>();

    /** The flow is driven at its own 1280x800; each check below gives the window its sizes in turn. */
    @Start
    void start(Stage primary) {
        this.stage = primary;
        before = StageSize.set(primary, WORKING_WIDTH, WORKING_HEIGHT);
    }

    @AfterEach
    void restore(FxRobot robot) {
        robot.interact(before::restore);
    }

    @Test
    void everyScreen_normalPrint_fitsAtEverySize(FxRobot robot) throws Exception {
        walk(robot, "D1001", "normal");
    }

    @Test
    void everyScreen_largePrintHighContrast_fitsAtEverySize(FxRobot robot) throws Exception {
        walk(robot, "D1003", "large-print-high-contrast");
    }

    private void walk(FxRobot robot, String candidate, String print) throws Exception {
        Path bundle = FlowDriver.buildDemoSitting(temp);
        ManualClock clock = new ManualClock();
        FlowDriver d = new FlowDriver(robot, stage, temp.resolve("data"));
        Path out = temp.resolve("out");
        d.openReal(bundle, clock);
        d.await("setupPin", Node.class);
        fits(robot, print, "01-setup");
        d.setUp(FlowDriver.demoPin(), out);

        d.await("candidateNumber", Node.class);
        d.type("candidateNumber", candidate);
        fits(robot, print, "02-sign-in");
        d.press("signInButton");

        d.await("startButton", Node.class);
        d.awaitText("toolsStatus", "ready");
        fits(robot, print, "03-instructions");
        d.press("startButton");

        d.awaitTask("A note to a neighbour");
        d.typeInEditor("Dear Sam,\n\nThank you for offering to help while I am away. I leave on Saturday mornng"
                + " and I will be back on Sunday evening.");
        robot.press(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.K).release(KeyCode.K, KeyCode.SHIFT, KeyCode.CONTROL);
        ListView<?> flags = d.await("flagList", ListView.class);
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> !flags.getItems().isEmpty());
        robot.interact(() -> flags.getSelectionModel().selectFirst());
        robot.interact(() -> flags.fireEvent(new javafx.scene.input.KeyEvent(javafx.scene.input.KeyEvent.KEY_PRESSED,
                "", "", KeyCode.ENTER, false, false, false, false)));
        ListView<?> suggestions = d.await("suggestionList", ListView.class);
        WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> !suggestions.getItems().isEmpty());
        fits(robot, print, "04-task-spelling-page");
        d.press("finishTaskButton");
        fits(robot, print, "05-task-finish-question");
        d.press("keepWritingButton");

        robot.press(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.F12).release(KeyCode.F12, KeyCode.SHIFT, KeyCode.CONTROL);
        d.await("pinField", Node.class);
        fits(robot, print, "06-invigilator-pin");
        d.type("pinField", FlowDriver.demoPin());
        d.press("pinOk");
        ListView<String> focus = d.await("focusLog", ListView.class);
        // a long afternoon: twelve invented focus losses, so the list has to scroll rather than grow off screen
        robot.interact(() -> {
            for (int i = 0; i < 12; i++) {
                focus.getItems().add(String.format("14:%02d:05  Focus lost: the window was left for 4 s", 10 + i));
            }
        });
        fits(robot, print, "07-invigilator-screen");
        d.press("pauseButton");
        d.press("closePanelButton");
        fits(robot, print, "08-paused-cover");
        robot.press(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.F12).release(KeyCode.F12, KeyCode.SHIFT, KeyCode.CONTROL);
        d.type("pinField", FlowDriver.demoPin());
        d.press("pinOk");
        d.press("pauseButton");
        d.press("closePanelButton");
        d.finishTask();

        d.awaitTask("The empty shop on Mill Street");
        d.typeInEditor("The empty shop on Mill Street should become a repair cafe.");
        fits(robot, print, "09-task-without-tools");
        d.finishTask();

        d.await("questionnaireDone", Node.class);
        fits(robot, print, "10-questionnaire");
        d.press("questionnaireDone");

        d.await("confirmCheck", Node.class);
        fits(robot, print, "11-review");
        d.check("confirmCheck");
        Files.delete(out);
        d.press("submitButton");
        d.awaitText("submitError", "not there");
        fits(robot, print, "12-hand-in-retry");
        Files.createDirectories(out);
        d.press("retryButton");
        d.await("finishedScreen", Node.class);
        fits(robot, print, "13-finished");
        d.openInvigilator();
        fits(robot, print, "14-invigilator-after-hand-in");

        assertTrue(problems.isEmpty(), problems.size() + " screen(s) do not fit:\n" + String.join("\n", problems));
    }

    @Test
    void recoveryScreen_bothPrints_fitsAtEverySize(FxRobot robot) throws Exception {
        for (String[] who : new String[][] {{"D1001", "normal"}, {"D1003", "large-print-high-contrast"}}) {
            Path data = temp.resolve("data-" + who[0]);
            Path bundle = FlowDriver.buildDemoSitting(temp);
            ManualClock clock = new ManualClock();
            FlowDriver d = new FlowDriver(robot, stage, data);
            d.openReal(bundle, clock);
            d.setUp(FlowDriver.demoPin(), temp.resolve("out"));
            d.signIn(who[0]);
            // no wait for the tools: closing while the spelling check still warms up must leave
            // LanguageTool usable for the rest of the JVM (packs.spelling.CloseDuringWarmUpTest)
            d.press("startButton");
            d.awaitTask("A note to a neighbour");
            d.typeInEditor("Dear Sam,");
            robot.interact(() -> d.flow.closeQuietly());
            clock.advance(Duration.ofMinutes(3));
            FlowDriver again = new FlowDriver(robot, stage, data);
            again.openReal(bundle, clock);
            again.await("recoveryScreen", Node.class);
            again.check("creditDowntime");
            fits(robot, who[1], "15-recovery");
            again.type("recoveryPin", FlowDriver.demoPin());
            again.press("resumeButton");
            again.await("continueButton", Node.class);
            fits(robot, who[1], "16-resumed");
            robot.interact(() -> again.flow.closeQuietly());
        }
        assertTrue(problems.isEmpty(), problems.size() + " screen(s) do not fit:\n" + String.join("\n", problems));
    }

    /** The refusal of a bundle changed after signing: shown before any roster, so in normal print only. */
    @Test
    void refusedBundle_fitsAtEverySize(FxRobot robot) throws Exception {
        Path tampered = temp.resolve("exam.inkexam");
        Tampering.flipByteInEntry(FlowDriver.buildDemoSitting(temp), "prompts/task-1-neighbour-note.md", tampered);
        FlowDriver d = new FlowDriver(robot, stage, temp.resolve("data"));
        d.openReal(tampered, new ManualClock());
        d.await("refusalMessage", Node.class);
        fits(robot, "normal", "00-refused");
        assertTrue(problems.isEmpty(), problems.size() + " screen(s) do not fit:\n" + String.join("\n", problems));
    }

    /** Checks the screen now showing at every size, writes its picture, and goes back to the working size. */
    private void fits(FxRobot robot, String print, String screen) throws Exception {
        for (int[] size : LayoutCheck.SIZES) {
            robot.interact(() -> StageSize.apply(stage, size[0], size[1]));
            WaitForAsyncUtils.waitForFxEvents();
            WaitForAsyncUtils.sleep(150, TimeUnit.MILLISECONDS);
            WaitForAsyncUtils.waitForFxEvents();
            String where = screen + " at " + size[0] + "x" + size[1] + " in " + print;
            AtomicReference<List<String>> found = new AtomicReference<>();
            AtomicReference<BufferedImage> image = new AtomicReference<>();
            robot.interact(() -> {
                found.set(LayoutCheck.problems(stage.getScene()));
                image.set(PngSnapshots.snapshot(stage.getScene()));
            });
            if (image.get().getWidth() != size[0] || image.get().getHeight() != size[1]) {
                problems.add(where + ": the window did not take the size (" + image.get().getWidth() + "x"
                        + image.get().getHeight() + ")");
            }
            if (!found.get().isEmpty()) {
                problems.add(where + ":\n    " + String.join("\n    ", found.get()));
            }
            PngSnapshots.write(image.get(), Path.of("target", "screenshots", "fit",
                    print + "-" + size[0] + "x" + size[1] + "-" + screen + ".png"));
        }
        robot.interact(() -> StageSize.apply(stage, WORKING_WIDTH, WORKING_HEIGHT));
        WaitForAsyncUtils.waitForFxEvents();
    }
}
