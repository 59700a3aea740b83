package org.inkgate.analysis.mfrm.fit;

import org.apache.commons.math3.distribution.ChiSquaredDistribution;

/**
 * Facet-level spread statistics (Wright & Masters 1982, ch. 5; Wright 1996, "Reliability and
 * separation", Rasch Measurement Transactions 9:4 [memory]).
 *
 * @param count       elements summarised (non-extreme, with ratings)
 * @param mean        mean measure
 * @param sd          population SD of the measures (divisor J)
 * @param rmse        root mean square of the model SEs
 * @param trueSd      sqrt(max(0, SD^2 - RMSE^2))
 * @param separation  G = true SD / RMSE
 * @param reliability G^2 / (1 + G^2) (= true variance / observed variance)
 * @param strata      (4G + 1) / 3
 * @param chiSquare   fixed (all same) chi-square: sum w D^2 - (sum w D)^2 / sum w, w = 1/SE^2
 * @param df          J - 1
 * @param p           upper-tail probability of chiSquare on df
 */
public record Separation(int count, double mean, double sd, double rmse, double trueSd, double separation,
                         double reliability, double strata, double chiSquare, int df, double p) {

    /** Summarises measures with their SEs. */
    public static Separation of(double[] measure, double[] se) {
        int j = measure.length;
        if (j == 0) {
            return new Separation(0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, Double.NaN, 0, Double.NaN);
        }
        double mean = 0;
        double mse = 0;
        double sw = 0;
        double swd = 0;
        double swd2 = 0;
        for (int i = 0; i < j; i++) {
            mean += measure[i] / j;
            mse += se[i] * se[i] / j;
            double w = 1 / (se[i] * se[i]);
            sw += w;
            swd += w * measure[i];
            swd2 += w * measure[i] * measure[i];
        }
        double var = 0;
        for (double m : measure) {
            var += (m - mean) * (m - mean) / j;
        }
        double rmse = Math.sqrt(mse);
        double trueSd = Math.sqrt(Math.max(0, var - mse));
        double g = trueSd / rmse;
        double chi = swd2 - swd * swd / sw;
        int df = j - 1;
        double p = df > 0 ? 1 - new ChiSquaredDistribution(null, df).cumulativeProbability(chi) : Double.NaN;
        return new Separation(j, mean, Math.sqrt(var), rmse, trueSd, g, reliabilityOf(g), strataOf(g), chi, df, p);
    }

    /** Reliability from separation: G^2 / (1 + G^2). */
    public static double reliabilityOf(double g) {
        return g * g / (1 + g * g);
    }

    /** Statistically distinct strata from separation: (4G + 1) / 3. */
    public static double strataOf(double g) {
        return (4 * g + 1) / 3;
    }
}
