package org.inkgate.analysis.groups;

/**
 * The condition x level interaction of a split-plot design with two within-candidate conditions
 * and proficiency level between candidates.
 *
 * <p>With two conditions the interaction F of the mixed ANOVA equals the one-way ANOVA F of the
 * per-candidate differences (condition B minus A) across levels, for equal or unequal group
 * sizes (e.g. Maxwell &amp; Delaney 2004, ch. 12), and the condition main effect is the test
 * that the grand mean difference is zero. Only candidates with a score under both conditions
 * enter.
 */
public final class ConditionByLevel {

    private ConditionByLevel() {
    }

    /** The interaction test: levels' difference scores (B - A) as groups. */
    public static OneWayAnova interaction(Groups differencesByLevel) {
        return OneWayAnova.of(differencesByLevel);
    }
}
