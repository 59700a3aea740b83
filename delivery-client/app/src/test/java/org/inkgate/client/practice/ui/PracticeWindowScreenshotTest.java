package org.inkgate.client.practice.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.Scene;
import javafx.scene.control.TextArea;
import javafx.stage.Stage;
import org.inkgate.client.practice.PracticeLoader;
import org.inkgate.client.testutil.DemoBundles;
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
 * Screenshots of the practice window at 1280x800, written to target/screenshots on every build.
 * To refresh the committed ones, give the folder: {@code -Dinkgate.screenshots.dir=/abs/path/docs/screenshots}
 * (see docs/screenshots/README.md).
 */
@ExtendWith(ApplicationExtension.class)
class PracticeWindowScreenshotTest {

    static final String DIR_PROPERTY = "inkgate.screenshots.dir";
    /** Invented sample text, so the screenshot shows the word count at work. */
    static final String SAMPLE = "Dear Sam,\n\nThank you so much for offering to help while I am away."
            + " I leave on Saturday morning and I will be back the following Sunday evening.\n\nCould you water"
            + " the tomato plants by the back door every second day?";

    @TempDir
    Path temp;
    private Stage stage;
    private StageSize before;

    /** The window's own size, whatever an earlier test class left on the shared stage. */
    @Start
    void start(Stage primary) {
        this.stage = primary;
        before = StageSize.set(primary, PracticeStage.WIDTH, PracticeStage.HEIGHT);
    }

    @AfterEach
    void restore(FxRobot robot) {
        robot.interact(before::restore);
    }

    @Test
    void snapshot_demoFormA_writes1280x800PracticeWindowPng(FxRobot robot) throws Exception {
        Scene scene = open(robot, DemoBundles.buildInto(temp));
        robot.interact(() -> robot.lookup("#editor").queryAs(TextArea.class).setText(SAMPLE));

        BufferedImage image = snapshot(robot, scene);

        assertEquals(1280, image.getWidth());
        assertEquals(800, image.getHeight());
        // the banner's tint (practice.css) proves the stylesheet was applied
        assertEquals(0xfff6e7bd, image.getRGB(4, 4));
        save(image, "practice-window.png");
    }

    @Test
    void snapshot_tamperedBundle_writes1280x800RefusalPng(FxRobot robot) throws Exception {
        Path tampered = temp.resolve("tampered.inkexam");
        Tampering.flipByteInEntry(DemoBundles.buildInto(temp), "prompts/task-1-neighbour-note.md", tampered);
        Scene scene = open(robot, tampered);

        BufferedImage image = snapshot(robot, scene);

        assertEquals(1280, image.getWidth());
        assertEquals(800, image.getHeight());
        save(image, "practice-window-refused.png");
    }

    private Scene open(FxRobot robot, Path bundle) {
        AtomicReference<Scene> scene = new AtomicReference<>();
        robot.interact(() -> scene.set(PracticeStage.show(stage, new PracticeLoader().load(bundle))));
        WaitForAsyncUtils.waitForFxEvents();
        return scene.get();
    }

    private static BufferedImage snapshot(FxRobot robot, Scene scene) {
        WaitForAsyncUtils.waitForFxEvents();
        AtomicReference<BufferedImage> image = new AtomicReference<>();
        robot.interact(() -> image.set(PngSnapshots.snapshot(scene)));
        return image.get();
    }

    private static void save(BufferedImage image, String name) throws Exception {
        PngSnapshots.write(image, Path.of("target", "screenshots", name));
        String dir = System.getProperty(DIR_PROPERTY);
        if (dir != null && !dir.isBlank()) {
            PngSnapshots.write(image, Path.of(dir, name));
        }
    }
}
