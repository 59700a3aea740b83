package org.inkgate.analysis.mfrm.chart;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/** For tests: a canvas that draws through the real Graphics2D canvas and keeps each text's box. */
final class RecordingCanvas implements Canvas {
    final GraphicsCanvas real;
    final List<Rectangle2D> boxes = new ArrayList<>();
    final List<String> texts = new ArrayList<>();
    final List<String> lines = new ArrayList<>();
    int points;
    int turned;

    RecordingCanvas(Graphics2D g) {
        real = new GraphicsCanvas(g);
    }

    public void line(double x1, double y1, double x2, double y2, Color c, double w) {
        real.line(x1, y1, x2, y2, c, w);
    }

    public void rect(double x, double y, double w, double h, Color fill) {
        real.rect(x, y, w, h, fill);
    }

    public void circle(double cx, double cy, double r, Color fill) {
        points++;
        real.circle(cx, cy, r, fill);
    }

    public void ring(double cx, double cy, double r, Color c, double w) {
        real.ring(cx, cy, r, c, w);
    }

    public void polyline(double[] xs, double[] ys, Color c, double w, boolean dashed) {
        lines.add(c.getRGB() + (dashed ? " dashed" : " solid"));
        real.polyline(xs, ys, c, w, dashed);
    }

    public void text(String s, double x, double y, double size, boolean bold, Color c, Anchor anchor) {
        double w = real.textWidth(s, size, bold);
        double left = switch (anchor) {
            case START -> x;
            case MIDDLE -> x - w / 2;
            case END -> x - w;
        };
        double ascent = real.ascent(size, bold);
        boxes.add(new Rectangle2D.Double(left, y - ascent, w, ascent + real.descent(size, bold)));
        texts.add(s);
        real.text(s, x, y, size, bold, c, anchor);
    }

    public double textWidth(String s, double size, boolean bold) {
        return real.textWidth(s, size, bold);
    }

    public double ascent(double size, boolean bold) {
        return real.ascent(size, bold);
    }

    public double descent(double size, boolean bold) {
        return real.descent(size, bold);
    }

    public void verticalText(String s, double x, double y, double size, Color c) {
        turned++;
        real.verticalText(s, x, y, size, c);
    }
}
