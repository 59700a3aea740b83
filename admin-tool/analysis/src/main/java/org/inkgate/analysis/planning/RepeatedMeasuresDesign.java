package org.inkgate.analysis.planning;

import org.inkgate.analysis.distributions.NoncentralF;

/**
 * Every candidate writes under each of k conditions; the one-way repeated-measures ANOVA F test.
 *
 * <p>Model: a candidate's k scores have equal variances sigma^2 and equal correlations rho
 * (compound symmetry); the condition means have standard deviation sigma_m (divisor k), and
 * Cohen's f = sigma_m / sigma. The condition effect's error is the candidate x condition residual,
 * whose variance is sigma^2 (1 - rho), so F is noncentral F with k - 1 and (n - 1)(k - 1) degrees
 * of freedom and noncentrality lambda = n k f^2 / (1 - rho). When sphericity is not assumed, the
 * Greenhouse-Geisser epsilon multiplies both degrees of freedom and lambda. This is the
 * computation Faul, Erdfelder, Lang &amp; Buchner (2007, Behavior Research Methods 39, 175-191)
 * describe for a repeated-measures within-candidate factor, lambda = f^2 u n epsilon with
 * u = k / (1 - rho) (from memory), and follows from the model above for epsilon = 1; the
 * epsilon scaling is an approximation (Muller &amp; Barton 1989, JASA 84, 549-555, from memory).
 */
public record RepeatedMeasuresDesign(int conditions, double effectF, double correlation, double epsilon, double alpha)
        implements PowerDesign {

    public RepeatedMeasuresDesign {
        if (conditions < 2) {
            throw new IllegalArgumentException("a repeated-measures design needs 2 or more conditions: " + conditions);
        }
        Checks.finite("the effect f", effectF);
        if (effectF < 0) {
            throw new IllegalArgumentException("Cohen's f is a standard deviation ratio, 0 or more: " + effectF);
        }
        Checks.correlation(correlation);
        double lowest = 1.0 / (conditions - 1);
        if (!(epsilon >= lowest - 1e-12 && epsilon <= 1)) {
            throw new IllegalArgumentException("the sphericity epsilon for " + conditions + " conditions lies between 1/"
                    + (conditions - 1) + " and 1 (1 when sphericity holds): " + epsilon);
        }
        Checks.alpha(alpha);
    }

    /** Degrees of freedom and noncentrality of the test with n candidates. */
    public record FTestParameters(double numeratorDf, double denominatorDf, double noncentrality, double criticalF) {
    }

    public FTestParameters test(int candidates) {
        if (candidates < fewestCandidates()) {
            throw new IllegalArgumentException("a repeated-measures ANOVA needs at least 2 candidates: " + candidates);
        }
        double d1 = (conditions - 1) * epsilon;
        double d2 = (candidates - 1) * (conditions - 1) * epsilon;
        double lambda = candidates * conditions * effectF * effectF / (1 - correlation) * epsilon;
        return new FTestParameters(d1, d2, lambda, CriticalValues.f(1 - alpha, d1, d2));
    }

    @Override
    public double power(int candidates) {
        FTestParameters t = test(candidates);
        return NoncentralF.upper(t.criticalF(), t.numeratorDf(), t.denominatorDf(), t.noncentrality());
    }

    @Override
    public int fewestCandidates() {
        return 2;
    }
}
