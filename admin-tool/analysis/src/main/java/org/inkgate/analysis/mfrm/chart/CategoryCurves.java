package org.inkgate.analysis.mfrm.chart;

import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.util.List;
import java.util.Locale;
import org.inkgate.analysis.mfrm.MfrmResult;
import org.inkgate.analysis.mfrm.estimation.CategoryModel;

/**
 * Category probability curves of one threshold set: P(category k) against the measure of the
 * rating relative to its combined difficulty (candidate minus the other facets), from the
 * estimated Rasch-Andrich thresholds. Adjacent curves cross at the thresholds; a category whose
 * curve is never the highest is never the most likely rating (disordered thresholds).
 */
public final class CategoryCurves {
    private static final int W = 640;
    private static final int H = 400;
    private static final double RANGE = 6;

    private CategoryCurves() {
    }

    /** Curves of the scale at {@code scaleIndex} as an SVG element. */
    public static String svg(MfrmResult r, int scaleIndex) {
        MfrmResult.Scale s = r.scales().get(scaleIndex);
        return ChartOutput.svg(W, H, g -> paint(g, s, r.scales().size() == 1));
    }

    /** The same as PNG bytes. */
    public static byte[] png(MfrmResult r, int scaleIndex) {
        MfrmResult.Scale s = r.scales().get(scaleIndex);
        return ChartOutput.png(W, H, g -> paint(g, s, r.scales().size() == 1));
    }

    static void paint(Graphics2D g, MfrmResult.Scale s, boolean shared) {
        List<MfrmResult.Category> cats = s.categories();
        int m = cats.size() - 1;
        double[] f = new double[m + 1];
        for (int k = 1; k <= m; k++) {
            f[k] = cats.get(k).threshold();
        }
        int left = 56;
        int right = W - 110;
        int top = 40;
        int bottom = H - 48;
        WrightMap.Scale x = new WrightMap.Scale(-RANGE, RANGE, left, right);
        WrightMap.Scale y = new WrightMap.Scale(0, 1, bottom, top);
        g.setFont(Palette.TITLE);
        g.setColor(Palette.TEXT);
        g.drawString("Category probability curves" + (shared ? "" : ": " + s.label()), 10, 20);
        g.setFont(Palette.LABEL);
        for (int v = (int) -RANGE; v <= RANGE; v++) {
            double px = x.map(v);
            g.setColor(Palette.GRID);
            g.draw(new Line2D.Double(px, top, px, bottom));
            g.setColor(Palette.TEXT);
            String t = Integer.toString(v);
            g.drawString(t, (float) (px - g.getFontMetrics().stringWidth(t) / 2.0), bottom + 16);
        }
        for (int i = 0; i <= 4; i++) {
            double v = i / 4.0;
            double py = y.map(v);
            g.setColor(Palette.GRID);
            g.draw(new Line2D.Double(left, py, right, py));
            g.setColor(Palette.TEXT);
            String t = String.format(Locale.ROOT, "%.2f", v);
            g.drawString(t, left - 6 - g.getFontMetrics().stringWidth(t), (float) py + 4);
        }
        g.drawString("measure relative to the rating's difficulty (logits)", left + 80, H - 12);
        g.drawString("P", 20, (top + bottom) / 2);
        double[] p = new double[m + 1];
        Path2D[] paths = new Path2D[m + 1];
        for (int k = 0; k <= m; k++) {
            paths[k] = new Path2D.Double();
        }
        int steps = 240;
        for (int i = 0; i <= steps; i++) {
            double eta = -RANGE + 2 * RANGE * i / steps;
            CategoryModel.probabilities(eta, f, m, p);
            for (int k = 0; k <= m; k++) {
                if (i == 0) {
                    paths[k].moveTo(x.map(eta), y.map(p[k]));
                } else {
                    paths[k].lineTo(x.map(eta), y.map(p[k]));
                }
            }
        }
        g.setStroke(Palette.LINE);
        for (int k = 0; k <= m; k++) {
            g.setColor(Palette.series(k));
            g.draw(paths[k]);
            g.draw(new Line2D.Double(right + 14, top + 8 + k * 16, right + 34, top + 8 + k * 16));
            g.setColor(Palette.TEXT);
            g.drawString("score " + cats.get(k).score(), right + 40, top + 12 + k * 16);
        }
        g.setStroke(Palette.THIN);
        if (!s.notes().isEmpty() && s.notes().stream().anyMatch(n -> n.contains("disordered"))) {
            g.setColor(Palette.MARK);
            g.drawString("disordered thresholds: see the category notes", left, top - 6);
        }
    }
}
