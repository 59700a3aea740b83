package org.inkgate.analysis.mfrm;

import java.util.Objects;

/**
 * Two columns whose combinations get a bias/interaction term, e.g. rater x task or
 * condition x level. Either may be a modelled facet, {@code candidate}, or a grouping column
 * that is not modelled (such as {@code level}).
 */
public record FacetPair(String first, String second) {
    public FacetPair {
        Objects.requireNonNull(first, "first");
        Objects.requireNonNull(second, "second");
        if (first.equals(second)) {
            throw new IllegalArgumentException("a bias pair needs two different columns, got " + first + " twice");
        }
    }

    /** "first x second", the label used in results. */
    public String label() {
        return first + " x " + second;
    }
}
