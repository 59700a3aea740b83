package org.inkgate.analysis.mfrm;

import java.util.Objects;

/** How thresholds are shared: one set for all ratings, or one set per element of a facet. */
public sealed interface ScaleStructure {

    /** Rating-scale structure (Andrich 1978): every rating shares one set of thresholds. */
    record RatingScale() implements ScaleStructure {
    }

    /** Partial-credit structure (Masters 1982): thresholds per element of the named facet. */
    record PartialCredit(String facet) implements ScaleStructure {
        public PartialCredit {
            Objects.requireNonNull(facet, "facet");
        }
    }
}
