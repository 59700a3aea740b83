package org.inkgate.analysis.groups;

import java.util.ArrayList;
import java.util.List;
import org.inkgate.analysis.descriptive.Moments;

/**
 * Welch's (1951) heteroscedastic one-way ANOVA: weights w_i = n_i / s_i^2, F = A / B with
 * df (k - 1, (k^2 - 1) / (3 lambda)), lambda = sum (1 - w_i / W)^2 / (n_i - 1)
 * (Welch 1951, Biometrika 38:330-336).
 */
public record WelchAnova(double f, double df1, double df2, double p, List<String> cautions) {

    public WelchAnova {
        cautions = List.copyOf(cautions);
    }

    public static WelchAnova of(Groups groups) {
        List<String> cautions = new ArrayList<>();
        List<double[]> used = new ArrayList<>();
        for (int g = 0; g < groups.count(); g++) {
            double[] v = groups.values().get(g);
            if (v.length < 2) {
                cautions.add("group " + groups.labels().get(g) + " has fewer than 2 values and is left out");
            } else if (Moments.variance(v) == 0) {
                cautions.add("group " + groups.labels().get(g) + " has zero variance: Welch weights undefined");
                return new WelchAnova(Double.NaN, Double.NaN, Double.NaN, Double.NaN, cautions);
            } else {
                used.add(v);
            }
        }
        int k = used.size();
        if (k < 2) {
            cautions.add("Welch ANOVA needs at least 2 groups of 2 or more values");
            return new WelchAnova(Double.NaN, Double.NaN, Double.NaN, Double.NaN, cautions);
        }
        double[] w = new double[k];
        double[] m = new double[k];
        double sumW = 0;
        for (int i = 0; i < k; i++) {
            w[i] = used.get(i).length / Moments.variance(used.get(i));
            m[i] = Moments.mean(used.get(i));
            sumW += w[i];
        }
        double weightedMean = 0;
        for (int i = 0; i < k; i++) {
            weightedMean += w[i] * m[i] / sumW;
        }
        double a = 0, lambda = 0;
        for (int i = 0; i < k; i++) {
            a += w[i] * (m[i] - weightedMean) * (m[i] - weightedMean);
            lambda += Math.pow(1 - w[i] / sumW, 2) / (used.get(i).length - 1);
        }
        a /= (k - 1);
        double b = 1 + 2.0 * (k - 2) * lambda / (k * k - 1.0);
        double f = a / b;
        double df2 = (k * k - 1.0) / (3 * lambda);
        double p = org.inkgate.analysis.distributions.Tails.fUpper(f, k - 1, df2);
        return new WelchAnova(f, k - 1, df2, p, cautions);
    }
}
