package org.inkgate.client.sitting.ui.lock;

import java.util.List;
import java.util.Objects;
import java.util.function.LongSupplier;
import javafx.application.Platform;
import javafx.beans.value.ChangeListener;
import javafx.event.EventHandler;
import javafx.geometry.Rectangle2D;
import javafx.scene.Scene;
import javafx.scene.input.DragEvent;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.input.KeyEvent;
import javafx.stage.Screen;
import javafx.stage.Stage;
import javafx.stage.WindowEvent;

/**
 * What a JavaFX application can do to keep a candidate inside the sitting window: full screen
 * with no exit key and no exit hint, close requests consumed, always on top, the operating-system
 * shortcuts that reach the application consumed, nothing dropped in from outside, and every loss
 * and return of focus reported. It cannot block sequences the operating system keeps for itself
 * (docs/invigilator-guide.md says which, and what the OS's own kiosk setting must add).
 *
 * <p>The lock is applied to one stage and released only by {@link #release()}, which the flow
 * calls after an invigilator's exit or the finished screen.
 */
public final class StageLock {

    /** Reports focus changes; the flow logs them ({@code focus.lost}/{@code focus.returned}) and shows them to the invigilator. */
    public interface FocusListener {
        /** The window lost focus. */
        void focusLost();

        /** The window has focus again after {@code awayMillis}. */
        void focusReturned(long awayMillis);
    }

    /**
     * Key combinations consumed before any control sees them: window closing, quitting, printing,
     * saving, opening, new windows and tabs, help and full-screen toggles. Ctrl and Meta (Cmd) both.
     * Escape and the context-menu key stay free: with no full-screen exit key they cannot leave the
     * window, and candidates need them to close pop-ups and open suggestions from the keyboard.
     */
    public static final List<KeyCombination> BLOCKED_KEYS = List.of(
            new KeyCodeCombination(KeyCode.F4, KeyCombination.ALT_DOWN),
            new KeyCodeCombination(KeyCode.F4, KeyCombination.CONTROL_DOWN),
            new KeyCodeCombination(KeyCode.W, KeyCombination.SHORTCUT_DOWN),
            new KeyCodeCombination(KeyCode.Q, KeyCombination.SHORTCUT_DOWN),
            new KeyCodeCombination(KeyCode.P, KeyCombination.SHORTCUT_DOWN),
            new KeyCodeCombination(KeyCode.S, KeyCombination.SHORTCUT_DOWN),
            new KeyCodeCombination(KeyCode.O, KeyCombination.SHORTCUT_DOWN),
            new KeyCodeCombination(KeyCode.N, KeyCombination.SHORTCUT_DOWN),
            new KeyCodeCombination(KeyCode.T, KeyCombination.SHORTCUT_DOWN),
            new KeyCodeCombination(KeyCode.M, KeyCombination.SHORTCUT_DOWN),
            new KeyCodeCombination(KeyCode.H, KeyCombination.SHORTCUT_DOWN),
            new KeyCodeCombination(KeyCode.F, KeyCombination.SHORTCUT_DOWN, KeyCombination.CONTROL_DOWN),
            new KeyCodeCombination(KeyCode.F1),
            new KeyCodeCombination(KeyCode.F11),
            new KeyCodeCombination(KeyCode.PRINTSCREEN),
            new KeyCodeCombination(KeyCode.WINDOWS),
            new KeyCodeCombination(KeyCode.COMMAND));

    private final Stage stage;
    private final FocusListener focus;
    private final LongSupplier monoMillis;
    private final EventHandler<WindowEvent> closeGuard = WindowEvent::consume;
    private final EventHandler<KeyEvent> keyGuard = this::guardKey;
    private final EventHandler<DragEvent> dropGuard = this::refuseDrop;
    private final ChangeListener<Boolean> focusWatch = (obs, was, now) -> focusChanged(now);
    private final ChangeListener<Boolean> fullScreenWatch = (obs, was, now) -> fullScreenChanged(now);
    private final ChangeListener<Scene> sceneWatch = (obs, old, now) -> moveGuards(old, now);
    private boolean locked;
    private long lostAtMillis = -1;
    /** The window's bounds before the lock, given back on release. */
    private Rectangle2D before;

    private StageLock(Stage stage, FocusListener focus, LongSupplier monoMillis) {
        this.stage = Objects.requireNonNull(stage, "stage");
        this.focus = Objects.requireNonNull(focus, "focus");
        this.monoMillis = Objects.requireNonNull(monoMillis, "monoMillis");
    }

    /** Locks the stage now (call on the JavaFX thread, before or after it is shown). */
    public static StageLock apply(Stage stage, FocusListener focus) {
        return apply(stage, focus, () -> System.nanoTime() / 1_000_000);
    }

    /** As {@link #apply(Stage, FocusListener)}, with the clock that measures time away (tests pass a fake). */
    public static StageLock apply(Stage stage, FocusListener focus, LongSupplier monoMillis) {
        StageLock lock = new StageLock(stage, focus, monoMillis);
        lock.lock();
        return lock;
    }

    private void lock() {
        // the last window closing must not end the JavaFX runtime: only the flow decides when to exit
        Platform.setImplicitExit(false);
        // order matters: the exit key and hint are read when full screen starts
        stage.setFullScreenExitKeyCombination(KeyCombination.NO_MATCH);
        stage.setFullScreenExitHint("");
        stage.setAlwaysOnTop(true);
        before = new Rectangle2D(stage.getX(), stage.getY(), stage.getWidth(), stage.getHeight());
        coverScreen();
        stage.setFullScreen(true);
        stage.addEventFilter(WindowEvent.WINDOW_CLOSE_REQUEST, closeGuard);
        stage.addEventFilter(KeyEvent.ANY, keyGuard);
        stage.focusedProperty().addListener(focusWatch);
        stage.fullScreenProperty().addListener(fullScreenWatch);
        stage.sceneProperty().addListener(sceneWatch);
        moveGuards(null, stage.getScene());
        locked = true;
    }

    /** Ends the lock: the window can close and leave full screen again. */
    public void release() {
        if (!locked) {
            return;
        }
        locked = false;
        stage.removeEventFilter(WindowEvent.WINDOW_CLOSE_REQUEST, closeGuard);
        stage.removeEventFilter(KeyEvent.ANY, keyGuard);
        stage.focusedProperty().removeListener(focusWatch);
        stage.fullScreenProperty().removeListener(fullScreenWatch);
        stage.sceneProperty().removeListener(sceneWatch);
        moveGuards(stage.getScene(), null);
        stage.setAlwaysOnTop(false);
        stage.setFullScreen(false);
        if (before != null && before.getWidth() > 0 && before.getHeight() > 0) {
            stage.setX(before.getMinX());
            stage.setY(before.getMinY());
            stage.setWidth(before.getWidth());
            stage.setHeight(before.getHeight());
        }
    }

    /**
     * Gives the window the whole screen's bounds as well as asking for full screen: full screen is a
     * request to the window manager, and a kiosk session started straight from the display server
     * has none, so without this the window keeps its first size in a corner of the screen.
     */
    private void coverScreen() {
        Rectangle2D screen = screenOf(stage).getBounds();
        stage.setX(screen.getMinX());
        stage.setY(screen.getMinY());
        stage.setWidth(screen.getWidth());
        stage.setHeight(screen.getHeight());
    }

    private static Screen screenOf(Stage stage) {
        double w = Double.isNaN(stage.getWidth()) ? 1 : Math.max(1, stage.getWidth());
        double h = Double.isNaN(stage.getHeight()) ? 1 : Math.max(1, stage.getHeight());
        double x = Double.isNaN(stage.getX()) ? 0 : stage.getX();
        double y = Double.isNaN(stage.getY()) ? 0 : stage.getY();
        List<Screen> under = Screen.getScreensForRectangle(x, y, w, h);
        return under.isEmpty() ? Screen.getPrimary() : under.get(0);
    }

    /** True until {@link #release()}. */
    public boolean locked() {
        return locked;
    }

    /** True when the key event is one of {@link #BLOCKED_KEYS}. */
    public static boolean blocked(KeyEvent event) {
        for (KeyCombination combination : BLOCKED_KEYS) {
            if (combination.match(event)) {
                return true;
            }
        }
        return false;
    }

    private void guardKey(KeyEvent event) {
        if (event.getEventType() != KeyEvent.KEY_TYPED && blocked(event)) {
            event.consume();
        }
    }

    private void refuseDrop(DragEvent event) {
        // nothing may be dragged in from outside the window: a drop would bring outside text into the answer
        event.consume();
    }

    private void moveGuards(Scene from, Scene to) {
        if (from != null) {
            from.removeEventFilter(DragEvent.ANY, dropGuard);
        }
        if (to != null) {
            to.addEventFilter(DragEvent.ANY, dropGuard);
        }
    }

    private void focusChanged(boolean focused) {
        if (!focused) {
            if (lostAtMillis < 0) {
                lostAtMillis = monoMillis.getAsLong();
                focus.focusLost();
            }
        } else if (lostAtMillis >= 0) {
            long away = Math.max(0, monoMillis.getAsLong() - lostAtMillis);
            lostAtMillis = -1;
            focus.focusReturned(away);
            // full screen ends silently when another window takes focus; take it back
            if (!stage.isFullScreen()) {
                coverScreen();
                stage.setFullScreen(true);
            }
        }
    }

    private void fullScreenChanged(boolean fullScreen) {
        if (!fullScreen && locked) {
            // re-entered later, when the runtime is done with this change
            Platform.runLater(() -> {
                if (locked && !stage.isFullScreen()) {
                    coverScreen();
                    stage.setFullScreen(true);
                }
            });
        }
    }
}
