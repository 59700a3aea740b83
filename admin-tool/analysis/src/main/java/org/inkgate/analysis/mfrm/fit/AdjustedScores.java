package org.inkgate.analysis.mfrm.fit;

import org.inkgate.analysis.mfrm.design.ModelDesign;
import org.inkgate.analysis.mfrm.estimation.CategoryModel;

/**
 * Adjusted scores on the raw score scale: the model-expected score of one rating for an element
 * with every other facet at its mean (rater severity, task difficulty... taken out), so candidates
 * who met harsher raters or harder tasks are compared on one footing; the same for every element
 * of the other facets (a rater's adjusted score is what an average candidate would get from them
 * on an average task). Means are over the elements the estimation used (extremes set aside).
 * Under partial credit the score is averaged over the partial-credit facet's threshold sets, except
 * for that facet's own elements, which use their own set.
 */
public final class AdjustedScores {
    private final ModelDesign d;
    private final double[][] thresholds;
    private final int pcFacet;
    private final double[] mean;
    private final double[] work;

    /**
     * @param active  the design the estimation used (extreme elements set aside)
     * @param pcFacet the partial-credit facet, or -1
     */
    public AdjustedScores(ModelDesign active, double[][] measure, double[][] thresholds, int pcFacet) {
        this.d = active;
        this.thresholds = thresholds;
        this.pcFacet = pcFacet;
        int nF = active.facetCount();
        mean = new double[nF];
        for (int f = 0; f < nF; f++) {
            boolean[] present = new boolean[active.elementCount(f)];
            for (int e : active.elements(f)) {
                present[e] = true;
            }
            double sum = 0;
            int n = 0;
            for (int e = 0; e < present.length; e++) {
                if (present[e]) {
                    sum += measure[f][e];
                    n++;
                }
            }
            mean[f] = n == 0 ? 0 : sum / n;
        }
        work = new double[active.maxCategoryOverall() + 1];
    }

    /** The adjusted score of element {@code e} of facet {@code f} at the given measure (logits). */
    public double at(int f, int e, double measureValue) {
        double eta = mean[0];
        for (int g = 1; g < mean.length; g++) {
            eta -= mean[g];
        }
        eta += f == 0 ? measureValue - mean[0] : -(measureValue - mean[f]);
        if (pcFacet < 0) {
            return expectedRaw(eta, 0);
        }
        if (f == pcFacet) {
            return expectedRaw(eta, e);
        }
        double sum = 0;
        for (int s = 0; s < d.scaleCount(); s++) {
            sum += expectedRaw(eta, s);
        }
        return sum / d.scaleCount();
    }

    private double expectedRaw(double eta, int s) {
        int m = d.maxCategory(s);
        CategoryModel.probabilities(eta, thresholds[s], m, work);
        double e = 0;
        for (int k = 0; k <= m; k++) {
            e += d.rawScore(s, k) * work[k];
        }
        return e;
    }
}
