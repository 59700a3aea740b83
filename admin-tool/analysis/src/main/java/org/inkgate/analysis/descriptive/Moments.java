package org.inkgate.analysis.descriptive;

/** The sample mean and the unbiased sample variance, shared by the comparisons and the group tests. */
public final class Moments {

    private Moments() {
    }

    /** Arithmetic mean; NaN for no values. */
    public static double mean(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return s / v.length;
    }

    /** Sample variance with n - 1 in the denominator (two-pass); NaN for fewer than two values. */
    public static double variance(double[] v) {
        double m = mean(v);
        double s = 0;
        for (double x : v) {
            s += (x - m) * (x - m);
        }
        return s / (v.length - 1);
    }
}
