package org.inkgate.analysis.mfrm;

/** For the chart tests in a sub-package: the simulated designs of {@link RecoveryTest}. */
public final class RecoveryTestAccess {

    private RecoveryTestAccess() {
    }

    /** The crossed design's rating data (simulated, invented). */
    public static RatingData crossed(long seed) {
        return RecoveryTest.crossed(seed).data;
    }
}
