package org.inkgate.analysis.mfrm.chart;

import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.inkgate.analysis.mfrm.MfrmResult;

/**
 * The Wright map: every facet side by side on the one logit scale (Wright & Stone 1979; Linacre
 * 1989). Candidates appear as a histogram (more able higher up); every other facet's elements as
 * labelled ticks (harder or more severe higher up); the last column(s) show the Rasch-Andrich
 * thresholds of each scale. An element and a candidate at the same height give that candidate a
 * 50% chance of each step.
 */
public final class WrightMap {
    private static final int MARGIN_TOP = 48;
    private static final int MARGIN_BOTTOM = 72;
    private static final int AXIS_WIDTH = 56;
    private static final int HIST_WIDTH = 150;
    private static final int COLUMN_WIDTH = 130;
    private static final int MAX_LABELLED = 60;
    private static final int MAX_SCALES = 6;

    private WrightMap() {
    }

    /** The map as an SVG element. */
    public static String svg(MfrmResult r) {
        return ChartOutput.svg(width(r), 640, g -> paint(g, r, width(r), 640));
    }

    /** The map as PNG bytes. */
    public static byte[] png(MfrmResult r) {
        return ChartOutput.png(width(r), 640, g -> paint(g, r, width(r), 640));
    }

    private static int width(MfrmResult r) {
        int scales = Math.min(MAX_SCALES, r.scales().size());
        return AXIS_WIDTH + HIST_WIDTH + COLUMN_WIDTH * (r.facets().size() - 1 + scales) + 20;
    }

    static void paint(Graphics2D g, MfrmResult r, int width, int height) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (MfrmResult.Facet f : r.facets()) {
            for (MfrmResult.Element e : f.elements()) {
                if (Double.isFinite(e.measure())) {
                    lo = Math.min(lo, e.measure());
                    hi = Math.max(hi, e.measure());
                }
            }
        }
        for (MfrmResult.Scale s : r.scales()) {
            for (MfrmResult.Category c : s.categories()) {
                if (Double.isFinite(c.threshold())) {
                    lo = Math.min(lo, c.threshold());
                    hi = Math.max(hi, c.threshold());
                }
            }
        }
        lo = Math.floor(lo) - 0.5;
        hi = Math.ceil(hi) + 0.5;
        int plotTop = MARGIN_TOP;
        int plotBottom = height - MARGIN_BOTTOM;
        Scale y = new Scale(lo, hi, plotBottom, plotTop);

        g.setFont(Palette.TITLE);
        g.setColor(Palette.TEXT);
        g.drawString("Wright map: all facets on one logit scale", 10, 20);
        g.setFont(Palette.SMALL);
        g.setColor(Palette.MUTED);
        g.drawString("Higher: more able candidates; harder or more severe elements of the other facets."
                + " Thresholds: Rasch-Andrich F_k.", 10, 36);

        // axis and grid
        g.setFont(Palette.LABEL);
        for (int v = (int) Math.ceil(lo); v <= hi; v++) {
            int py = (int) Math.round(y.map(v));
            g.setColor(Palette.GRID);
            g.draw(new Line2D.Double(AXIS_WIDTH, py, width - 10, py));
            g.setColor(Palette.TEXT);
            String t = String.format(Locale.ROOT, "%+d", v);
            g.drawString(v == 0 ? "0" : t, AXIS_WIDTH - 8 - g.getFontMetrics().stringWidth(t), py + 4);
        }
        g.setColor(Palette.TEXT);
        g.draw(new Line2D.Double(AXIS_WIDTH, plotTop, AXIS_WIDTH, plotBottom));
        drawRotated(g, "logits", 14, (plotTop + plotBottom) / 2);

        int x = AXIS_WIDTH + 8;
        candidateHistogram(g, r.facets().get(0), x, HIST_WIDTH - 16, y, plotBottom);
        x += HIST_WIDTH;
        for (int f = 1; f < r.facets().size(); f++) {
            MfrmResult.Facet facet = r.facets().get(f);
            List<double[]> marks = new ArrayList<>();
            List<String> labels = new ArrayList<>();
            for (MfrmResult.Element e : facet.elements()) {
                if (Double.isFinite(e.measure())) {
                    marks.add(new double[] {e.measure(), labels.size()});
                    labels.add(e.label() + (e.status() == MfrmResult.Status.ESTIMATED ? "" : "*"));
                }
            }
            labelledColumn(g, facet.name(), marks, labels, x, y, plotBottom);
            x += COLUMN_WIDTH;
        }
        int shown = 0;
        for (MfrmResult.Scale s : r.scales()) {
            if (shown++ == MAX_SCALES) {
                break;
            }
            List<double[]> marks = new ArrayList<>();
            List<String> labels = new ArrayList<>();
            List<MfrmResult.Category> cats = s.categories();
            for (int k = 1; k < cats.size(); k++) {
                marks.add(new double[] {cats.get(k).threshold(), labels.size()});
                labels.add(cats.get(k - 1).score() + "|" + cats.get(k).score());
            }
            String title = r.scales().size() == 1 ? "thresholds" : "thr. " + s.label();
            labelledColumn(g, title, marks, labels, x, y, plotBottom);
            x += COLUMN_WIDTH;
        }
        g.setFont(Palette.SMALL);
        g.setColor(Palette.MUTED);
        String foot = "* anchored or extreme (estimated after setting aside)";
        if (r.scales().size() > MAX_SCALES) {
            foot += "; first " + MAX_SCALES + " of " + r.scales().size() + " threshold sets shown";
        }
        g.drawString(foot, 10, height - 8);
    }

    private static void candidateHistogram(Graphics2D g, MfrmResult.Facet facet, int x, int w, Scale y,
                                           int plotBottom) {
        double bin = 0.25;
        int nb = (int) Math.ceil((y.hi - y.lo) / bin);
        int[] counts = new int[nb];
        for (MfrmResult.Element e : facet.elements()) {
            if (Double.isFinite(e.measure())) {
                int b = (int) Math.floor((e.measure() - y.lo) / bin);
                counts[Math.max(0, Math.min(nb - 1, b))]++;
            }
        }
        int max = 1;
        for (int c : counts) {
            max = Math.max(max, c);
        }
        g.setColor(Palette.BAR);
        for (int b = 0; b < nb; b++) {
            if (counts[b] == 0) {
                continue;
            }
            double top = y.map(y.lo + (b + 1) * bin);
            double bottom = y.map(y.lo + b * bin);
            double len = (double) w * counts[b] / max;
            g.fill(new Rectangle2D.Double(x + w - len, top + 0.5, len, Math.max(1, bottom - top - 1)));
        }
        g.setColor(Palette.TEXT);
        g.setFont(Palette.LABEL);
        g.drawString(facet.name() + " (n = " + facet.elements().size() + ")", x, plotBottom + 18);
        g.setFont(Palette.SMALL);
        g.setColor(Palette.MUTED);
        g.drawString("bar length: count per 0.25 logit, max " + max, x, plotBottom + 32);
    }

    private static void labelledColumn(Graphics2D g, String title, List<double[]> marks, List<String> labels, int x,
                                       Scale y, int plotBottom) {
        g.setColor(Palette.TEXT);
        g.setFont(Palette.LABEL);
        g.drawString(title, x, plotBottom + 18);
        marks.sort(Comparator.comparingDouble((double[] m) -> -m[0]));
        g.setFont(Palette.SMALL);
        int lineHeight = g.getFontMetrics().getHeight() - 2;
        boolean labelled = marks.size() <= MAX_LABELLED;
        double lastY = Double.NEGATIVE_INFINITY;
        for (double[] m : marks) {
            double py = y.map(m[0]);
            g.setColor(Palette.MARK);
            g.draw(new Line2D.Double(x, py, x + 10, py));
            if (!labelled) {
                continue;
            }
            // labels never overlap: each goes below the previous one if they would collide
            double ly = Math.max(py + 4, lastY + lineHeight);
            lastY = ly;
            g.setColor(Palette.MUTED);
            if (Math.abs(ly - 4 - py) > 1) {
                g.draw(new Line2D.Double(x + 10, py, x + 16, ly - 4));
            }
            g.setColor(Palette.TEXT);
            g.drawString(labels.get((int) m[1]), x + 18, (float) ly);
        }
        if (!labelled) {
            g.setColor(Palette.MUTED);
            g.drawString(marks.size() + " elements (ticks only)", x, plotBottom + 32);
        }
    }

    private static void drawRotated(Graphics2D g, String text, int x, int y) {
        var old = g.getTransform();
        g.rotate(-Math.PI / 2, x, y);
        g.drawString(text, x - g.getFontMetrics().stringWidth(text) / 2, y);
        g.setTransform(old);
    }

    /** Linear map from data values to pixels. */
    record Scale(double lo, double hi, double pixelLo, double pixelHi) {
        double map(double v) {
            return pixelLo + (v - lo) / (hi - lo) * (pixelHi - pixelLo);
        }
    }
}
