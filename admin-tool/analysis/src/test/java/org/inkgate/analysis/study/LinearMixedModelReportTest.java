package org.inkgate.analysis.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.inkgate.analysis.comparison.LinearMixedModel;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.report.Report;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.testutil.SimulatedStudy;
import org.junit.jupiter.api.Test;

/**
 * The linear mixed model in the report, through {@link StudyAnalysis#report}: within-candidate designs
 * get it (overall and per criterion, baseline first), parallel designs do not. Data: the seeded,
 * invented three-condition studies of {@link DesignSimulationTest} and the simulated ratings of
 * reference/lmm_simulated_ratings.csv (checked against lme4 in LinearMixedModelReferenceTest).
 */
class LinearMixedModelReportTest {

    private static Section comparison(List<Rating> ratings, String baseline) {
        Report r = StudyAnalysis.report(StudyData.ofRatings(ratings), StudyOptions.DEFAULT.withBaseline(baseline));
        return r.sections().stream().filter(x -> x.id().equals("comparison")).findFirst().orElseThrow();
    }

    private static double d(Map<String, Object> s, String key) {
        Object v = s.get("comparison." + key);
        assertTrue(v instanceof Number, key + " missing: " + s.keySet());
        return ((Number) v).doubleValue();
    }

    @Test
    void threeConditionStudy_reportCarriesTheFitOfEveryRating_asTheModelGivesIt() {
        List<Map<String, String>> rows = SimulatedStudy.rows("lmm_simulated_ratings.csv");
        List<Rating> ratings = rows.stream().map(m -> new Rating(m.get("candidate"), "", "", m.get("task"),
                m.get("condition"), m.get("rater"), "content", Double.parseDouble(m.get("score")))).toList();
        Section s = comparison(ratings, "none");
        Map<String, Object> sum = s.summary();
        assertEquals(true, sum.get("comparison.linear_mixed_model.available"));
        // one criterion, one rating per rater and response: overall equals the criterion and the lme4 fit
        // (lmm_reference.txt simulated_fixed_3, simulated_fit; conditions in the order none, full, spelling:
        // the report puts the baseline first and the others alphabetically)
        assertEquals(0.682735865778751, d(sum, "linear_mixed_model.overall.full_minus_none.estimate"), 1e-4,
                "lme4 conditionfull (lmm_reference.txt)");
        assertEquals(834.547145301536, d(sum, "linear_mixed_model.overall.reml_criterion"), 1e-4 * 834.5,
                "lme4 REML criterion (lmm_reference.txt)");
        assertEquals(0.92958417538852, d(sum, "linear_mixed_model.content.variance_candidate"), 1e-4,
                "lme4 candidate variance (lmm_reference.txt)");
        Table fixed = s.tables().stream().filter(t -> t.id().equals("comparison_linear_mixed_model")).findFirst()
                .orElseThrow();
        assertTrue(fixed.method().contains("Wald"), fixed.method());
        assertTrue(s.paragraphs().stream().anyMatch(p -> p.contains("No p-values")), "plain note on p-values");
        assertTrue(s.tables().stream().anyMatch(t -> t.id().equals("comparison_variance_components")));
    }

    @Test
    void twoCriteria_overallIsEachRatersMeanOfTheResponse() {
        List<Rating> ratings = DesignSimulationTest.threeConditions(31, 1.0);
        Section s = comparison(ratings, "none");
        Map<String, Object> sum = s.summary();
        // 24 candidates x 3 responses x 2 raters; per criterion the same count of single ratings
        assertEquals(144L, ((Number) sum.get("comparison.linear_mixed_model.overall.ratings")).longValue());
        assertEquals(144L, ((Number) sum.get("comparison.linear_mixed_model.content.ratings")).longValue());
        LinearMixedModelSection.Observations o = LinearMixedModelSection.overall(ratings,
                org.inkgate.analysis.scores.ScoreRule.MEAN, List.of("none", "full", "spelling"));
        LinearMixedModel direct = LinearMixedModel.fit(o.score(), o.condition(), List.of("none", "full", "spelling"),
                o.factors(), 0.95);
        assertEquals(direct.effectOf("full").estimate(), d(sum, "linear_mixed_model.overall.full_minus_none.estimate"),
                1e-12);
        assertTrue(d(sum, "linear_mixed_model.overall.full_minus_none.ci_lower") > 0, "planted effect 1.0 found");
    }

    @Test
    void parallelGroups_getNoMixedModel() {
        List<Rating> ratings = DesignSimulationTest.parallel(5, 1.0);
        Map<String, Object> sum = comparison(ratings, "none").summary();
        assertEquals("parallel", sum.get("comparison.design"));
        assertNull(sum.get("comparison.linear_mixed_model.available"));
        assertFalse(sum.keySet().stream().anyMatch(k -> k.contains("linear_mixed_model")));
    }

    @Test
    void aboveTheLimit_onlyTheOverallModelIsFitted_andTheNoteSaysSo() {
        List<Rating> ratings = DesignSimulationTest.threeConditions(32, 0.5);
        Section.Builder b = Section.builder("comparison", "test");
        LinearMixedModelSection.build(b, ratings, StudyOptions.DEFAULT, List.of("none", "full", "spelling"),
                List.of("content", "language"), 100);
        Section s = b.build();
        assertEquals(false, s.summary().get("comparison.linear_mixed_model.per_criterion"));
        assertEquals(true, s.summary().get("comparison.linear_mixed_model.overall.fitted"));
        assertNull(s.summary().get("comparison.linear_mixed_model.content.fitted"));
        Table fixed = s.tables().get(0);
        assertTrue(fixed.notes().stream().anyMatch(n -> n.contains("only the overall model")), fixed.notes().toString());
    }
}
