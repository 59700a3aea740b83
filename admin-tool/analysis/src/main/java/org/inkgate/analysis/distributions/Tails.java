package org.inkgate.analysis.distributions;

import org.apache.commons.math3.special.Beta;
import org.apache.commons.math3.special.Gamma;

/**
 * Upper-tail probabilities computed directly, not as 1 - cdf, so that small p-values keep their
 * digits instead of rounding to 0 (F: P(F &gt; f) = I_{d2/(d2 + d1 f)}(d2/2, d1/2); chi-square:
 * the regularized upper incomplete gamma Q(df/2, x/2); Abramowitz &amp; Stegun 26.6.2, 26.4.19).
 */
public final class Tails {

    private Tails() {
    }

    /** P(F &gt; f) for an F distribution with d1 and d2 degrees of freedom. */
    public static double fUpper(double f, double d1, double d2) {
        if (Double.isNaN(f)) {
            return Double.NaN;
        }
        if (f <= 0) {
            return 1;
        }
        return Beta.regularizedBeta(d2 / (d2 + d1 * f), d2 / 2, d1 / 2);
    }

    /** P(X &gt; x) for a chi-square distribution with df degrees of freedom. */
    public static double chiSquareUpper(double x, double df) {
        if (Double.isNaN(x)) {
            return Double.NaN;
        }
        if (x <= 0) {
            return 1;
        }
        return Gamma.regularizedGammaQ(df / 2, x / 2);
    }
}
