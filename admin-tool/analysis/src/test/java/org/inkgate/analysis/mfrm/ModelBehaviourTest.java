package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** Extreme scores, unobserved categories, anchoring, iteration cap, partial credit, length correction. */
class ModelBehaviourTest {

    private static RatingData withExtremeCandidate() {
        RatingData base = RecoveryTest.crossed(21).data;
        RatingData.Builder b = RatingData.builder(base.columns());
        int[] cand = base.codesView(-1);
        String[] cl = base.labels(-1);
        for (int n = 0; n < base.size(); n++) {
            String[] v = new String[base.columns().size()];
            for (int i = 0; i < v.length; i++) {
                v[i] = base.labels(i)[base.codesView(i)[n]];
            }
            b.add(cl[cand[n]], v, base.scoresView()[n]);
        }
        for (String t : List.of("task1", "task2")) {
            for (String r : List.of("rater1", "rater2")) {
                b.add("top", new String[] {t, r, "criterion1"}, 4);
            }
        }
        return b.build();
    }

    @Test
    void analyse_candidateWithAllTopScores_isSetAsideThenEstimatedAboveOthers() {
        MfrmResult r = ManyFacetRasch.analyse(withExtremeCandidate(),
                MfrmOptions.builder(List.of("task", "rater", "criterion")).build());
        MfrmResult.Element top = r.facet("candidate").elements().stream().filter(e -> e.label().equals("top"))
                .findFirst().orElseThrow();
        assertEquals(MfrmResult.Status.EXTREME_MAXIMUM, top.status());
        assertTrue(Double.isNaN(top.infit()));
        double maxOther = r.facet("candidate").elements().stream().filter(e -> !e.label().equals("top"))
                .mapToDouble(MfrmResult.Element::measure).max().orElseThrow();
        assertTrue(top.measure() > maxOther - 1, "extreme " + top.measure() + " vs best " + maxOther);
        assertTrue(Double.isFinite(top.measure()) && top.se() > 0);
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("extreme scores")));
        assertEquals(r.model().ratings() - 4, r.model().ratingsEstimated());
        // issue 18: reported with its real ratings (the four added above, each 4), not 0 and none;
        // its measure puts the expected score 0.5 below the maximum 16 (the convention in docs/analysis.md)
        assertEquals(4, top.count());
        assertEquals(16, top.observedScore(), 1e-12);
        assertEquals(4, top.observedAverage(), 1e-12);
        assertEquals(15.5, top.expectedScore(), 1e-3);
    }

    @Test
    void analyse_raterWhoRatedOnlyAnExtremeCandidate_isEstimatedAfterwardsAndFlagged() {
        RatingData base = withExtremeCandidate();
        RatingData.Builder b = RatingData.builder(base.columns());
        for (int n = 0; n < base.size(); n++) {
            String[] v = new String[base.columns().size()];
            for (int i = 0; i < v.length; i++) {
                v[i] = base.labels(i)[base.codesView(i)[n]];
            }
            b.add(base.labels(-1)[base.codesView(-1)[n]], v, base.scoresView()[n]);
        }
        b.add("top", new String[] {"task1", "rater13", "criterion2"}, 4);
        MfrmResult r = ManyFacetRasch.analyse(b.build(), MfrmOptions.builder(List.of("task", "rater", "criterion")).build());
        MfrmResult.Element lone = r.facet("rater").elements().stream().filter(e -> e.label().equals("rater13"))
                .findFirst().orElseThrow();
        assertEquals(MfrmResult.Status.ONLY_WITH_EXTREMES, lone.status());
        assertEquals(1, lone.count(), "its one rating, of the extreme candidate");
        assertEquals(4, lone.observedScore(), 1e-12);
        assertTrue(Double.isFinite(lone.measure()));
        assertEquals(12, r.facet("rater").separation().count(), "left out of the rater summary");
    }

    @Test
    void analyse_unobservedMiddleScore_isRenumberedAndReported() {
        RatingData.Builder b = RatingData.builder(List.of("rater"));
        java.util.Random rng = new java.util.Random(3);
        int[] scores = {0, 1, 3, 4};
        for (int c = 0; c < 60; c++) {
            for (int r = 0; r < 4; r++) {
                b.add("c" + c, new String[] {"r" + r}, scores[rng.nextInt(4)]);
            }
        }
        MfrmResult res = ManyFacetRasch.analyse(b.build(), MfrmOptions.builder(List.of("rater")).build());
        assertTrue(res.model().notes().get(0).contains("[2] never observed"), res.model().notes().toString());
        assertEquals(List.of(0, 1, 3, 4), res.scales().get(0).categories().stream().map(MfrmResult.Category::score).toList());
    }

    @Test
    void analyse_thresholdsAndRaterAnchoredAtEstimates_reproducesTheFreeFit() {
        RatingData d = RecoveryTest.crossed(31).data;
        List<String> facets = List.of("task", "rater", "criterion");
        MfrmResult free = ManyFacetRasch.analyse(d, MfrmOptions.builder(facets).convergence(1e-7, 1e-5).build());
        double[] thr = free.scales().get(0).categories().stream().skip(1).mapToDouble(MfrmResult.Category::threshold)
                .toArray();
        MfrmOptions.Builder o = MfrmOptions.builder(facets).convergence(1e-7, 1e-5)
                .anchorThresholds(MfrmOptions.SHARED_SCALE, thr);
        for (MfrmResult.Element e : free.facet("rater").elements()) {
            o.anchor("rater", e.label(), e.measure());
        }
        MfrmResult anchored = ManyFacetRasch.analyse(d, o.build());
        for (String f : List.of("candidate", "task", "criterion")) {
            List<MfrmResult.Element> a = anchored.facet(f).elements();
            List<MfrmResult.Element> b = free.facet(f).elements();
            for (int i = 0; i < a.size(); i++) {
                assertEquals(b.get(i).measure(), a.get(i).measure(), 1e-4, f + " " + a.get(i).label());
            }
        }
        assertEquals(MfrmResult.Status.ANCHORED, anchored.facet("rater").elements().get(0).status());
    }

    @Test
    void analyse_candidateAnchoredAtItsEstimate_facetByFacetPathReproducesJointNewton() {
        // an anchored candidate switches the estimator to facet-by-facet steps (JmleEstimator)
        RatingData d = RecoveryTest.chain(32).data;
        List<String> facets = List.of("task", "rater", "criterion");
        MfrmResult free = ManyFacetRasch.analyse(d, MfrmOptions.builder(facets).convergence(1e-7, 1e-5).build());
        MfrmResult.Element first = free.facet("candidate").elements().get(0);
        MfrmOptions.Builder o = MfrmOptions.builder(facets).convergence(1e-7, 1e-5).maxIterations(5000);
        for (MfrmResult.Element e : free.facet("task").elements()) {
            o.anchor("task", e.label(), e.measure());
        }
        o.anchor("candidate", first.label(), first.measure());
        MfrmResult anchored = ManyFacetRasch.analyse(d, o.build());
        assertTrue(anchored.convergence().converged(), anchored.convergence().toString());
        assertTrue(anchored.convergence().iterations() > 10, "facet-by-facet path takes more iterations");
        for (String f : List.of("candidate", "rater", "criterion")) {
            List<MfrmResult.Element> a = anchored.facet(f).elements();
            List<MfrmResult.Element> b = free.facet(f).elements();
            for (int i = 0; i < a.size(); i++) {
                assertEquals(b.get(i).measure(), a.get(i).measure(), 1e-3, f + " " + a.get(i).label());
            }
        }
    }

    @Test
    void analyse_iterationCapReached_warnsAndReportsNotConverged() {
        MfrmResult r = ManyFacetRasch.analyse(RecoveryTest.crossed(41).data,
                MfrmOptions.builder(List.of("task", "rater", "criterion")).maxIterations(2).build());
        assertFalse(r.convergence().converged());
        assertTrue(r.warnings().get(0).contains("iteration cap (2)"), r.warnings().toString());
        assertEquals(false, ((Map<?, ?>) r.summary().get("convergence")).get("converged"));
    }

    @Test
    void analyse_partialCreditByCriterion_givesOneThresholdSetPerCriterion() {
        MfrmResult r = ManyFacetRasch.analyse(RecoveryTest.crossed(51).data,
                MfrmOptions.builder(List.of("task", "rater", "criterion"))
                        .structure(new ScaleStructure.PartialCredit("criterion")).build());
        assertTrue(r.convergence().converged());
        assertEquals(List.of("criterion1", "criterion2", "criterion3"),
                r.scales().stream().map(MfrmResult.Scale::label).toList());
        for (MfrmResult.Scale s : r.scales()) {
            double sum = s.categories().stream().skip(1).mapToDouble(MfrmResult.Category::threshold).sum();
            assertEquals(0, sum, 1e-9, "thresholds of each set are centred");
        }
    }

    @Test
    void analyse_lengthCorrection_shrinksMeasuresByReportedFactor() {
        RatingData d = RecoveryTest.crossed(61).data;
        List<String> f = List.of("task", "rater", "criterion");
        MfrmResult plain = ManyFacetRasch.analyse(d, MfrmOptions.builder(f).build());
        MfrmResult corrected = ManyFacetRasch.analyse(d, MfrmOptions.builder(f).lengthCorrection(true).build());
        double factor = corrected.model().lengthCorrectionFactor();
        assertEquals(17.0 / 18.0, factor, 1e-12, "L = 18 ratings per candidate");
        assertEquals(plain.facet("rater").elements().get(3).measure() * factor,
                corrected.facet("rater").elements().get(3).measure(), 1e-12);
        assertFalse(plain.model().lengthCorrection());
    }
}
