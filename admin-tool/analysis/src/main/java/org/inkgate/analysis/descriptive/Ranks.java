package org.inkgate.analysis.descriptive;

import java.util.Arrays;

/** Average ranks (mid-ranks for ties) and the tie correction sum of (t^3 - t). */
public final class Ranks {

    private Ranks() {
    }

    /** Ranks 1..n of the values, ties sharing the mean of their ranks. */
    public static double[] of(double[] values) {
        int n = values.length;
        double[] distinct = DistinctValues.of(values);
        int q = distinct.length;
        long[] count = new long[q];
        int[] index = new int[n];
        for (int k = 0; k < n; k++) {
            index[k] = DistinctValues.indexOf(distinct, values[k]);
            count[index[k]]++;
        }
        // values equal to distinct[d] occupy positions below..below+count-1 (0-based) in sorted order
        double[] meanRank = new double[q];
        long below = 0;
        for (int d = 0; d < q; d++) {
            meanRank[d] = below + (count[d] + 1) / 2.0;
            below += count[d];
        }
        double[] ranks = new double[n];
        for (int k = 0; k < n; k++) {
            ranks[k] = meanRank[index[k]];
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
