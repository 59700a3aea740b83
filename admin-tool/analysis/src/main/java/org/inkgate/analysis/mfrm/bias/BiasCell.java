package org.inkgate.analysis.mfrm.bias;

/**
 * One combination of a bias pair. Positive size = ratings in this combination score higher than
 * the main-effects model expects (e.g. a rater more lenient on this task than overall).
 *
 * @param observedMinusExpectedAverage (observed - expected raw score) per rating, at size 0
 * @param extreme all ratings at the bottom or top: size estimated at the score moved 0.5 inwards
 */
public record BiasCell(String first, String second, int count, double observedScore, double expectedScore,
                       double observedMinusExpectedAverage, double size, double se, double t, int df,
                       double p, boolean extreme) {
}
