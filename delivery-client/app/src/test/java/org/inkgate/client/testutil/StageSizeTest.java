package org.inkgate.client.testutil;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.Scene;
import javafx.scene.layout.StackPane;
import javafx.stage.Screen;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * What an earlier test class can leave on the shared stage (the lock's full screen, the practice
 * window's 960x640 minimum) is exactly what made the 1280x800 screenshot tests come out 1920 or
 * 400 pixels wide in a whole-module run: a size set with {@link StageSize} must hold regardless.
 */
@ExtendWith(ApplicationExtension.class)
class StageSizeTest {

    private Stage stage;
    private StageSize outer;

    @Start
    void start(Stage primary) {
        stage = primary;
        outer = StageSize.set(primary, 640, 480);
        stage.setScene(new Scene(new StackPane(), 640, 480));
        stage.show();
    }

    @AfterEach
    void restore(FxRobot robot) {
        robot.interact(outer::restore);
    }

    @Test
    void set_afterFullScreenAndAMinimumSizeLeftBehind_givesExactlyTheSizeAndRestoreGivesTheStateBack(FxRobot robot) {
        robot.interact(() -> {
            stage.setMinWidth(960);
            stage.setMinHeight(640);
            stage.setFullScreen(true);
        });
        WaitForAsyncUtils.waitForFxEvents();
        AtomicReference<StageSize> held = new AtomicReference<>();
        robot.interact(() -> held.set(StageSize.set(stage, 400, 300)));
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(stage.isFullScreen(), "not full screen");
        assertEquals(400, stage.getScene().getWidth(), 0.5, "scene width");
        assertEquals(300, stage.getScene().getHeight(), 0.5, "scene height");

        robot.interact(held.get()::restore);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(stage.isFullScreen(), "full screen again, as it was found");
        assertEquals(960, stage.getMinWidth(), 0.0, "minimum width as it was found");
    }

    @Test
    void apply_windowLargerThanTheHeadlessScreen_saysWhereTheScreenSizeIsSet(FxRobot robot) {
        double tooWide = Screen.getPrimary().getBounds().getWidth() + 1;
        AtomicReference<Throwable> thrown = new AtomicReference<>();
        robot.interact(() -> thrown.set(assertThrows(IllegalStateException.class, () -> StageSize.apply(stage, tooWide, 300))));
        assertTrue(thrown.get().getMessage().contains("headless.geometry"), thrown.get().getMessage());
    }
}
