package org.inkgate.analysis.planning;

/** The fewest candidates that give a design the power wanted. */
public final class SampleSize {

    /** Beyond this the command says the effect is too small to plan for, rather than searching on. */
    public static final int MOST_CANDIDATES = 10_000_000;

    private SampleSize() {
    }

    /**
     * The smallest n with power(n) &gt;= target, by doubling then bisection (power grows with n in
     * all three designs: the noncentrality grows and the critical value falls).
     *
     * @throws IllegalArgumentException when even {@link #MOST_CANDIDATES} do not reach it
     */
    public static int smallest(PowerDesign design, double target) {
        Checks.power(target);
        int lo = design.fewestCandidates();
        if (design.power(lo) >= target) {
            return lo;
        }
        int hi = lo;
        while (design.power(hi) < target) {
            if (hi >= MOST_CANDIDATES) {
                throw new IllegalArgumentException("even " + MOST_CANDIDATES + " candidates do not give power " + target
                        + ": the effect is too small (or zero) to plan a study for");
            }
            lo = hi;
            hi = (int) Math.min((long) hi * 2, MOST_CANDIDATES);
        }
        // power(lo) < target <= power(hi)
        while (hi - lo > 1) {
            int mid = lo + (hi - lo) / 2;
            if (design.power(mid) >= target) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return hi;
    }
}
