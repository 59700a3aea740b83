package org.inkgate.analysis.planning;

import org.inkgate.analysis.distributions.NoncentralT;

/** The power of a t test with df degrees of freedom when T is noncentral t with noncentrality delta. */
final class TPower {

    private TPower() {
    }

    static double of(double delta, double df, double alpha, Sides sides) {
        if (sides == Sides.ONE_SIDED) {
            // one-sided in the planned direction: a negative planned effect is tested downwards
            double c = CriticalValues.t(1 - alpha, df);
            return NoncentralT.upper(c, df, Math.abs(delta));
        }
        double c = CriticalValues.t(1 - alpha / 2, df);
        return NoncentralT.upper(c, df, delta) + NoncentralT.cdf(-c, df, delta);
    }
}
