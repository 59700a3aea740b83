package org.inkgate.analysis.comparison;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.inkgate.analysis.descriptive.Ranks;

/**
 * Wilcoxon's (1945) signed-rank test for paired values, differences b - a.
 *
 * <p>Zero differences are dropped (Wilcoxon's convention). V = sum of the ranks of positive
 * differences. With fewer than 50 differences, no ties and no zeros the p-value is exact (the
 * null distribution by counting subsets), as R and scipy do; otherwise the normal approximation
 * with tie correction and continuity correction (Hollander &amp; Wolfe 1999, ch. 3). The matched-pairs
 * rank-biserial correlation r = (V+ - V-) / (V+ + V-) (Kerby 2014) is given as effect size.
 */
public record WilcoxonSignedRank(int nonZero, int zeros, double v, double z, double p, boolean exact,
        double rankBiserial, List<String> cautions) {

    public WilcoxonSignedRank {
        cautions = List.copyOf(cautions);
    }

    public static WilcoxonSignedRank of(double[] a, double[] b) {
        List<String> cautions = new ArrayList<>();
        List<Double> nz = new ArrayList<>();
        int zeros = 0;
        for (int i = 0; i < a.length; i++) {
            double d = b[i] - a[i];
            if (d == 0) {
                zeros++;
            } else {
                nz.add(d);
            }
        }
        int n = nz.size();
        if (zeros > 0) {
            cautions.add(zeros + " zero difference(s) dropped");
        }
        if (n == 0) {
            cautions.add("no non-zero differences: test undefined");
            return new WilcoxonSignedRank(0, zeros, Double.NaN, Double.NaN, Double.NaN, false, Double.NaN, cautions);
        }
        double[] abs = nz.stream().mapToDouble(Math::abs).toArray();
        double[] ranks = Ranks.of(abs);
        double vPlus = 0, total = n * (n + 1) / 2.0;
        for (int i = 0; i < n; i++) {
            if (nz.get(i) > 0) {
                vPlus += ranks[i];
            }
        }
        double ties = Ranks.tieSum(abs);
        double r = (vPlus - (total - vPlus)) / total;
        double mean = n * (n + 1) / 4.0;
        double var = n * (n + 1) * (2.0 * n + 1) / 24 - ties / 48;
        double z = var > 0 ? (vPlus - mean) / Math.sqrt(var) : Double.NaN;
        if (n < 50 && ties == 0 && zeros == 0) {
            return new WilcoxonSignedRank(n, zeros, vPlus, z, exactP(n, (int) Math.round(vPlus)), true, r, cautions);
        }
        if (ties > 0) {
            cautions.add("tied differences: normal approximation with tie correction");
        }
        if (var == 0) {
            cautions.add("all ranks tied: test undefined");
            return new WilcoxonSignedRank(n, zeros, vPlus, Double.NaN, Double.NaN, false, r, cautions);
        }
        double cc = Math.signum(vPlus - mean) * 0.5;
        double zc = (vPlus - mean - cc) / Math.sqrt(var);
        double p = Math.min(1, 2 * new NormalDistribution(null, 0, 1).cumulativeProbability(-Math.abs(zc)));
        return new WilcoxonSignedRank(n, zeros, vPlus, zc, p, false, r, cautions);
    }

    /** Two-sided exact p: counts of subsets of {1..n} by rank sum. */
    static double exactP(int n, int v) {
        int max = n * (n + 1) / 2;
        double[] count = new double[max + 1];
        count[0] = 1;
        for (int k = 1; k <= n; k++) {
            for (int s = max; s >= k; s--) {
                count[s] += count[s - k];
            }
        }
        double totalSubsets = Math.pow(2, n);
        double lower = 0, upper = 0;
        for (int s = 0; s <= v; s++) {
            lower += count[s];
        }
        for (int s = v; s <= max; s++) {
            upper += count[s];
        }
        return Math.min(1, 2 * Math.min(lower, upper) / totalSubsets);
    }
}
