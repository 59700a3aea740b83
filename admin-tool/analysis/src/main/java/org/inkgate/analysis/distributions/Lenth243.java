package org.inkgate.analysis.distributions;

import org.apache.commons.math3.special.Beta;
import org.apache.commons.math3.special.Erf;
import org.apache.commons.math3.special.Gamma;

/**
 * The noncentral t distribution function by Lenth's series, Algorithm AS 243 (R. V. Lenth 1989,
 * "Cumulative distribution function of the non-central t distribution", Applied Statistics 38,
 * 185-189), written here from memory of the published algorithm and of the form R's {@code pnt}
 * gives it (error bound 1e-12, at most 1000 terms; the 0.5 - p rewrite for small lambda).
 *
 * <p>For t &gt;= 0, P(T &lt;= t) = Phi(-delta) + sum over j of p_j I_x(j + 1/2, df/2) + q_j I_x(j + 1,
 * df/2) with x = t^2 / (t^2 + df), p_j, q_j the Poisson-type weights of delta^2 / 2; a negative t
 * uses P(T &lt;= t; delta) = 1 - P(T &lt;= -t; -delta). The series stops when Lenth's bound on the
 * remainder, 2 s (I_odd - g_odd), falls below the error bound.
 */
final class Lenth243 {

    private static final double ERROR_BOUND = 1e-12;
    private static final int MAX_TERMS = 1000;
    private static final double SQRT_2_OVER_PI = Math.sqrt(2 / Math.PI);
    private static final double LOG_SQRT_PI = 0.5 * Math.log(Math.PI);

    /**
     * Beyond this |delta| the first weight exp(-delta^2 / 2) underflows (AS 243 switches to a
     * normal approximation there; {@link NoncentralT} uses its quadrature instead).
     */
    static final double DELTA_LIMIT = Math.sqrt(2 * Math.log(2) * 1021);

    private Lenth243() {
    }

    /** P(T &lt;= t) or NaN where the series does not apply (|delta| beyond the limit, no convergence). */
    static double cdf(double t, double df, double delta) {
        boolean negative = t < 0;
        double tt = negative ? -t : t;
        double del = negative ? -delta : delta;
        if (Math.abs(del) > DELTA_LIMIT) {
            return Double.NaN;
        }
        double sum = 0;
        double x = tt * tt / (tt * tt + df);
        if (x > 0) {
            double lambda = del * del;
            double p = 0.5 * Math.exp(-0.5 * lambda);
            double q = SQRT_2_OVER_PI * p * del;
            double s = 0.5 - p;
            if (s < 1e-7) {
                s = -0.5 * Math.expm1(-0.5 * lambda); // keeps digits when lambda is tiny
            }
            double a = 0.5;
            double b = 0.5 * df;
            double rxb = Math.pow(1 - x, b);
            double logBeta = LOG_SQRT_PI + Gamma.logGamma(b) - Gamma.logGamma(0.5 + b);
            double xOdd = Beta.regularizedBeta(x, a, b);
            double gOdd = 2 * rxb * Math.exp(a * Math.log(x) - logBeta);
            double bx = b * x;
            double xEven = bx < Math.ulp(1.0) ? bx : 1 - rxb;
            double gEven = bx * rxb;
            sum = p * xOdd + q * xEven;
            boolean converged = false;
            for (int it = 1; it <= MAX_TERMS; it++) {
                a += 1;
                xOdd -= gOdd;
                xEven -= gEven;
                gOdd *= x * (a + b - 1) / a;
                gEven *= x * (a + b - 0.5) / (a + 0.5);
                p *= lambda / (2 * it);
                q *= lambda / (2 * it + 1);
                sum += p * xOdd + q * xEven;
                s -= p;
                if (s <= 0 && it > 1) {
                    converged = true;
                    break;
                }
                if (Math.abs(2 * s * (xOdd - gOdd)) < ERROR_BOUND) {
                    converged = true;
                    break;
                }
            }
            if (!converged) {
                return Double.NaN;
            }
        }
        sum += 0.5 * Erf.erfc(del / Math.sqrt(2)); // Phi(-del)
        sum = Math.min(1, Math.max(0, sum));
        return negative ? 1 - sum : sum;
    }
}
