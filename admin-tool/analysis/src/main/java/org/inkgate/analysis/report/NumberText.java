package org.inkgate.analysis.report;

import java.math.BigDecimal;
import java.util.Locale;

/** How numbers appear: rounded in HTML, full precision in CSV; NaN as a dash with the reason in notes. */
final class NumberText {

    private NumberText() {
    }

    static String html(Object v) {
        if (v == null) {
            return "";
        }
        if (v instanceof Double d) {
            if (d.isNaN()) {
                return "–";
            }
            if (d.isInfinite()) {
                return d > 0 ? "∞" : "−∞";
            }
            double a = Math.abs(d);
            if (d == Math.rint(d) && a < 1e9) {
                return Long.toString((long) (double) d);
            }
            if (a != 0 && a < 0.001) {
                return String.format(Locale.ROOT, "%.2e", d);
            }
            return String.format(Locale.ROOT, a >= 1000 ? "%.1f" : "%.3f", d);
        }
        if (v instanceof Float f) {
            return html(f.doubleValue());
        }
        return v.toString();
    }

    static String csv(Object v) {
        if (v == null) {
            return "";
        }
        if (v instanceof Double d) {
            if (d.isNaN() || d.isInfinite()) {
                return "";
            }
            return d == Math.rint(d) && Math.abs(d) < 1e15 ? BigDecimal.valueOf(d).toBigInteger().toString()
                    : Double.toString(d);
        }
        return v.toString();
    }
}
