package org.inkgate.analysis.mfrm.chart;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.function.Consumer;
import javax.imageio.ImageIO;
import org.jfree.svg.SVGGraphics2D;

/** One drawing routine, two outputs: an SVG element string and PNG bytes. */
final class ChartOutput {
    private ChartOutput() {
    }

    static String svg(int width, int height, Consumer<Graphics2D> painter) {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        prepare(g, width, height);
        painter.accept(g);
        g.dispose();
        return g.getSVGElement();
    }

    /** PNG at the given pixel size; needs no display (java.awt.headless=true is enough). */
    static byte[] png(int width, int height, Consumer<Graphics2D> painter) {
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        prepare(g, width, height);
        painter.accept(g);
        g.dispose();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            ImageIO.write(image, "png", out);
        } catch (IOException e) {
            throw new UncheckedIOException("PNG encoding failed in memory", e);
        }
        return out.toByteArray();
    }

    private static void prepare(Graphics2D g, int width, int height) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, width, height);
    }
}
