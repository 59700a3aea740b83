package org.inkgate.analysis.comparison;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.inkgate.analysis.descriptive.Ranks;

/**
 * The Mann-Whitney U test (Wilcoxon rank-sum; Mann &amp; Whitney 1947) for two independent samples.
 *
 * <p>U = W - n_a(n_a + 1)/2 with W the rank sum of sample a in the pooled ranks (mid-ranks for ties),
 * as R's {@code wilcox.test} reports it (its statistic W). With fewer than 50 values in each sample and
 * no ties the two-sided p-value is exact (the null distribution of U by counting); otherwise the
 * normal approximation with tie correction and continuity correction (Hollander &amp; Wolfe 1999, ch. 4),
 * the same rule as R. The rank-biserial correlation r = 2U/(n_a n_b) - 1 (Kerby 2014) is the effect
 * size: positive when a tends to be larger.
 */
public record MannWhitney(int na, int nb, double u, double z, double p, boolean exact, double rankBiserial,
        List<String> cautions) {

    public MannWhitney {
        cautions = List.copyOf(cautions);
    }

    public static MannWhitney of(double[] a, double[] b) {
        int na = a.length, nb = b.length;
        List<String> cautions = new ArrayList<>();
        if (na == 0 || nb == 0) {
            cautions.add("a sample is empty: test undefined");
            return new MannWhitney(na, nb, Double.NaN, Double.NaN, Double.NaN, false, Double.NaN, cautions);
        }
        double[] pooled = new double[na + nb];
        System.arraycopy(a, 0, pooled, 0, na);
        System.arraycopy(b, 0, pooled, na, nb);
        double[] ranks = Ranks.of(pooled);
        double w = 0;
        for (int i = 0; i < na; i++) {
            w += ranks[i];
        }
        double u = w - na * (na + 1) / 2.0;
        double r = 2 * u / ((double) na * nb) - 1;
        double ties = Ranks.tieSum(pooled);
        int n = na + nb;
        double mean = na * (double) nb / 2;
        double var = na * (double) nb / 12 * ((n + 1) - ties / ((double) n * (n - 1)));
        if (na < 50 && nb < 50 && ties == 0) {
            double z = (u - mean) / Math.sqrt(var);
            return new MannWhitney(na, nb, u, z, exactP(na, nb, (int) Math.round(u)), true, r, cautions);
        }
        if (ties > 0) {
            cautions.add("tied values: normal approximation with tie correction");
        }
        if (!(var > 0)) {
            cautions.add("all values tied: test undefined");
            return new MannWhitney(na, nb, u, Double.NaN, Double.NaN, false, r, cautions);
        }
        double cc = Math.signum(u - mean) * 0.5;
        double z = (u - mean - cc) / Math.sqrt(var);
        double p = Math.min(1, 2 * new NormalDistribution(null, 0, 1).cumulativeProbability(-Math.abs(z)));
        return new MannWhitney(na, nb, u, z, p, false, r, cautions);
    }

    /**
     * Two-sided exact p: frequencies of U by the recursion f(m, n, u) = f(m-1, n, u-n) + f(m, n-1, u)
     * (Mann &amp; Whitney 1947), computed as counts of m-subsets of {1..m+n} by rank sum.
     */
    static double exactP(int na, int nb, int u) {
        int max = na * nb;
        // count[j][s]: subsets of size j of the ranks seen so far with (rank sum - j(j+1)/2) = s
        double[][] count = new double[na + 1][max + 1];
        count[0][0] = 1;
        for (int k = 1; k <= na + nb; k++) {
            for (int j = Math.min(k, na); j >= 1; j--) {
                int shift = k - j; // adding rank k as the j-th element raises U-form sum by k - j
                for (int s = max; s >= shift; s--) {
                    count[j][s] += count[j - 1][s - shift];
                }
            }
        }
        double total = 0, lower = 0, upper = 0;
        for (int s = 0; s <= max; s++) {
            total += count[na][s];
            if (s <= u) {
                lower += count[na][s];
            }
            if (s >= u) {
                upper += count[na][s];
            }
        }
        return Math.min(1, 2 * Math.min(lower, upper) / total);
    }
}
