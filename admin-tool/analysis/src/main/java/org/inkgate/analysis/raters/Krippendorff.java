package org.inkgate.analysis.raters;

import java.util.ArrayList;
import java.util.List;

/**
 * Krippendorff's alpha from the coincidence matrix (Krippendorff 2011, "Computing
 * Krippendorff's alpha-reliability", Annenberg School for Communication, sections C-E):
 * alpha = 1 - D_o / D_e. Units with fewer than two values are not pairable and are left out.
 * Metrics: nominal, ordinal (delta from marginal counts: (sum_{g=c..k} n_g - (n_c + n_k)/2)^2),
 * interval ((c - k)^2).
 */
public final class Krippendorff {

    /** The difference function. */
    public enum Metric { NOMINAL, ORDINAL, INTERVAL }

    /** Alpha with the number of pairable units and values. */
    public record Result(Metric metric, double alpha, int units, double pairableValues, List<String> cautions) {
        public Result {
            cautions = List.copyOf(cautions);
        }
    }

    private Krippendorff() {
    }

    /** units[u] holds the values given to unit u (missing values simply absent). */
    public static Result alpha(List<double[]> units, Metric metric) {
        int total = 0;
        for (double[] u : units) {
            total += u.length >= 2 ? u.length : 0;
        }
        double[] all = new double[total];
        int at = 0;
        for (double[] u : units) {
            if (u.length >= 2) {
                System.arraycopy(u, 0, all, at, u.length);
                at += u.length;
            }
        }
        double[] values = Kappa.distinctSorted(all);
        List<String> cautions = new ArrayList<>();
        int q = values.length;
        double[][] o = new double[q][q];
        int pairable = 0;
        for (double[] u : units) {
            int m = u.length;
            if (m < 2) {
                continue;
            }
            pairable++;
            for (int i = 0; i < m; i++) {
                for (int j = 0; j < m; j++) {
                    if (i != j) {
                        o[java.util.Arrays.binarySearch(values, u[i])][java.util.Arrays.binarySearch(values, u[j])] += 1.0 / (m - 1);
                    }
                }
            }
        }
        double[] nc = new double[q];
        double n = 0;
        for (int i = 0; i < q; i++) {
            for (int j = 0; j < q; j++) {
                nc[i] += o[i][j];
            }
            n += nc[i];
        }
        if (pairable == 0 || q < 2) {
            cautions.add(pairable == 0 ? "no unit has two or more values" : "only one value used: alpha undefined");
            return new Result(metric, Double.NaN, pairable, n, cautions);
        }
        double dObs = 0, dExp = 0;
        for (int i = 0; i < q; i++) {
            for (int j = 0; j < q; j++) {
                double delta = delta(metric, i, j, values, nc);
                dObs += o[i][j] * delta;
                dExp += nc[i] * nc[j] * delta;
            }
        }
        dObs /= n;
        dExp /= n * (n - 1);
        return new Result(metric, 1 - dObs / dExp, pairable, n, cautions);
    }

    private static double delta(Metric metric, int i, int j, double[] values, double[] nc) {
        return switch (metric) {
            case NOMINAL -> i == j ? 0 : 1;
            case INTERVAL -> Math.pow(values[i] - values[j], 2);
            case ORDINAL -> {
                int lo = Math.min(i, j), hi = Math.max(i, j);
                double s = 0;
                for (int g = lo; g <= hi; g++) {
                    s += nc[g];
                }
                yield Math.pow(s - (nc[i] + nc[j]) / 2, 2);
            }
        };
    }
}
