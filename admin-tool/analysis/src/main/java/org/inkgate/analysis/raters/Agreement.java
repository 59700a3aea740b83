package org.inkgate.analysis.raters;

/** Exact agreement (share of |a - b| = 0) and adjacent agreement (share of |a - b| &lt;= 1). */
public record Agreement(int n, double exact, double adjacent) {

    public static Agreement of(double[] a, double[] b) {
        int exact = 0, adjacent = 0;
        for (int i = 0; i < a.length; i++) {
            double d = Math.abs(a[i] - b[i]);
            exact += d == 0 ? 1 : 0;
            adjacent += d <= 1 ? 1 : 0;
        }
        int n = a.length;
        return new Agreement(n, n == 0 ? Double.NaN : (double) exact / n, n == 0 ? Double.NaN : (double) adjacent / n);
    }
}
