package org.inkgate.analysis.mfrm.estimation;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.IntStream;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.NonPositiveDefiniteMatrixException;
import org.apache.commons.math3.linear.NonSymmetricMatrixException;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.inkgate.analysis.mfrm.design.ModelDesign;

/**
 * Joint maximum likelihood estimation (JMLE) of a many-facet Rasch model (Linacre 1989; Wright &
 * Masters 1982, ch. 5) by Newton-Raphson.
 *
 * <p>Default: joint Newton steps on all measures and thresholds at once, candidates absorbed
 * ({@link JointNewton}); then each unanchored non-candidate facet is centred at 0 and each
 * unanchored threshold set at sum 0, moving the candidates the other way so no rating's
 * probabilities change. Fallback (an anchored candidate, a very large system, or joint steps that
 * do not settle): facet by facet, each free element moves by (observed - expected) / information
 * (steps capped at 1 logit), the facet is centred, then each threshold set takes a full Newton
 * step within itself.
 *
 * <p>Passes are split into chunks run in parallel, each with its own accumulators, so no
 * per-rating objects are made and the result does not depend on thread timing beyond the order
 * of floating-point sums.
 */
public final class JmleEstimator {
    private static final double MAX_STEP = 1.0;
    /** Above this many non-candidate elements and thresholds the joint system is not solved. */
    private static final int JOINT_LIMIT = 800;
    /** Joint Newton steps tried before falling back to facet-by-facet steps. */
    private static final int JOINT_PATIENCE = 60;

    private final ModelDesign d;
    private final boolean[][] anchored;
    private final boolean[] scaleAnchored;
    private final int threads;
    private final int nF;
    private final int nS;
    private final double[][] obsSum;
    private final double[][] thrObs;
    private final boolean[][] present;
    private final boolean[] anyAnchored;
    private final boolean[] allAnchored;
    private final boolean allScalesAnchored;
    private final int pcFacet;
    /** Pass that accumulates every facet and the thresholds. */
    private static final int ALL = -1;
    /** Pass that accumulates the thresholds only. */
    private static final int THRESHOLDS = -2;

    /**
     * @param anchored      [facet][element] true where the measure is fixed
     * @param scaleAnchored [scale] true where the thresholds are fixed
     */
    public JmleEstimator(ModelDesign d, boolean[][] anchored, boolean[] scaleAnchored, int threads) {
        this(d, anchored, scaleAnchored, threads, -1);
    }

    /**
     * @param pcFacet the facet whose elements own the threshold sets (partial credit), or -1
     */
    public JmleEstimator(ModelDesign d, boolean[][] anchored, boolean[] scaleAnchored, int threads, int pcFacet) {
        this.d = d;
        this.pcFacet = pcFacet;
        this.anchored = anchored;
        this.scaleAnchored = scaleAnchored;
        this.threads = threads;
        this.nF = d.facetCount();
        this.nS = d.scaleCount();
        obsSum = new double[nF][];
        present = new boolean[nF][];
        int[] x = d.categories();
        for (int f = 0; f < nF; f++) {
            obsSum[f] = new double[d.elementCount(f)];
            present[f] = new boolean[d.elementCount(f)];
            int[] el = d.elements(f);
            for (int n = 0; n < x.length; n++) {
                obsSum[f][el[n]] += x[n];
                present[f][el[n]] = true;
            }
        }
        anyAnchored = new boolean[nF];
        allAnchored = new boolean[nF];
        for (int f = 0; f < nF; f++) {
            boolean all = true;
            for (int e = 0; e < anchored[f].length; e++) {
                anyAnchored[f] |= anchored[f][e];
                all &= anchored[f][e] || !present[f][e];
            }
            allAnchored[f] = all;
        }
        boolean allScales = true;
        for (boolean a : scaleAnchored) {
            allScales &= a;
        }
        allScalesAnchored = allScales;
        thrObs = new double[nS][];
        for (int s = 0; s < nS; s++) {
            thrObs[s] = new double[d.maxCategory(s) + 1];
        }
        int[] sc = d.scales();
        for (int n = 0; n < x.length; n++) {
            for (int k = 1; k <= x[n]; k++) {
                thrObs[sc[n]][k]++;
            }
        }
    }

    /** Sensible starting values: candidates from their raw score, thresholds from category counts. */
    public void startingValues(double[][] measure, double[][] thresholds) {
        int[] x = d.categories();
        int[] sc = d.scales();
        double[] maxSum = new double[d.elementCount(0)];
        int[] cand = d.elements(0);
        for (int n = 0; n < x.length; n++) {
            maxSum[cand[n]] += d.maxCategory(sc[n]);
        }
        for (int c = 0; c < maxSum.length; c++) {
            if (!anchored[0][c] && present[0][c]) {
                measure[0][c] = Math.log((obsSum[0][c] + 0.5) / (maxSum[c] - obsSum[0][c] + 0.5));
            }
        }
        for (int s = 0; s < nS; s++) {
            if (scaleAnchored[s]) {
                continue;
            }
            int m = d.maxCategory(s);
            double[] count = new double[m + 1];
            for (int n = 0; n < x.length; n++) {
                if (sc[n] == s) {
                    count[x[n]]++;
                }
            }
            double mean = 0;
            for (int k = 1; k <= m; k++) {
                thresholds[s][k] = Math.log((count[k - 1] + 0.5) / (count[k] + 0.5));
                mean += thresholds[s][k] / m;
            }
            for (int k = 1; k <= m; k++) {
                thresholds[s][k] -= mean;
            }
        }
    }

    /** Iterates to convergence or the cap; updates {@code measure} and {@code thresholds} in place. */
    public Estimates estimate(double[][] measure, double[][] thresholds, double maxChangeLimit,
                              double maxResidualLimit, int maxIterations) {
        Accumulators total = new Accumulators(d);
        int it = 0;
        double maxResidual = Double.NaN;
        double maxChange = Double.NaN;
        boolean converged = false;
        JointNewton joint = useJointNewton() ? new JointNewton(d, anchored, scaleAnchored, present, threads) : null;
        JointNewton.Step lastStep = null;
        boolean fellBack = false;
        // Newton converges in a handful of steps near the maximum; if it has not settled after
        // JOINT_PATIENCE steps (oscillating on an awkward design), facet-by-facet steps take over
        while (joint != null && it < Math.min(maxIterations, JOINT_PATIENCE)) {
            it++;
            JointNewton.Step step = joint.step(measure, thresholds);
            double size = JointNewton.size(step);
            if (!Double.isFinite(size)) {
                break; // not applied; the facet-by-facet steps below take over
            }
            lastStep = step;
            maxResidual = step.maxResidual();
            maxChange = joint.apply(step, size > MAX_STEP ? MAX_STEP / size : 1, measure, thresholds);
            centreKeepingEta(measure, thresholds);
            if (maxChange < maxChangeLimit && maxResidual < maxResidualLimit) {
                converged = true;
                break;
            }
        }
        if (joint != null && !converged && it < maxIterations) {
            fellBack = true;
            lastStep = null;
        }
        while (!converged && (joint == null || fellBack) && it < maxIterations) {
            it++;
            maxResidual = 0;
            maxChange = 0;
            // block Gauss-Seidel: elements of one facet share no rating, so within a block the
            // information matrix is diagonal and the Newton step is exact; stepping all facets at
            // once (Jacobi) overshoots and oscillates when raters are nested in candidate groups
            for (int f = 0; f < nF; f++) {
                if (allAnchored[f]) {
                    continue;
                }
                pass(measure, thresholds, total, f);
                double sign = f == 0 ? 1 : -1;
                for (int e = 0; e < measure[f].length; e++) {
                    if (anchored[f][e] || !present[f][e]) {
                        continue;
                    }
                    double r = obsSum[f][e] - total.exp[f][e];
                    maxResidual = Math.max(maxResidual, Math.abs(r));
                    double step = clamp(r / total.info[f][e]);
                    measure[f][e] += sign * step;
                    maxChange = Math.max(maxChange, Math.abs(step));
                }
                centre(measure, f);
            }
            if (!allScalesAnchored) {
                pass(measure, thresholds, total, THRESHOLDS);
                for (int s = 0; s < nS; s++) {
                    if (scaleAnchored[s]) {
                        continue;
                    }
                    // full Newton within a threshold set: adjacent thresholds are strongly
                    // correlated, and a diagonal step crawls along that ridge
                    int m = d.maxCategory(s);
                    double[] g = new double[m];
                    double[][] h = new double[m][m];
                    for (int k = 1; k <= m; k++) {
                        g[k - 1] = total.thrExp[s][k] - thrObs[s][k];
                        maxResidual = Math.max(maxResidual, Math.abs(g[k - 1]));
                        for (int l = k; l <= m; l++) {
                            h[k - 1][l - 1] = total.thrCov[s][k][l];
                            h[l - 1][k - 1] = total.thrCov[s][k][l];
                        }
                    }
                    double[] step = solve(h, g);
                    double scale = 1;
                    for (double v : step) {
                        scale = Math.max(scale, Math.abs(v) / MAX_STEP);
                    }
                    for (int k = 1; k <= m; k++) {
                        double st = step[k - 1] / scale;
                        thresholds[s][k] += st;
                        maxChange = Math.max(maxChange, Math.abs(st));
                    }
                }
                centreThresholds(thresholds);
            }
            if (maxChange < maxChangeLimit && maxResidual < maxResidualLimit) {
                converged = true;
                break;
            }
        }
        pass(measure, thresholds, total, ALL);
        double[][] se = new double[nF][];
        for (int f = 0; f < nF; f++) {
            se[f] = new double[measure[f].length];
            for (int e = 0; e < se[f].length; e++) {
                se[f][e] = present[f][e] ? 1 / Math.sqrt(total.info[f][e]) : Double.NaN;
            }
        }
        double[][] thrSe = new double[nS][];
        for (int s = 0; s < nS; s++) {
            thrSe[s] = new double[d.maxCategory(s) + 1];
            for (int k = 1; k <= d.maxCategory(s); k++) {
                thrSe[s][k] = 1 / Math.sqrt(total.thrInfo[s][k]);
            }
        }
        List<String> warnings = new ArrayList<>();
        if (fellBack) {
            warnings.add("the joint Newton-Raphson steps did not settle within " + JOINT_PATIENCE
                    + " iterations; estimation continued facet by facet (slower, same maximum)");
        }
        if (!converged) {
            warnings.add(String.format(java.util.Locale.ROOT, "estimation stopped at the iteration cap (%d) before"
                    + " converging: largest score residual %.4g, largest logit change %.4g; measures may be off"
                    + " by about that change or more - raise the cap or check the design before using them",
                    maxIterations, maxResidual, maxChange));
        }
        JointNewton.JointSe jointSe = lastStep != null && joint != null ? joint.jointSe(lastStep) : null;
        return new Estimates(measure, se, jointSe == null ? null : jointSe.elements(), thresholds, thrSe,
                jointSe == null ? null : jointSe.thresholds(), it, maxResidual, maxChange, converged, warnings);
    }

    /** Solves h x = g (h symmetric positive definite); falls back to the diagonal if singular. */
    private static double[] solve(double[][] h, double[] g) {
        try {
            return new CholeskyDecomposition(new Array2DRowRealMatrix(h, true))
                    .getSolver().solve(new ArrayRealVector(g)).toArray();
        } catch (NonPositiveDefiniteMatrixException | NonSymmetricMatrixException | SingularMatrixException e) {
            double[] x = new double[g.length];
            for (int i = 0; i < g.length; i++) {
                x[i] = h[i][i] > 0 ? g[i] / h[i][i] : 0;
            }
            return x;
        }
    }

    private static double clamp(double step) {
        if (Double.isNaN(step)) {
            return 0;
        }
        return Math.max(-MAX_STEP, Math.min(MAX_STEP, step));
    }

    /**
     * Joint Newton needs free candidates (they absorb the centring shifts) and a small enough
     * system; otherwise facet-by-facet steps are used.
     */
    private boolean useJointNewton() {
        if (anyAnchored[0]) {
            return false;
        }
        int q = 0;
        for (int f = 1; f < nF; f++) {
            q += d.elementCount(f);
        }
        for (int s = 0; s < nS; s++) {
            q += d.maxCategory(s);
        }
        return q <= JOINT_LIMIT;
    }

    /**
     * Centres thresholds and unanchored facets after a joint step, moving the candidates (or, for
     * partial credit, the scale's element) the other way so every rating's probabilities stay as
     * the Newton step left them.
     */
    private void centreKeepingEta(double[][] measure, double[][] thresholds) {
        for (int s = 0; s < nS; s++) {
            if (scaleAnchored[s]) {
                continue;
            }
            int m = d.maxCategory(s);
            double mean = 0;
            for (int k = 1; k <= m; k++) {
                mean += thresholds[s][k] / m;
            }
            for (int k = 1; k <= m; k++) {
                thresholds[s][k] -= mean;
            }
            // F - mean at eta equals F at eta + mean
            if (pcFacet < 0) {
                for (int c = 0; c < measure[0].length; c++) {
                    measure[0][c] -= mean;
                }
            } else if (!anchored[pcFacet][s]) {
                measure[pcFacet][s] += mean;
            }
        }
        for (int f = 1; f < nF; f++) {
            double mean = centre(measure, f);
            for (int c = 0; c < measure[0].length; c++) {
                measure[0][c] -= mean;
            }
        }
    }

    /** Centres facet f at 0 unless it is the candidate facet or has anchored elements; returns the mean removed. */
    private double centre(double[][] measure, int f) {
        if (f == 0 || anyAnchored[f]) {
            return 0;
        }
        double sum = 0;
        int count = 0;
        for (int e = 0; e < measure[f].length; e++) {
            if (present[f][e]) {
                sum += measure[f][e];
                count++;
            }
        }
        double mean = sum / count;
        for (int e = 0; e < measure[f].length; e++) {
            if (present[f][e]) {
                measure[f][e] -= mean;
            }
        }
        return mean;
    }

    /** Centres every unanchored threshold set at sum 0. */
    private void centreThresholds(double[][] thresholds) {
        for (int s = 0; s < nS; s++) {
            if (scaleAnchored[s]) {
                continue;
            }
            int m = d.maxCategory(s);
            double mean = 0;
            for (int k = 1; k <= m; k++) {
                mean += thresholds[s][k] / m;
            }
            for (int k = 1; k <= m; k++) {
                thresholds[s][k] -= mean;
            }
        }
    }

    /** One pass: expected scores and information of every element and threshold. */
    void pass(double[][] measure, double[][] thresholds, Accumulators total, int block) {
        int nObs = d.observationCount();
        int chunks = nObs < 20_000 ? 1 : threads;
        double[][] expNegCum = CategoryModel.expNegCumulative(thresholds, d);
        if (chunks == 1) {
            total.clear();
            passRange(0, nObs, measure, thresholds, expNegCum, total, block);
            return;
        }
        Accumulators[] parts = new Accumulators[chunks];
        IntStream.range(0, chunks).parallel().forEach(c -> {
            Accumulators a = new Accumulators(d);
            long from = (long) nObs * c / chunks;
            long to = (long) nObs * (c + 1) / chunks;
            passRange((int) from, (int) to, measure, thresholds, expNegCum, a, block);
            parts[c] = a;
        });
        total.clear();
        for (Accumulators a : parts) {
            total.add(a);
        }
    }

    private void passRange(int from, int to, double[][] measure, double[][] thresholds, double[][] expNegCum,
                           Accumulators acc, int block) {
        int[] x = d.categories();
        int[] sc = d.scales();
        int[][] el = new int[nF][];
        for (int f = 0; f < nF; f++) {
            el[f] = d.elements(f);
        }
        double[] cand = measure[0];
        int[] candEl = el[0];
        int mMax = d.maxCategoryOverall();
        double[] p = new double[mMax + 1];
        double[] tails = new double[mMax + 1];
        for (int n = from; n < to; n++) {
            double eta = cand[candEl[n]];
            for (int f = 1; f < nF; f++) {
                eta -= measure[f][el[f][n]];
            }
            int s = sc[n];
            int m = expNegCum[s].length - 1;
            CategoryModel.probabilities(eta, thresholds[s], expNegCum[s], m, p);
            if (block == THRESHOLDS || block == ALL) {
                double tail = 0;
                double[] te = acc.thrExp[s];
                double[] ti = acc.thrInfo[s];
                double[] tl = tails;
                for (int k = m; k >= 1; k--) {
                    tail += p[k];
                    tl[k] = tail;
                    te[k] += tail;
                    ti[k] += tail * (1 - tail);
                }
                double[][] cov = acc.thrCov[s];
                for (int k = 1; k <= m; k++) {
                    double tk = tl[k];
                    double[] row = cov[k];
                    for (int l = k; l <= m; l++) {
                        row[l] += tl[l] - tk * tl[l];
                    }
                }
                if (block == THRESHOLDS) {
                    continue;
                }
            }
            double e = 0;
            double e2 = 0;
            for (int k = 1; k <= m; k++) {
                double pk = p[k];
                e += k * pk;
                e2 += k * k * pk;
            }
            double v = e2 - e * e;
            if (block >= 0) {
                int idx = el[block][n];
                acc.exp[block][idx] += e;
                acc.info[block][idx] += v;
                continue;
            }
            for (int f = 0; f < nF; f++) {
                int idx = el[f][n];
                acc.exp[f][idx] += e;
                acc.info[f][idx] += v;
            }
        }
    }

    /** Per-pass sums, one set per parallel chunk. */
    static final class Accumulators {
        final double[][] exp;
        final double[][] info;
        final double[][] thrExp;
        final double[][] thrInfo;
        /** [scale][k][l], l >= k: covariance of the indicators "at or above k" and "at or above l". */
        final double[][][] thrCov;

        Accumulators(ModelDesign d) {
            exp = new double[d.facetCount()][];
            info = new double[d.facetCount()][];
            for (int f = 0; f < d.facetCount(); f++) {
                exp[f] = new double[d.elementCount(f)];
                info[f] = new double[d.elementCount(f)];
            }
            thrExp = new double[d.scaleCount()][];
            thrInfo = new double[d.scaleCount()][];
            thrCov = new double[d.scaleCount()][][];
            for (int s = 0; s < d.scaleCount(); s++) {
                thrCov[s] = new double[d.maxCategory(s) + 1][d.maxCategory(s) + 1];
                thrExp[s] = new double[d.maxCategory(s) + 1];
                thrInfo[s] = new double[d.maxCategory(s) + 1];
            }
        }

        void clear() {
            for (double[] a : exp) {
                Arrays.fill(a, 0);
            }
            for (double[] a : info) {
                Arrays.fill(a, 0);
            }
            for (double[] a : thrExp) {
                Arrays.fill(a, 0);
            }
            for (double[] a : thrInfo) {
                Arrays.fill(a, 0);
            }
            for (double[][] a : thrCov) {
                for (double[] b : a) {
                    Arrays.fill(b, 0);
                }
            }
        }

        void add(Accumulators o) {
            addAll(exp, o.exp);
            addAll(info, o.info);
            addAll(thrExp, o.thrExp);
            addAll(thrInfo, o.thrInfo);
            for (int s = 0; s < thrCov.length; s++) {
                addAll(thrCov[s], o.thrCov[s]);
            }
        }

        private static void addAll(double[][] a, double[][] b) {
            for (int i = 0; i < a.length; i++) {
                for (int j = 0; j < a[i].length; j++) {
                    a[i][j] += b[i][j];
                }
            }
        }
    }
}
