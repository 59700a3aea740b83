package org.inkgate.analysis.mfrm.bias;

import java.util.List;

/**
 * All combinations of a bias pair, with the summary chi-square that every size is zero
 * (sum of t^2 over non-extreme cells with at least two ratings, df = their number).
 *
 * @param estimation how the sizes were estimated
 * @param notEstimable combinations whose joint size could not be estimated (confounded with a main
 *                     effect, or the refit did not converge): size, SE, t and p are NaN
 */
public record BiasPair(String first, String second, List<BiasCell> cells, double chiSquare, int df,
                       double p, int significantCells, BiasEstimation estimation, int notEstimable) {
}
