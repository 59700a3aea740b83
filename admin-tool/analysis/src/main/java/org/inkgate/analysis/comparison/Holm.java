package org.inkgate.analysis.comparison;

import java.util.Arrays;
import java.util.Comparator;

/** Holm's (1979) step-down adjustment of a family of p-values (NaN p-values stay NaN, not counted). */
public final class Holm {

    private Holm() {
    }

    public static double[] adjust(double[] p) {
        Integer[] order = java.util.stream.IntStream.range(0, p.length).filter(i -> !Double.isNaN(p[i]))
                .boxed().toArray(Integer[]::new);
        Arrays.sort(order, Comparator.comparingDouble(i -> p[i]));
        int m = order.length;
        double[] out = new double[p.length];
        Arrays.fill(out, Double.NaN);
        double running = 0;
        for (int r = 0; r < m; r++) {
            running = Math.max(running, Math.min(1, (m - r) * p[order[r]]));
            out[order[r]] = running;
        }
        return out;
    }
}
