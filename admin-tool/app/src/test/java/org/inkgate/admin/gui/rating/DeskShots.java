package org.inkgate.admin.gui.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.awt.image.BufferedImage;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import javafx.application.Platform;
import javafx.scene.Scene;
import org.inkgate.admin.testutil.PngSnapshots;
import org.testfx.api.FxRobot;
import org.testfx.util.WaitForAsyncUtils;

/** Waiting for the desk's store calls, and its screenshots (docs/screenshots). */
final class DeskShots {

    private DeskShots() {
    }

    /** Waits until every queued store call has come back and the JavaFX thread is idle. */
    static void settle(DeskModel model) throws Exception {
        WaitForAsyncUtils.waitForFxEvents();
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> pending(model) == 0);
        WaitForAsyncUtils.waitForFxEvents();
    }

    private static int pending(DeskModel model) throws Exception {
        AtomicInteger n = new AtomicInteger();
        WaitForAsyncUtils.asyncFx(() -> n.set(model.pending().get())).get(5, TimeUnit.SECONDS);
        return n.get();
    }

    /** The picture at the desk's size; the stage is sized here, since test classes share the primary stage. */
    static void shoot(FxRobot robot, Scene scene, String name) throws Exception {
        AtomicReference<BufferedImage> image = new AtomicReference<>();
        robot.interact(() -> {
            scene.getWindow().setWidth(DeskWindow.WIDTH);
            scene.getWindow().setHeight(DeskWindow.HEIGHT);
        });
        WaitForAsyncUtils.waitForFxEvents();
        robot.interact(() -> image.set(PngSnapshots.snapshot(scene)));
        assertEquals((int) DeskWindow.WIDTH, image.get().getWidth());
        assertEquals((int) DeskWindow.HEIGHT, image.get().getHeight());
        PngSnapshots.save(image.get(), name);
        assert !Platform.isFxApplicationThread();
    }
}
