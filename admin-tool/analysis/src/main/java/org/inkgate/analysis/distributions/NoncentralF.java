package org.inkgate.analysis.distributions;

import org.apache.commons.math3.special.Beta;
import org.apache.commons.math3.special.Gamma;

/**
 * The noncentral F distribution with d1, d2 degrees of freedom and noncentrality lambda, as the
 * Poisson mixture of central F (beta) distributions (Johnson, Kotz &amp; Balakrishnan 1995,
 * Continuous Univariate Distributions vol. 2, ch. 30; the series behind Algorithm AS 226, Lenth
 * 1987, and Frick's AS R84, written here from memory):
 *
 * <pre>P(F &lt;= f) = sum_j e^(-lambda/2) (lambda/2)^j / j! * I_x(d1/2 + j, d2/2),  x = d1 f / (d1 f + d2)</pre>
 *
 * <p>Unlike AS 226, which starts at j = 0 and so underflows for large lambda, the sum starts at the
 * Poisson mode and walks outwards both ways, each weight from the previous one, and stops on a
 * geometric bound of the Poisson mass left on that side (below 1e-15). The upper tail is summed
 * directly, with I_{1-x}(d2/2, d1/2 + j), so it keeps its digits when small.
 */
public final class NoncentralF {

    private static final double MASS_LEFT = 1e-15;
    private static final int MAX_TERMS = 100_000;

    private NoncentralF() {
    }

    /** P(F &lt;= f). */
    public static double cdf(double f, double d1, double d2, double lambda) {
        check(d1, d2, lambda);
        if (f <= 0) {
            return 0;
        }
        double x = d1 * f / (d1 * f + d2);
        return clamp(mixture(lambda, j -> Beta.regularizedBeta(x, d1 / 2 + j, d2 / 2)));
    }

    /** P(F &gt; f), the power of an F test whose critical value is f. */
    public static double upper(double f, double d1, double d2, double lambda) {
        check(d1, d2, lambda);
        if (f <= 0) {
            return 1;
        }
        double y = d2 / (d1 * f + d2);
        return clamp(mixture(lambda, j -> Beta.regularizedBeta(y, d2 / 2, d1 / 2 + j)));
    }

    private interface Term {
        double at(int j);
    }

    /** sum_j Poisson(j; lambda/2) term(j), from the mode outwards. */
    private static double mixture(double lambda, Term term) {
        double mu = lambda / 2;
        if (mu == 0) {
            return term.at(0);
        }
        int mode = (int) Math.floor(mu);
        double modeWeight = Math.exp(-mu + mode * Math.log(mu) - Gamma.logGamma(mode + 1.0));
        double sum = modeWeight * term.at(mode);
        // upwards: w_{j+1} = w_j mu / (j + 1); the mass above j is below w_j r / (1 - r), r = mu / (j + 2)
        double w = modeWeight;
        for (int j = mode + 1; j < mode + MAX_TERMS; j++) {
            w *= mu / j;
            sum += w * term.at(j);
            double r = mu / (j + 1);
            if (r < 1 && w * r / (1 - r) < MASS_LEFT) {
                break;
            }
        }
        // downwards: w_{j-1} = w_j j / mu; the mass below j is below w_j r / (1 - r), r = j / mu
        w = modeWeight;
        for (int j = mode - 1; j >= 0; j--) {
            w *= (j + 1) / mu;
            sum += w * term.at(j);
            double r = j / mu;
            if (r < 1 && w * r / (1 - r) < MASS_LEFT) {
                break;
            }
        }
        return sum;
    }

    private static void check(double d1, double d2, double lambda) {
        if (!(d1 > 0) || !(d2 > 0)) {
            throw new IllegalArgumentException("noncentral F needs degrees of freedom above 0: " + d1 + ", " + d2);
        }
        if (!(lambda >= 0) || Double.isInfinite(lambda)) {
            throw new IllegalArgumentException("noncentral F needs a finite noncentrality of 0 or more: " + lambda);
        }
    }

    private static double clamp(double p) {
        return Math.min(1, Math.max(0, p));
    }
}
