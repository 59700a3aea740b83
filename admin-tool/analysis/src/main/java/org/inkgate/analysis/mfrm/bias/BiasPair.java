package org.inkgate.analysis.mfrm.bias;

import java.util.List;

/**
 * All combinations of a bias pair, with the summary chi-square that every size is zero
 * (sum of t^2 over non-extreme cells with at least two ratings, df = their number).
 */
public record BiasPair(String first, String second, List<BiasCell> cells, double chiSquare, int df,
                       double p, int significantCells) {
}
