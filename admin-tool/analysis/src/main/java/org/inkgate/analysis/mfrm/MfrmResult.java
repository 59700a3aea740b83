package org.inkgate.analysis.mfrm;

import java.util.List;
import java.util.Map;
import org.inkgate.analysis.mfrm.bias.BiasPair;
import org.inkgate.analysis.mfrm.fit.Separation;

/**
 * Everything a many-facet Rasch analysis produced. Measures are in logits: candidates positive =
 * more able; every other facet positive = harder / more severe (it lowers expected scores).
 * {@link #summary()} gives the same content as nested maps with stable keys (docs/analysis.md).
 */
public record MfrmResult(Model model, Convergence convergence, List<Facet> facets, List<Scale> scales,
                         List<Unexpected> unexpected, List<BiasPair> bias, List<String> warnings) {

    /** What was modelled and on which ratings. */
    public record Model(List<String> facets, String structure, int ratings, int ratingsEstimated,
                        boolean lengthCorrection, double lengthCorrectionFactor, List<String> notes) {
    }

    /** How estimation ended (criteria: both limits must be met). */
    public record Convergence(boolean converged, int iterations, int maxIterations, double maxScoreResidual,
                              double maxLogitChange, double residualLimit, double changeLimit) {
    }

    /** How an element's measure was obtained. */
    public enum Status {
        /** Estimated with the other non-extreme elements. */
        ESTIMATED,
        /** Fixed by the user. */
        ANCHORED,
        /** Every rating at the bottom: set aside, then estimated at score + 0.5. */
        EXTREME_MINIMUM,
        /** Every rating at the top: set aside, then estimated at score - 0.5. */
        EXTREME_MAXIMUM,
        /** Every rating was with an extreme element: set aside with them, then estimated from its ratings. */
        ONLY_WITH_EXTREMES
    }

    /**
     * One element of a facet. Fit values are NaN for extreme elements. {@code se} is the model SE
     * (own information, other measures treated as known); {@code jointSe} (non-candidate facets)
     * also carries the uncertainty of the candidates and other facets it is linked through.
     * {@code displacement} (anchored elements only, else NaN): the logit change of the measure the
     * data ask for, one Newton step from the anchor, in the measure's own orientation.
     * {@code adjustedScore}: the model-expected raw score of one rating with every other facet at its
     * mean; {@code adjustedLow}/{@code adjustedHigh}: the same at measure -+ 1.96 SE (the joint SE
     * where there is one), i.e. a 95% band, ordered low to high.
     */
    public record Element(String label, Status status, double measure, double se, double jointSe, int count,
                          double observedScore, double expectedScore, double observedAverage,
                          double infit, double infitZ, double outfit, double outfitZ, double pointMeasure,
                          double displacement, double adjustedScore, double adjustedLow, double adjustedHigh) {
    }

    /**
     * One facet: its elements and their spread, from the model SEs and (non-candidate facets; null
     * for candidates) from the joint SEs, which is the honest one in sparse designs.
     */
    public record Facet(String name, List<Element> elements, Separation separation, Separation separationJointSe) {
    }

    /**
     * One category of a threshold set. Threshold fields are NaN for the lowest category;
     * {@code thresholdJointSe} is NaN when the facet-by-facet path was used or the set is anchored.
     */
    public record Category(int score, int count, double percent, double averageMeasure,
                           double expectedAverageMeasure, double outfit, double threshold, double thresholdSe,
                           double thresholdJointSe) {
    }

    /** A threshold set: the shared scale, or one partial-credit element's scale. */
    public record Scale(String label, List<Category> categories, List<String> notes) {
    }

    /** A rating far from its expectation (|standardised residual| at or above the limit). */
    public record Unexpected(int row, Map<String, String> elements, int score, double expected,
                             double residual, double z) {
    }

    /** The facet of that name. */
    public Facet facet(String name) {
        return facets.stream().filter(f -> f.name().equals(name)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no facet '" + name + "'"));
    }

    /** Stable nested maps for summary.json (keys documented in docs/analysis.md). */
    public Map<String, Object> summary() {
        return MfrmSummary.of(this);
    }
}
