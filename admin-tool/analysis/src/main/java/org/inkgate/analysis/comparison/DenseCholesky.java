package org.inkgate.analysis.comparison;

/**
 * Cholesky factorisation of the small dense Schur complement of the mixed model's equations, in
 * place (lower triangle), with the solves it needs. Written out rather than taken from Commons
 * Math because it runs once per REML evaluation and the lower triangle is reused for log det and
 * for the fixed effects' covariance.
 */
final class DenseCholesky {

    private DenseCholesky() {
    }

    /** Replaces the lower triangle of a by L (a = L L'); false if a is not positive definite. */
    static boolean factorInPlace(double[][] a) {
        int m = a.length;
        for (int j = 0; j < m; j++) {
            double[] aj = a[j];
            double d = aj[j];
            for (int k = 0; k < j; k++) {
                d -= aj[k] * aj[k];
            }
            if (!(d > 0)) {
                return false;
            }
            d = Math.sqrt(d);
            aj[j] = d;
            for (int i = j + 1; i < m; i++) {
                double[] ai = a[i];
                double v = ai[j];
                for (int k = 0; k < j; k++) {
                    v -= ai[k] * aj[k];
                }
                ai[j] = v / d;
            }
        }
        return true;
    }

    /** Solves L L' x = b with the factor from {@link #factorInPlace}. */
    static double[] solve(double[][] l, double[] b) {
        int m = l.length;
        double[] z = b.clone();
        for (int i = 0; i < m; i++) {
            double v = z[i];
            for (int k = 0; k < i; k++) {
                v -= l[i][k] * z[k];
            }
            z[i] = v / l[i][i];
        }
        for (int i = m - 1; i >= 0; i--) {
            double v = z[i];
            for (int k = i + 1; k < m; k++) {
                v -= l[k][i] * z[k];
            }
            z[i] = v / l[i][i];
        }
        return z;
    }

    /**
     * The trailing p x p block of (L L')^-1, which is (L_pp L_pp')^-1 for the trailing diagonal
     * block L_pp of L (the covariance of the last p unknowns up to sigma squared).
     */
    static double[][] inverseOfTrailingBlock(double[][] l, int p) {
        int off = l.length - p;
        // W = L_pp^-1 (lower triangular), then (L_pp L_pp')^-1 = W' W
        double[][] w = new double[p][p];
        for (int c = 0; c < p; c++) {
            for (int i = c; i < p; i++) {
                double v = i == c ? 1 : 0;
                for (int k = c; k < i; k++) {
                    v -= l[off + i][off + k] * w[k][c];
                }
                w[i][c] = v / l[off + i][off + i];
            }
        }
        double[][] out = new double[p][p];
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < p; j++) {
                double v = 0;
                for (int k = Math.max(i, j); k < p; k++) {
                    v += w[k][i] * w[k][j];
                }
                out[i][j] = v;
            }
        }
        return out;
    }
}
