package org.inkgate.analysis.raters;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.TDistribution;
import org.inkgate.analysis.descriptive.Ranks;

/**
 * Pearson's r with its t-test and Fisher-z 95% CI, and Spearman's rho (Pearson's r of average
 * ranks) with the t approximation p-value (as scipy.stats.spearmanr).
 */
public record Correlation(int n, double r, double p, double lower, double upper, List<String> cautions) {

    public Correlation {
        cautions = List.copyOf(cautions);
    }

    public static Correlation pearson(double[] x, double[] y) {
        List<String> cautions = new ArrayList<>();
        int n = x.length;
        double r = r(x, y);
        if (n < 3) {
            cautions.add("correlation test needs at least 3 pairs (has " + n + ")");
            return new Correlation(n, r, Double.NaN, Double.NaN, Double.NaN, cautions);
        }
        if (Double.isNaN(r)) {
            cautions.add("one variable has zero variance: correlation undefined");
            return new Correlation(n, r, Double.NaN, Double.NaN, Double.NaN, cautions);
        }
        double p = tTestP(r, n);
        double lo = Double.NaN, hi = Double.NaN;
        if (n > 3 && Math.abs(r) < 1) {
            double z = 0.5 * Math.log((1 + r) / (1 - r));
            double crit = new NormalDistribution(null, 0, 1).inverseCumulativeProbability(0.975) / Math.sqrt(n - 3);
            lo = Math.tanh(z - crit);
            hi = Math.tanh(z + crit);
        }
        return new Correlation(n, r, p, lo, hi, cautions);
    }

    public static Correlation spearman(double[] x, double[] y) {
        Correlation c = pearson(Ranks.of(x), Ranks.of(y));
        return new Correlation(c.n, c.r, c.p, Double.NaN, Double.NaN, c.cautions);
    }

    /** Pearson's r, NaN when either variable has zero variance. */
    public static double r(double[] x, double[] y) {
        int n = x.length;
        double mx = 0, my = 0;
        for (int i = 0; i < n; i++) {
            mx += x[i];
            my += y[i];
        }
        mx /= n;
        my /= n;
        double sxy = 0, sxx = 0, syy = 0;
        for (int i = 0; i < n; i++) {
            sxy += (x[i] - mx) * (y[i] - my);
            sxx += (x[i] - mx) * (x[i] - mx);
            syy += (y[i] - my) * (y[i] - my);
        }
        return sxx == 0 || syy == 0 ? Double.NaN : sxy / Math.sqrt(sxx * syy);
    }

    private static double tTestP(double r, int n) {
        if (Math.abs(r) >= 1) {
            return 0;
        }
        double t = r * Math.sqrt((n - 2) / (1 - r * r));
        return 2 * new TDistribution(null, n - 2).cumulativeProbability(-Math.abs(t));
    }
}
