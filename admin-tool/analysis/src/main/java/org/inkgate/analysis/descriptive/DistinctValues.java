package org.inkgate.analysis.descriptive;

import java.util.Arrays;

/**
 * The distinct values of an array, increasing. Ratings take few values, so values are first
 * collected into a small sorted array (n log q); only with many distinct values does it fall
 * back to sorting a copy (n log n).
 */
public final class DistinctValues {

    private static final int SMALL = 256;

    private DistinctValues() {
    }

    public static double[] of(double[] values) {
        double[] d = new double[SMALL];
        int q = 0;
        for (double v : values) {
            int i = Arrays.binarySearch(d, 0, q, v);
            if (i >= 0 && d[i] == v) {
                continue;
            }
            if (q == SMALL) {
                return bySorting(values);
            }
            int at = i >= 0 ? i : -i - 1;
            System.arraycopy(d, at, d, at + 1, q - at);
            d[at] = v;
            q++;
        }
        return Arrays.copyOf(d, q);
    }

    private static double[] bySorting(double[] values) {
        double[] v = values.clone();
        Arrays.sort(v);
        int d = 0;
        for (int i = 0; i < v.length; i++) {
            if (i == 0 || v[i] != v[d - 1]) {
                v[d++] = v[i];
            }
        }
        return Arrays.copyOf(v, d);
    }

    /** Position of v in the distinct values (v must be one of them). */
    static int indexOf(double[] distinct, double v) {
        return Arrays.binarySearch(distinct, v);
    }
}
