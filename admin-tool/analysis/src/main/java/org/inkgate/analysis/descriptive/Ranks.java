package org.inkgate.analysis.descriptive;

import java.util.Arrays;
import java.util.Comparator;

/** Average ranks (mid-ranks for ties) and the tie correction sum of (t^3 - t). */
public final class Ranks {

    private Ranks() {
    }

    /** Ranks 1..n of the values, ties sharing the mean of their ranks. */
    public static double[] of(double[] values) {
        int n = values.length;
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        Arrays.sort(order, Comparator.comparingDouble(i -> values[i]));
        double[] ranks = new double[n];
        int i = 0;
        while (i < n) {
            int j = i;
            while (j + 1 < n && values[order[j + 1]] == values[order[i]]) {
                j++;
            }
            double rank = (i + j) / 2.0 + 1;
            for (int k = i; k <= j; k++) {
                ranks[order[k]] = rank;
            }
            i = j + 1;
        }
        return ranks;
    }

    /** Sum over tie groups of t^3 - t, t the size of the group (0 when there are no ties). */
    public static double tieSum(double[] values) {
        double[] x = values.clone();
        Arrays.sort(x);
        double sum = 0;
        int i = 0;
        while (i < x.length) {
            int j = i;
            while (j + 1 < x.length && x[j + 1] == x[i]) {
                j++;
            }
            double t = j - i + 1;
            sum += t * t * t - t;
            i = j + 1;
        }
        return sum;
    }
}
