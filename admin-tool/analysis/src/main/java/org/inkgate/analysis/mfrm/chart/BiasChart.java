package org.inkgate.analysis.mfrm.chart;

import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.inkgate.analysis.graphics.Drawing;
import org.inkgate.analysis.mfrm.bias.BiasCell;
import org.inkgate.analysis.mfrm.bias.BiasPair;

/**
 * Bias sizes of one pair with 95% intervals (size +- 1.96 SE), the cells with the largest |t|
 * first. Right of zero: the combination scores higher than the main effects expect.
 */
public final class BiasChart {
    private static final int W = 640;
    private static final int ROW = 18;
    private static final int MAX_ROWS = 30;

    private BiasChart() {
    }

    /** The chart's drawing routine and size (for a report chart). */
    public static Drawing drawing(BiasPair pair) {
        List<BiasCell> cells = top(pair);
        return new Drawing(W, height(cells), g -> paint(new GraphicsCanvas(g), pair, cells));
    }

    /** The chart as an SVG element. */
    public static String svg(BiasPair pair) {
        String id = ("bias-" + pair.first() + "-" + pair.second()).replaceAll("[^A-Za-z0-9_-]", "_");
        return drawing(pair).svg(id, "Bias " + pair.first() + " x " + pair.second());
    }

    /** The same as PNG bytes. */
    public static byte[] png(BiasPair pair) {
        return drawing(pair).png();
    }

    private static List<BiasCell> top(BiasPair pair) {
        return pair.cells().stream().filter(c -> Double.isFinite(c.t()))
                .sorted(Comparator.comparingDouble((BiasCell c) -> -Math.abs(c.t()))).limit(MAX_ROWS).toList();
    }

    private static int height(List<BiasCell> cells) {
        return 90 + ROW * Math.max(1, cells.size());
    }

    static void paint(Canvas g, BiasPair pair, List<BiasCell> cells) {
        int left = 200;
        int right = W - 20;
        int top = 50;
        int bottom = top + ROW * Math.max(1, cells.size());
        double span = 0.5;
        for (BiasCell c : cells) {
            span = Math.max(span, Math.abs(c.size()) + 1.96 * c.se());
        }
        span = Math.min(span, 6);
        WrightMap.Scale x = new WrightMap.Scale(-span, span, left, right);
        g.text("Bias: " + pair.first() + " x " + pair.second(), 10, 20, Palette.TITLE, true, Palette.TEXT,
                Canvas.Anchor.START);
        g.text(String.format(Locale.ROOT, "%d largest |t| of %d cells; 95%% intervals; right of 0 = higher scores"
                        + " than expected; red: p < 0.05 (unadjusted). Chi-square %.1f, df %d", cells.size(),
                pair.cells().size(), pair.chiSquare(), pair.df()), 10, 36, Palette.SMALL, false, Palette.MUTED,
                Canvas.Anchor.START);
        g.line(x.map(0), top - 4, x.map(0), bottom, Palette.GRID, 1);
        for (int i = 0; i < cells.size(); i++) {
            BiasCell c = cells.get(i);
            double cy = top + ROW * i + ROW / 2.0;
            g.text(c.first() + " / " + c.second() + (c.extreme() ? " (extreme)" : ""), left - 8, cy + 4, Palette.SMALL,
                    false, Palette.TEXT, Canvas.Anchor.END);
            double lo = x.map(Math.max(-span, c.size() - 1.96 * c.se()));
            double hi = x.map(Math.min(span, c.size() + 1.96 * c.se()));
            var colour = c.p() < 0.05 ? Palette.MARK : Palette.BAR;
            g.line(lo, cy, hi, cy, colour, 1.5);
            g.circle(x.map(Math.max(-span, Math.min(span, c.size()))), cy, 3.5, colour);
        }
        for (double v : new double[] {-span, -span / 2, 0, span / 2, span}) {
            // two decimals for small spans, so the quarter ticks (e.g. 0.25) are not rounded to 0.3
            g.text(String.format(Locale.ROOT, span < 2 ? "%.2f" : "%.1f", v), x.map(v), bottom + 16, Palette.LABEL, false, Palette.TEXT,
                    Canvas.Anchor.MIDDLE);
        }
        g.text("bias size (logits)", (left + right) / 2.0, bottom + 32, Palette.LABEL, false, Palette.TEXT,
                Canvas.Anchor.MIDDLE);
    }
}
