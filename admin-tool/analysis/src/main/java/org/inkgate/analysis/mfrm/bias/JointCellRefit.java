package org.inkgate.analysis.mfrm.bias;

import java.util.Arrays;
import java.util.List;
import org.inkgate.analysis.mfrm.design.DesignCheck;
import org.inkgate.analysis.mfrm.design.ModelDesign;
import org.inkgate.analysis.mfrm.estimation.Estimates;
import org.inkgate.analysis.mfrm.estimation.JmleEstimator;
import org.inkgate.analysis.mfrm.estimation.JointStandardErrors;

/**
 * A combination's interaction estimated jointly with the main effects: the model is refitted with
 * one more facet, "this combination or not", whose "not" element is anchored at 0, so its free
 * element is the combination's own term beside every measure and threshold. Its SE comes from the
 * joint information (main effects' uncertainty included). Equivalent to adding the combination's
 * indicator to a fixed-effects adjacent-category model (checked against survival::clogit).
 */
public final class JointCellRefit {
    private final ModelDesign d;
    private final double[][] measure;
    private final double[][] thresholds;
    private final boolean[][] anchored;
    private final boolean[] scaleAnchored;
    private final int pcFacet;
    private final int threads;
    private final double maxChange;
    private final double maxResidual;
    private final int maxIterations;

    /** The fitted main-effects model the refits start from (not modified). */
    public JointCellRefit(ModelDesign d, double[][] measure, double[][] thresholds, boolean[][] anchored,
                          boolean[] scaleAnchored, int pcFacet, int threads, double maxChange, double maxResidual,
                          int maxIterations) {
        this.d = d;
        this.measure = measure;
        this.thresholds = thresholds;
        this.anchored = anchored;
        this.scaleAnchored = scaleAnchored;
        this.pcFacet = pcFacet;
        this.threads = threads;
        this.maxChange = maxChange;
        this.maxResidual = maxResidual;
        this.maxIterations = maxIterations;
    }

    /**
     * @param inCell per observation of the design, 1 in the combination and 0 elsewhere
     * @return {size, SE} (size positive = the combination scores higher than the main effects
     *         expect), or null when the combination cannot be told apart from the main effects
     *         (e.g. it holds every rating of an element) or the refit did not converge
     */
    double[] fit(int[] inCell) {
        int nF = d.facetCount();
        String[] names = Arrays.copyOf(d.facetNames(), nF + 1);
        names[nF] = "combination";
        String[][] labels = new String[nF + 1][];
        int[][] elem = new int[nF + 1][];
        double[][] m = new double[nF + 1][];
        boolean[][] anch = new boolean[nF + 1][];
        for (int f = 0; f < nF; f++) {
            labels[f] = new String[d.elementCount(f)];
            for (int e = 0; e < labels[f].length; e++) {
                labels[f][e] = d.label(f, e);
            }
            elem[f] = d.elements(f);
            m[f] = measure[f].clone();
            anch[f] = anchored[f];
        }
        labels[nF] = new String[] {"other", "this"};
        elem[nF] = inCell;
        m[nF] = new double[2];
        anch[nF] = new boolean[] {true, false};
        String[] scaleLabels = new String[d.scaleCount()];
        int[][] rawOf = new int[d.scaleCount()][];
        double[][] thr = new double[d.scaleCount()][];
        for (int s = 0; s < d.scaleCount(); s++) {
            scaleLabels[s] = d.scaleLabel(s);
            rawOf[s] = new int[d.maxCategory(s) + 1];
            for (int k = 0; k < rawOf[s].length; k++) {
                rawOf[s][k] = d.rawScore(s, k);
            }
            thr[s] = thresholds[s].clone();
        }
        ModelDesign aug = new ModelDesign(names, labels, elem, d.categories(), d.scales(), scaleLabels, rawOf, d.rows());
        List<String> problems = DesignCheck.problems(aug, anch, "");
        if (!problems.isEmpty()) {
            return null;
        }
        Estimates est = new JmleEstimator(aug, anch, scaleAnchored, threads, pcFacet)
                .estimate(m, thr, maxChange, maxResidual, maxIterations);
        if (!est.converged()) {
            return null;
        }
        double se = est.jointSe() != null ? est.jointSe()[nF][1]
                : JointStandardErrors.of(aug, m, thr, anch)[nF][1];
        // measures lower expected scores (harder, more severe): the combination's size is the opposite
        return new double[] {-m[nF][1], se};
    }
}
