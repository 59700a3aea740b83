package org.inkgate.analysis.distributions;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.apache.commons.math3.distribution.TDistribution;

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
    private static final int Z_PANELS = 12;
    private static final double Z_LIMIT = 8.5;
    private static final double SQRT2 = Math.sqrt(2);
    private static final Map<String, Double> QUANTILES = new ConcurrentHashMap<>();
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
        return QUANTILES.computeIfAbsent(p + "/" + k + "/" + df, key -> solve(p, k, df));
    }

    private static double solve(double p, int k, double df) {
        // bracket: Q_k is at least the range of 2 means (sqrt(2) |T|), and by Bonferroni over the
        // k(k-1)/2 pairs at most sqrt(2) times the t quantile at level 1 - (1-p)/(k(k-1))
        TDistribution t = new TDistribution(null, df);
        double pairs = k * (k - 1) / 2.0;
        double lo = SQRT2 * t.inverseCumulativeProbability((1 + p) / 2) * 0.999;
        double hi = SQRT2 * t.inverseCumulativeProbability(1 - (1 - p) / (2 * pairs)) * 1.001;
        if (cdf(hi, k, df) < p) {
            hi *= 2;
        }
        return new BrentSolver(1e-12, 1e-11).solve(500, q -> cdf(q, k, df) - p, lo, hi);
    }

    /** Distribution function of the range of k independent standard normals. */
    static double rangeCdf(double w, int k) {
        if (w <= 0) {
            return 0;
        }
        double sum = 0;
        for (int i = 0; i < Z_NODES.length; i++) {
            double inside = PHI_AT_NODES[i] - phi(Z_NODES[i] - w);
            if (inside > 0) {
                sum += Z_WEIGHTS[i] * Math.pow(inside, k - 1);
            }
        }
        return Math.min(1, k * sum);
    }

    // fixed quadrature grid over z with the normal density and Phi(z) folded in once
    private static final double[] Z_NODES;
    private static final double[] Z_WEIGHTS;
    private static final double[] PHI_AT_NODES;

    static {
        int per = GaussLegendre.POINTS;
        Z_NODES = new double[Z_PANELS * per];
        Z_WEIGHTS = new double[Z_PANELS * per];
        PHI_AT_NODES = new double[Z_PANELS * per];
        double width = 2 * Z_LIMIT / Z_PANELS;
        int c = 0;
        for (int p = 0; p < Z_PANELS; p++) {
            double a = -Z_LIMIT + p * width;
            for (int i = 0; i < per; i++) {
                double z = a + width / 2 * (1 + GaussLegendre.node(i));
                Z_NODES[c] = z;
                Z_WEIGHTS[c] = width / 2 * GaussLegendre.weight(i) * Math.exp(-z * z / 2) * INV_SQRT_2PI;
                PHI_AT_NODES[c] = phi(z);
                c++;
            }
        }
    }

    private static double phi(double x) {
        return NormalTable.cdf(x);
    }
}
