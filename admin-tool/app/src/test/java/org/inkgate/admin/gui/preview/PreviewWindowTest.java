package org.inkgate.admin.gui.preview;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.stage.Stage;
import org.inkgate.admin.core.bundling.PreviewBundle;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.testutil.DemoSource;
import org.inkgate.admin.testutil.PngSnapshots;
import org.inkgate.client.practice.PracticeLoader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The window half of {@code preview}, headless: the client's practice window under a plain preview banner. */
@ExtendWith(ApplicationExtension.class)
class PreviewWindowTest {

    @TempDir
    Path dir;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @Test
    void show_previewBundle_saysItIsAPreviewAndNotALockedSitting(FxRobot robot) throws Exception {
        var exam = ExamSourceReader.read(DemoSource.DEMO.resolve("exam-source"));
        PreviewBundle.Built built = PreviewBundle.build(exam, "ferry-complaint", "without-resources",
                dir.resolve("preview.inkexam"));
        AtomicReference<Scene> scene = new AtomicReference<>();
        robot.interact(() -> scene.set(PreviewStage.show(stage, new PracticeLoader().load(built.file()),
                "ferry-complaint", "without-resources")));
        // the primary stage is shared by every test class: an earlier one may have left it at 1024 wide
        robot.interact(() -> {
            stage.setWidth(1280);
            stage.setHeight(800);
        });
        WaitForAsyncUtils.waitForFxEvents();

        Node banner = robot.lookup("#previewBanner").query();
        assertTrue(banner.getAccessibleText().startsWith(PreviewStage.HEADLINE), banner.getAccessibleText());
        assertTrue(banner.getAccessibleText().contains("not locked"), banner.getAccessibleText());
        assertTrue(robot.lookup(PreviewStage.HEADLINE).tryQueryAs(Label.class).isPresent()
                || robot.lookup(".preview-banner-headline").queryAs(Label.class).getText().equals(PreviewStage.HEADLINE));
        assertTrue(stage.getTitle().startsWith("PREVIEW (not a locked sitting)"), stage.getTitle());
        // the client's own practice banner stays too: it is the practice window underneath
        assertTrue(robot.lookup("#practiceBanner").tryQuery().isPresent());

        AtomicReference<BufferedImage> image = new AtomicReference<>();
        robot.interact(() -> image.set(PngSnapshots.snapshot(scene.get())));
        assertEquals(1280, image.get().getWidth());
        assertEquals(800, image.get().getHeight());
        PngSnapshots.save(image.get(), "admin-preview.png");
    }
}
