package org.inkgate.analysis.rubric;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.FDistribution;

/**
 * Cronbach's (1951) alpha = k/(k-1) (1 - sum s_i^2 / s_X^2) over the columns (criteria) of a
 * complete persons x items table, with the Feldt, Woodruff &amp; Salih (1987) interval
 * [1 - (1 - a) F(1 - g/2), 1 - (1 - a) F(g/2)], df (n - 1, (n - 1)(k - 1)), and alpha if each item
 * is deleted.
 */
public record CronbachAlpha(int n, int items, double alpha, double lower, double upper, double[] alphaIfDeleted,
        List<String> cautions) {

    public CronbachAlpha {
        alphaIfDeleted = alphaIfDeleted.clone();
        cautions = List.copyOf(cautions);
    }

    /** rows = persons, columns = items. */
    public static CronbachAlpha of(double[][] table, double confidence) {
        int n = table.length;
        int k = n == 0 ? 0 : table[0].length;
        List<String> cautions = new ArrayList<>();
        if (n < 2 || k < 2) {
            cautions.add("alpha needs at least 2 persons and 2 items (has " + n + " and " + k + ")");
            return new CronbachAlpha(n, k, Double.NaN, Double.NaN, Double.NaN, new double[0], cautions);
        }
        double a = alpha(table, -1);
        if (Double.isNaN(a)) {
            cautions.add("total score has zero variance: alpha undefined");
            return new CronbachAlpha(n, k, a, Double.NaN, Double.NaN, new double[0], cautions);
        }
        double[] ci = feldt(a, n, k, confidence);
        double lower = ci[0], upper = ci[1];
        double[] deleted = new double[k];
        for (int i = 0; i < k; i++) {
            deleted[i] = k > 2 ? alpha(table, i) : Double.NaN;
        }
        if (k == 2) {
            cautions.add("alpha if deleted needs at least 3 items");
        }
        return new CronbachAlpha(n, k, a, lower, upper, deleted, cautions);
    }

    /** Feldt, Woodruff &amp; Salih (1987) interval for alpha from n persons and k items. */
    public static double[] feldt(double alpha, int n, int k, double confidence) {
        double g = 1 - confidence;
        FDistribution f = new FDistribution(null, n - 1, (n - 1.0) * (k - 1));
        return new double[] {1 - (1 - alpha) * f.inverseCumulativeProbability(1 - g / 2),
            1 - (1 - alpha) * f.inverseCumulativeProbability(g / 2)};
    }

    /** Alpha of the table without column {@code skip} (-1: all columns). */
    private static double alpha(double[][] table, int skip) {
        int n = table.length;
        int k = table[0].length - (skip >= 0 ? 1 : 0);
        double itemVar = 0;
        double[] total = new double[n];
        for (int j = 0; j < table[0].length; j++) {
            if (j == skip) {
                continue;
            }
            double[] col = new double[n];
            for (int i = 0; i < n; i++) {
                col[i] = table[i][j];
                total[i] += col[i];
            }
            itemVar += variance(col);
        }
        double totalVar = variance(total);
        return totalVar == 0 ? Double.NaN : k / (k - 1.0) * (1 - itemVar / totalVar);
    }

    static double variance(double[] v) {
        double m = 0;
        for (double x : v) {
            m += x;
        }
        m /= v.length;
        double s = 0;
        for (double x : v) {
            s += (x - m) * (x - m);
        }
        return s / (v.length - 1);
    }
}
