package org.inkgate.analysis.planning;

/**
 * Parallel groups: each candidate writes under one condition; Student's t test of the two means.
 *
 * <p>With groups of n1 and n2 and the standardized difference d (pooled within-group standard
 * deviation), T has n1 + n2 - 2 degrees of freedom and noncentrality d / sqrt(1/n1 + 1/n2)
 * (Cohen 1988, ch. 2; R's {@code power.t.test} for n1 = n2). The allocation ratio is n2 / n1; the
 * second group is ratio x n1 rounded up, so it never falls short of the ratio. Planning for
 * Student's test is common practice also when Welch's test will be run: with equal variances
 * their power is nearly the same.
 *
 * @param ratio n2 / n1: 1 for equal groups, 2 for twice as many in the second group
 */
public record TwoGroupsDesign(double effect, double alpha, Sides sides, double ratio) implements PowerDesign {

    public TwoGroupsDesign {
        Checks.finite("the effect", effect);
        Checks.alpha(alpha);
        Checks.positive("the allocation ratio (second group / first group)", ratio);
    }

    /** The second group's size when the first has n1 candidates. */
    public int secondGroup(int n1) {
        // the 1e-9 keeps a ratio like 1.5 x 4 = 6.000000000000001 from rounding up to 7
        return Math.max(1, (int) Math.ceil(ratio * n1 - 1e-9));
    }

    @Override
    public double power(int n1) {
        int n2 = secondGroup(n1);
        if (n1 < 1 || n1 + n2 < 3) {
            throw new IllegalArgumentException("two groups need at least 3 candidates in all: " + n1 + " + " + n2);
        }
        return TPower.of(effect / Math.sqrt(1.0 / n1 + 1.0 / n2), n1 + n2 - 2, alpha, sides);
    }

    @Override
    public int fewestCandidates() {
        for (int n1 = 1; ; n1++) {
            if (n1 + secondGroup(n1) >= 3) {
                return n1;
            }
        }
    }
}
