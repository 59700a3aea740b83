package org.inkgate.analysis.distributions;

import org.apache.commons.math3.special.Erf;

/**
 * The standard normal distribution function by cubic Hermite interpolation in a table of exact
 * values (Commons Math erfc) and exact derivatives (the density), step 1/64 on [-40, 40].
 *
 * <p>The interpolation error is at most h^4/384 max|Phi''''| &lt; 4e-11 absolute: far below the
 * precision of the quadratures that call it, and about a hundred times faster than erfc, which
 * the studentized range calls hundreds of thousands of times per quantile.
 */
final class NormalTable {

    private static final double LIMIT = 40;
    private static final int PER_UNIT = 64;
    private static final double H = 1.0 / PER_UNIT;
    private static final double[] CDF;
    private static final double[] PDF;
    private static final double INV_SQRT_2PI = 1 / Math.sqrt(2 * Math.PI);

    static {
        int n = (int) (2 * LIMIT * PER_UNIT) + 1;
        CDF = new double[n];
        PDF = new double[n];
        for (int i = 0; i < n; i++) {
            double x = -LIMIT + i * H;
            CDF[i] = 0.5 * Erf.erfc(-x / Math.sqrt(2));
            PDF[i] = Math.exp(-x * x / 2) * INV_SQRT_2PI;
        }
    }

    private NormalTable() {
    }

    static double cdf(double x) {
        if (x <= -LIMIT) {
            return 0;
        }
        if (x >= LIMIT) {
            return 1;
        }
        double pos = (x + LIMIT) * PER_UNIT;
        int i = (int) pos;
        if (i >= CDF.length - 1) {
            return CDF[CDF.length - 1];
        }
        double t = pos - i;
        double t2 = t * t, t3 = t2 * t;
        double h00 = 2 * t3 - 3 * t2 + 1, h10 = t3 - 2 * t2 + t, h01 = -2 * t3 + 3 * t2, h11 = t3 - t2;
        return h00 * CDF[i] + h10 * H * PDF[i] + h01 * CDF[i + 1] + h11 * H * PDF[i + 1];
    }
}
