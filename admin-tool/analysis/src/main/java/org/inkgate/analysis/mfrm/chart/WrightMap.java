package org.inkgate.analysis.mfrm.chart;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.inkgate.analysis.graphics.Drawing;
import org.inkgate.analysis.mfrm.MfrmResult;

/**
 * The Wright map: every facet side by side on the one logit scale (Wright & Stone 1979; Linacre
 * 1989). Candidates appear as a histogram (more able higher up); every other facet's elements as
 * labelled ticks (harder or more severe higher up); the last column(s) show the Rasch-Andrich
 * thresholds of each scale. A candidate level with an element (the other facets at 0) has step
 * log-odds -F_k: even odds on the average step.
 */
public final class WrightMap {
    private static final int HEIGHT = 640;
    private static final int MARGIN_TOP = 48;
    private static final int MARGIN_BOTTOM = 72;
    private static final int AXIS_WIDTH = 56;
    private static final int HIST_WIDTH = 150;
    private static final int COLUMN_WIDTH = 130;
    private static final int MAX_LABELLED = 60;
    private static final int MAX_SCALES = 6;
    private static final int LINE_HEIGHT = 12;

    private WrightMap() {
    }

    /** The map's drawing routine and size (for a report chart). */
    public static Drawing drawing(MfrmResult r) {
        int w = width(r);
        return new Drawing(w, HEIGHT, g -> paint(new GraphicsCanvas(g), r, w, HEIGHT));
    }

    /** The map as an SVG element. */
    public static String svg(MfrmResult r) {
        return drawing(r).svg("wright-map", "Wright map");
    }

    /** The map as PNG bytes. */
    public static byte[] png(MfrmResult r) {
        return drawing(r).png();
    }

    private static int width(MfrmResult r) {
        int scales = Math.min(MAX_SCALES, r.scales().size());
        return AXIS_WIDTH + HIST_WIDTH + COLUMN_WIDTH * (r.facets().size() - 1 + scales) + 20;
    }

    static void paint(Canvas g, MfrmResult r, int width, int height) {
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

        g.text("Wright map: all facets on one logit scale", 10, 20, Palette.TITLE, true, Palette.TEXT,
                Canvas.Anchor.START);
        g.text("Higher: more able candidates; harder or more severe elements of the other facets."
                + " Thresholds: Rasch-Andrich F_k.", 10, 36, Palette.SMALL, false, Palette.MUTED, Canvas.Anchor.START);
        for (int v = (int) Math.ceil(lo); v <= hi; v++) {
            double py = y.map(v);
            g.line(AXIS_WIDTH, py, width - 10, py, Palette.GRID, 1);
            g.text(v > 0 ? "+" + v : Integer.toString(v), AXIS_WIDTH - 8, py + 4, Palette.LABEL, false, Palette.TEXT,
                    Canvas.Anchor.END);
        }
        g.line(AXIS_WIDTH, plotTop, AXIS_WIDTH, plotBottom, Palette.TEXT, 1);
        g.verticalText("logits", 16, (plotTop + plotBottom) / 2.0, Palette.LABEL, Palette.TEXT);

        int x = AXIS_WIDTH + 8;
        candidateHistogram(g, r.facets().get(0), x, HIST_WIDTH - 16, y, plotBottom);
        x += HIST_WIDTH;
        for (int f = 1; f < r.facets().size(); f++) {
            MfrmResult.Facet facet = r.facets().get(f);
            List<Mark> marks = new ArrayList<>();
            for (MfrmResult.Element e : facet.elements()) {
                if (Double.isFinite(e.measure())) {
                    marks.add(new Mark(e.measure(), e.label() + (e.status() == MfrmResult.Status.ESTIMATED ? "" : "*")));
                }
            }
            labelledColumn(g, facet.name(), marks, x, y, plotBottom);
            x += COLUMN_WIDTH;
        }
        int shown = 0;
        for (MfrmResult.Scale s : r.scales()) {
            if (shown++ == MAX_SCALES) {
                break;
            }
            List<Mark> marks = new ArrayList<>();
            List<MfrmResult.Category> cats = s.categories();
            for (int k = 1; k < cats.size(); k++) {
                marks.add(new Mark(cats.get(k).threshold(), cats.get(k - 1).score() + "|" + cats.get(k).score()));
            }
            labelledColumn(g, r.scales().size() == 1 ? "thresholds" : "thr. " + s.label(), marks, x, y, plotBottom);
            x += COLUMN_WIDTH;
        }
        String foot = "* anchored, or extreme (set aside, then estimated at a score 0.5 from the extreme)";
        if (r.scales().size() > MAX_SCALES) {
            foot += "; first " + MAX_SCALES + " of " + r.scales().size() + " threshold sets shown";
        }
        g.text(foot, 10, height - 8, Palette.SMALL, false, Palette.MUTED, Canvas.Anchor.START);
    }

    private static void candidateHistogram(Canvas g, MfrmResult.Facet facet, int x, int w, Scale y, int plotBottom) {
        double bin = 0.25;
        int nb = (int) Math.ceil((y.hi() - y.lo()) / bin);
        int[] counts = new int[nb];
        for (MfrmResult.Element e : facet.elements()) {
            if (Double.isFinite(e.measure())) {
                int b = (int) Math.floor((e.measure() - y.lo()) / bin);
                counts[Math.max(0, Math.min(nb - 1, b))]++;
            }
        }
        int max = 1;
        for (int c : counts) {
            max = Math.max(max, c);
        }
        for (int b = 0; b < nb; b++) {
            if (counts[b] == 0) {
                continue;
            }
            double top = y.map(y.lo() + (b + 1) * bin);
            double bottom = y.map(y.lo() + b * bin);
            double len = (double) w * counts[b] / max;
            g.rect(x + w - len, top + 0.5, len, Math.max(1, bottom - top - 1), Palette.BAR);
        }
        g.text(facet.name() + " (n = " + facet.elements().size() + ")", x, plotBottom + 18, Palette.LABEL, false,
                Palette.TEXT, Canvas.Anchor.START);
        g.text("bar length: count per 0.25 logit, longest " + max, x, plotBottom + 32, Palette.SMALL, false,
                Palette.MUTED, Canvas.Anchor.START);
    }

    private static void labelledColumn(Canvas g, String title, List<Mark> marks, int x, Scale y, int plotBottom) {
        g.text(title, x, plotBottom + 18, Palette.LABEL, false, Palette.TEXT, Canvas.Anchor.START);
        marks.sort(Comparator.comparingDouble((Mark m) -> -m.value()));
        boolean labelled = marks.size() <= MAX_LABELLED;
        double lastY = Double.NEGATIVE_INFINITY;
        for (Mark m : marks) {
            double py = y.map(m.value());
            g.line(x, py, x + 10, py, Palette.MARK, 1.5);
            if (!labelled) {
                continue;
            }
            // labels never overlap: each goes below the previous one if they would collide
            double ly = Math.max(py + 4, lastY + LINE_HEIGHT);
            lastY = ly;
            if (Math.abs(ly - 4 - py) > 1) {
                g.line(x + 10, py, x + 16, ly - 4, Palette.MUTED, 0.75);
            }
            g.text(m.label(), x + 18, ly, Palette.SMALL, false, Palette.TEXT, Canvas.Anchor.START);
        }
        if (!labelled) {
            g.text(marks.size() + " elements (ticks only)", x, plotBottom + 32, Palette.SMALL, false, Palette.MUTED,
                    Canvas.Anchor.START);
        }
    }

    private record Mark(double value, String label) {
    }

    /** Linear map from data values to pixels. */
    record Scale(double lo, double hi, double pixelLo, double pixelHi) {
        double map(double v) {
            return pixelLo + (v - lo) / (hi - lo) * (pixelHi - pixelLo);
        }
    }
}
