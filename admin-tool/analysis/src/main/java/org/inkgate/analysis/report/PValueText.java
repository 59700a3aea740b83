package org.inkgate.analysis.report;

import java.util.Locale;

/**
 * The one way a p-value is written in the report's HTML, notes and charts. Below 1e-15 a tail
 * probability is no longer resolved by double precision arithmetic (about 2.2e-16 relative
 * spacing near 1), so such a p is shown as "&lt; 1e-15" rather than as 0 or as spurious digits;
 * the CSV and summary.json keep the computed number.
 */
public final class PValueText {

    /** The smallest p-value the report writes as a number. */
    public static final double FLOOR = 1e-15;
    /** What a p-value below {@link #FLOOR} reads as. */
    public static final String BELOW_FLOOR = "< 1e-15";

    private PValueText() {
    }

    /** A p-value as text: "< 1e-15" below the floor, 2 significant digits in e-notation below 0.001, else 3 decimals. */
    public static String of(double p) {
        if (Double.isNaN(p)) {
            return "–";
        }
        if (p < FLOOR) {
            return BELOW_FLOOR;
        }
        if (p < 0.001) {
            return String.format(Locale.ROOT, "%.2e", p);
        }
        return String.format(Locale.ROOT, "%.3f", p);
    }
}
