package org.inkgate.analysis.comparison;

import java.util.HashMap;
import java.util.Map;

/**
 * The cross-products of a linear mixed model with crossed random intercepts, gathered once from the
 * ratings and kept sparse: they depend only on counts and sums of the scores, never on the variance
 * parameters, so every REML evaluation reuses them.
 *
 * <p>The random-effects levels are split in two. The factor with the most levels (in a writing study,
 * the candidates) is "absorbed": its block of Z'Z is diagonal (every rating has exactly one level of
 * it), so it is eliminated level by level. All other levels (raters, tasks, further factors) and
 * the fixed effects form a small "dense" block whose size does not grow with the number of ratings
 * or candidates. Per absorbed level the model keeps only the few dense columns it meets (the raters
 * and tasks of that candidate's ratings): a sparse row.
 */
final class CrossedCrossProducts {

    final int n;
    final int fixed;
    final int absorbed;
    final int[] levels;
    /** Dense index where each non-absorbed factor's levels start (-1 for the absorbed factor). */
    final int[] offset;
    /** Size of the dense block: non-absorbed random levels, then the fixed effects. */
    final int dense;
    /** Per absorbed level: its count of ratings and its sum of (centred) scores. */
    final double[] absorbedCount;
    final double[] absorbedSum;
    /** Per absorbed level: the dense columns it meets and the counts (Z_a' [Z_o X]), sparse. */
    final int[][] rowColumns;
    final double[][] rowCounts;
    /** [Z_o X]' [Z_o X] unscaled, dense (dense x dense), and [Z_o X]' y. */
    final double[][] denseCross;
    final double[] denseSum;
    /** The centring constant subtracted from every score (added back to the intercept). */
    final double centre;
    /** Sum of squares of the centred scores. */
    final double yy;

    CrossedCrossProducts(double[] score, int[] condition, int conditions, int[][] factorCodes, int[] levels) {
        this.n = score.length;
        this.fixed = conditions;
        this.levels = levels.clone();
        int f = levels.length;
        int a = 0;
        for (int i = 1; i < f; i++) {
            if (levels[i] > levels[a]) {
                a = i;
            }
        }
        this.absorbed = a;
        offset = new int[f];
        int d = 0;
        for (int i = 0; i < f; i++) {
            offset[i] = i == a ? -1 : d;
            d += i == a ? 0 : levels[i];
        }
        int fixedStart = d;
        this.dense = d + conditions;
        double mean = 0;
        for (double v : score) {
            mean += v / n;
        }
        this.centre = mean;
        double sumSquares = 0;
        for (double v : score) {
            sumSquares += (v - mean) * (v - mean);
        }
        this.yy = sumSquares;
        absorbedCount = new double[levels[a]];
        absorbedSum = new double[levels[a]];
        denseCross = new double[dense][dense];
        denseSum = new double[dense];
        @SuppressWarnings("unchecked")
        Map<Integer, Double>[] rows = new Map[levels[a]];
        int[] cols = new int[f + 1];
        for (int r = 0; r < n; r++) {
            int m = 0;
            for (int i = 0; i < f; i++) {
                if (i != a) {
                    cols[m++] = offset[i] + factorCodes[i][r];
                }
            }
            cols[m++] = fixedStart; // intercept
            if (condition[r] > 0) {
                cols[m++] = fixedStart + condition[r]; // treatment contrast against the first condition
            }
            int lev = factorCodes[a][r];
            double y = score[r] - mean;
            absorbedCount[lev]++;
            absorbedSum[lev] += y;
            Map<Integer, Double> row = rows[lev] == null ? (rows[lev] = new HashMap<>()) : rows[lev];
            for (int j = 0; j < m; j++) {
                row.merge(cols[j], 1.0, Double::sum);
                denseSum[cols[j]] += y;
                for (int l = 0; l < m; l++) {
                    denseCross[cols[j]][cols[l]]++;
                }
            }
        }
        rowColumns = new int[levels[a]][];
        rowCounts = new double[levels[a]][];
        for (int lev = 0; lev < levels[a]; lev++) {
            Map<Integer, Double> row = rows[lev] == null ? Map.of() : rows[lev];
            rowColumns[lev] = row.keySet().stream().mapToInt(Integer::intValue).sorted().toArray();
            rowCounts[lev] = new double[rowColumns[lev].length];
            for (int j = 0; j < rowColumns[lev].length; j++) {
                rowCounts[lev][j] = row.get(rowColumns[lev][j]);
            }
        }
    }

    /** First dense index of the fixed effects. */
    int fixedStart() {
        return dense - fixed;
    }

    /** The factor a dense random index belongs to. */
    int factorOfDense(int j) {
        for (int i = 0; i < levels.length; i++) {
            if (i != absorbed && j >= offset[i] && j < offset[i] + levels[i]) {
                return i;
            }
        }
        throw new IllegalArgumentException("dense index " + j + " is not a random level");
    }
}
