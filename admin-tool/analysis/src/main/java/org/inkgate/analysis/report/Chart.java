package org.inkgate.analysis.report;

import java.awt.Rectangle;
import java.util.Objects;
import org.inkgate.analysis.graphics.Drawing;
import org.jfree.chart.JFreeChart;

/**
 * One chart of the report: any Graphics2D drawing (a JFreeChart chart, or a chart with its own
 * drawing routine such as the Wright map), written into the HTML as inline SVG.
 */
public record Chart(String id, String title, String caption, Drawing drawing) {

    public Chart {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(drawing, "drawing");
        if (!id.matches("[A-Za-z][A-Za-z0-9_-]*")) {
            throw new IllegalArgumentException("chart id must start with a letter and hold letters, digits, - or _: "
                    + id);
        }
    }

    /** A chart drawn by JFreeChart on a canvas of width x height pixels. */
    public static Chart of(String id, String title, String caption, JFreeChart chart, int width, int height) {
        Objects.requireNonNull(chart, "chart");
        return new Chart(id, title, caption,
                new Drawing(width, height, g -> chart.draw(g, new Rectangle(0, 0, width, height))));
    }

    public int width() {
        return drawing.width();
    }

    public int height() {
        return drawing.height();
    }

    /** The chart as PNG bytes (for documents; the report embeds SVG). */
    public byte[] png() {
        return drawing.png();
    }
}
