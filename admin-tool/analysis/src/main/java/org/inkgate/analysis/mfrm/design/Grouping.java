package org.inkgate.analysis.mfrm.design;

/**
 * Observations grouped by a key (a candidate, a bias cell) with one counting sort: the
 * observations of group g are {@code order[start[g]] .. order[start[g + 1] - 1]}, in input order.
 *
 * @param start group boundaries, length groups + 1
 * @param order observation indices sorted by group
 */
public record Grouping(int[] start, int[] order) {

    /** Groups observations 0..groupOf.length-1 by {@code groupOf[n]} in 0..groups-1. */
    public static Grouping of(int[] groupOf, int groups) {
        int[] start = new int[groups + 1];
        for (int g : groupOf) {
            start[g + 1]++;
        }
        for (int g = 0; g < groups; g++) {
            start[g + 1] += start[g];
        }
        int[] order = new int[groupOf.length];
        int[] fill = start.clone();
        for (int n = 0; n < groupOf.length; n++) {
            order[fill[groupOf[n]]++] = n;
        }
        return new Grouping(start, order);
    }
}
