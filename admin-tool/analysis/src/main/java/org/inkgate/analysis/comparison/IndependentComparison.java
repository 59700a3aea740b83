package org.inkgate.analysis.comparison;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.TDistribution;
import org.inkgate.analysis.descriptive.Moments;
import org.inkgate.analysis.distributions.NoncentralT;

/**
 * Two independent samples: Student's and Welch's t-tests (Welch df = SE^4 / sum((s_i^2/n_i)^2 /
 * (n_i - 1))), Cohen's d_s with its noncentral-t CI and Hedges' g = d_s J(df),
 * J(df) = Gamma(df/2) / (sqrt(df/2) Gamma((df-1)/2)) (Lakens 2013, equations 1-4).
 * Differences are a minus b.
 */
public record IndependentComparison(double difference, double studentT, double studentDf, double studentP,
        double studentLower, double studentUpper, double welchT, double welchDf, double welchP, double welchLower,
        double welchUpper, double ds, double dsLower, double dsUpper, double hedgesG, List<String> cautions) {

    public IndependentComparison {
        cautions = List.copyOf(cautions);
    }

    /** Hedges' small-sample factor J(df) = Gamma(df/2) / (sqrt(df/2) Gamma((df-1)/2)), df = n_a + n_b - 2. */
    public double hedgesJ() {
        return j(studentDf);
    }

    /** Hedges' g's CI: the CI of d_s times J (Lakens 2013; the factor is treated as known). */
    public double hedgesLower() {
        return dsLower * hedgesJ();
    }

    /** Upper end of Hedges' g's CI. */
    public double hedgesUpper() {
        return dsUpper * hedgesJ();
    }

    private static double j(double df) {
        return Math.exp(org.apache.commons.math3.special.Gamma.logGamma(df / 2) - Math.log(Math.sqrt(df / 2))
                - org.apache.commons.math3.special.Gamma.logGamma((df - 1) / 2));
    }

    public static IndependentComparison of(double[] a, double[] b, double confidence) {
        List<String> cautions = new ArrayList<>();
        int na = a.length, nb = b.length;
        if (na < 2 || nb < 2) {
            throw new IllegalArgumentException("independent t-tests need at least 2 values per sample (have " + na
                    + " and " + nb + ")");
        }
        double ma = Moments.mean(a), mb = Moments.mean(b);
        double va = Moments.variance(a), vb = Moments.variance(b);
        double diff = ma - mb;
        double dfS = na + nb - 2;
        double pooled = ((na - 1) * va + (nb - 1) * vb) / dfS;
        double seS = Math.sqrt(pooled * (1.0 / na + 1.0 / nb));
        double tS = diff / seS;
        TDistribution distS = new TDistribution(null, dfS);
        double critS = distS.inverseCumulativeProbability(1 - (1 - confidence) / 2);
        double ua = va / na, ub = vb / nb;
        double seW = Math.sqrt(ua + ub);
        double dfW = Math.pow(ua + ub, 2) / (ua * ua / (na - 1) + ub * ub / (nb - 1));
        double tW = diff / seW;
        TDistribution distW = new TDistribution(null, dfW);
        double critW = distW.inverseCumulativeProbability(1 - (1 - confidence) / 2);
        double ds = diff / Math.sqrt(pooled);
        double[] delta = NoncentralT.deltaInterval(tS, dfS, confidence);
        double scale = Math.sqrt(1.0 / na + 1.0 / nb);
        double j = j(dfS);
        return new IndependentComparison(diff, tS, dfS, 2 * distS.cumulativeProbability(-Math.abs(tS)),
                diff - critS * seS, diff + critS * seS, tW, dfW, 2 * distW.cumulativeProbability(-Math.abs(tW)),
                diff - critW * seW, diff + critW * seW, ds, delta[0] * scale, delta[1] * scale, ds * j, cautions);
    }
}
