package org.inkgate.client.sitting.ui.lock;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import javafx.event.Event;
import javafx.scene.Scene;
import javafx.scene.control.TextField;
import javafx.scene.input.ClipboardContent;
import javafx.scene.input.DragEvent;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCombination;
import javafx.scene.input.KeyEvent;
import javafx.scene.input.TransferMode;
import javafx.scene.layout.StackPane;
import javafx.stage.Stage;
import javafx.stage.WindowEvent;
import org.inkgate.client.testutil.StageSize;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** Each piece of the lock on a real (headless) stage: applied, working, and undone by release. */
@ExtendWith(ApplicationExtension.class)
class StageLockTest {

    private Stage stage;
    private TextField field;
    private final List<String> focusEvents = new ArrayList<>();
    private final AtomicLong clock = new AtomicLong(1_000);
    private final List<KeyEvent> seen = new ArrayList<>();
    private StageSize before;

    @Start
    void start(Stage primary) {
        stage = primary;
        // an ordinary 400x300 window, whatever an earlier test class left on the shared stage
        before = StageSize.set(primary, 400, 300);
        field = new TextField();
        field.addEventHandler(KeyEvent.ANY, seen::add);
        stage.setScene(new Scene(new StackPane(field), 400, 300));
        stage.show();
    }

    @AfterEach
    void restore(FxRobot robot) {
        robot.interact(before::restore);
    }

    @BeforeEach
    void clear() {
        focusEvents.clear();
        seen.clear();
    }

    private StageLock lock(FxRobot robot) {
        StageLock[] lock = new StageLock[1];
        robot.interact(() -> lock[0] = StageLock.apply(stage, new StageLock.FocusListener() {
            @Override
            public void focusLost() {
                focusEvents.add("lost");
            }

            @Override
            public void focusReturned(long awayMillis) {
                focusEvents.add("returned " + awayMillis);
            }
        }, clock::get));
        return lock[0];
    }

    @Test
    void apply_stage_isFullScreenOnTopWithNoExitKeyAndNoHint(FxRobot robot) {
        StageLock lock = lock(robot);
        try {
            assertEquals(KeyCombination.NO_MATCH, stage.getFullScreenExitKeyCombination());
            assertEquals("", stage.getFullScreenExitHint());
            assertTrue(stage.isAlwaysOnTop());
            assertTrue(stage.isFullScreen());
            assertTrue(lock.locked());
        } finally {
            robot.interact(lock::release);
        }
    }

    /**
     * A kiosk session started straight from the display server has no window manager, and full
     * screen is only a request to one: the window must take the screen's bounds itself (issue 13).
     * The headless platform resizes a full-screen window itself (as a window manager would), so the
     * test reads the window's bounds at the moment full screen is asked for: they must already be
     * the screen's, set by the lock, not left to whatever honours the full-screen request.
     */
    @Test
    void apply_withoutAWindowManager_windowCoversTheWholeScreen(FxRobot robot) {
        robot.interact(() -> {
            StageSize.apply(stage, 400, 300);
            stage.setX(40);
            stage.setY(30);
        });
        javafx.geometry.Rectangle2D screen = javafx.stage.Screen.getPrimary().getBounds();
        List<String> atFullScreen = new ArrayList<>();
        javafx.beans.value.ChangeListener<Boolean> watch = (o, was, now) -> {
            if (now) {
                atFullScreen.add(stage.getX() + "," + stage.getY() + " " + stage.getWidth() + "x" + stage.getHeight());
            }
        };
        robot.interact(() -> stage.fullScreenProperty().addListener(watch));
        StageLock lock = lock(robot);
        try {
            WaitForAsyncUtils.waitForFxEvents();
            assertEquals(List.of(screen.getMinX() + "," + screen.getMinY() + " " + screen.getWidth() + "x" + screen.getHeight()),
                    atFullScreen, "the window's own bounds cover the screen before full screen is requested");
            assertEquals(screen.getMinX(), stage.getX(), 0.5, "x");
            assertEquals(screen.getMinY(), stage.getY(), 0.5, "y");
            assertEquals(screen.getWidth(), stage.getWidth(), 0.5, "width");
            assertEquals(screen.getHeight(), stage.getHeight(), 0.5, "height");
            assertEquals(screen.getWidth(), stage.getScene().getWidth(), 0.5, "the scene fills the window");
        } finally {
            robot.interact(lock::release);
            robot.interact(() -> stage.fullScreenProperty().removeListener(watch));
        }
        assertEquals(400, stage.getWidth(), 0.5, "release gives the window its size back");
    }

    @Test
    void closeRequest_whileLocked_isConsumedAndStageStaysOpen(FxRobot robot) {
        StageLock lock = lock(robot);
        try {
            robot.interact(() -> Event.fireEvent(stage, new WindowEvent(stage, WindowEvent.WINDOW_CLOSE_REQUEST)));
            WaitForAsyncUtils.waitForFxEvents();
            assertTrue(stage.isShowing());
        } finally {
            robot.interact(lock::release);
        }
    }

    @Test
    void blockedShortcuts_whileLocked_neverReachTheControl(FxRobot robot) {
        StageLock lock = lock(robot);
        try {
            // Alt+F4, Ctrl+W, Ctrl+Q, Ctrl+P (print), F11: each must be consumed before the field
            fire(robot, KeyCode.F4, false, true);
            fire(robot, KeyCode.W, true, false);
            fire(robot, KeyCode.Q, true, false);
            fire(robot, KeyCode.P, true, false);
            fire(robot, KeyCode.F11, false, false);
            assertTrue(seen.isEmpty(), "blocked keys reached the field: " + seen);
            // ordinary typing and Escape (closes pop-ups) still arrive
            fire(robot, KeyCode.A, false, false);
            fire(robot, KeyCode.ESCAPE, false, false);
            assertEquals(2, seen.size());
        } finally {
            robot.interact(lock::release);
        }
    }

    @Test
    void release_afterLock_letsShortcutsAndCloseThroughAgain(FxRobot robot) {
        StageLock lock = lock(robot);
        robot.interact(lock::release);
        assertFalse(lock.locked());
        assertFalse(stage.isAlwaysOnTop());
        fire(robot, KeyCode.W, true, false);
        assertEquals(1, seen.size());
    }

    @Test
    void dragIntoWindow_whileLocked_isConsumed(FxRobot robot) {
        StageLock lock = lock(robot);
        List<DragEvent> dropped = new ArrayList<>();
        robot.interact(() -> field.addEventHandler(DragEvent.ANY, dropped::add));
        try {
            robot.interact(() -> {
                ClipboardContent content = new ClipboardContent();
                content.putString("outside text");
                DragEvent drop = new DragEvent(DragEvent.DRAG_DROPPED, null, 10, 10, 10, 10, TransferMode.COPY, null,
                        null, null);
                Event.fireEvent(field, drop);
            });
            assertTrue(dropped.isEmpty(), "a drop reached the field");
        } finally {
            robot.interact(lock::release);
        }
    }

    @Test
    void focusLostAndReturned_whileLocked_reportedWithTimeAway(FxRobot robot) {
        robot.interact(() -> com.sun.javafx.stage.WindowHelper.setFocused(stage, true));
        StageLock lock = lock(robot);
        try {
            // Monocle does not move focus between windows, so the test sets the window's focus state the
            // way the platform does when another program takes the screen and gives it back
            robot.interact(() -> com.sun.javafx.stage.WindowHelper.setFocused(stage, false));
            clock.addAndGet(4_200);
            robot.interact(() -> com.sun.javafx.stage.WindowHelper.setFocused(stage, true));
            WaitForAsyncUtils.waitForFxEvents();
            assertEquals(List.of("lost", "returned 4200"), focusEvents);
            assertTrue(stage.isFullScreen(), "full screen not re-entered after focus returned");
        } finally {
            robot.interact(lock::release);
        }
    }

    private void fire(FxRobot robot, KeyCode code, boolean shortcut, boolean alt) {
        robot.interact(() -> {
            field.requestFocus();
            KeyEvent press = new KeyEvent(KeyEvent.KEY_PRESSED, "", "", code, false, shortcut, alt, false);
            Event.fireEvent(field, press);
        });
        WaitForAsyncUtils.waitForFxEvents();
    }
}
