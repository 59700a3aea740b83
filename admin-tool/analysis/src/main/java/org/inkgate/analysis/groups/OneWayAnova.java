package org.inkgate.analysis.groups;

import java.util.ArrayList;
import java.util.List;
import org.inkgate.analysis.descriptive.Moments;

/**
 * One-way analysis of variance with eta squared and omega squared (eta^2 = SS_b / SS_T;
 * omega^2 = (SS_b - df_b MS_w) / (SS_T + MS_w): Hays 1963; see Lakens 2013).
 */
public record OneWayAnova(int groups, int n, double ssBetween, double ssWithin, double dfBetween,
        double dfWithin, double f, double p, double etaSquared, double omegaSquared, List<String> cautions) {

    public OneWayAnova {
        cautions = List.copyOf(cautions);
    }

    public double msWithin() {
        return ssWithin / dfWithin;
    }

    /** The ANOVA of the groups; groups with no values are left out and named in the cautions. */
    public static OneWayAnova of(Groups groups) {
        List<String> cautions = new ArrayList<>();
        List<double[]> used = new ArrayList<>();
        for (int g = 0; g < groups.count(); g++) {
            if (groups.values().get(g).length == 0) {
                cautions.add("group " + groups.labels().get(g) + " has no values and is left out");
            } else {
                used.add(groups.values().get(g));
            }
        }
        int k = used.size();
        int n = used.stream().mapToInt(v -> v.length).sum();
        if (k < 2) {
            cautions.add("ANOVA needs at least 2 groups with values (has " + k + ")");
            return nan(k, n, cautions);
        }
        if (n - k < 1) {
            cautions.add("ANOVA needs more values than groups (n " + n + ", groups " + k + ")");
            return nan(k, n, cautions);
        }
        double grand = used.stream().flatMapToDouble(java.util.Arrays::stream).sum() / n;
        double ssb = 0, ssw = 0;
        for (double[] v : used) {
            double m = Moments.mean(v);
            ssb += v.length * (m - grand) * (m - grand);
            for (double x : v) {
                ssw += (x - m) * (x - m);
            }
        }
        double dfb = k - 1, dfw = n - k;
        if (ssw == 0) {
            cautions.add("no variance within groups: F undefined");
            return new OneWayAnova(k, n, ssb, ssw, dfb, dfw, Double.NaN, Double.NaN, ssb + ssw > 0 ? 1 : Double.NaN,
                    Double.NaN, cautions);
        }
        double msw = ssw / dfw;
        double f = (ssb / dfb) / msw;
        double p = org.inkgate.analysis.distributions.Tails.fUpper(f, dfb, dfw);
        double sst = ssb + ssw;
        return new OneWayAnova(k, n, ssb, ssw, dfb, dfw, f, p, ssb / sst, (ssb - dfb * msw) / (sst + msw), cautions);
    }

    private static OneWayAnova nan(int k, int n, List<String> cautions) {
        return new OneWayAnova(k, n, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                Double.NaN, Double.NaN, cautions);
    }
}
