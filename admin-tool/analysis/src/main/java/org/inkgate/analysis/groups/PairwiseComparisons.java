package org.inkgate.analysis.groups;

import java.util.ArrayList;
import java.util.List;
import org.inkgate.analysis.descriptive.Moments;
import org.inkgate.analysis.distributions.StudentizedRange;

/**
 * Post-hoc pairwise comparisons of group means with the studentized range distribution.
 *
 * <p>Tukey HSD, with the Tukey-Kramer standard error for unequal n (Kramer 1956):
 * q = |m_i - m_j| / sqrt(MS_E / 2 (1/n_i + 1/n_j)), p = P(Q &gt; q; k, df_E),
 * CI = diff +- q_crit / sqrt(2) sqrt(MS_E (1/n_i + 1/n_j)). Games-Howell (1976) uses each pair's
 * own variances with a Welch standard error and Welch-Satterthwaite df, with the same q.
 */
public final class PairwiseComparisons {

    /** Which procedure. */
    public enum Method { TUKEY_HSD, GAMES_HOWELL }

    /** One comparison: later group minus earlier group, as R and most textbooks print it. */
    public record Comparison(String groupA, String groupB, double difference, double lower, double upper,
            double q, double df, double p) {
    }

    private PairwiseComparisons() {
    }

    /** All pairs j &gt; i of groups with values, difference = mean(j) - mean(i), 95% family-wise. */
    public static List<Comparison> compare(Groups groups, Method method, double confidence) {
        return compareWithError(groups, method, confidence, -1);
    }

    /**
     * As {@link #compare}, with the error degrees of freedom of a larger model whose residuals
     * are the within-group deviations (e.g. a balanced additive two-factor model); -1 for n - k.
     */
    public static List<Comparison> compareWithError(Groups groups, Method method, double confidence, double errorDf) {
        List<String> labels = new ArrayList<>();
        List<double[]> values = new ArrayList<>();
        for (int g = 0; g < groups.count(); g++) {
            if (groups.values().get(g).length >= (method == Method.GAMES_HOWELL ? 2 : 1)) {
                labels.add(groups.labels().get(g));
                values.add(groups.values().get(g));
            }
        }
        int k = labels.size();
        List<Comparison> out = new ArrayList<>();
        if (k < 2) {
            return out;
        }
        double mse = 0;
        int n = 0;
        for (double[] v : values) {
            double m = Moments.mean(v);
            for (double x : v) {
                mse += (x - m) * (x - m);
            }
            n += v.length;
        }
        double dfE = errorDf > 0 ? errorDf : n - k;
        mse /= dfE;
        double qCritPooled = method == Method.TUKEY_HSD && dfE > 0 ? StudentizedRange.quantile(confidence, k, dfE) : Double.NaN;
        for (int i = 0; i < k; i++) {
            for (int j = i + 1; j < k; j++) {
                double[] a = values.get(i);
                double[] b = values.get(j);
                double diff = Moments.mean(b) - Moments.mean(a);
                double se;
                double df;
                double qCrit;
                if (method == Method.TUKEY_HSD) {
                    se = Math.sqrt(mse / 2 * (1.0 / a.length + 1.0 / b.length));
                    df = dfE;
                    qCrit = qCritPooled;
                } else {
                    double va = Moments.variance(a) / a.length;
                    double vb = Moments.variance(b) / b.length;
                    se = Math.sqrt((va + vb) / 2);
                    df = (va + vb) * (va + vb) / (va * va / (a.length - 1) + vb * vb / (b.length - 1));
                    qCrit = df > 0 ? StudentizedRange.quantile(confidence, k, df) : Double.NaN;
                }
                if (!(se > 0) || !(df > 0)) {
                    out.add(new Comparison(labels.get(i), labels.get(j), diff, Double.NaN, Double.NaN, Double.NaN, df,
                            Double.NaN));
                    continue;
                }
                double q = Math.abs(diff) / se;
                double p = StudentizedRange.upperTail(q, k, df);
                out.add(new Comparison(labels.get(i), labels.get(j), diff, diff - qCrit * se, diff + qCrit * se, q, df, p));
            }
        }
        return out;
    }
}
