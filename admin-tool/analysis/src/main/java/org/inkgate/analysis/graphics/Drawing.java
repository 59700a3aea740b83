package org.inkgate.analysis.graphics;

import java.awt.Graphics2D;
import java.util.Objects;
import java.util.function.Consumer;

/**
 * A drawing routine with its canvas size: what a report chart and the many-facet Rasch charts
 * share, so one routine gives both SVG (for the HTML report) and PNG (for documents).
 *
 * @param painter draws on a canvas of width x height pixels, origin top left
 */
public record Drawing(int width, int height, Consumer<Graphics2D> painter) {

    public Drawing {
        Objects.requireNonNull(painter, "painter");
        if (width < 1 || height < 1) {
            throw new IllegalArgumentException("a drawing needs a positive size, got " + width + " x " + height);
        }
    }

    /** The drawing as an inline {@code <svg>} element (see {@link Drawings#svg}). */
    public String svg(String id, String title) {
        return Drawings.svg(id, title, width, height, painter);
    }

    /** The drawing as PNG bytes. */
    public byte[] png() {
        return Drawings.png(width, height, painter);
    }
}
