package org.inkgate.analysis.mfrm.estimation;

import java.util.List;

/**
 * Estimated measures with their model standard errors and the convergence report.
 *
 * @param measure       [facet][element] logits (candidate facet 0 positive = more able; others
 *                      positive = harder / more severe)
 * @param se            [facet][element] model SE = 1/sqrt(information)
 * @param jointSe       [facet][element] SE from the joint information (candidates absorbed), or
 *                      null when the facet-by-facet path was used
 * @param thresholds    [scale][k] Rasch-Andrich thresholds F_k, k = 1..m (index 0 unused, 0)
 * @param thresholdSe   [scale][k] model SE of each threshold (its own information, others fixed)
 * @param thresholdJointSe [scale][k] SE from the joint information, or null as for jointSe
 * @param iterations    Newton-Raphson iterations used
 * @param maxResidual   largest |observed - expected| score of any free element or threshold at the end
 * @param maxChange     largest logit change in the last iteration
 * @param converged     both criteria met before the iteration cap
 */
public record Estimates(double[][] measure, double[][] se, double[][] jointSe, double[][] thresholds, double[][] thresholdSe,
                        double[][] thresholdJointSe, int iterations, double maxResidual, double maxChange, boolean converged,
                        List<String> warnings) {
}
