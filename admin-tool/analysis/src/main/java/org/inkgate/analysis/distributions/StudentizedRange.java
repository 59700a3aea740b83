package org.inkgate.analysis.distributions;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.special.Erf;

/**
 * The studentized range distribution: Q = range of k standard normals / S, S = sqrt(chi2_df/df).
 *
 * <p>P(Q &lt;= q) = E[W(qS)] with W(w) = k integral phi(z) [Phi(z) - Phi(z - w)]^(k-1) dz, the
 * distribution of the range of k normals (Hartley 1942; the same double integral is the basis of
 * Copenhaver &amp; Holland 1988). Both integrals are computed by Gauss-Legendre quadrature; the
 * quantile is found by Brent's method. Used by Tukey HSD, Tukey-Kramer and Games-Howell.
 */
public final class StudentizedRange {

    /** Beyond this df the chi scale is treated as 1 (the normal-theory range). */
    private static final double LARGE_DF = 50_000;
    private static final int Z_PANELS = 16;
    private static final double Z_LIMIT = 8.5;
    private static final double SQRT2 = Math.sqrt(2);
    private static final double INV_SQRT_2PI = 1 / Math.sqrt(2 * Math.PI);

    private StudentizedRange() {
    }

    /** P(Q &lt;= q) for k means and df error degrees of freedom. */
    public static double cdf(double q, int k, double df) {
        if (k < 2 || !(df > 0)) {
            throw new IllegalArgumentException("studentized range needs k >= 2 and df > 0 (k " + k + ", df " + df + ")");
        }
        if (q <= 0) {
            return 0;
        }
        if (df > LARGE_DF) {
            return rangeCdf(q, k);
        }
        double p = ScaledChiIntegral.expectation(df, s -> rangeCdf(q * s, k));
        return Math.min(1, Math.max(0, p));
    }

    /** P(Q &gt; q): the p-value of an observed studentized range. */
    public static double upperTail(double q, int k, double df) {
        return Math.max(0, 1 - cdf(q, k, df));
    }

    /** The q with P(Q &lt;= q) = p. */
    public static double quantile(double p, int k, double df) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException("probability must lie strictly between 0 and 1: " + p);
        }
        double hi = 10;
        while (cdf(hi, k, df) < p) {
            hi *= 2;
        }
        return new BrentSolver(1e-12, 1e-10).solve(500, q -> cdf(q, k, df) - p, 0, hi);
    }

    /** Distribution function of the range of k independent standard normals. */
    static double rangeCdf(double w, int k) {
        if (w <= 0) {
            return 0;
        }
        double width = 2 * Z_LIMIT / Z_PANELS;
        double sum = 0;
        for (int i = 0; i < Z_PANELS; i++) {
            double a = -Z_LIMIT + i * width;
            sum += GaussLegendre.integrate(z -> {
                double inside = phi(z) - phi(z - w);
                return inside <= 0 ? 0 : Math.exp(-z * z / 2) * INV_SQRT_2PI * Math.pow(inside, k - 1);
            }, a, a + width);
        }
        return Math.min(1, k * sum);
    }

    private static double phi(double x) {
        return 0.5 * Erf.erfc(-x / SQRT2);
    }
}
