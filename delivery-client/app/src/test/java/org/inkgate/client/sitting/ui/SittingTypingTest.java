package org.inkgate.client.sitting.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Collection;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import com.sun.javafx.scene.SceneHelper;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.ButtonBase;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.stage.Stage;
import org.fxmisc.richtext.StyleClassedTextArea;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.task.TaskWorkspace;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Issue 13, through the real sitting flow with the real task workspace and checker, headless:
 * keys typed the moment "Begin" or "Yes, finish this task" is pressed reach the answer (in normal
 * and in large print), and after a crash the restored text is checked without the candidate
 * typing. Tasks, forms and display settings are the demo's (src/demo/exam.json, sitting.json).
 */
@ExtendWith(ApplicationExtension.class)
class SittingTypingTest {

    @TempDir
    Path temp;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    private FlowDriver driver() {
        return new FlowDriver(new FxRobot(), stage, temp.resolve("data"));
    }

    /** D1001: form A, normal print; D1003: form A, large print and high contrast (sitting.json). */
    @ParameterizedTest(name = "candidate {0}")
    @ValueSource(strings = {"D1001", "D1003"})
    void keysTypedAtOnceAfterBeginAndAfterFinishingATask_reachTheAnswer(String candidate, FxRobot robot) throws Exception {
        FlowDriver d = driver();
        d.openReal(FlowDriver.buildDemoSitting(temp), SittingClock.system());
        d.setUp(FlowDriver.demoPin(), temp.resolve("out"));
        d.signIn(candidate);
        Node begin = d.await("startButton", Node.class);

        // pressed, and typing starts at once: the keys are already queued when the button's action runs
        robot.interact(() -> {
            ((ButtonBase) begin).fire();
            typeNow(stage.getScene(), "Dear Sam, hi");
        });
        d.awaitTask("A note to a neighbour");
        awaitText(d, 1, "Dear Sam, hi");

        Node finish = d.await("finishTaskButton", Node.class);
        robot.interact(() -> ((ButtonBase) finish).fire());
        Node confirm = d.await("confirmFinishButton", Node.class);
        robot.interact(() -> {
            ((ButtonBase) confirm).fire();
            typeNow(stage.getScene(), "The shop");
        });
        d.awaitTask("The empty shop on Mill Street");
        awaitText(d, 2, "The shop");
    }

    @Test
    void keysTypedAfterTheTimeIsUp_goIntoNoTask(FxRobot robot) throws Exception {
        ManualClock clock = new ManualClock();
        FlowDriver d = driver();
        d.openReal(FlowDriver.buildDemoSitting(temp), clock);
        d.setUp(FlowDriver.demoPin(), temp.resolve("out"));
        d.signIn("D1001");
        d.press("startButton");
        d.awaitTask("A note to a neighbour");
        d.typeInEditor("Dear Sam,");
        // the first task allows 1200 s (exam.json); the candidate is still typing when it ends
        clock.advance(java.time.Duration.ofSeconds(1200));
        d.awaitText("announcement", "time for this task is up");
        robot.interact(() -> typeNow(stage.getScene(), " and more"));
        d.awaitTask("The empty shop on Mill Street");
        // once the next editor has focus, anything kept would have been handed to it
        WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> stage.getScene().getFocusOwner() != null
                && "answer".equals(stage.getScene().getFocusOwner().getId()));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("Dear Sam,", d.realWorkspaces.get(0).text());
        assertEquals("", d.realWorkspaces.get(1).text(), "keys typed after the time was up went into the next task");
    }

    /**
     * Keys as the platform delivers them to the scene (press, typed, release), before anything
     * queued after them runs. Space presses whatever button has focus, so a lost key shows.
     */
    private static void typeNow(Scene scene, String text) {
        for (char c : text.toCharArray()) {
            KeyCode code = c == ' ' ? KeyCode.SPACE : c == ',' ? KeyCode.COMMA
                    : KeyCode.getKeyCode(String.valueOf(Character.toUpperCase(c)));
            boolean shift = Character.isUpperCase(c);
            SceneHelper.processKeyEvent(scene, new KeyEvent(KeyEvent.KEY_PRESSED, KeyEvent.CHAR_UNDEFINED, "", code,
                    shift, false, false, false));
            SceneHelper.processKeyEvent(scene, new KeyEvent(KeyEvent.KEY_TYPED, String.valueOf(c), "", KeyCode.UNDEFINED,
                    shift, false, false, false));
            SceneHelper.processKeyEvent(scene, new KeyEvent(KeyEvent.KEY_RELEASED, KeyEvent.CHAR_UNDEFINED, "", code,
                    shift, false, false, false));
        }
    }

    @Test
    void recovery_restoredText_isCheckedWithoutTyping(FxRobot robot) throws Exception {
        Path bundle = FlowDriver.buildDemoSitting(temp);
        ManualClock clock = new ManualClock();
        FlowDriver first = driver();
        first.openReal(bundle, clock);
        first.setUp(FlowDriver.demoPin(), temp.resolve("out"));
        // D1002 sits form B: mill-street-shop first, with spelling suggestions (sitting.json, exam.json)
        first.signIn("D1002");
        first.press("startButton");
        first.awaitTask("The empty shop on Mill Street");
        String typed = "The shop is emty now. It could recieve visitors.";
        first.typeInEditor(typed);
        awaitText(first, 1, typed);
        // the log is durable within 0.5 s; wait well past that, then drop the window as a crash would
        WaitForAsyncUtils.sleep(1500, TimeUnit.MILLISECONDS);
        robot.interact(() -> first.flow.closeQuietly());
        clock.advance(java.time.Duration.ofSeconds(60));

        FlowDriver second = driver();
        second.openReal(bundle, clock);
        second.await("recoveryScreen", Node.class);
        // LanguageTool takes seconds to start: it starts while the invigilator reads the recovery screen
        assertTrue(second.flow.toolsStarted(), "the writing tools wait for the invigilator's PIN");
        second.type("recoveryPin", FlowDriver.demoPin());
        second.press("resumeButton");
        second.press("continueButton");
        second.awaitTask("The empty shop on Mill Street");
        awaitText(second, 1, typed);

        // no key is pressed: both misspellings are underlined ("emty" and "recieve": not English words, any dictionary)
        StyleClassedTextArea answer = robot.lookup("#answer").queryAs(StyleClassedTextArea.class);
        for (String word : new String[] {"emty", "recieve"}) {
            int at = typed.indexOf(word) + 1;
            AtomicReference<Collection<String>> style = new AtomicReference<>();
            try {
                WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> {
                    robot.interact(() -> style.set(answer.getStyleOfChar(at)));
                    return style.get().contains("spelling-flag");
                });
            } catch (java.util.concurrent.TimeoutException e) {
                throw new AssertionError("\"" + word + "\" of the restored text was never underlined; its style is "
                        + style.get(), e);
            }
        }
        assertEquals(typed, second.realWorkspaces.getLast().text(), "nothing was typed");
    }

    /** Waits until the n-th task workspace made holds exactly this text. */
    private static void awaitText(FlowDriver d, int n, String expected) {
        AtomicReference<String> seen = new AtomicReference<>("(no workspace)");
        try {
            WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> {
                WaitForAsyncUtils.waitForFxEvents();
                if (d.realWorkspaces.size() < n) {
                    return false;
                }
                TaskWorkspace w = d.realWorkspaces.get(n - 1);
                d.robot.interact(() -> seen.set(w.text()));
                return expected.equals(seen.get());
            });
        } catch (java.util.concurrent.TimeoutException e) {
            throw new AssertionError("the answer holds \"" + seen.get() + "\", not the \"" + expected + "\" typed", e);
        }
    }
}
