package org.inkgate.analysis.planning;

/**
 * A planned test whose power grows with the number of candidates. What "candidates" counts is the
 * design's own: pairs for the paired design, the first group's size for two groups, candidates
 * (each under every condition) for repeated measures.
 */
public interface PowerDesign {

    /** The power of the test with this many candidates. */
    double power(int candidates);

    /** The fewest candidates for which the test exists (its error degrees of freedom above 0). */
    int fewestCandidates();
}
