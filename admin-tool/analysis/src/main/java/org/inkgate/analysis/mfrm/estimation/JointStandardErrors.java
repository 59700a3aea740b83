package org.inkgate.analysis.mfrm.estimation;

import java.util.Arrays;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.inkgate.analysis.mfrm.design.Grouping;
import org.inkgate.analysis.mfrm.design.ModelDesign;

/**
 * Standard errors of the non-candidate measures from the joint information matrix, candidates
 * absorbed (Schur complement) and thresholds held fixed. The usual model SE, 1/sqrt(own
 * information), treats every other measure as known; in sparse designs (raters linked through
 * a chain of shared candidates) a rater's measure inherits the uncertainty of the whole chain,
 * and only the joint matrix shows it.
 *
 * <p>M = sum over ratings of w u u' - sum over candidates of t t' / W, with w the model variance
 * of a rating, u its indicator vector over free non-candidate elements, t = sum of w u over the
 * candidate's ratings and W = sum of w. Its null space is spanned by the facets' indicator
 * vectors (a shift of a whole facet is absorbed by the candidates), so the Moore-Penrose inverse
 * is the covariance of the measures centred within each facet - the constraint the estimator uses.
 */
public final class JointStandardErrors {
    private JointStandardErrors() {
    }

    /** [facet][element] joint SE; NaN for candidates, anchored and absent elements. */
    public static double[][] of(ModelDesign d, double[][] measure, double[][] thresholds, boolean[][] anchored) {
        int nF = d.facetCount();
        int[][] column = new int[nF][];
        boolean[][] present = new boolean[nF][];
        for (int f = 0; f < nF; f++) {
            present[f] = new boolean[d.elementCount(f)];
            for (int e : d.elements(f)) {
                present[f][e] = true;
            }
        }
        int p = 0;
        for (int f = 1; f < nF; f++) {
            column[f] = new int[d.elementCount(f)];
            Arrays.fill(column[f], -1);
            for (int e = 0; e < column[f].length; e++) {
                if (!anchored[f][e] && present[f][e]) {
                    column[f][e] = p++;
                }
            }
        }
        double[][] out = new double[nF][];
        for (int f = 0; f < nF; f++) {
            out[f] = new double[d.elementCount(f)];
            Arrays.fill(out[f], Double.NaN);
        }
        if (p == 0) {
            return out;
        }
        int nC = d.elementCount(0);
        int[] cand = d.elements(0);
        Grouping byCandidate = Grouping.of(cand, nC);
        int[] start = byCandidate.start();
        int[] order = byCandidate.order();
        double[][] m = new double[p][p];
        double[] t = new double[p];
        int[] touched = new int[p];
        int[] cols = new int[nF];
        double[] prob = new double[d.maxCategoryOverall() + 1];
        for (int c = 0; c < nC; c++) {
            double wSum = 0;
            int nt = 0;
            for (int i = start[c]; i < start[c + 1]; i++) {
                int n = order[i];
                double eta = measure[0][c];
                for (int f = 1; f < nF; f++) {
                    eta -= measure[f][d.elements(f)[n]];
                }
                int s = d.scales()[n];
                int mc = d.maxCategory(s);
                CategoryModel.probabilities(eta, thresholds[s], mc, prob);
                double e1 = 0;
                double e2 = 0;
                for (int k = 1; k <= mc; k++) {
                    e1 += k * prob[k];
                    e2 += k * k * prob[k];
                }
                double w = e2 - e1 * e1;
                wSum += w;
                int k = 0;
                for (int f = 1; f < nF; f++) {
                    int col = column[f][d.elements(f)[n]];
                    if (col >= 0) {
                        cols[k++] = col;
                    }
                }
                for (int x = 0; x < k; x++) {
                    for (int y = 0; y < k; y++) {
                        m[cols[x]][cols[y]] += w;
                    }
                    if (t[cols[x]] == 0) {
                        touched[nt++] = cols[x];
                    }
                    t[cols[x]] += w;
                }
            }
            if (wSum > 0) {
                for (int x = 0; x < nt; x++) {
                    for (int y = 0; y < nt; y++) {
                        m[touched[x]][touched[y]] -= t[touched[x]] * t[touched[y]] / wSum;
                    }
                }
            }
            for (int x = 0; x < nt; x++) {
                t[touched[x]] = 0;
            }
        }
        RealMatrix cov = new SingularValueDecomposition(new Array2DRowRealMatrix(m, false)).getSolver().getInverse();
        for (int f = 1; f < nF; f++) {
            for (int e = 0; e < column[f].length; e++) {
                if (column[f][e] >= 0) {
                    out[f][e] = Math.sqrt(cov.getEntry(column[f][e], column[f][e]));
                }
            }
        }
        return out;
    }
}
