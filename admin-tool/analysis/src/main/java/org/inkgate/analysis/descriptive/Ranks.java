package org.inkgate.analysis.descriptive;

import java.util.Arrays;

/** Average ranks (mid-ranks for ties) and the tie correction sum of (t^3 - t). */
public final class Ranks {

    private Ranks() {
    }

    /** Ranks 1..n of the values, ties sharing the mean of their ranks. */
    public static double[] of(double[] values) {
        int n = values.length;
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        // distinct values and the mean rank of each (positions i..j hold equal values)
        double[] distinct = new double[n];
        double[] meanRank = new double[n];
        int d = 0, i = 0;
        while (i < n) {
            int j = i;
            while (j + 1 < n && sorted[j + 1] == sorted[i]) {
                j++;
            }
            distinct[d] = sorted[i];
            meanRank[d++] = (i + j) / 2.0 + 1;
            i = j + 1;
        }
        double[] ranks = new double[n];
        for (int k = 0; k < n; k++) {
            ranks[k] = meanRank[Arrays.binarySearch(distinct, 0, d, values[k])];
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
