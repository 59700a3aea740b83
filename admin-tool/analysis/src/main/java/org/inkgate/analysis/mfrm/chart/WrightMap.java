package org.inkgate.analysis.mfrm.chart;

import java.awt.Color;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.analysis.graphics.Drawing;
import org.inkgate.analysis.mfrm.MfrmResult;

/**
 * The Wright map of a many-facet analysis (Wright &amp; Stone 1979; Linacre 1989): candidates and
 * the elements of every other facet on one logit scale, drawn in our own layout. The logit scale
 * runs left to right; below it, in bands: the candidates as a distribution per level (bars: share
 * of the level's candidates per bin, median marked), each facet's elements as a point with a 95%
 * error whisker (measure +- 1.96 SE, the joint SE where there is one), each on its own labelled
 * row, and the score zones of the rating scale (where each score is the most likely rating), or,
 * under partial credit, each element's own zones beneath it. Every label sits in its own row or
 * column and is measured before it is placed, so no two labels overlap; a label too long for the
 * label column is shortened with an ellipsis (the tables give it in full).
 */
public final class WrightMap {
    static final int WIDTH = 960;
    private static final double LABEL_COLUMN = 200;
    private static final double VALUE_COLUMN = 112;
    private static final double PAD = 10;
    /** Title, subtitle and top axis above the bands. */
    private static final double TOP = 74;
    private static final double HEADING_ROW = 24;
    private static final double ELEMENT_ROW = 18;
    private static final double ZONE_ROW = 15;
    private static final double LEVEL_ROW = 44;
    /** A facet with more elements than this is drawn as a distribution, like the candidates. */
    static final int MAX_ROWS = 60;
    private static final int MAX_SCALES = 12;
    private static final double BIN = 0.25;
    private static final double Z95 = 1.959964;
    private static final Color ZONE_A = new Color(0xEE, 0xF1, 0xF5);
    private static final Color ZONE_B = new Color(0xDC, 0xE3, 0xEC);
    private static final Color BAND = new Color(0xF7, 0xF7, 0xF7);

    private WrightMap() {
    }

    /** The map's drawing routine and size (for a report chart), candidates in one distribution. */
    public static Drawing drawing(MfrmResult r) {
        return drawing(r, Map.of());
    }

    /** The map with the candidates' distribution drawn per level (candidate label to level; others "no level"). */
    public static Drawing drawing(MfrmResult r, Map<String, String> levelOf) {
        Layout layout = new Layout(r, levelOf);
        // the height depends on text metrics only through fixed row sizes, so a throwaway pass is not needed
        return new Drawing(WIDTH, (int) Math.ceil(layout.height()), g -> paint(new GraphicsCanvas(g), layout));
    }

    /** The map as an SVG element. */
    public static String svg(MfrmResult r) {
        return drawing(r).svg("wright-map", "Wright map");
    }

    /** The map as PNG bytes. */
    public static byte[] png(MfrmResult r) {
        return drawing(r).png();
    }

    static void paint(Canvas g, Layout l) {
        new Painter(g, l).paint();
    }

    /** What is drawn, row by row; the height follows from the rows. */
    static final class Layout {
        final MfrmResult result;
        final Map<String, List<Double>> levels = new TreeMap<>();
        final int candidateCount;
        final List<FacetBand> facets = new ArrayList<>();
        final List<MfrmResult.Scale> ratingScale = new ArrayList<>();
        final String partialFacet;
        final double lo;
        final double hi;

        Layout(MfrmResult r, Map<String, String> levelOf) {
            this.result = r;
            MfrmResult.Facet candidates = r.facets().get(0);
            int counted = 0;
            for (MfrmResult.Element e : candidates.elements()) {
                if (Double.isFinite(e.measure())) {
                    String level = levelOf.getOrDefault(e.label(), "");
                    levels.computeIfAbsent(level.isBlank() ? "" : level, k -> new ArrayList<>()).add(e.measure());
                    counted++;
                }
            }
            candidateCount = counted;
            String structure = r.model().structure();
            partialFacet = structure.startsWith("partial credit by ") ? structure.substring("partial credit by ".length())
                    : null;
            Map<String, MfrmResult.Scale> scaleOf = new TreeMap<>();
            for (MfrmResult.Scale s : r.scales()) {
                scaleOf.put(s.label(), s);
            }
            if (partialFacet == null) {
                ratingScale.addAll(r.scales());
            }
            double min = Double.POSITIVE_INFINITY;
            double max = Double.NEGATIVE_INFINITY;
            for (List<Double> v : levels.values()) {
                for (double m : v) {
                    min = Math.min(min, m);
                    max = Math.max(max, m);
                }
            }
            for (MfrmResult.Facet f : r.facets().subList(1, r.facets().size())) {
                List<Row> rows = new ArrayList<>();
                boolean partial = f.name().equals(partialFacet);
                for (MfrmResult.Element e : f.elements()) {
                    if (!Double.isFinite(e.measure())) {
                        continue;
                    }
                    double se = Double.isFinite(e.jointSe()) ? e.jointSe() : e.se();
                    double[] bounds = partial && scaleOf.containsKey(e.label())
                            ? thresholds(scaleOf.get(e.label()), e.measure()) : null;
                    rows.add(new Row(e, se, bounds, partial ? scaleOf.get(e.label()) : null));
                    double half = Double.isFinite(se) ? Z95 * se : 0;
                    min = Math.min(min, e.measure() - half);
                    max = Math.max(max, e.measure() + half);
                    if (bounds != null) {
                        for (double b : bounds) {
                            if (Double.isFinite(b)) {
                                min = Math.min(min, b);
                                max = Math.max(max, b);
                            }
                        }
                    }
                }
                // highest first: harder or more severe elements at the top of their band
                rows.sort(Comparator.comparingDouble((Row x) -> -x.element().measure()));
                facets.add(new FacetBand(f.name(), rows, f.elements().size()));
            }
            for (MfrmResult.Scale s : ratingScale.subList(0, Math.min(MAX_SCALES, ratingScale.size()))) {
                for (double b : thresholds(s, 0)) {
                    if (Double.isFinite(b)) {
                        min = Math.min(min, b);
                        max = Math.max(max, b);
                    }
                }
            }
            if (!Double.isFinite(min)) {
                min = -1;
                max = 1;
            }
            // whiskers of very uncertain elements may reach far; keep the scale readable and clip them
            lo = Math.floor(Math.max(min, -15)) - 0.5;
            hi = Math.ceil(Math.min(max, 15)) + 0.5;
        }

        double height() {
            return TOP + plotHeight() + 48 + 4 * 16 + 12; // bottom axis and its title, legend lines, margin
        }

        double plotHeight() {
            double h = HEADING_ROW + LEVEL_ROW * Math.max(1, levels.size());
            for (FacetBand f : facets) {
                h += HEADING_ROW + (f.asDistribution() ? LEVEL_ROW : f.rows().stream()
                        .mapToDouble(x -> ELEMENT_ROW + (x.scale() != null ? ZONE_ROW : 0)).sum());
            }
            if (!ratingScale.isEmpty()) {
                h += HEADING_ROW + ZONE_ROW * 1.4 * Math.min(MAX_SCALES, ratingScale.size());
            }
            return h;
        }
    }

    /** Zone boundaries of a threshold set moved by an offset: the thresholds F_1..F_m plus the offset. */
    static double[] thresholds(MfrmResult.Scale s, double offset) {
        List<MfrmResult.Category> cats = s.categories();
        double[] b = new double[Math.max(0, cats.size() - 1)];
        for (int k = 1; k < cats.size(); k++) {
            b[k - 1] = cats.get(k).threshold() + offset;
        }
        return b;
    }

    record Row(MfrmResult.Element element, double se, double[] bounds, MfrmResult.Scale scale) {
    }

    record FacetBand(String name, List<Row> rows, int elements) {
        boolean asDistribution() {
            return rows.size() > MAX_ROWS;
        }
    }

    /** Draws a layout; keeps the y cursor and the text rules in one place. */
    private static final class Painter {
        private final Canvas g;
        private final Layout l;
        private final double x0 = PAD + LABEL_COLUMN;
        private final double x1 = WIDTH - PAD - VALUE_COLUMN;
        private final Scale x;
        private double y;

        Painter(Canvas g, Layout l) {
            this.g = g;
            this.l = l;
            this.x = new Scale(l.lo, l.hi, x0, x1);
        }

        void paint() {
            g.text("Wright map: candidates and elements on one logit scale", PAD, 22, Palette.TITLE, true,
                    Palette.TEXT, Canvas.Anchor.START);
            g.text(fit("Right: more able candidates; harder, more severe or score-lowering elements. Whiskers: 95%"
                    + " interval of each measure.", WIDTH - 2 * PAD, Palette.SMALL, false), PAD, 40, Palette.SMALL,
                    false, Palette.MUTED, Canvas.Anchor.START);
            axisLabels(TOP - 8);
            y = TOP;
            double plotTop = y;
            grid(plotTop, plotTop + l.plotHeight());
            candidates();
            for (FacetBand f : l.facets) {
                band(f);
            }
            if (!l.ratingScale.isEmpty()) {
                ratingScale();
            }
            double plotBottom = y;
            axisLabels(plotBottom + 16);
            g.text("measure (logits)", (x0 + x1) / 2, plotBottom + 34, Palette.LABEL, false, Palette.TEXT,
                    Canvas.Anchor.MIDDLE);
            legend(plotBottom + 56);
        }

        private void grid(double top, double bottom) {
            for (int v = (int) Math.ceil(l.lo); v <= l.hi; v++) {
                double px = x.map(v);
                g.line(px, top, px, bottom, v == 0 ? Palette.MUTED : Palette.GRID, v == 0 ? 1 : 0.75);
            }
        }

        // integer ticks; a label that would touch the previous one is skipped
        private void axisLabels(double baseline) {
            double lastRight = Double.NEGATIVE_INFINITY;
            for (int v = (int) Math.ceil(l.lo); v <= l.hi; v++) {
                String s = v > 0 ? "+" + v : v < 0 ? "\u2212" + (-v) : "0";
                double w = g.textWidth(s, Palette.LABEL, false);
                double left = x.map(v) - w / 2;
                if (left < lastRight + 6) {
                    continue;
                }
                g.text(s, x.map(v), baseline, Palette.LABEL, false, Palette.TEXT, Canvas.Anchor.MIDDLE);
                lastRight = left + w;
            }
        }

        private void heading(String text) {
            g.rect(PAD, y + 2, WIDTH - 2 * PAD, HEADING_ROW - 4, BAND);
            g.text(fit(text, WIDTH - 2 * PAD - 8, Palette.LABEL, true), PAD + 4, y + HEADING_ROW / 2 + 4,
                    Palette.LABEL, true, Palette.TEXT, Canvas.Anchor.START);
            y += HEADING_ROW;
        }

        private void candidates() {
            heading(l.result.facets().get(0).name() + ": distribution by level (" + l.candidateCount
                    + ", bars: share of the level per " + BIN + " logit)");
            Map<String, List<Double>> levels = l.levels.isEmpty() ? Map.of("", List.of()) : l.levels;
            double share = 0;
            for (List<Double> v : levels.values()) {
                share = Math.max(share, maxShare(v));
            }
            int i = 0;
            for (var e : levels.entrySet()) {
                String name = e.getKey().isEmpty() ? (levels.size() == 1 ? "all" : "no level") : e.getKey();
                distribution(name, e.getValue(), share, Palette.series(i++));
            }
        }

        private double maxShare(List<Double> v) {
            int[] counts = bins(v);
            int max = 0;
            for (int c : counts) {
                max = Math.max(max, c);
            }
            return v.isEmpty() ? 0 : (double) max / v.size();
        }

        private int[] bins(List<Double> values) {
            int nb = (int) Math.ceil((l.hi - l.lo) / BIN);
            int[] counts = new int[nb];
            for (double m : values) {
                counts[Math.max(0, Math.min(nb - 1, (int) Math.floor((m - l.lo) / BIN)))]++;
            }
            return counts;
        }

        private void distribution(String name, List<Double> values, double maxShare, Color colour) {
            double base = y + LEVEL_ROW - 6;
            double room = LEVEL_ROW - 12;
            int[] counts = bins(values);
            for (int b = 0; b < counts.length; b++) {
                if (counts[b] == 0) {
                    continue;
                }
                double h = room * counts[b] / values.size() / maxShare;
                double left = x.map(l.lo + b * BIN);
                double right = x.map(l.lo + (b + 1) * BIN);
                g.rect(left + 0.5, base - h, Math.max(1, right - left - 1), h, colour);
            }
            g.line(x0, base, x1, base, Palette.GRID, 1);
            label(name + " (" + values.size() + ")", y + LEVEL_ROW / 2 + 4, false);
            if (!values.isEmpty()) {
                double median = median(values);
                double mx = x.map(median);
                g.line(mx, y + 4, mx, base + 3, Palette.TEXT, 1.5);
                value("median " + signed(median), y + LEVEL_ROW / 2 + 4);
            }
            y += LEVEL_ROW;
        }

        private void band(FacetBand f) {
            String more = f.asDistribution() ? ", drawn as a distribution" : "";
            heading(f.name() + " (" + f.elements() + " elements" + more + ")" + (f.name().equals(l.partialFacet)
                    ? ": each with its own score zones" : ""));
            if (f.asDistribution()) {
                List<Double> m = f.rows().stream().map(r -> r.element().measure()).toList();
                distribution("all", m, maxShare(m), Palette.BAR);
                return;
            }
            for (Row r : f.rows()) {
                element(r);
                if (r.scale() != null) {
                    zones(r.scale(), r.bounds(), "");
                }
            }
        }

        private void element(Row r) {
            double cy = y + ELEMENT_ROW / 2;
            MfrmResult.Element e = r.element();
            g.line(x0, cy, x1, cy, Palette.GRID, 0.5);
            if (Double.isFinite(r.se())) {
                double a = x.map(Math.max(l.lo, e.measure() - Z95 * r.se()));
                double b = x.map(Math.min(l.hi, e.measure() + Z95 * r.se()));
                g.line(a, cy, b, cy, Palette.INK, 1.5);
                g.line(a, cy - 3, a, cy + 3, Palette.INK, 1);
                g.line(b, cy - 3, b, cy + 3, Palette.INK, 1);
            }
            double px = x.map(Math.max(l.lo, Math.min(l.hi, e.measure())));
            switch (e.status()) {
                case ESTIMATED -> g.circle(px, cy, 4, Palette.INK);
                case ANCHORED -> g.rect(px - 4, cy - 4, 8, 8, Palette.INK);
                default -> {
                    g.circle(px, cy, 4, Color.WHITE);
                    g.ring(px, cy, 4, Palette.INK, 1.5);
                }
            }
            label(e.label(), cy + 4, false);
            value(signed(e.measure()) + (Double.isFinite(r.se()) ? " \u00b1 " + String.format(Locale.ROOT, "%.2f",
                    r.se()) : ""), cy + 4);
            y += ELEMENT_ROW;
        }

        // shaded zones between consecutive thresholds, each numbered with its score where the number fits
        private void zones(MfrmResult.Scale s, double[] bounds, String rowLabel) {
            double top = y + 2;
            double h = ZONE_ROW - 4;
            List<MfrmResult.Category> cats = s.categories();
            boolean ordered = true;
            for (int k = 1; k < bounds.length; k++) {
                ordered &= bounds[k] > bounds[k - 1];
            }
            if (ordered) {
                for (int k = 0; k < cats.size(); k++) {
                    double a = k == 0 ? l.lo : Math.max(l.lo, bounds[k - 1]);
                    double b = k == cats.size() - 1 ? l.hi : Math.min(l.hi, bounds[k]);
                    if (b <= a) {
                        continue;
                    }
                    double pa = x.map(a);
                    double pb = x.map(b);
                    g.rect(pa, top, pb - pa, h, k % 2 == 0 ? ZONE_A : ZONE_B);
                    String score = Integer.toString(cats.get(k).score());
                    if (g.textWidth(score, Palette.TINY, false) + 4 <= pb - pa) {
                        g.text(score, (pa + pb) / 2, top + h - 2, Palette.TINY, false, Palette.TEXT,
                                Canvas.Anchor.MIDDLE);
                    }
                }
            } else {
                g.rect(x0, top, x1 - x0, h, ZONE_A);
            }
            for (double b : bounds) {
                if (b >= l.lo && b <= l.hi) {
                    g.line(x.map(b), top, x.map(b), top + h, ordered ? Palette.MUTED : Palette.MARK, 1);
                }
            }
            if (!rowLabel.isEmpty()) {
                label(rowLabel, top + h - 2, true);
            }
            if (!ordered) {
                value("disordered", top + h - 2);
            }
            y += rowLabel.isEmpty() ? ZONE_ROW : ZONE_ROW * 1.4;
        }

        private void ratingScale() {
            heading(l.ratingScale.size() == 1 ? "rating scale: where each score is the most likely rating"
                    : "threshold sets: where each score is the most likely rating");
            int shown = Math.min(MAX_SCALES, l.ratingScale.size());
            for (MfrmResult.Scale s : l.ratingScale.subList(0, shown)) {
                zones(s, thresholds(s, 0), l.ratingScale.size() == 1 ? "scores" : s.label());
            }
        }

        private void legend(double top) {
            List<String> items = new ArrayList<>();
            items.add("\u25cf estimated");
            items.add("\u25a0 anchored");
            items.add("\u25cb extreme (every rating at one end)");
            items.add("whisker: measure \u00b1 1.96 standard errors (joint where available)");
            items.add("zones: score most likely for a candidate there, other facets at 0 (Rasch-Andrich thresholds)");
            if (l.ratingScale.size() > MAX_SCALES) {
                items.add("first " + MAX_SCALES + " of " + l.ratingScale.size() + " threshold sets shown");
            }
            double cx = PAD;
            double baseline = top;
            for (String item : items) {
                String text = fit(item, WIDTH - 2 * PAD, Palette.SMALL, false);
                double w = g.textWidth(text, Palette.SMALL, false);
                if (cx > PAD && cx + w > WIDTH - PAD) {
                    cx = PAD;
                    baseline += 16;
                }
                g.text(text, cx, baseline, Palette.SMALL, false, Palette.MUTED, Canvas.Anchor.START);
                cx += w + 18;
            }
        }

        private void label(String text, double baseline, boolean small) {
            double size = small ? Palette.TINY : Palette.LABEL;
            g.text(fit(text, LABEL_COLUMN - 12, size, false), x0 - 8, baseline, size, false, Palette.TEXT,
                    Canvas.Anchor.END);
        }

        private void value(String text, double baseline) {
            g.text(fit(text, VALUE_COLUMN - 10, Palette.SMALL, false), x1 + 8, baseline, Palette.SMALL, false,
                    Palette.MUTED, Canvas.Anchor.START);
        }

        /** The text, shortened with an ellipsis until it is at most width wide. */
        private String fit(String text, double width, double size, boolean bold) {
            if (g.textWidth(text, size, bold) <= width) {
                return text;
            }
            String s = text;
            while (!s.isEmpty() && g.textWidth(s + "\u2026", size, bold) > width) {
                s = s.substring(0, s.length() - 1);
            }
            return s.strip() + "\u2026";
        }
    }

    private static String signed(double v) {
        String s = String.format(Locale.ROOT, "%.2f", Math.abs(v));
        return (v < 0 && !s.equals("0.00") ? "\u2212" : v > 0 && !s.equals("0.00") ? "+" : "") + s;
    }

    private static double median(List<Double> values) {
        double[] v = values.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        int n = v.length;
        return n % 2 == 1 ? v[n / 2] : (v[n / 2 - 1] + v[n / 2]) / 2;
    }

    /** Linear map from data values to pixels. */
    record Scale(double lo, double hi, double pixelLo, double pixelHi) {
        double map(double v) {
            return pixelLo + (v - lo) / (hi - lo) * (pixelHi - pixelLo);
        }
    }
}
