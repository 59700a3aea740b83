package org.inkgate.analysis.descriptive;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * The Shapiro-Wilk W test of normality with Royston's approximations (Royston 1995, "Remark AS
 * R94: A remark on algorithm AS 181", Applied Statistics 44:547-551; coefficients and p-value
 * polynomials from Royston 1992, Statistics and Computing 2:117-119).
 *
 * <p>Valid for 3 &lt;= n &lt;= 5000. Larger samples are tested, but the p-value is extrapolated
 * and a caution says so; with thousands of values W rejects trivial departures.
 */
public final class ShapiroWilk {

    /** The largest n for which Royston validated the approximation. */
    public static final int MAX_VALIDATED_N = 5000;
    private static final NormalDistribution STD = new NormalDistribution(0, 1);

    /** W, its p-value, and cautions (a NaN W comes with the reason). */
    public record Result(int n, double w, double p, List<String> cautions) {
        public Result {
            cautions = List.copyOf(cautions);
        }

        /** True when p is below alpha (normality rejected). */
        public boolean rejects(double alpha) {
            return !Double.isNaN(p) && p < alpha;
        }
    }

    private ShapiroWilk() {
    }

    /** Tests the values for normality. */
    public static Result test(double[] values) {
        int n = values.length;
        List<String> cautions = new ArrayList<>();
        if (n < 3) {
            cautions.add("Shapiro-Wilk needs at least 3 values (has " + n + ")");
            return new Result(n, Double.NaN, Double.NaN, cautions);
        }
        double[] x = values.clone();
        Arrays.sort(x);
        if (x[n - 1] - x[0] == 0) {
            cautions.add("all values equal: Shapiro-Wilk undefined");
            return new Result(n, Double.NaN, Double.NaN, cautions);
        }
        if (n > MAX_VALIDATED_N) {
            cautions.add("n = " + n + " above " + MAX_VALIDATED_N
                    + ": p-value extrapolated beyond Royston's validated range; large samples reject trivial departures");
        }
        double[] a = coefficients(n);
        double mean = Arrays.stream(x).sum() / n;
        double num = 0, ss = 0;
        for (int i = 0; i < n; i++) {
            num += a[i] * x[i];
            ss += (x[i] - mean) * (x[i] - mean);
        }
        double w = Math.min(1, num * num / ss);
        return new Result(n, w, pValue(w, n), cautions);
    }

    // the coefficients depend on n only; an analysis tests many samples of the same size
    private static final java.util.Map<Integer, double[]> COEFFICIENTS = new java.util.concurrent.ConcurrentHashMap<>();

    /** Royston's approximate coefficients a_1..a_n (antisymmetric, a_n &gt; 0); callers must not modify. */
    static double[] coefficients(int n) {
        if (COEFFICIENTS.size() > 64) {
            COEFFICIENTS.clear();
        }
        return COEFFICIENTS.computeIfAbsent(n, ShapiroWilk::computeCoefficients);
    }

    private static double[] computeCoefficients(int n) {
        double[] a = new double[n];
        if (n == 3) {
            a[0] = -Math.sqrt(0.5);
            a[2] = Math.sqrt(0.5);
            return a;
        }
        double[] m = new double[n];
        double summ2 = 0;
        for (int i = 0; i < n; i++) {
            m[i] = STD.inverseCumulativeProbability((i + 1 - 0.375) / (n + 0.25));
            summ2 += m[i] * m[i];
        }
        double ssumm2 = Math.sqrt(summ2);
        double u = 1 / Math.sqrt(n);
        double an = m[n - 1] / ssumm2 + poly(u, 0, 0.221157, -0.147981, -2.071190, 4.434685, -2.706056);
        double phi;
        int fixed;
        if (n > 5) {
            double an1 = m[n - 2] / ssumm2 + poly(u, 0, 0.042981, -0.293762, -1.752461, 5.682633, -3.582633);
            phi = (summ2 - 2 * m[n - 1] * m[n - 1] - 2 * m[n - 2] * m[n - 2]) / (1 - 2 * an * an - 2 * an1 * an1);
            a[n - 2] = an1;
            a[1] = -an1;
            fixed = 2;
        } else {
            phi = (summ2 - 2 * m[n - 1] * m[n - 1]) / (1 - 2 * an * an);
            fixed = 1;
        }
        a[n - 1] = an;
        a[0] = -an;
        double root = Math.sqrt(phi);
        for (int i = fixed; i < n - fixed; i++) {
            a[i] = m[i] / root;
        }
        return a;
    }

    static double pValue(double w, int n) {
        if (n == 3) {
            double p = 6 / Math.PI * (Math.asin(Math.sqrt(w)) - Math.asin(Math.sqrt(0.75)));
            return Math.max(0, Math.min(1, p));
        }
        double z;
        if (n <= 11) {
            double gamma = poly(n, -2.273, 0.459);
            double mu = poly(n, 0.5440, -0.39978, 0.025054, -6.714e-4);
            double sigma = Math.exp(poly(n, 1.3822, -0.77857, 0.062767, -0.0020322));
            double y = Math.log(1 - w);
            if (y >= gamma) {
                return 0; // W far in the lower tail: beyond the transform's domain
            }
            z = (-Math.log(gamma - y) - mu) / sigma;
        } else {
            double ln = Math.log(n);
            double mu = poly(ln, -1.5861, -0.31082, -0.083751, 0.0038915);
            double sigma = Math.exp(poly(ln, -0.4803, -0.082676, 0.0030302));
            z = (Math.log(1 - w) - mu) / sigma;
        }
        return STD.cumulativeProbability(-z);
    }

    private static double poly(double x, double... c) {
        double r = 0;
        for (int i = c.length - 1; i >= 0; i--) {
            r = r * x + c[i];
        }
        return r;
    }
}
