package org.inkgate.analysis.comparison;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.TDistribution;
import org.inkgate.analysis.descriptive.Moments;
import org.inkgate.analysis.distributions.NoncentralT;

/**
 * Paired t-test with mean difference, its CI, and Cohen's d_z and d_av with confidence intervals
 * (Lakens 2013, Frontiers in Psychology 4:863, equations 6-10).
 *
 * <p>d_z = mean(diff) / sd(diff); its CI inverts the noncentral t with df n - 1 (t = d_z sqrt(n)).
 * d_av = mean(diff) / ((s_1 + s_2) / 2). The CI of d_av is the d_z interval scaled by
 * sd(diff) / ((s_1 + s_2) / 2): an approximation that treats the SD ratio as known.
 * Differences are second minus first ({@code b - a}).
 */
public record PairedComparison(int n, double meanA, double meanB, double meanDifference, double sdDifference,
        double t, double df, double p, double differenceLower, double differenceUpper,
        double dz, double dzLower, double dzUpper, double dav, double davLower, double davUpper,
        List<String> cautions) {

    public PairedComparison {
        cautions = List.copyOf(cautions);
    }

    /** Compares paired values a[i], b[i]; confidence e.g. 0.95. */
    public static PairedComparison of(double[] a, double[] b, double confidence) {
        if (a.length != b.length) {
            throw new IllegalArgumentException("paired samples differ in length: " + a.length + " and " + b.length);
        }
        int n = a.length;
        List<String> cautions = new ArrayList<>();
        double ma = Moments.mean(a), mb = Moments.mean(b);
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            d[i] = b[i] - a[i];
        }
        double md = Moments.mean(d);
        if (n < 2) {
            cautions.add("paired t-test needs at least 2 pairs (has " + n + ")");
            return nan(n, ma, mb, md, cautions);
        }
        double sd = Math.sqrt(Moments.variance(d));
        double sa = Math.sqrt(Moments.variance(a)), sb = Math.sqrt(Moments.variance(b));
        if (sd == 0) {
            cautions.add("all paired differences are equal: t and d_z undefined");
            return nan(n, ma, mb, md, cautions);
        }
        double df = n - 1;
        double se = sd / Math.sqrt(n);
        double t = md / se;
        TDistribution dist = new TDistribution(null, df);
        double p = 2 * dist.cumulativeProbability(-Math.abs(t));
        double crit = dist.inverseCumulativeProbability(1 - (1 - confidence) / 2);
        double dz = md / sd;
        double[] delta = NoncentralT.deltaInterval(t, df, confidence);
        double dzLo = delta[0] / Math.sqrt(n), dzHi = delta[1] / Math.sqrt(n);
        double avSd = (sa + sb) / 2;
        double dav = avSd > 0 ? md / avSd : Double.NaN;
        double ratio = sd / avSd;
        if (avSd == 0) {
            cautions.add("both conditions have zero SD: d_av undefined");
        }
        return new PairedComparison(n, ma, mb, md, sd, t, df, p, md - crit * se, md + crit * se, dz, dzLo, dzHi,
                dav, dzLo * ratio, dzHi * ratio, cautions);
    }

    private static PairedComparison nan(int n, double ma, double mb, double md, List<String> cautions) {
        double x = Double.NaN;
        return new PairedComparison(n, ma, mb, md, x, x, x, x, x, x, x, x, x, x, x, x, cautions);
    }

}
