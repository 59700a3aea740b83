package org.inkgate.analysis.report;

/** Number text for labels (column names and categories): integers without a decimal point. */
public final class NumberFormatting {

    private NumberFormatting() {
    }

    public static String plain(double v) {
        return NumberText.csv(v);
    }
}
