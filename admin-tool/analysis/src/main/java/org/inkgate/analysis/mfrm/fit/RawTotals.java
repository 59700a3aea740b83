package org.inkgate.analysis.mfrm.fit;

import org.inkgate.analysis.mfrm.design.ModelDesign;
import org.inkgate.analysis.mfrm.estimation.CategoryModel;

/**
 * Per element, over every rating of a design: the number of ratings, the raw score and its model
 * expectation at the given measures. Extreme elements are set aside before estimation, so the
 * residual statistics ({@link RatingStatistics}) never see their ratings; their counts and scores
 * come from here, over all ratings.
 */
public final class RawTotals {
    public final int[][] count;
    public final double[][] observedRaw;
    public final double[][] expectedRaw;
    /** d(expected raw score)/d(logit) summed over the ratings: the information, in raw-score units. */
    public final double[][] slope;

    public RawTotals(ModelDesign d, double[][] measure, double[][] thresholds) {
        int nF = d.facetCount();
        count = new int[nF][];
        observedRaw = new double[nF][];
        expectedRaw = new double[nF][];
        slope = new double[nF][];
        for (int f = 0; f < nF; f++) {
            count[f] = new int[d.elementCount(f)];
            observedRaw[f] = new double[d.elementCount(f)];
            expectedRaw[f] = new double[d.elementCount(f)];
            slope[f] = new double[d.elementCount(f)];
        }
        double[] p = new double[d.maxCategoryOverall() + 1];
        for (int n = 0; n < d.observationCount(); n++) {
            double eta = measure[0][d.elements(0)[n]];
            for (int f = 1; f < nF; f++) {
                eta -= measure[f][d.elements(f)[n]];
            }
            int s = d.scales()[n];
            int m = d.maxCategory(s);
            CategoryModel.probabilities(eta, thresholds[s], m, p);
            double expected = 0;
            double meanCategory = 0;
            for (int k = 0; k <= m; k++) {
                expected += d.rawScore(s, k) * p[k];
                meanCategory += k * p[k];
            }
            // dp_k/d(eta) = p_k (k - mean category), so d(expected raw)/d(eta) = cov(raw score, category)
            double cov = 0;
            for (int k = 0; k <= m; k++) {
                cov += d.rawScore(s, k) * p[k] * (k - meanCategory);
            }
            double raw = d.rawScore(s, d.categories()[n]);
            for (int f = 0; f < nF; f++) {
                int e = d.elements(f)[n];
                count[f][e]++;
                observedRaw[f][e] += raw;
                expectedRaw[f][e] += expected;
                slope[f][e] += cov;
            }
        }
    }
}
