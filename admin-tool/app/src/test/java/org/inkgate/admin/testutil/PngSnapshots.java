package org.inkgate.admin.testutil;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import javafx.scene.Scene;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import javax.imageio.ImageIO;

/**
 * Writes a scene as a PNG without javafx-swing: snapshot, copy ARGB pixels, ImageIO (the client's
 * test helper of the same name, copied: test classes of one module are not published to another).
 * Files go to the folder named by {@code inkgate.screenshots.dir}, else target/screenshots.
 */
public final class PngSnapshots {

    public static final String DIR_PROPERTY = "inkgate.screenshots.dir";

    private PngSnapshots() {
    }

    /** Takes the snapshot; call on the JavaFX application thread. */
    public static BufferedImage snapshot(Scene scene) {
        WritableImage image = scene.snapshot(null);
        int width = (int) image.getWidth();
        int height = (int) image.getHeight();
        PixelReader pixels = image.getPixelReader();
        BufferedImage out = new BufferedImage(width, height, BufferedImage.TYPE_INT_ARGB);
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                out.setRGB(x, y, pixels.getArgb(x, y));
            }
        }
        return out;
    }

    /** Saves the image under the screenshot folder; returns the file. */
    public static Path save(BufferedImage image, String name) throws IOException {
        Path dir = Path.of(System.getProperty(DIR_PROPERTY, "target/screenshots"));
        Files.createDirectories(dir);
        Path file = dir.resolve(name);
        if (!ImageIO.write(image, "png", file.toFile())) {
            throw new IOException("no PNG writer available for " + file);
        }
        return file;
    }
}
