package org.inkgate.analysis.mfrm.chart;

import java.util.List;
import java.util.Locale;
import org.inkgate.analysis.graphics.Drawing;
import org.inkgate.analysis.graphics.SeriesPalette;
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

    /** The drawing routine and size of the curves of the scale at {@code scaleIndex} (for a report chart). */
    public static Drawing drawing(MfrmResult r, int scaleIndex) {
        MfrmResult.Scale scale = r.scales().get(scaleIndex);
        boolean shared = r.scales().size() == 1;
        return new Drawing(W, H, g -> paint(new GraphicsCanvas(g), scale, shared));
    }

    /** Curves of the scale at {@code scaleIndex} as an SVG element. */
    public static String svg(MfrmResult r, int scaleIndex) {
        return drawing(r, scaleIndex).svg("category-curves-" + scaleIndex, "Category probability curves");
    }

    /** The same as PNG bytes. */
    public static byte[] png(MfrmResult r, int scaleIndex) {
        return drawing(r, scaleIndex).png();
    }

    static void paint(Canvas g, MfrmResult.Scale s, boolean shared) {
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
        g.text("Category probability curves" + (shared ? "" : ": " + s.label()), 10, 20, Palette.TITLE, true,
                Palette.TEXT, Canvas.Anchor.START);
        for (int v = (int) -RANGE; v <= RANGE; v++) {
            double px = x.map(v);
            g.line(px, top, px, bottom, Palette.GRID, 1);
            g.text(Integer.toString(v), px, bottom + 16, Palette.LABEL, false, Palette.TEXT, Canvas.Anchor.MIDDLE);
        }
        for (int i = 0; i <= 4; i++) {
            double v = i / 4.0;
            double py = y.map(v);
            g.line(left, py, right, py, Palette.GRID, 1);
            g.text(String.format(Locale.ROOT, "%.2f", v), left - 6, py + 4, Palette.LABEL, false, Palette.TEXT,
                    Canvas.Anchor.END);
        }
        g.text("measure relative to the rating's difficulty (logits)", (left + right) / 2.0, H - 12, Palette.LABEL,
                false, Palette.TEXT, Canvas.Anchor.MIDDLE);
        g.verticalText("probability", 14, (top + bottom) / 2.0, Palette.LABEL, Palette.TEXT);
        int steps = 240;
        double[][] ys = new double[m + 1][steps + 1];
        double[] xs = new double[steps + 1];
        double[] p = new double[m + 1];
        for (int i = 0; i <= steps; i++) {
            double eta = -RANGE + 2 * RANGE * i / steps;
            xs[i] = x.map(eta);
            CategoryModel.probabilities(eta, f, m, p);
            for (int k = 0; k <= m; k++) {
                ys[k][i] = y.map(p[k]);
            }
        }
        for (int k = 0; k <= m; k++) {
            boolean dashed = SeriesPalette.dashed(k);
            g.polyline(xs, ys[k], Palette.series(k), 2, dashed);
            double ly = top + 8 + k * 16;
            g.polyline(new double[] {right + 14, right + 34}, new double[] {ly, ly}, Palette.series(k), 2, dashed);
            g.text("score " + cats.get(k).score(), right + 40, ly + 4, Palette.LABEL, false, Palette.TEXT,
                    Canvas.Anchor.START);
        }
        if (s.notes().stream().anyMatch(n -> n.contains("disordered"))) {
            g.text("disordered thresholds: see the category notes", left, top - 6, Palette.LABEL, false, Palette.MARK,
                    Canvas.Anchor.START);
        }
    }
}
