package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * JMLE maximises the same likelihood as a fixed-effects model (METHODS.md), so with sum-to-zero
 * contrasts the centred measures must agree with a general-purpose fit. Reference values: R 4.2.2
 * glm (binomial) and VGAM 1.1.7 vglm(acat(parallel = TRUE)) run by
 * src/test/resources/mfrm/reference/reference.R (and reference-pcm.R for partial credit) on the
 * simulated data sets committed beside them.
 */
class EquivalenceTest {
    /** The acceptance limit for centred measures, logits. */
    private static final double LIMIT = 0.005;

    @Test
    void analyse_dichotomousData_matchesBinomialGlm() throws Exception {
        RatingData data = ReferenceFits.data("dichotomous");
        MfrmResult r = ManyFacetRasch.analyse(data, MfrmOptions.builder(List.of("item", "rater")).build());
        Map<String, Map<String, Double>> ref = ReferenceFits.measures("dichotomous-glm.csv");
        assertTrue(r.convergence().converged(), r.convergence().toString());
        double worst = compare(r, ref, List.of("candidate", "item", "rater"));
        assertTrue(worst < LIMIT, "largest difference " + worst);
    }

    @Test
    void analyse_ratingScaleData_matchesVgamAdjacentCategoryLogit() throws Exception {
        for (String name : List.of("ratingscale-2000", "ratingscale-6000")) {
            RatingData data = ReferenceFits.data(name);
            MfrmResult r = ManyFacetRasch.analyse(data, MfrmOptions.builder(List.of("task", "rater")).build());
            Map<String, Map<String, Double>> ref = ReferenceFits.measures(name + "-vgam.csv");
            assertTrue(r.convergence().converged(), r.convergence().toString());
            double worst = compare(r, ref, List.of("candidate", "task", "rater"));
            List<MfrmResult.Category> cats = r.scales().get(0).categories();
            for (int k = 1; k < cats.size(); k++) {
                double d = Math.abs(cats.get(k).threshold() - ref.get("threshold").get("F" + k));
                worst = Math.max(worst, d);
            }
            assertEquals(4, ref.get("threshold").size());
            assertEquals(List.of(), r.warnings(), "a fully crossed design gives no warnings");
            assertTrue(worst < LIMIT, name + ": largest difference " + worst);
        }
    }

    @Test
    void analyse_ratingScaleData_jointSesMatchVgamCovariance() throws Exception {
        // reference-se.R: SEs of the centred task and rater measures and thresholds from vcov() of
        // the same VGAM fit. The joint information with candidates absorbed is the same matrix
        // (its pseudo-inverse gives the covariance of the centred measures), so the SEs agree.
        MfrmResult r = ManyFacetRasch.analyse(ReferenceFits.data("ratingscale-2000"),
                MfrmOptions.builder(List.of("task", "rater")).build());
        Map<String, Map<String, Double>> ref = ReferenceFits.measures("ratingscale-2000-vgam-se.csv");
        for (String facet : List.of("task", "rater")) {
            for (MfrmResult.Element e : r.facet(facet).elements()) {
                assertEquals(ref.get(facet).get(e.label()), e.jointSe(), 1e-6, facet + " " + e.label());
            }
        }
        List<MfrmResult.Category> cats = r.scales().get(0).categories();
        for (int k = 1; k < cats.size(); k++) {
            assertEquals(ref.get("threshold").get("F" + k), cats.get(k).thresholdJointSe(), 1e-6, "F" + k);
        }
    }

    @Test
    void analyse_partialCreditByTask_matchesVgamWithTaskSpecificThresholds() throws Exception {
        // reference-pcm.R: acat(parallel = TRUE ~ candidate + rater - 1), i.e. intercepts and task
        // terms differ by category step: one threshold set per task
        RatingData data = ReferenceFits.data("ratingscale-2000");
        MfrmResult r = ManyFacetRasch.analyse(data, MfrmOptions.builder(List.of("task", "rater"))
                .structure(new ScaleStructure.PartialCredit("task")).build());
        Map<String, Map<String, Double>> ref = ReferenceFits.measures("ratingscale-2000-pcm-vgam.csv");
        assertTrue(r.convergence().converged(), r.convergence().toString());
        double worst = compare(r, ref, List.of("candidate", "task", "rater"));
        assertEquals(4, r.scales().size());
        for (MfrmResult.Scale s : r.scales()) {
            for (int k = 1; k < s.categories().size(); k++) {
                double d = Math.abs(s.categories().get(k).threshold() - ref.get("threshold").get(s.label() + ":F" + k));
                worst = Math.max(worst, d);
            }
        }
        assertTrue(worst < LIMIT, "largest difference " + worst);
    }

    private static double compare(MfrmResult r, Map<String, Map<String, Double>> ref, List<String> facets) {
        return ReferenceFits.compare(r, ref, facets);
    }
}
