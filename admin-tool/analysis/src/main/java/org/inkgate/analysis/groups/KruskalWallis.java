package org.inkgate.analysis.groups;

import java.util.ArrayList;
import java.util.List;
import org.inkgate.analysis.descriptive.Ranks;
import org.inkgate.analysis.distributions.Tails;

/**
 * The Kruskal-Wallis (1952) rank test for k independent groups: all values ranked together (mid-ranks
 * for ties), H = 12 / (N (N + 1)) sum_j R_j^2 / n_j - 3 (N + 1), divided by the tie correction
 * 1 - sum(t^3 - t) / (N^3 - N), referred to chi-square with k - 1 df (the formula of R's
 * {@code kruskal.test}). Effect size epsilon squared = H / (N - 1) (Tomczak &amp; Tomczak 2014).
 */
public record KruskalWallis(int groups, int n, double h, double df, double p, double epsilonSquared,
        double[] meanRanks, List<String> cautions) {

    /** Below this many values in a group the chi-square approximation is rough (common practice). */
    public static final int SMALL_GROUP = 5;

    public KruskalWallis {
        meanRanks = meanRanks.clone();
        cautions = List.copyOf(cautions);
    }

    /** The test of the groups; groups with no values are left out and named in the cautions. */
    public static KruskalWallis of(Groups groups) {
        List<String> cautions = new ArrayList<>();
        List<double[]> used = new ArrayList<>();
        for (int g = 0; g < groups.count(); g++) {
            if (groups.values().get(g).length == 0) {
                cautions.add("group " + groups.labels().get(g) + " has no values and is left out");
            } else {
                used.add(groups.values().get(g));
            }
        }
        int k = used.size();
        int n = used.stream().mapToInt(v -> v.length).sum();
        double[] all = new double[n];
        int at = 0;
        for (double[] v : used) {
            System.arraycopy(v, 0, all, at, v.length);
            at += v.length;
        }
        double[] ranks = Ranks.of(all);
        double[] meanRanks = new double[k];
        double sum = 0;
        at = 0;
        for (int j = 0; j < k; j++) {
            double r = 0;
            for (int i = 0; i < used.get(j).length; i++) {
                r += ranks[at++];
            }
            meanRanks[j] = r / used.get(j).length;
            sum += r * r / used.get(j).length;
        }
        double correction = n < 2 ? 0 : 1 - Ranks.tieSum(all) / ((double) n * n * n - n);
        if (k < 2 || !(correction > 0)) {
            cautions.add(k < 2 ? "Kruskal-Wallis needs at least 2 groups with values (has " + k + ")"
                    : "every value is tied: test undefined");
            return new KruskalWallis(k, n, Double.NaN, k - 1, Double.NaN, Double.NaN, meanRanks, cautions);
        }
        double h = (12.0 / (n * (n + 1.0)) * sum - 3 * (n + 1.0)) / correction;
        if (used.stream().anyMatch(v -> v.length < SMALL_GROUP)) {
            cautions.add("a group has fewer than " + SMALL_GROUP + " values: the chi-square approximation is rough");
        }
        return new KruskalWallis(k, n, h, k - 1, Tails.chiSquareUpper(h, k - 1), h / (n - 1), meanRanks, cautions);
    }
}
