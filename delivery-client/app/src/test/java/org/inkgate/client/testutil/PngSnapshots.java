package org.inkgate.client.testutil;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import javafx.scene.Scene;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import javafx.scene.image.WritablePixelFormat;
import javax.imageio.ImageIO;

/** Writes a scene as a PNG without javafx-swing: snapshot, copy ARGB pixels, ImageIO. */
public final class PngSnapshots {

    private PngSnapshots() {
    }

    /** Takes the snapshot; call on the JavaFX application thread. */
    public static BufferedImage snapshot(Scene scene) {
        WritableImage image = scene.snapshot(null);
        int width = (int) image.getWidth();
        int height = (int) image.getHeight();
        PixelReader pixels = image.getPixelReader();
        // one bulk copy: pixel by pixel took seconds a picture at 1920x1080
        int[] argb = new int[width * height];
        pixels.getPixels(0, 0, width, height, WritablePixelFormat.getIntArgbInstance(), argb, 0, width);
        BufferedImage out = new BufferedImage(width, height, BufferedImage.TYPE_INT_ARGB);
        out.setRGB(0, 0, width, height, argb, 0, width);
        return out;
    }

    public static void write(BufferedImage image, Path file) throws IOException {
        Files.createDirectories(file.toAbsolutePath().getParent());
        if (!ImageIO.write(image, "png", file.toFile())) {
            throw new IOException("no PNG writer available for " + file);
        }
    }
}
