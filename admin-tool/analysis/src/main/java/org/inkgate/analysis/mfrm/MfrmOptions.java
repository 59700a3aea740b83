package org.inkgate.analysis.mfrm;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.inkgate.analysis.mfrm.bias.BiasEstimation;

/**
 * What to model and how to estimate it. Defaults: rating-scale structure, convergence when the
 * largest logit change is below 0.0001 and the largest score residual below 0.01 score points,
 * at most 1,000 iterations, no (L-1)/L correction, unexpected responses at |z| >= 3 (common
 * practice uses 2 or 3), bias pairs none.
 */
public record MfrmOptions(
        List<String> facets,
        ScaleStructure structure,
        Map<String, Map<String, Double>> elementAnchors,
        Map<String, double[]> thresholdAnchors,
        double maxLogitChange,
        double maxScoreResidual,
        int maxIterations,
        boolean lengthCorrection,
        List<FacetPair> biasPairs,
        BiasEstimation biasEstimation,
        double unexpectedZ,
        int unexpectedLimit,
        int threads) {

    /** Label of the threshold set under the rating-scale structure (for anchoring). */
    public static final String SHARED_SCALE = "all";

    public MfrmOptions {
        facets = List.copyOf(facets);
        Objects.requireNonNull(structure, "structure");
        elementAnchors = Map.copyOf(elementAnchors);
        thresholdAnchors = Map.copyOf(thresholdAnchors);
        biasPairs = List.copyOf(biasPairs);
        Objects.requireNonNull(biasEstimation, "biasEstimation");
        if (facets.isEmpty()) {
            throw new IllegalArgumentException("choose at least one facet besides candidates (e.g. rater)");
        }
        if (facets.contains(RatingData.CANDIDATE)) {
            throw new IllegalArgumentException("'candidate' is always modelled; list only the other facets");
        }
        if (facets.stream().distinct().count() != facets.size()) {
            throw new IllegalArgumentException("facets repeat: " + facets);
        }
        if (!(maxLogitChange > 0) || !(maxScoreResidual > 0)) {
            throw new IllegalArgumentException("convergence limits must be positive");
        }
        if (maxIterations < 1) {
            throw new IllegalArgumentException("maxIterations must be at least 1");
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1");
        }
        if (structure instanceof ScaleStructure.PartialCredit pc && !facets.contains(pc.facet())) {
            throw new IllegalArgumentException("partial credit by '" + pc.facet()
                    + "' needs that column among the modelled facets " + facets);
        }
    }

    /** A builder holding these options, to change some of them. */
    public Builder toBuilder() {
        Builder b = new Builder(facets).structure(structure).convergence(maxLogitChange, maxScoreResidual)
                .maxIterations(maxIterations).lengthCorrection(lengthCorrection).biasEstimation(biasEstimation)
                .unexpected(unexpectedZ, unexpectedLimit).threads(threads);
        elementAnchors.forEach((facet, els) -> els.forEach((e, m) -> b.anchor(facet, e, m)));
        thresholdAnchors.forEach(b::anchorThresholds);
        biasPairs.forEach(p -> b.bias(p.first(), p.second()));
        return b;
    }

    /** Defaults for the given facets. */
    public static Builder builder(List<String> facets) {
        return new Builder(facets);
    }

    /** Builds options step by step. */
    public static final class Builder {
        private final List<String> facets;
        private ScaleStructure structure = new ScaleStructure.RatingScale();
        private final Map<String, Map<String, Double>> elementAnchors = new LinkedHashMap<>();
        private final Map<String, double[]> thresholdAnchors = new LinkedHashMap<>();
        private double maxLogitChange = 1e-4;
        private double maxScoreResidual = 0.01;
        private int maxIterations = 1000;
        private boolean lengthCorrection;
        private final List<FacetPair> biasPairs = new ArrayList<>();
        private BiasEstimation biasEstimation = BiasEstimation.MAIN_EFFECTS_FIXED;
        private double unexpectedZ = 3.0;
        private int unexpectedLimit = 100;
        private int threads = Math.max(1, Math.min(2, Runtime.getRuntime().availableProcessors()));

        private Builder(List<String> facets) {
            this.facets = List.copyOf(facets);
        }

        public Builder structure(ScaleStructure s) { this.structure = s; return this; }

        /** Fixes an element's measure (logits) instead of estimating it; its facet is then not centred. */
        public Builder anchor(String column, String element, double measure) {
            elementAnchors.computeIfAbsent(column, k -> new LinkedHashMap<>()).put(element, measure);
            return this;
        }

        /** Fixes a threshold set: {@link #SHARED_SCALE} or a partial-credit element label; F_1..F_m. */
        public Builder anchorThresholds(String scale, double... thresholds) {
            thresholdAnchors.put(scale, thresholds.clone());
            return this;
        }

        public Builder convergence(double maxChange, double maxResidual) {
            this.maxLogitChange = maxChange;
            this.maxScoreResidual = maxResidual;
            return this;
        }

        public Builder maxIterations(int n) { this.maxIterations = n; return this; }

        /** Applies the (L-1)/L correction of JMLE measures; off by default. */
        public Builder lengthCorrection(boolean on) { this.lengthCorrection = on; return this; }

        public Builder bias(String first, String second) { biasPairs.add(new FacetPair(first, second)); return this; }

        /** How bias sizes are estimated (default: main effects held fixed). */
        public Builder biasEstimation(BiasEstimation e) { this.biasEstimation = e; return this; }

        public Builder unexpected(double minAbsZ, int limit) {
            this.unexpectedZ = minAbsZ;
            this.unexpectedLimit = limit;
            return this;
        }

        public Builder threads(int n) { this.threads = n; return this; }

        public MfrmOptions build() {
            return new MfrmOptions(facets, structure, elementAnchors, thresholdAnchors, maxLogitChange,
                    maxScoreResidual, maxIterations, lengthCorrection, biasPairs, biasEstimation, unexpectedZ, unexpectedLimit, threads);
        }
    }
}
