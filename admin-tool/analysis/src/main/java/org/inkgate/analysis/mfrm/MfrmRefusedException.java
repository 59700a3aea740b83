package org.inkgate.analysis.mfrm;

import java.util.List;

/**
 * The data cannot support the requested model (disconnected subsets, confounded facets, a single
 * category...). Nothing is estimated; {@link #reasons()} says what is wrong and how to fix it.
 */
public final class MfrmRefusedException extends RuntimeException {
    private final List<String> reasons;

    public MfrmRefusedException(List<String> reasons) {
        super("many-facet Rasch analysis refused: " + String.join("; ", reasons));
        this.reasons = List.copyOf(reasons);
    }

    /** One sentence per problem found. */
    public List<String> reasons() {
        return reasons;
    }
}
