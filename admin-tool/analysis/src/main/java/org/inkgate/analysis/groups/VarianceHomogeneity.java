package org.inkgate.analysis.groups;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.inkgate.analysis.descriptive.Moments;

/**
 * Levene's test (centre = mean; Levene 1960) and the Brown-Forsythe test (centre = median;
 * Brown &amp; Forsythe 1974): a one-way ANOVA F on absolute deviations from the group centre.
 */
public final class VarianceHomogeneity {

    /** Which centre the absolute deviations are taken from. */
    public enum Centre { MEAN, MEDIAN }

    private VarianceHomogeneity() {
    }

    /** The test; its cautions come from the ANOVA on the deviations. */
    public static OneWayAnova test(Groups groups, Centre centre) {
        List<double[]> deviations = new ArrayList<>();
        for (double[] v : groups.values()) {
            double c = v.length == 0 ? 0 : centre == Centre.MEAN ? Moments.mean(v) : median(v);
            deviations.add(Arrays.stream(v).map(x -> Math.abs(x - c)).toArray());
        }
        return OneWayAnova.of(new Groups(groups.labels(), deviations));
    }

    static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        int n = s.length;
        return n % 2 == 1 ? s[n / 2] : (s[n / 2 - 1] + s[n / 2]) / 2;
    }
}
