package org.inkgate.analysis.distributions;

import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.special.Gamma;

/**
 * Expectation of a function of S = sqrt(V / df), V chi-square with df degrees of freedom.
 *
 * <p>Both the noncentral t and the studentized range are normal-theory quantities divided by
 * such an S, so their distribution functions are E[g(S)] for a g given by the normal
 * distribution. The integral runs over the range where the density of S is within e^-40 of its
 * mode, by composite 20-point Gauss-Legendre quadrature.
 */
final class ScaledChiIntegral {

    private static final int PANELS = 10;
    private static final double LOG_SPAN = 40.0;

    private ScaledChiIntegral() {
    }

    /** E[g(S)] for S = sqrt(chi2_df / df). */
    static double expectation(double df, DoubleUnaryOperator g) {
        double logNorm = Math.log(2) + (df / 2) * Math.log(df / 2) - Gamma.logGamma(df / 2);
        DoubleUnaryOperator logDensity = s -> logNorm + (df - 1) * Math.log(s) - df * s * s / 2;
        double mode = Math.sqrt(Math.max(df - 1, 0) / df);
        double top = logDensity.applyAsDouble(mode > 0 ? mode : 1e-300);
        if (mode == 0) {
            top = df == 1 ? logNorm : top;
        }
        double cut = top - LOG_SPAN;
        double lower = 0;
        if (mode > 0) {
            lower = bisect(logDensity, 1e-300, mode, cut);
        }
        double hi = Math.max(mode, 1) * 2;
        while (logDensity.applyAsDouble(hi) > cut) {
            hi *= 2;
        }
        double upper = bisect(logDensity, Math.max(mode, 1e-9), hi, cut);
        double width = (upper - lower) / PANELS;
        double sum = 0;
        for (int p = 0; p < PANELS; p++) {
            double a = lower + p * width;
            sum += GaussLegendre.integrate(s -> s <= 0 ? 0 : Math.exp(logDensity.applyAsDouble(s)) * g.applyAsDouble(s),
                    a, a + width);
        }
        return sum;
    }

    /** The point between a and b where a monotone (on [a,b]) log density crosses the cut. */
    private static double bisect(DoubleUnaryOperator f, double a, double b, double cut) {
        double fa = f.applyAsDouble(a) - cut;
        for (int i = 0; i < 200; i++) {
            double m = (a + b) / 2;
            double fm = f.applyAsDouble(m) - cut;
            if ((fm > 0) == (fa > 0)) {
                a = m;
                fa = fm;
            } else {
                b = m;
            }
        }
        return (a + b) / 2;
    }
}
