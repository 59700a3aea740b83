package org.inkgate.analysis.comparison;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.inkgate.analysis.distributions.Tails;

/**
 * Analysis of covariance for two independent groups: score = intercept + group + adjustment, the
 * adjustment being a numeric covariate (a pre-test, or a numeric level) with one common slope, or a
 * categorical level as a factor (treatment-coded). The group effect is tested by the extra sum of
 * squares of adding group to the adjustment-only model (F with 1 and n - rank df; with one covariate
 * and no interaction this is the Type II and Type III test alike), and the adjusted difference is the
 * group coefficient with its t-based CI. The homogeneity-of-slopes check adds the group x adjustment
 * interaction and tests its extra sum of squares (for a factor: whether the group difference is the
 * same at every level). Least squares by singular value decomposition, so empty level x group cells
 * (a rank-deficient interaction) lose degrees of freedom instead of failing (Maxwell &amp; Delaney 2004,
 * ch. 9; the same models as R's {@code lm} and {@code anova}).
 *
 * @param adjustedDifference the second group minus the first, adjusted
 */
public record Ancova(int n, boolean factor, double adjustedDifference, double differenceLower,
        double differenceUpper, double f, double df1, double df2, double p, double partialEtaSquared,
        double slope, double slopesF, double slopesDf1, double slopesDf2, double slopesP, List<String> cautions) {

    public Ancova {
        cautions = List.copyOf(cautions);
    }

    /** Numeric covariate; inSecond[i] says candidate i belongs to the second group. */
    public static Ancova numeric(double[] y, boolean[] inSecond, double[] covariate, double confidence) {
        int n = y.length;
        double[][] base = new double[n][], full = new double[n][], slopes = new double[n][];
        for (int i = 0; i < n; i++) {
            double gi = inSecond[i] ? 1 : 0;
            base[i] = new double[] {1, covariate[i]};
            full[i] = new double[] {1, covariate[i], gi};
            slopes[i] = new double[] {1, covariate[i], gi, gi * covariate[i]};
        }
        return fit(y, base, full, slopes, 2, false, confidence);
    }

    /** Categorical adjustment (e.g. level) as a factor; inSecond[i] says candidate i belongs to the second group. */
    public static Ancova factor(double[] y, boolean[] inSecond, String[] level, double confidence) {
        Map<String, Integer> codes = new LinkedHashMap<>();
        for (String l : level) {
            codes.putIfAbsent(l, codes.size());
        }
        int m = codes.size(), n = y.length;
        double[][] base = new double[n][m], full = new double[n][m + 1], slopes = new double[n][2 * m];
        for (int i = 0; i < n; i++) {
            int c = codes.get(level[i]);
            double gi = inSecond[i] ? 1 : 0;
            base[i][0] = full[i][0] = slopes[i][0] = 1;
            if (c > 0) {
                base[i][c] = full[i][c] = slopes[i][c] = 1;
            }
            full[i][m] = slopes[i][m] = gi;
            if (c > 0) {
                slopes[i][m + c] = gi;
            }
        }
        return fit(y, base, full, slopes, m, true, confidence);
    }

    private record Fit(double rss, int rank, RealVector beta, RealMatrix covarianceUnscaled) {

        static Fit of(double[] y, double[][] x) {
            RealMatrix xm = new Array2DRowRealMatrix(x, false);
            SingularValueDecomposition svd = new SingularValueDecomposition(xm);
            RealVector yv = new ArrayRealVector(y, false);
            RealVector beta = svd.getSolver().solve(yv);
            RealVector resid = yv.subtract(xm.operate(beta));
            double tol = svd.getSingularValues()[0] * 1e-10;
            return new Fit(resid.dotProduct(resid), svd.getRank(), beta, svd.getCovariance(tol));
        }
    }

    private static Ancova fit(double[] y, double[][] base, double[][] full, double[][] slopes, int groupColumn,
            boolean factor, double confidence) {
        List<String> cautions = new ArrayList<>();
        int n = y.length;
        Fit b = Fit.of(y, base), f = Fit.of(y, full), s = Fit.of(y, slopes);
        double df2 = n - f.rank();
        if (f.rank() != b.rank() + 1 || df2 < 1) {
            cautions.add("the groups cannot be separated from the adjustment (each level or covariate value in one"
                    + " group only, or too few candidates): no adjusted comparison");
            return new Ancova(n, factor, Double.NaN, Double.NaN, Double.NaN, Double.NaN, 1, df2, Double.NaN,
                    Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, cautions);
        }
        double ssGroup = b.rss() - f.rss();
        double mse = f.rss() / df2;
        double fStat = ssGroup / mse;
        double coef = f.beta().getEntry(groupColumn);
        double se = Math.sqrt(mse * f.covarianceUnscaled().getEntry(groupColumn, groupColumn));
        double crit = new TDistribution(null, df2).inverseCumulativeProbability(1 - (1 - confidence) / 2);
        double slope = factor ? Double.NaN : f.beta().getEntry(1);
        double sDf1 = s.rank() - f.rank(), sDf2 = n - s.rank();
        double sF = Double.NaN, sP = Double.NaN;
        if (sDf1 >= 1 && sDf2 >= 1) {
            sF = ((f.rss() - s.rss()) / sDf1) / (s.rss() / sDf2);
            sP = Tails.fUpper(sF, sDf1, sDf2);
        } else {
            cautions.add("the homogeneity-of-slopes check has no degrees of freedom left: not tested");
        }
        return new Ancova(n, factor, coef, coef - crit * se, coef + crit * se, fStat, 1, df2,
                Tails.fUpper(fStat, 1, df2), ssGroup / (ssGroup + f.rss()), slope, sF, sDf1, sDf2, sP, cautions);
    }
}
