package org.inkgate.client.task;

import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import javafx.scene.Scene;
import javafx.stage.Stage;
import org.testfx.api.FxRobot;
import org.testfx.util.WaitForAsyncUtils;

/** Puts a workspace on a test stage at 1280x800 and waits for things to settle. */
final class Shown {

    private Shown() {
    }

    static WritingWorkspace show(FxRobot robot, Stage stage, TaskContext context, ClipboardAccess clipboard) {
        AtomicReference<WritingWorkspace> made = new AtomicReference<>();
        robot.interact(() -> {
            WritingWorkspace w = TaskWorkspaces.open(context, clipboard);
            stage.setScene(new Scene(w.view(), 1280, 800));
            stage.show();
            stage.requestFocus();
            w.focusEditor();
            made.set(w);
        });
        WaitForAsyncUtils.waitForFxEvents();
        return made.get();
    }

    /** Waits (polling, at most 20 s) until the condition holds; fails with the message otherwise. */
    static void until(String what, BooleanSupplier condition) {
        try {
            WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> {
                WaitForAsyncUtils.waitForFxEvents();
                return condition.getAsBoolean();
            });
        } catch (Exception e) {
            throw new AssertionError("timed out waiting for: " + what, e);
        }
    }

    static void onFx(FxRobot robot, Runnable r) {
        robot.interact(r);
        WaitForAsyncUtils.waitForFxEvents();
    }
}
