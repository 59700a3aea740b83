package org.inkgate.admin.testutil;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import javafx.scene.Scene;

/**
 * The admin window's screenshots: the client's scene-to-PNG helper, with the files going to the
 * folder named by {@code inkgate.screenshots.dir}, else target/screenshots.
 */
public final class PngSnapshots {

    public static final String DIR_PROPERTY = "inkgate.screenshots.dir";

    private PngSnapshots() {
    }

    /** Takes the snapshot; call on the JavaFX application thread. */
    public static BufferedImage snapshot(Scene scene) {
        return org.inkgate.client.testutil.PngSnapshots.snapshot(scene);
    }

    /** Saves the image under the screenshot folder; returns the file. */
    public static Path save(BufferedImage image, String name) throws IOException {
        Path file = Path.of(System.getProperty(DIR_PROPERTY, "target/screenshots")).resolve(name);
        org.inkgate.client.testutil.PngSnapshots.write(image, file);
        return file;
    }
}
