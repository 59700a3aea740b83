package org.inkgate.analysis.descriptive;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * n, mean, SD, min, max, and bias-corrected skewness G1 and kurtosis G2 with their standard
 * errors (Joanes &amp; Gill 1998, "Comparing measures of sample skewness and kurtosis", The
 * Statistician 47:183-189: G1, G2 and the SEs of SAS/SPSS).
 *
 * <p>Values a method cannot give for this n are NaN and {@link #cautions()} says why.
 */
public record Descriptives(int n, double mean, double sd, double min, double max,
        double skewness, double skewnessSe, double kurtosis, double kurtosisSe, List<String> cautions) {

    public Descriptives {
        cautions = List.copyOf(cautions);
    }

    /** The descriptives of the values (none may be NaN). */
    public static Descriptives of(double[] values) {
        int n = values.length;
        List<String> cautions = new ArrayList<>();
        if (n == 0) {
            cautions.add("no values");
            return new Descriptives(0, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, Double.NaN, Double.NaN, Double.NaN, cautions);
        }
        double mean = Arrays.stream(values).sum() / n;
        double m2 = 0, m3 = 0, m4 = 0, min = Double.POSITIVE_INFINITY, max = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            double d = v - mean;
            double d2 = d * d;
            m2 += d2;
            m3 += d2 * d;
            m4 += d2 * d2;
            min = Math.min(min, v);
            max = Math.max(max, v);
        }
        double sd = n > 1 ? Math.sqrt(m2 / (n - 1)) : Double.NaN;
        if (n < 2) {
            cautions.add("SD needs at least 2 values");
        }
        m2 /= n;
        m3 /= n;
        m4 /= n;
        double skew = Double.NaN, skewSe = Double.NaN, kurt = Double.NaN, kurtSe = Double.NaN;
        if (m2 == 0) {
            cautions.add("all values equal: skewness and kurtosis undefined");
        } else {
            if (n >= 3) {
                double g1 = m3 / Math.pow(m2, 1.5);
                skew = Math.sqrt((double) n * (n - 1)) / (n - 2) * g1;
                skewSe = Math.sqrt(6.0 * n * (n - 1) / ((n - 2.0) * (n + 1) * (n + 3)));
            } else {
                cautions.add("skewness needs at least 3 values");
            }
            if (n >= 4) {
                double g2 = m4 / (m2 * m2) - 3;
                kurt = (n - 1.0) / ((n - 2.0) * (n - 3)) * ((n + 1) * g2 + 6);
                double se1 = Math.sqrt(6.0 * n * (n - 1) / ((n - 2.0) * (n + 1) * (n + 3)));
                kurtSe = 2 * se1 * Math.sqrt((n * (double) n - 1) / ((n - 3.0) * (n + 5)));
            } else {
                cautions.add("kurtosis needs at least 4 values");
            }
        }
        return new Descriptives(n, mean, sd, min, max, skew, skewSe, kurt, kurtSe, cautions);
    }
}
