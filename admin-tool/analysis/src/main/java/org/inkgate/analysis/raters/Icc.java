package org.inkgate.analysis.raters;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.FDistribution;

/**
 * Intraclass correlations in the six forms of Shrout &amp; Fleiss (1979), Psychological Bulletin
 * 86:420-428, from a complete targets x judges table, with F-based confidence intervals (Shrout
 * &amp; Fleiss 1979, Table 4 and equations for ICC(2,1) with Satterthwaite's df; McGraw &amp;
 * Wong 1996, Psychological Methods 1:30-46, Table 7 for the k-judge forms).
 */
public record Icc(int targets, int judges, double bms, double wms, double jms, double ems, List<Form> forms,
        List<String> cautions) {

    /** One ICC form with its CI and F test against 0. */
    public record Form(String name, String description, double value, double lower, double upper, double f,
            double df1, double df2, double p) {
    }

    public Icc {
        forms = List.copyOf(forms);
        cautions = List.copyOf(cautions);
    }

    /** ICCs of rows = targets, columns = judges; every cell present. */
    public static Icc of(double[][] table, double confidence) {
        int n = table.length;
        int k = n == 0 ? 0 : table[0].length;
        List<String> cautions = new ArrayList<>();
        if (n < 2 || k < 2) {
            cautions.add("ICC needs at least 2 targets and 2 judges (has " + n + " and " + k + ")");
            return new Icc(n, k, Double.NaN, Double.NaN, Double.NaN, Double.NaN, List.of(), cautions);
        }
        double grand = 0;
        double[] rowMean = new double[n], colMean = new double[k];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < k; j++) {
                grand += table[i][j];
                rowMean[i] += table[i][j] / k;
                colMean[j] += table[i][j] / n;
            }
        }
        grand /= n * k;
        double ssr = 0, ssc = 0, sst = 0;
        for (int i = 0; i < n; i++) {
            ssr += k * Math.pow(rowMean[i] - grand, 2);
            for (int j = 0; j < k; j++) {
                sst += Math.pow(table[i][j] - grand, 2);
            }
        }
        for (int j = 0; j < k; j++) {
            ssc += n * Math.pow(colMean[j] - grand, 2);
        }
        double sse = sst - ssr - ssc;
        double bms = ssr / (n - 1);
        double wms = (ssc + sse) / (n * (k - 1.0));
        double jms = ssc / (k - 1);
        double ems = sse / ((n - 1.0) * (k - 1));
        if (bms == 0 || wms == 0 || ems == 0) {
            cautions.add("zero variance between targets or within them: ICC and its F tests undefined");
            return new Icc(n, k, bms, wms, jms, ems, List.of(), cautions);
        }
        double a = (1 - confidence) / 2;
        List<Form> forms = new ArrayList<>();
        // ICC(1): one-way random
        double f1 = bms / wms, df11 = n - 1, df12 = n * (k - 1.0);
        double fl1 = f1 / fq(1 - a, df11, df12), fu1 = f1 * fq(1 - a, df12, df11);
        double p1 = org.inkgate.analysis.distributions.Tails.fUpper(f1, df11, df12);
        forms.add(new Form("ICC1", "single rater, one-way random (Shrout-Fleiss ICC(1,1))",
                (bms - wms) / (bms + (k - 1) * wms), (fl1 - 1) / (fl1 + k - 1), (fu1 - 1) / (fu1 + k - 1),
                f1, df11, df12, p1));
        // ICC(2): two-way random, absolute agreement
        double f3 = bms / ems, df31 = n - 1, df32 = (n - 1.0) * (k - 1);
        double p3 = org.inkgate.analysis.distributions.Tails.fUpper(f3, df31, df32);
        double icc2 = (bms - ems) / (bms + (k - 1) * ems + k * (jms - ems) / n);
        double aa = k * icc2 / (n * (1 - icc2));
        double bb = 1 + k * icc2 * (n - 1) / (n * (1 - icc2));
        double v = Math.pow(aa * jms + bb * ems, 2) / (Math.pow(aa * jms, 2) / (k - 1) + Math.pow(bb * ems, 2) / df32);
        double fStar = fq(1 - a, n - 1, v), fStarInv = fq(1 - a, v, n - 1);
        double l2 = n * (bms - fStar * ems) / (fStar * (k * jms + (k * n - k - n) * ems) + n * bms);
        double u2 = n * (fStarInv * bms - ems) / (k * jms + (k * n - k - n) * ems + n * fStarInv * bms);
        forms.add(new Form("ICC2", "single rater, two-way random, absolute agreement (ICC(2,1))", icc2, l2, u2,
                f3, df31, df32, p3));
        // ICC(3): two-way mixed, consistency
        double fl3 = f3 / fq(1 - a, df31, df32), fu3 = f3 * fq(1 - a, df32, df31);
        forms.add(new Form("ICC3", "single rater, two-way mixed, consistency (ICC(3,1))",
                (bms - ems) / (bms + (k - 1) * ems), (fl3 - 1) / (fl3 + k - 1), (fu3 - 1) / (fu3 + k - 1),
                f3, df31, df32, p3));
        forms.add(new Form("ICC1k", "mean of k raters, one-way random (ICC(1,k))", (bms - wms) / bms,
                1 - 1 / fl1, 1 - 1 / fu1, f1, df11, df12, p1));
        forms.add(new Form("ICC2k", "mean of k raters, two-way random, absolute agreement (ICC(2,k))",
                (bms - ems) / (bms + (jms - ems) / n), spearmanBrown(l2, k), spearmanBrown(u2, k), f3, df31, df32, p3));
        forms.add(new Form("ICC3k", "mean of k raters, two-way mixed, consistency (ICC(3,k))", (bms - ems) / bms,
                1 - 1 / fl3, 1 - 1 / fu3, f3, df31, df32, p3));
        if (n < 30) {
            cautions.add("only " + n + " targets: ICC confidence intervals are wide (common practice: 30 or more)");
        }
        return new Icc(n, k, bms, wms, jms, ems, forms, cautions);
    }

    private static double spearmanBrown(double r, int k) {
        return k * r / (1 + (k - 1) * r);
    }

    private static double fq(double p, double df1, double df2) {
        return new FDistribution(null, df1, df2).inverseCumulativeProbability(p);
    }
}
