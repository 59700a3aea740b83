package org.inkgate.analysis.comparison;

import java.util.ArrayList;
import java.util.List;
import org.inkgate.analysis.descriptive.Ranks;
import org.inkgate.analysis.distributions.Tails;

/**
 * Friedman's (1937) rank test for k related samples: each candidate's scores are ranked across the
 * conditions (mid-ranks for ties), Q = 12 sum_j (R_j - n(k+1)/2)^2 / (n k (k+1) - sum(t^3 - t)/(k-1))
 * with R_j the rank sum of condition j and the tie sum over every candidate's ties, referred to
 * chi-square with k - 1 df; the formula and tie correction of R's {@code friedman.test}. Kendall's
 * W = Q / (n (k - 1)) is the effect size.
 */
public record Friedman(int n, int k, double q, double df, double p, double kendallW, double[] meanRanks,
        List<String> cautions) {

    public Friedman {
        meanRanks = meanRanks.clone();
        cautions = List.copyOf(cautions);
    }

    /** y[i][j]: candidate i under condition j. */
    public static Friedman of(double[][] y) {
        int n = y.length, k = n == 0 ? 0 : y[0].length;
        List<String> cautions = new ArrayList<>();
        double[] rankSum = new double[k];
        double ties = 0;
        for (double[] row : y) {
            double[] r = Ranks.of(row);
            for (int j = 0; j < k; j++) {
                rankSum[j] += r[j];
            }
            ties += Ranks.tieSum(row);
        }
        double[] meanRanks = new double[k];
        double s = 0;
        for (int j = 0; j < k; j++) {
            meanRanks[j] = rankSum[j] / n;
            double d = rankSum[j] - n * (k + 1) / 2.0;
            s += d * d;
        }
        double denominator = n * k * (k + 1.0) - ties / (k - 1);
        if (!(denominator > 0)) {
            cautions.add("every candidate's scores are tied across conditions: test undefined");
            return new Friedman(n, k, Double.NaN, k - 1, Double.NaN, Double.NaN, meanRanks, cautions);
        }
        double q = 12 * s / denominator;
        if (n < 10) {
            cautions.add("fewer than 10 candidates: the chi-square approximation is rough");
        }
        return new Friedman(n, k, q, k - 1, Tails.chiSquareUpper(q, k - 1), q / (n * (k - 1.0)), meanRanks,
                cautions);
    }
}
