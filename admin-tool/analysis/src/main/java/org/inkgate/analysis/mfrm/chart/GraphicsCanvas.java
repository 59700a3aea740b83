package org.inkgate.analysis.mfrm.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;

/**
 * The canvas operations on any Graphics2D: an image for PNG or Batik's SVG generator for SVG
 * (see {@link org.inkgate.analysis.graphics.Drawings}), so each chart has one drawing routine.
 */
final class GraphicsCanvas implements Canvas {
    private final Graphics2D g;

    GraphicsCanvas(Graphics2D g) {
        this.g = g;
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
    }

    @Override
    public void line(double x1, double y1, double x2, double y2, Color colour, double width) {
        g.setColor(colour);
        g.setStroke(new BasicStroke((float) width));
        g.draw(new Line2D.Double(x1, y1, x2, y2));
    }

    @Override
    public void rect(double x, double y, double w, double h, Color fill) {
        g.setColor(fill);
        g.fill(new Rectangle2D.Double(x, y, w, h));
    }

    @Override
    public void circle(double cx, double cy, double r, Color fill) {
        g.setColor(fill);
        g.fill(new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r));
    }

    @Override
    public void ring(double cx, double cy, double r, Color colour, double width) {
        g.setColor(colour);
        g.setStroke(new BasicStroke((float) width));
        g.draw(new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r));
    }

    @Override
    public void polyline(double[] xs, double[] ys, Color colour, double width, boolean dashed) {
        Path2D.Double p = new Path2D.Double();
        p.moveTo(xs[0], ys[0]);
        for (int i = 1; i < xs.length; i++) {
            p.lineTo(xs[i], ys[i]);
        }
        g.setColor(colour);
        g.setStroke(dashed ? new BasicStroke((float) width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                new float[] {6f, 4f}, 0f) : new BasicStroke((float) width));
        g.draw(p);
    }

    private static Font font(double size, boolean bold) {
        return new Font(Font.SANS_SERIF, bold ? Font.BOLD : Font.PLAIN, (int) Math.round(size));
    }

    @Override
    public double textWidth(String s, double size, boolean bold) {
        return g.getFontMetrics(font(size, bold)).getStringBounds(s, g).getWidth();
    }

    @Override
    public double ascent(double size, boolean bold) {
        return g.getFontMetrics(font(size, bold)).getAscent();
    }

    @Override
    public double descent(double size, boolean bold) {
        return g.getFontMetrics(font(size, bold)).getDescent();
    }

    @Override
    public void text(String s, double x, double y, double size, boolean bold, Color colour, Anchor anchor) {
        g.setFont(font(size, bold));
        g.setColor(colour);
        double w = textWidth(s, size, bold);
        double dx = switch (anchor) {
            case START -> 0;
            case MIDDLE -> -w / 2;
            case END -> -w;
        };
        g.drawString(s, (float) (x + dx), (float) y);
    }

    @Override
    public void verticalText(String s, double x, double y, double size, Color colour) {
        AffineTransform old = g.getTransform();
        g.rotate(-Math.PI / 2, x, y);
        text(s, x, y, size, false, colour, Anchor.MIDDLE);
        g.setTransform(old);
    }
}
