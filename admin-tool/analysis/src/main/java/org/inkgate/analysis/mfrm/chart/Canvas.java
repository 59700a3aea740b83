package org.inkgate.analysis.mfrm.chart;

import java.awt.Color;

/**
 * The few drawing operations the charts need, drawn by {@link GraphicsCanvas} on a Graphics2D
 * that becomes SVG or PNG. Coordinates are pixels from the top left.
 */
interface Canvas {

    /** Horizontal text alignment relative to the given x. */
    enum Anchor { START, MIDDLE, END }

    void line(double x1, double y1, double x2, double y2, Color colour, double width);

    void rect(double x, double y, double w, double h, Color fill);

    void circle(double cx, double cy, double r, Color fill);

    /** An unfilled circle. */
    void ring(double cx, double cy, double r, Color colour, double width);

    default void polyline(double[] xs, double[] ys, Color colour, double width) {
        polyline(xs, ys, colour, width, false);
    }

    /** A polyline, solid or dashed (series past the palette's size are dashed). */
    void polyline(double[] xs, double[] ys, Color colour, double width, boolean dashed);

    /** Text with its baseline at y. */
    void text(String s, double x, double y, double size, boolean bold, Color colour, Anchor anchor);

    /** The advance width of the text as {@link #text} would draw it. */
    double textWidth(String s, double size, boolean bold);

    /** Height from the top of the tallest glyph to the baseline. */
    double ascent(double size, boolean bold);

    /** Height below the baseline. */
    double descent(double size, boolean bold);

    /** Text turned 90 degrees anticlockwise, centred on (x, y). */
    void verticalText(String s, double x, double y, double size, Color colour);
}
