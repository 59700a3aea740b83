package org.inkgate.analysis.planning;

/**
 * Every candidate writes under both conditions; the paired t test on the n differences.
 *
 * <p>With the standardized mean difference of the differences d_z, T has n - 1 degrees of freedom
 * and noncentrality d_z sqrt(n) (Cohen 1988, ch. 2; the same model as R's
 * {@code power.t.test(type = "paired")}). Two-sided power counts both rejection regions,
 * P(T &gt; t_c) + P(T &lt; -t_c) with t_c = qt(1 - alpha/2, n - 1) (R's {@code strict = TRUE}).
 *
 * @param effectOfDifferences d_z: mean difference over the standard deviation of the differences (see {@link Effects#ofDifferences})
 */
public record PairedDesign(double effectOfDifferences, double alpha, Sides sides) implements PowerDesign {

    public PairedDesign {
        Checks.finite("the effect", effectOfDifferences);
        Checks.alpha(alpha);
    }

    @Override
    public double power(int pairs) {
        if (pairs < fewestCandidates()) {
            throw new IllegalArgumentException("a paired t test needs at least 2 candidates: " + pairs);
        }
        return TPower.of(effectOfDifferences * Math.sqrt(pairs), pairs - 1, alpha, sides);
    }

    @Override
    public int fewestCandidates() {
        return 2;
    }
}
