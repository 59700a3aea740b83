package org.inkgate.analysis.raters;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * Cohen's kappa for two ratings of the same units: unweighted (Cohen 1960) and weighted
 * (Cohen 1968) with linear weights 1 - |i-j|/(q-1) or quadratic weights 1 - (i-j)^2/(q-1)^2.
 *
 * <p>Standard errors from Fleiss, Cohen &amp; Everitt (1969), Psychological Bulletin 72:323-327:
 * the large-sample SE for confidence intervals, and the SE under kappa = 0 for the z test.
 * Categories are the distinct values observed in either rating, in numeric order; weights use
 * category positions, so a scale with an unused middle category should be given explicitly.
 */
public record Kappa(Weights weights, int n, int categories, double observed, double expected, double kappa,
        double se, double lower, double upper, double seNull, double z, double p, List<String> cautions) {

    /** The weighting scheme. */
    public enum Weights { UNWEIGHTED, LINEAR, QUADRATIC }

    public Kappa {
        cautions = List.copyOf(cautions);
    }

    /** Kappa over the categories observed in a and b. */
    public static Kappa of(double[] a, double[] b, Weights weights) {
        double[] all = new double[a.length + b.length];
        System.arraycopy(a, 0, all, 0, a.length);
        System.arraycopy(b, 0, all, a.length, b.length);
        return of(a, b, distinctSorted(all), weights);
    }

    /** Kappa over the given categories, in increasing order (every value must be one of them). */
    public static Kappa of(double[] a, double[] b, double[] categories, Weights weights) {
        int q = categories.length;
        int n = a.length;
        List<String> cautions = new ArrayList<>();
        double x = Double.NaN;
        if (n == 0 || q < 2) {
            cautions.add(n == 0 ? "no paired ratings" : "only one category used: kappa undefined");
            return new Kappa(weights, n, q, x, x, x, x, x, x, x, x, x, cautions);
        }
        double[][] p = new double[q][q];
        for (int i = 0; i < n; i++) {
            p[index(categories, a[i])][index(categories, b[i])] += 1.0 / n;
        }
        double[][] w = new double[q][q];
        for (int i = 0; i < q; i++) {
            for (int j = 0; j < q; j++) {
                double d = Math.abs(i - j) / (q - 1.0);
                w[i][j] = switch (weights) {
                    case UNWEIGHTED -> i == j ? 1 : 0;
                    case LINEAR -> 1 - d;
                    case QUADRATIC -> 1 - d * d;
                };
            }
        }
        double[] row = new double[q], col = new double[q];
        for (int i = 0; i < q; i++) {
            for (int j = 0; j < q; j++) {
                row[i] += p[i][j];
                col[j] += p[i][j];
            }
        }
        double po = 0, pe = 0;
        for (int i = 0; i < q; i++) {
            for (int j = 0; j < q; j++) {
                po += w[i][j] * p[i][j];
                pe += w[i][j] * row[i] * col[j];
            }
        }
        if (pe >= 1) {
            cautions.add("expected agreement is 1 (one category per rater): kappa undefined");
            return new Kappa(weights, n, q, po, pe, x, x, x, x, x, x, x, cautions);
        }
        double kappa = (po - pe) / (1 - pe);
        double[] wRow = new double[q], wCol = new double[q];
        for (int i = 0; i < q; i++) {
            for (int j = 0; j < q; j++) {
                wRow[i] += col[j] * w[i][j];
                wCol[j] += row[i] * w[i][j];
            }
        }
        double sum = 0, sum0 = 0;
        for (int i = 0; i < q; i++) {
            for (int j = 0; j < q; j++) {
                double term = w[i][j] - (wRow[i] + wCol[j]) * (1 - kappa);
                sum += p[i][j] * term * term;
                double term0 = w[i][j] - (wRow[i] + wCol[j]);
                sum0 += row[i] * col[j] * term0 * term0;
            }
        }
        double var = (sum - Math.pow(kappa - pe * (1 - kappa), 2)) / (n * Math.pow(1 - pe, 2));
        double var0 = (sum0 - pe * pe) / (n * Math.pow(1 - pe, 2));
        double se = Math.sqrt(Math.max(var, 0));
        double se0 = Math.sqrt(Math.max(var0, 0));
        NormalDistribution std = new NormalDistribution(null, 0, 1);
        double crit = std.inverseCumulativeProbability(0.975);
        double z = se0 > 0 ? kappa / se0 : Double.NaN;
        double pValue = se0 > 0 ? 2 * std.cumulativeProbability(-Math.abs(z)) : Double.NaN;
        if (n < 30) {
            cautions.add("n = " + n + ": large-sample SEs are rough below about 30 pairs (common practice)");
        }
        return new Kappa(weights, n, q, po, pe, kappa, se, kappa - crit * se, kappa + crit * se, se0, z, pValue,
                cautions);
    }

    /** The distinct values, increasing. */
    public static double[] distinctSorted(double[] values) {
        return org.inkgate.analysis.descriptive.DistinctValues.of(values);
    }

    private static int index(double[] categories, double v) {
        int i = java.util.Arrays.binarySearch(categories, v);
        if (i >= 0 && categories[i] == v) {
            return i;
        }
        throw new IllegalArgumentException("value " + v + " is not one of the categories");
    }
}
