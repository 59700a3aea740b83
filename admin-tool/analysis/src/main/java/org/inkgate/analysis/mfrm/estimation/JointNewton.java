package org.inkgate.analysis.mfrm.estimation;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.IntStream;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.inkgate.analysis.mfrm.design.Grouping;
import org.inkgate.analysis.mfrm.design.ModelDesign;

/**
 * One full Newton-Raphson step on all measures and thresholds at once, with the candidates
 * absorbed: the information matrix is block-diagonal in the candidates, so the step solves a
 * small system over the non-candidate elements and thresholds (Schur complement) and then each
 * candidate's step follows from its own row. Converges in a handful of iterations where
 * facet-by-facet steps crawl along the ridge between the candidates' spread and the thresholds.
 *
 * <p>Per rating with P_k the category probabilities, E the expected category, V its variance,
 * t_k = P(X >= k) and a_k = sum_{j>=k} j P_j - E t_k: gradient x - E for the candidate, -(x - E)
 * for every other element, t_k - [x >= k] for threshold k; information V between measures (sign
 * + for candidate-candidate and element-element, - between candidate and element), -a_k between
 * the candidate and threshold k, +a_k between another element and threshold k, and
 * t_max(k,l) - t_k t_l between thresholds k and l.
 */
final class JointNewton {
    private final ModelDesign d;
    private final int nF;
    private final int q;
    private final int[][] column;
    private final int[][] thresholdColumn;
    private final int[] order;
    private final int[] start;
    private final int[] bound;
    private final int threads;

    private final boolean[] isThreshold;
    /** [facet] true when the facet has no anchored element, so the estimator centres it. */
    private final boolean[] centred;

    /** Result of one iteration's gradient pass, with the reduced information matrix it solved. */
    record Step(double[] candidate, double[] columns, double maxResidual, double[][] reducedInformation) {
    }

    JointNewton(ModelDesign d, boolean[][] anchored, boolean[] scaleAnchored, boolean[][] present, int threads) {
        this.d = d;
        this.nF = d.facetCount();
        this.threads = threads;
        column = new int[nF][];
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
        thresholdColumn = new int[d.scaleCount()][];
        for (int s = 0; s < d.scaleCount(); s++) {
            thresholdColumn[s] = new int[d.maxCategory(s) + 1];
            Arrays.fill(thresholdColumn[s], -1);
            if (!scaleAnchored[s]) {
                for (int k = 1; k <= d.maxCategory(s); k++) {
                    thresholdColumn[s][k] = p++;
                }
            }
        }
        q = p;
        centred = new boolean[nF];
        for (int f = 1; f < nF; f++) {
            centred[f] = true;
            for (boolean a : anchored[f]) {
                centred[f] &= !a;
            }
        }
        isThreshold = new boolean[q];
        for (int[] tc : thresholdColumn) {
            for (int k = 1; k < tc.length; k++) {
                if (tc[k] >= 0) {
                    isThreshold[tc[k]] = true;
                }
            }
        }
        int nC = d.elementCount(0);
        int[] cand = d.elements(0);
        Grouping byCandidate = Grouping.of(cand, nC);
        start = byCandidate.start();
        order = byCandidate.order();
        bound = new int[nC + 1];
        int perRating = nF - 1 + d.maxCategoryOverall();
        for (int c = 0; c < nC; c++) {
            bound[c + 1] = bound[c] + Math.min(q, (start[c + 1] - start[c]) * perRating);
        }
    }

    /** Computes the Newton step (not yet applied) at the current estimates. */
    Step step(double[][] measure, double[][] thresholds) {
        int nC = d.elementCount(0);
        double[] gc = new double[nC];
        double[] jcc = new double[nC];
        int[] cols = new int[bound[nC]];
        double[] vals = new double[bound[nC]];
        int[] used = new int[nC];
        int chunks = d.observationCount() < 20_000 ? 1 : threads;
        Part[] parts = new Part[chunks];
        IntStream.range(0, chunks).parallel().forEach(ch -> {
            Part part = new Part(q);
            int c0 = (int) ((long) nC * ch / chunks);
            int c1 = (int) ((long) nC * (ch + 1) / chunks);
            accumulate(c0, c1, measure, thresholds, part, gc, jcc, cols, vals, used);
            parts[ch] = part;
        });
        double[][] jqq = parts[0].jqq;
        double[] gq = parts[0].gq;
        double maxResidual = parts[0].maxResidual;
        for (int ch = 1; ch < chunks; ch++) {
            for (int i = 0; i < q; i++) {
                gq[i] += parts[ch].gq[i];
                for (int j = 0; j < q; j++) {
                    jqq[i][j] += parts[ch].jqq[i][j];
                }
            }
            maxResidual = Math.max(maxResidual, parts[ch].maxResidual);
        }
        // the threshold rows were filled in their upper triangle only: mirror them
        for (int[] tc : thresholdColumn) {
            for (int k = 1; k < tc.length; k++) {
                if (tc[k] < 0) {
                    continue;
                }
                for (int l = k + 1; l < tc.length; l++) {
                    jqq[tc[l]][tc[k]] = jqq[tc[k]][tc[l]];
                }
                for (int i = 0; i < q; i++) {
                    if (!isThreshold[i]) {
                        jqq[tc[k]][i] = jqq[i][tc[k]];
                    }
                }
            }
        }
        double[] rawGq = new double[q];
        for (Part part : parts) {
            for (int i = 0; i < q; i++) {
                rawGq[i] += part.rawGq[i];
            }
        }
        for (double g : rawGq) {
            maxResidual = Math.max(maxResidual, Math.abs(g));
        }
        double[] dq = q == 0 ? new double[0]
                : new SingularValueDecomposition(new Array2DRowRealMatrix(jqq, true)).getSolver()
                .solve(new ArrayRealVector(gq, false)).toArray();
        double[] dc = new double[nC];
        for (int c = 0; c < nC; c++) {
            if (jcc[c] > 0) {
                double s = gc[c];
                for (int i = bound[c]; i < bound[c] + used[c]; i++) {
                    s -= vals[i] * dq[cols[i]];
                }
                dc[c] = s / jcc[c];
            }
        }
        return new Step(dc, dq, maxResidual, jqq);
    }

    /** Applies a step scaled by {@code factor}; returns the largest change applied. */
    double apply(Step step, double factor, double[][] measure, double[][] thresholds) {
        double max = 0;
        for (int c = 0; c < step.candidate().length; c++) {
            double v = step.candidate()[c] * factor;
            measure[0][c] += v;
            max = Math.max(max, Math.abs(v));
        }
        for (int f = 1; f < nF; f++) {
            for (int e = 0; e < column[f].length; e++) {
                if (column[f][e] >= 0) {
                    double v = step.columns()[column[f][e]] * factor;
                    measure[f][e] += v;
                    max = Math.max(max, Math.abs(v));
                }
            }
        }
        for (int s = 0; s < thresholdColumn.length; s++) {
            for (int k = 1; k < thresholdColumn[s].length; k++) {
                if (thresholdColumn[s][k] >= 0) {
                    double v = step.columns()[thresholdColumn[s][k]] * factor;
                    thresholds[s][k] += v;
                    max = Math.max(max, Math.abs(v));
                }
            }
        }
        return max;
    }

    /** Joint SEs: [facet][element] (NaN for candidates and fixed elements), [scale][k] (NaN when fixed). */
    record JointSe(double[][] elements, double[][] thresholds) {
    }

    /**
     * Joint SEs of the non-candidate elements and thresholds from a step's reduced information
     * matrix, as the covariance of the parametrisation reported: see {@link ConstrainedCovariance}.
     */
    JointSe jointSe(Step step) {
        double[][] out = new double[nF][];
        for (int f = 0; f < nF; f++) {
            out[f] = new double[d.elementCount(f)];
            Arrays.fill(out[f], Double.NaN);
        }
        double[][] thr = new double[thresholdColumn.length][];
        for (int s = 0; s < thr.length; s++) {
            thr[s] = new double[thresholdColumn[s].length];
            Arrays.fill(thr[s], Double.NaN);
        }
        if (q == 0) {
            return new JointSe(out, thr);
        }
        var cov = ConstrainedCovariance.of(step.reducedInformation(), constraints());
        for (int f = 1; f < nF; f++) {
            for (int e = 0; e < column[f].length; e++) {
                if (column[f][e] >= 0) {
                    out[f][e] = Math.sqrt(cov.getEntry(column[f][e], column[f][e]));
                }
            }
        }
        for (int s = 0; s < thr.length; s++) {
            for (int k = 1; k < thr[s].length; k++) {
                int c = thresholdColumn[s][k];
                if (c >= 0) {
                    thr[s][k] = Math.sqrt(cov.getEntry(c, c));
                }
            }
        }
        return new JointSe(out, thr);
    }

    /**
     * The reported centring as rows over the step's columns: one per centred facet (its free
     * elements sum to 0) and one per free threshold set (its thresholds sum to 0).
     */
    private List<double[]> constraints() {
        List<double[]> rows = new ArrayList<>();
        for (int f = 1; f < nF; f++) {
            if (!centred[f]) {
                continue;
            }
            double[] row = new double[q];
            for (int c : column[f]) {
                if (c >= 0) {
                    row[c] = 1;
                }
            }
            rows.add(row);
        }
        for (int[] tc : thresholdColumn) {
            if (tc.length > 1 && tc[1] >= 0) {
                double[] row = new double[q];
                for (int k = 1; k < tc.length; k++) {
                    row[tc[k]] = 1;
                }
                rows.add(row);
            }
        }
        return rows;
    }

    /** Largest absolute value in a step. */
    static double size(Step step) {
        double max = 0;
        for (double v : step.candidate()) {
            max = Math.max(max, Math.abs(v));
        }
        for (double v : step.columns()) {
            max = Math.max(max, Math.abs(v));
        }
        return max;
    }

    private void accumulate(int c0, int c1, double[][] measure, double[][] thresholds, Part part, double[] gc,
                            double[] jcc, int[] cols, double[] vals, int[] used) {
        double[][] expNegCum = CategoryModel.expNegCumulative(thresholds, d);
        int mMax = d.maxCategoryOverall();
        double[] p = new double[mMax + 1];
        double[] t = new double[mMax + 2];
        double[] a = new double[mMax + 1];
        double[] jc = new double[q];
        int[] touched = new int[q];
        boolean[] isTouched = new boolean[q];
        int[] rowCols = new int[nF - 1];
        int[] x = d.categories();
        int[] sc = d.scales();
        double[][] jqq = part.jqq;
        double[] gq = part.gq;
        double[] rawGq = part.rawGq;
        for (int c = c0; c < c1; c++) {
            double g = 0;
            double info = 0;
            int nt = 0;
            for (int i = start[c]; i < start[c + 1]; i++) {
                int n = order[i];
                double eta = measure[0][c];
                int k0 = 0;
                for (int f = 1; f < nF; f++) {
                    int e = d.elements(f)[n];
                    eta -= measure[f][e];
                    int col = column[f][e];
                    if (col >= 0) {
                        rowCols[k0++] = col;
                    }
                }
                int s = sc[n];
                int m = d.maxCategory(s);
                CategoryModel.probabilities(eta, thresholds[s], expNegCum[s], m, p);
                double e1 = 0;
                double e2 = 0;
                for (int k = 1; k <= m; k++) {
                    e1 += k * p[k];
                    e2 += k * k * p[k];
                }
                double v = e2 - e1 * e1;
                t[m + 1] = 0;
                double jp = 0;
                for (int k = m; k >= 1; k--) {
                    t[k] = t[k + 1] + p[k];
                    jp += k * p[k];
                    a[k] = jp - e1 * t[k];
                }
                double r = x[n] - e1;
                g += r;
                info += v;
                for (int u = 0; u < k0; u++) {
                    int cu = rowCols[u];
                    gq[cu] -= r;
                    rawGq[cu] -= r;
                    double[] row = jqq[cu];
                    for (int w = 0; w < k0; w++) {
                        row[rowCols[w]] += v;
                    }
                    if (!isTouched[cu]) {
                        isTouched[cu] = true;
                        touched[nt++] = cu;
                    }
                    jc[cu] -= v;
                }
                int[] tc = thresholdColumn[s];
                if (tc[1] >= 0) {
                    for (int k = 1; k <= m; k++) {
                        int ck = tc[k];
                        double gk = t[k] - (x[n] >= k ? 1 : 0);
                        gq[ck] += gk;
                        rawGq[ck] += gk;
                        // upper triangle only (columns ordered: elements before thresholds,
                        // thresholds by k); mirrored once after the pass
                        double[] row = jqq[ck];
                        double tk = t[k];
                        for (int l = k; l <= m; l++) {
                            row[tc[l]] += t[l] - tk * t[l];
                        }
                        double ak = a[k];
                        for (int u = 0; u < k0; u++) {
                            jqq[rowCols[u]][ck] += ak;
                        }
                        if (!isTouched[ck]) {
                            isTouched[ck] = true;
                            touched[nt++] = ck;
                        }
                        jc[ck] -= a[k];
                    }
                }
            }
            gc[c] = g;
            jcc[c] = info;
            part.maxResidual = Math.max(part.maxResidual, Math.abs(g));
            int off = bound[c];
            for (int u = 0; u < nt; u++) {
                int cu = touched[u];
                double ju = jc[cu];
                cols[off + u] = cu;
                vals[off + u] = ju;
                if (info > 0) {
                    gq[cu] -= ju * g / info;
                    double[] row = jqq[cu];
                    for (int w = 0; w < nt; w++) {
                        row[touched[w]] -= ju * jc[touched[w]] / info;
                    }
                }
            }
            used[c] = nt;
            for (int u = 0; u < nt; u++) {
                jc[touched[u]] = 0;
                isTouched[touched[u]] = false;
            }
        }
    }

    private static final class Part {
        final double[][] jqq;
        final double[] gq;
        final double[] rawGq;
        double maxResidual;

        Part(int q) {
            jqq = new double[q][q];
            gq = new double[q];
            rawGq = new double[q];
        }
    }
}

