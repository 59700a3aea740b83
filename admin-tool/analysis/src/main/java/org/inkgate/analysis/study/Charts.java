package org.inkgate.analysis.study;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.util.List;
import java.util.Map;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.SymbolAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.category.StatisticalLineAndShapeRenderer;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.category.DefaultCategoryDataset;
import org.jfree.data.statistics.DefaultStatisticalCategoryDataset;
import org.jfree.data.statistics.HistogramDataset;
import org.jfree.data.statistics.HistogramType;
import org.jfree.data.xy.DefaultXYZDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The report's charts, drawn with JFreeChart. Colours come from the report's one palette
 * ({@link org.inkgate.analysis.graphics.SeriesPalette}), text in a sans-serif face.
 */
final class Charts {

    static final Color[] PALETTE = palette();
    private static final Font FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 12);

    private Charts() {
    }

    private static Color[] palette() {
        Color[] c = new Color[org.inkgate.analysis.graphics.SeriesPalette.size()];
        for (int i = 0; i < c.length; i++) {
            c[i] = org.inkgate.analysis.graphics.SeriesPalette.colour(i);
        }
        return c;
    }

    /** Overlaid histograms of values per series (e.g. candidate scores per condition). */
    static JFreeChart histogram(String xLabel, Map<String, double[]> series, int bins) {
        HistogramDataset data = new HistogramDataset();
        data.setType(HistogramType.RELATIVE_FREQUENCY);
        double min = Double.POSITIVE_INFINITY, max = Double.NEGATIVE_INFINITY;
        for (double[] v : series.values()) {
            for (double x : v) {
                min = Math.min(min, x);
                max = Math.max(max, x);
            }
        }
        if (max == min) {
            max = min + 1;
        }
        for (var e : series.entrySet()) {
            if (e.getValue().length > 0) {
                data.addSeries(e.getKey(), e.getValue(), bins, min, max);
            }
        }
        JFreeChart chart = ChartFactory.createHistogram(null, xLabel, "share of candidates", data,
                PlotOrientation.VERTICAL, true, false, false);
        XYPlot plot = chart.getXYPlot();
        XYBarRenderer r = (XYBarRenderer) plot.getRenderer();
        r.setShadowVisible(false);
        r.setBarPainter(new org.jfree.chart.renderer.xy.StandardXYBarPainter());
        for (int i = 0; i < data.getSeriesCount(); i++) {
            Color c = PALETTE[i % PALETTE.length];
            r.setSeriesPaint(i, new Color(c.getRed(), c.getGreen(), c.getBlue(), 130));
        }
        return style(chart);
    }

    /** Means with error bars (half-widths) per category and series, joined by lines. */
    static JFreeChart meansWithIntervals(String xLabel, String yLabel, DefaultStatisticalCategoryDataset data) {
        JFreeChart chart = ChartFactory.createLineChart(null, xLabel, yLabel, data, PlotOrientation.VERTICAL, true,
                false, false);
        CategoryPlot plot = chart.getCategoryPlot();
        StatisticalLineAndShapeRenderer r = new StatisticalLineAndShapeRenderer(true, true);
        for (int i = 0; i < data.getRowCount(); i++) {
            r.setSeriesPaint(i, PALETTE[i % PALETTE.length]);
            r.setSeriesStroke(i, new BasicStroke(2f));
        }
        r.setErrorIndicatorPaint(Color.DARK_GRAY);
        plot.setRenderer(r);
        ((NumberAxis) plot.getRangeAxis()).setAutoRangeIncludesZero(false);
        return style(chart);
    }

    /** Grouped bars (e.g. share of candidates using a tool, per level). */
    static JFreeChart bars(String xLabel, String yLabel, DefaultCategoryDataset data) {
        JFreeChart chart = ChartFactory.createBarChart(null, xLabel, yLabel, data, PlotOrientation.VERTICAL, true,
                false, false);
        var r = (org.jfree.chart.renderer.category.BarRenderer) chart.getCategoryPlot().getRenderer();
        r.setShadowVisible(false);
        r.setBarPainter(new org.jfree.chart.renderer.category.StandardBarPainter());
        for (int i = 0; i < data.getRowCount(); i++) {
            r.setSeriesPaint(i, PALETTE[i % PALETTE.length]);
        }
        return style(chart);
    }

    /** Scatter of paired values with the line of identity. */
    static JFreeChart scatter(String xLabel, String yLabel, double[] x, double[] y) {
        XYSeries points = new XYSeries("responses", false, true);
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < x.length; i++) {
            points.add(x[i], y[i]);
            lo = Math.min(lo, Math.min(x[i], y[i]));
            hi = Math.max(hi, Math.max(x[i], y[i]));
        }
        XYSeries identity = new XYSeries("equal ratings");
        if (x.length > 0) {
            identity.add(lo, lo);
            identity.add(hi, hi);
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(points);
        data.addSeries(identity);
        JFreeChart chart = ChartFactory.createScatterPlot(null, xLabel, yLabel, data, PlotOrientation.VERTICAL, true,
                false, false);
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer();
        r.setSeriesLinesVisible(0, false);
        r.setSeriesShape(0, new java.awt.geom.Ellipse2D.Double(-2, -2, 4, 4));
        r.setSeriesPaint(0, new Color(PALETTE[0].getRed(), PALETTE[0].getGreen(), PALETTE[0].getBlue(), 90));
        r.setSeriesShapesVisible(1, false);
        r.setSeriesPaint(1, Color.DARK_GRAY);
        chart.getXYPlot().setRenderer(r);
        return style(chart);
    }

    /** A grey-scale matrix of correlations with labelled axes. */
    static JFreeChart correlationMatrix(List<String> names, double[][] r) {
        int k = names.size();
        double[] xs = new double[k * k], ys = new double[k * k], zs = new double[k * k];
        int c = 0;
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                xs[c] = j;
                ys[c] = i;
                zs[c++] = Double.isNaN(r[i][j]) ? 0 : r[i][j];
            }
        }
        DefaultXYZDataset data = new DefaultXYZDataset();
        data.addSeries("r", new double[][] {xs, ys, zs});
        String[] labels = names.toArray(String[]::new);
        SymbolAxis x = new SymbolAxis(null, labels);
        SymbolAxis y = new SymbolAxis(null, labels);
        y.setInverted(true);
        XYBlockRenderer renderer = new XYBlockRenderer();
        DivergingScale scale = new DivergingScale();
        renderer.setPaintScale(scale);
        XYPlot plot = new XYPlot(data, x, y, renderer);
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                if (!Double.isNaN(r[i][j])) {
                    var label = new org.jfree.chart.annotations.XYTextAnnotation(
                            String.format(java.util.Locale.ROOT, "%.2f", r[i][j]), j, i);
                    label.setFont(FONT);
                    label.setPaint(Math.abs(r[i][j]) > 0.6 ? Color.WHITE : Color.BLACK);
                    plot.addAnnotation(label);
                }
            }
        }
        JFreeChart chart = new JFreeChart(null, FONT, plot, false);
        NumberAxis legendAxis = new NumberAxis("Pearson r");
        legendAxis.setRange(-1, 1);
        PaintScaleLegend legend = new PaintScaleLegend(scale, legendAxis);
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setMargin(4, 4, 4, 4);
        chart.addSubtitle(legend);
        return style(chart);
    }

    /** White at r = 0, deepening to blue at +1 and to vermilion at -1 (palette colours). */
    static final class DivergingScale implements org.jfree.chart.renderer.PaintScale {
        @Override
        public double getLowerBound() {
            return -1;
        }

        @Override
        public double getUpperBound() {
            return 1;
        }

        @Override
        public java.awt.Paint getPaint(double value) {
            double v = Math.max(-1, Math.min(1, Double.isNaN(value) ? 0 : value));
            Color end = v >= 0 ? PALETTE[0] : PALETTE[1];
            double t = Math.abs(v);
            return new Color((int) Math.round(255 + (end.getRed() - 255) * t),
                    (int) Math.round(255 + (end.getGreen() - 255) * t), (int) Math.round(255 + (end.getBlue() - 255) * t));
        }
    }

    private static JFreeChart style(JFreeChart chart) {
        chart.setBackgroundPaint(Color.WHITE);
        chart.getPlot().setBackgroundPaint(Color.WHITE);
        if (chart.getPlot() instanceof XYPlot p) {
            p.setDomainGridlinePaint(new Color(0xDDDDDD));
            p.setRangeGridlinePaint(new Color(0xDDDDDD));
        } else if (chart.getPlot() instanceof CategoryPlot p) {
            p.setRangeGridlinePaint(new Color(0xDDDDDD));
        }
        chart.setAntiAlias(true);
        return chart;
    }
}
