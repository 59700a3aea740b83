package org.inkgate.analysis.mfrm.estimation;

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
