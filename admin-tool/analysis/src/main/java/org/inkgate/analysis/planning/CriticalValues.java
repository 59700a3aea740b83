package org.inkgate.analysis.planning;

import org.apache.commons.math3.distribution.FDistribution;
import org.apache.commons.math3.distribution.TDistribution;

/** Central t and F quantiles (Commons Math), solved to 1e-13 rather than its default 1e-9. */
final class CriticalValues {

    private static final double ACCURACY = 1e-13;

    private CriticalValues() {
    }

    /** The t value with probability p below it. */
    static double t(double p, double df) {
        return new TDistribution(null, df, ACCURACY).inverseCumulativeProbability(p);
    }

    /** The F value with probability p below it. */
    static double f(double p, double d1, double d2) {
        return new FDistribution(null, d1, d2, ACCURACY).inverseCumulativeProbability(p);
    }
}
