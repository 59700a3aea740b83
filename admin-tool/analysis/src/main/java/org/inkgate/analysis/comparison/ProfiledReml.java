package org.inkgate.analysis.comparison;

/**
 * The REML criterion of a crossed random-intercepts model profiled over the relative standard
 * deviations theta (one per factor: its SD divided by the residual SD), in the penalised
 * least-squares form of Bates, Maechler, Bolker &amp; Walker (2015, lme4, section 3):
 *
 * <pre>
 *   M = [ Lambda Z'Z Lambda + I   Lambda Z'X ]     M [u; beta] = [Lambda Z'y; X'y]
 *       [ X'Z Lambda              X'X        ]
 *   r^2 = |y - X beta - Z Lambda u|^2 + |u|^2,    sigma^2 = r^2 / (n - p)
 *   -2 REML log-likelihood = log det M + (n - p) (1 + log(2 pi r^2 / (n - p)))
 * </pre>
 *
 * (log det M = log|L_theta|^2 + log|R_X|^2 of the paper). M is solved by block elimination: the
 * absorbed factor's block is diagonal, so it is eliminated level by level over its sparse rows; only
 * the Schur complement on the other random levels and the fixed effects is dense, and its size does
 * not depend on the number of ratings or candidates.
 */
final class ProfiledReml {

    /** One evaluation at theta. */
    record Evaluation(double criterion, double[] beta, double[][] betaCovarianceUnscaled, double sigmaSquared) {
    }

    private final CrossedCrossProducts x;
    private final int[] denseFactor;

    ProfiledReml(CrossedCrossProducts x) {
        this.x = x;
        denseFactor = new int[x.dense];
        for (int j = 0; j < x.dense; j++) {
            denseFactor[j] = j < x.fixedStart() ? x.factorOfDense(j) : -1;
        }
    }

    /** The criterion alone, for the optimiser (infinite where M is not positive definite). */
    double criterion(double[] theta) {
        Evaluation e = evaluate(theta, false);
        return e == null ? Double.POSITIVE_INFINITY : e.criterion();
    }

    /** The full evaluation; null when M is not positive definite (X not of full rank). */
    Evaluation evaluate(double[] theta, boolean withCovariance) {
        int m = x.dense, a = x.absorbed, q = x.absorbedCount.length, p = x.fixed, fs = x.fixedStart();
        double ta = theta[a];
        double[] s = new double[m];
        for (int j = 0; j < m; j++) {
            s[j] = denseFactor[j] < 0 ? 1 : theta[denseFactor[j]];
        }
        double[][] schur = new double[m][m];
        double[] rhs = new double[m];
        for (int j = 0; j < m; j++) {
            for (int l = 0; l <= j; l++) { // lower triangle: all the factorisation reads
                schur[j][l] = s[j] * s[l] * x.denseCross[j][l];
            }
            if (j < fs) {
                schur[j][j] += 1;
            }
            rhs[j] = s[j] * x.denseSum[j];
        }
        double[] scaled = new double[16];
        double[] diag = new double[q];
        double[] b1 = new double[q];
        double logDet = 0;
        for (int i = 0; i < q; i++) {
            diag[i] = ta * ta * x.absorbedCount[i] + 1;
            b1[i] = ta * x.absorbedSum[i];
            logDet += Math.log(diag[i]);
            int[] cols = x.rowColumns[i];
            double[] cnt = x.rowCounts[i];
            double w = ta * ta / diag[i];
            double[] v = scaled.length >= cols.length ? scaled : (scaled = new double[cols.length]);
            for (int j = 0; j < cols.length; j++) {
                v[j] = s[cols[j]] * cnt[j];
            }
            // a rank-one downdate of the lower triangle only (columns are sorted; the factorisation reads no more)
            for (int j = 0; j < cols.length; j++) {
                rhs[cols[j]] -= ta * v[j] * b1[i] / diag[i];
                double[] row = schur[cols[j]];
                double wj = w * v[j];
                for (int l = 0; l <= j; l++) {
                    row[cols[l]] -= wj * v[l];
                }
            }
        }
        if (!DenseCholesky.factorInPlace(schur)) {
            return null;
        }
        for (int j = 0; j < m; j++) {
            logDet += 2 * Math.log(schur[j][j]);
        }
        double[] s2 = DenseCholesky.solve(schur, rhs);
        double[] u1 = new double[q];
        for (int i = 0; i < q; i++) {
            double v = b1[i];
            int[] cols = x.rowColumns[i];
            double[] cnt = x.rowCounts[i];
            for (int j = 0; j < cols.length; j++) {
                v -= ta * s[cols[j]] * cnt[j] * s2[cols[j]];
            }
            u1[i] = v / diag[i];
        }
        // penalised residual sum of squares: the minimum of |y - Z Lambda u - X beta|^2 + |u|^2 is
        // y'y - solution . right-hand side (y centred, so the cancellation is mild); O(levels), not O(ratings)
        double r2 = x.yy;
        for (int i = 0; i < q; i++) {
            r2 -= u1[i] * b1[i];
        }
        for (int j = 0; j < m; j++) {
            r2 -= s2[j] * s[j] * x.denseSum[j];
        }
        int dfr = x.n - p;
        double criterion = logDet + dfr * (1 + Math.log(2 * Math.PI * r2 / dfr));
        double[] beta = new double[p];
        System.arraycopy(s2, fs, beta, 0, p);
        beta[0] += x.centre;
        double[][] cov = withCovariance ? DenseCholesky.inverseOfTrailingBlock(schur, p) : null;
        return new Evaluation(criterion, beta, cov, r2 / dfr);
    }
}
