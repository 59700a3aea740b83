package org.inkgate.analysis.report;

import java.util.Objects;
import org.jfree.chart.JFreeChart;

/** One chart of the report: drawn by JFreeChart, written into the HTML as inline SVG. */
public record Chart(String id, String title, String caption, JFreeChart chart, int width, int height) {

    public Chart {
        Objects.requireNonNull(chart, "chart");
    }
}
