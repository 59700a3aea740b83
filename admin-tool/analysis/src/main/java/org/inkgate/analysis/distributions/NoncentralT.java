package org.inkgate.analysis.distributions;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * The noncentral t distribution and confidence limits for its noncentrality parameter.
 *
 * <p>T = (Z + delta) / S with S = sqrt(chi2_df / df), so P(T &lt;= t) = E[Phi(tS - delta)].
 * The distribution function is Lenth's series, Algorithm AS 243 ({@link Lenth243}); where that
 * series does not apply (|delta| above about 37.6, where its first weight underflows, or no
 * convergence) it is the same expectation by quadrature over S ({@link ScaledChiIntegral}), which
 * agrees with the series to about 1e-9 where both apply (DistributionsTest). Confidence limits for delta are found by inverting the distribution function
 * in delta (Steiger &amp; Fouladi 1997; Cumming &amp; Finch 2001), which gives the intervals for
 * Cohen's d recommended by Lakens (2013).
 */
public final class NoncentralT {

    private NoncentralT() {
    }

    /** P(T &lt;= t) for df degrees of freedom and noncentrality delta. */
    public static double cdf(double t, double df, double delta) {
        if (!(df > 0)) {
            throw new IllegalArgumentException("noncentral t needs df > 0: " + df);
        }
        double series = Lenth243.cdf(t, df, delta);
        return Double.isNaN(series) ? byQuadrature(t, df, delta) : series;
    }

    /** P(T &lt;= t) as E[Phi(tS - delta)] by quadrature over S. */
    static double byQuadrature(double t, double df, double delta) {
        double p = ScaledChiIntegral.expectation(df, s -> NormalTable.cdf(t * s - delta));
        return Math.min(1, Math.max(0, p));
    }

    /**
     * P(T &gt; t), the upper tail, as 1 - P(T &lt;= t): absolute accuracy about 1e-12, enough for power,
     * not for tiny p-values.
     */
    public static double upper(double t, double df, double delta) {
        return 1 - cdf(t, df, delta);
    }

    /**
     * The two-sided confidence interval for delta given an observed t.
     *
     * @return {lower, upper} with P(T &lt;= t | lower) = 1 - alpha/2 and P(T &lt;= t | upper) = alpha/2
     */
    public static double[] deltaInterval(double t, double df, double confidence) {
        double alpha = 1 - confidence;
        return new double[] {solveDelta(t, df, 1 - alpha / 2), solveDelta(t, df, alpha / 2)};
    }

    private static double solveDelta(double t, double df, double target) {
        // cdf decreases in delta: widen the bracket until it holds the target
        double step = 4 + Math.abs(t) * 0.5;
        double lo = t - step;
        double hi = t + step;
        while (cdf(t, df, lo) < target) {
            lo -= step;
        }
        while (cdf(t, df, hi) > target) {
            hi += step;
        }
        return new BrentSolver(1e-12, 1e-10).solve(500, d -> cdf(t, df, d) - target, lo, hi);
    }
}
