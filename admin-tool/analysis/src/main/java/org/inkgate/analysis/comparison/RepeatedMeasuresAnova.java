package org.inkgate.analysis.comparison;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.inkgate.analysis.distributions.Tails;

/**
 * One-way repeated-measures ANOVA (k within-candidate conditions, every candidate under each), and
 * the mixed design with one between-candidates factor (e.g. level): the within effect, the
 * between effect and their interaction.
 *
 * <p>Computed on orthonormal contrasts Z = Y C (C: k x (k-1) normalised Helmert contrasts, the
 * multivariate formulation; O'Brien &amp; Kaiser 1985): SS(condition) = n |mean z|^2, SS(interaction) =
 * sum_g n_g |mean z_g - mean z|^2, error SSP E = sum_i (z_i - mean z_g(i))(...)' with df n - G.
 * This equals the univariate split-plot ANOVA (and R's {@code aov} with an Error stratum) with the
 * within effect entered first. Sphericity: Mauchly's (1940) W = det(E) / (tr(E)/p)^p with Anderson's
 * chi-square approximation and its second-order term, exactly as R's {@code mauchly.test};
 * Greenhouse-Geisser epsilon (sum lambda)^2 / (p sum lambda^2) over the eigenvalues of E, and
 * Huynh-Feldt epsilon ((r+1) p eps_GG - 2) / (p (r - p eps_GG)), r = n - G (Huynh &amp; Feldt 1976 with
 * Lecoutre's 1991 correction, as R's {@code anova.mlm}); the corrected tests use min(1, eps).
 * Partial eta squared = SS(effect) / (SS(effect) + SS(its error)) (Cohen 1973).
 *
 * @param groups number of between-candidates groups (1 = plain repeated measures)
 */
public record RepeatedMeasuresAnova(int n, int conditions, int groups, Effect condition, Effect between,
        Effect interaction, double mauchlyW, double mauchlyChiSquare, double mauchlyDf, double mauchlyP,
        double greenhouseGeisser, double huynhFeldt, List<String> cautions) {

    /** One F test; the corrected p-values are NaN where they do not apply (between effects, two conditions). */
    public record Effect(double ss, double df, double errorSs, double errorDf, double f, double p,
            double pGreenhouseGeisser, double pHuynhFeldt, double partialEtaSquared) {

        static Effect of(double ss, double df, double errorSs, double errorDf, double gg, double hf) {
            double f = (ss / df) / (errorSs / errorDf);
            double p = Tails.fUpper(f, df, errorDf);
            double pGg = Double.isNaN(gg) ? Double.NaN : Tails.fUpper(f, df * gg, errorDf * gg);
            double h = Math.min(1, hf);
            double pHf = Double.isNaN(hf) ? Double.NaN : Tails.fUpper(f, df * h, errorDf * h);
            return new Effect(ss, df, errorSs, errorDf, f, p, pGg, pHf, ss / (ss + errorSs));
        }
    }

    public RepeatedMeasuresAnova {
        cautions = List.copyOf(cautions);
    }

    /** Repeated measures only: y[i][j] is candidate i under condition j. */
    public static RepeatedMeasuresAnova of(double[][] y) {
        return of(y, new int[y.length]);
    }

    /**
     * The mixed design: group[i] in 0..G-1 is candidate i's between-candidates group (all 0: plain
     * repeated measures).
     */
    public static RepeatedMeasuresAnova of(double[][] y, int[] group) {
        int n = y.length;
        int k = n == 0 ? 0 : y[0].length;
        int g = 0;
        for (int x : group) {
            g = Math.max(g, x + 1);
        }
        int[] ng = new int[g];
        for (int x : group) {
            ng[x]++;
        }
        for (int c : ng) {
            if (c == 0) {
                throw new IllegalArgumentException("every group index 0.." + (g - 1) + " needs a candidate");
            }
        }
        if (k < 2 || n - g < 1) {
            throw new IllegalArgumentException("repeated-measures ANOVA needs at least 2 conditions and more"
                    + " candidates than groups (have " + k + " conditions, " + n + " candidates, " + g + " groups)");
        }
        List<String> cautions = new ArrayList<>();
        int p = k - 1;
        double[][] z = new double[n][p];
        double[] rowMean = new double[n];
        for (int i = 0; i < n; i++) {
            z[i] = contrasts(y[i]);
            for (double v : y[i]) {
                rowMean[i] += v / k;
            }
        }
        double[] zMean = new double[p];
        double[][] zGroup = new double[g][p];
        double grand = 0;
        double[] groupMean = new double[g];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < p; j++) {
                zMean[j] += z[i][j] / n;
                zGroup[group[i]][j] += z[i][j] / ng[group[i]];
            }
            grand += rowMean[i] / n;
            groupMean[group[i]] += rowMean[i] / ng[group[i]];
        }
        double ssCondition = 0, ssInteraction = 0;
        for (int j = 0; j < p; j++) {
            ssCondition += n * zMean[j] * zMean[j];
            for (int h = 0; h < g; h++) {
                double d = zGroup[h][j] - zMean[j];
                ssInteraction += ng[h] * d * d;
            }
        }
        double[][] e = new double[p][p];
        double ssSubjects = 0;
        for (int i = 0; i < n; i++) {
            for (int a = 0; a < p; a++) {
                double da = z[i][a] - zGroup[group[i]][a];
                for (int b = 0; b < p; b++) {
                    e[a][b] += da * (z[i][b] - zGroup[group[i]][b]);
                }
            }
            double d = rowMean[i] - groupMean[group[i]];
            ssSubjects += k * d * d;
        }
        double ssBetween = 0;
        for (int h = 0; h < g; h++) {
            double d = groupMean[h] - grand;
            ssBetween += k * ng[h] * d * d;
        }
        int r = n - g;
        double ssError = 0;
        for (int a = 0; a < p; a++) {
            ssError += e[a][a];
        }
        double gg = Double.NaN, hf = Double.NaN, w = Double.NaN, chi = Double.NaN, mDf = Double.NaN,
                mP = Double.NaN;
        if (p >= 2) {
            RealMatrix em = new Array2DRowRealMatrix(e);
            double[] lambda = new EigenDecomposition(em).getRealEigenvalues();
            double s1 = 0, s2 = 0;
            for (double l : lambda) {
                s1 += l;
                s2 += l * l;
            }
            gg = s1 * s1 / s2 / p;
            hf = ((r + 1) * p * gg - 2) / (p * (r - p * gg));
            if (r > p) {
                // Mauchly's test as R's mauchly.test.SSD, including its w2 term (which uses k, not p, in one place)
                double logW = Math.log(new LUDecomposition(em).getDeterminant()) - p * Math.log(s1 / p);
                double rho = 1 - (2.0 * p * p + p + 2) / (6.0 * p * r);
                double w2 = (p + 2.0) * (p - 1) * (p - 2) * (2.0 * p * p * p + 6.0 * p * p + 3.0 * k + 2)
                        / (288 * Math.pow(r * p * rho, 2));
                chi = -r * rho * logW;
                mDf = p * (p + 1) / 2.0 - 1;
                double pr1 = Tails.chiSquareUpper(chi, mDf), pr2 = Tails.chiSquareUpper(chi, mDf + 4);
                w = Math.exp(logW);
                mP = pr1 + w2 * (pr2 - pr1);
            } else {
                cautions.add("Mauchly's test needs more candidates than conditions (per group): not computed");
            }
            if (gg < 1) {
                // R reports the Huynh-Feldt epsilon uncapped; the tests use min(1, epsilon)
                if (hf > 1) {
                    cautions.add("Huynh-Feldt epsilon exceeds 1: its test uses 1");
                }
            }
        }
        Effect condition = Effect.of(ssCondition, p, ssError, (double) p * r, gg, hf);
        Effect between = g > 1 ? Effect.of(ssBetween, g - 1, ssSubjects, r, Double.NaN, Double.NaN) : null;
        Effect interaction = g > 1 ? Effect.of(ssInteraction, (double) p * (g - 1), ssError, (double) p * r, gg, hf)
                : null;
        return new RepeatedMeasuresAnova(n, k, g, condition, between, interaction, w, chi, mDf, mP, gg, hf,
                cautions);
    }

    /** Normalised Helmert contrasts of one candidate's k scores: column j compares the first j with the next. */
    static double[] contrasts(double[] row) {
        int k = row.length;
        double[] out = new double[k - 1];
        double prefix = 0;
        for (int j = 1; j < k; j++) {
            prefix += row[j - 1];
            out[j - 1] = (prefix - j * row[j]) / Math.sqrt(j * (j + 1.0));
        }
        return out;
    }
}
