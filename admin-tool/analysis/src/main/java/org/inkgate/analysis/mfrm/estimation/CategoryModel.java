package org.inkgate.analysis.mfrm.estimation;

import org.inkgate.analysis.mfrm.design.ModelDesign;

/**
 * Category probabilities of the Rasch-Andrich model (Andrich 1978; Wright & Masters 1982, ch. 3):
 * P_k proportional to exp(k*eta - (F_1 + ... + F_k)), k = 0..m, where eta is the combined measure
 * of the rating (candidate minus the other facets' measures).
 */
public final class CategoryModel {
    private CategoryModel() {
    }

    /**
     * Fills {@code p[0..m]} with the category probabilities; {@code f[1..m]} are the thresholds
     * ({@code f[0]} is ignored). Stable for any eta (log-sum-exp).
     */
    public static void probabilities(double eta, double[] f, int m, double[] p) {
        double cum = 0;
        double max = 0;
        p[0] = 0;
        for (int k = 1; k <= m; k++) {
            cum += f[k];
            p[k] = k * eta - cum;
            if (p[k] > max) {
                max = p[k];
            }
        }
        double z = 0;
        for (int k = 0; k <= m; k++) {
            p[k] = Math.exp(p[k] - max);
            z += p[k];
        }
        for (int k = 0; k <= m; k++) {
            p[k] /= z;
        }
    }

    /** Beyond this |eta| the one-exp power series could overflow; the stable path is used. */
    public static final double FAST_LIMIT = 30.0;

    /**
     * The fixed part of the fast probabilities per threshold set: {@code exp(-(F_1 + ... + F_k))}
     * for k = 0..m, computed once per pass instead of once per rating.
     */
    public static double[][] expNegCumulative(double[][] thresholds, ModelDesign d) {
        double[][] out = new double[d.scaleCount()][];
        for (int s = 0; s < out.length; s++) {
            int m = d.maxCategory(s);
            out[s] = new double[m + 1];
            out[s][0] = 1;
            double cum = 0;
            for (int k = 1; k <= m; k++) {
                cum += thresholds[s][k];
                out[s][k] = Math.exp(-cum);
            }
        }
        return out;
    }

    /**
     * The same probabilities as {@link #probabilities} with one exp per rating: P_k proportional to
     * exp(-F_1 - ... - F_k) * exp(eta)^k, from {@link #expNegCumulative}; the stable path beyond
     * {@link #FAST_LIMIT}.
     */
    public static void probabilities(double eta, double[] f, double[] expNegCum, int m, double[] p) {
        if (Math.abs(eta) >= FAST_LIMIT) {
            probabilities(eta, f, m, p);
            return;
        }
        double r = Math.exp(eta);
        double pow = 1;
        double z = 0;
        for (int k = 0; k <= m; k++) {
            p[k] = expNegCum[k] * pow;
            z += p[k];
            pow *= r;
        }
        for (int k = 0; k <= m; k++) {
            p[k] /= z;
        }
    }

    /** Expected category index at eta. */
    public static double expected(double eta, double[] f, int m, double[] work) {
        probabilities(eta, f, m, work);
        double e = 0;
        for (int k = 1; k <= m; k++) {
            e += k * work[k];
        }
        return e;
    }
}
