package org.inkgate.analysis.mfrm.chart;

import java.awt.Graphics2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.util.Comparator;
import java.util.List;
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

    /** The chart as an SVG element. */
    public static String svg(BiasPair pair) {
        List<BiasCell> cells = top(pair);
        return ChartOutput.svg(W, height(cells), g -> paint(g, pair, cells));
    }

    /** The same as PNG bytes. */
    public static byte[] png(BiasPair pair) {
        List<BiasCell> cells = top(pair);
        return ChartOutput.png(W, height(cells), g -> paint(g, pair, cells));
    }

    private static List<BiasCell> top(BiasPair pair) {
        return pair.cells().stream().filter(c -> Double.isFinite(c.t()))
                .sorted(Comparator.comparingDouble((BiasCell c) -> -Math.abs(c.t()))).limit(MAX_ROWS).toList();
    }

    private static int height(List<BiasCell> cells) {
        return 90 + ROW * Math.max(1, cells.size());
    }

    static void paint(Graphics2D g, BiasPair pair, List<BiasCell> cells) {
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
        g.setFont(Palette.TITLE);
        g.setColor(Palette.TEXT);
        g.drawString("Bias: " + pair.first() + " x " + pair.second(), 10, 20);
        g.setFont(Palette.SMALL);
        g.setColor(Palette.MUTED);
        g.drawString(String.format(java.util.Locale.ROOT, "%d largest |t| of %d cells; 95%% intervals; right of 0 ="
                + " higher scores than expected. Chi-square %.1f, df %d", cells.size(), pair.cells().size(),
                pair.chiSquare(), pair.df()), 10, 36);
        g.setColor(Palette.GRID);
        double zero = x.map(0);
        g.draw(new Line2D.Double(zero, top - 4, zero, bottom));
        g.setFont(Palette.SMALL);
        for (int i = 0; i < cells.size(); i++) {
            BiasCell c = cells.get(i);
            double cy = top + ROW * i + ROW / 2.0;
            g.setColor(Palette.TEXT);
            String label = c.first() + " / " + c.second() + (c.extreme() ? " (extreme)" : "");
            g.drawString(label, left - 8 - g.getFontMetrics().stringWidth(label), (float) cy + 4);
            double lo = x.map(Math.max(-span, c.size() - 1.96 * c.se()));
            double hi = x.map(Math.min(span, c.size() + 1.96 * c.se()));
            g.setColor(c.p() < 0.05 ? Palette.MARK : Palette.BAR);
            g.draw(new Line2D.Double(lo, cy, hi, cy));
            double px = x.map(Math.max(-span, Math.min(span, c.size())));
            g.fill(new Ellipse2D.Double(px - 3.5, cy - 3.5, 7, 7));
        }
        g.setColor(Palette.TEXT);
        g.setFont(Palette.LABEL);
        for (double v : new double[] {-span, -span / 2, 0, span / 2, span}) {
            String t = String.format(java.util.Locale.ROOT, "%.1f", v);
            g.drawString(t, (float) (x.map(v) - g.getFontMetrics().stringWidth(t) / 2.0), bottom + 16);
        }
        g.drawString("bias size (logits)", (left + right) / 2 - 40, bottom + 32);
    }
}
