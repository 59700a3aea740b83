package org.inkgate.analysis.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.data.StudyDesign;
import org.inkgate.analysis.mfrm.ConditionFacet;
import org.inkgate.analysis.mfrm.ManyFacetRasch;
import org.inkgate.analysis.mfrm.MfrmOptions;
import org.inkgate.analysis.mfrm.MfrmRefusedException;
import org.inkgate.analysis.mfrm.MfrmResult;
import org.inkgate.analysis.mfrm.MfrmSection;
import org.inkgate.analysis.mfrm.RatingData;
import org.inkgate.analysis.mfrm.StudyRatings;
import org.inkgate.analysis.report.Section;
import org.junit.jupiter.api.Test;

/**
 * Condition in the many-facet Rasch model follows the design: crossed with candidates for any
 * number of within conditions, describing candidates in parallel groups (SIMULATED, seeded data
 * from {@link DesignSimulationTest}).
 */
class ConditionFacetTest {

    private static final List<String> FACETS = List.of("task", "condition", "rater", "criterion");

    private static MfrmResult run(List<Rating> ratings, MfrmOptions o) {
        java.util.List<String> columns = new java.util.ArrayList<>(o.facets());
        if (!columns.contains("condition")) {
            columns.add("condition");
        }
        RatingData data = StudyRatings.of(ratings, Map.of(), columns);
        return ManyFacetRasch.analyse(data, o);
    }

    @Test
    void parallelGroups_conditionAsCrossedFacet_isConfoundedWithCandidates() {
        // what happened before: the design check refuses condition as a facet in parallel groups
        List<Rating> ratings = DesignSimulationTest.parallel(11, 1.5);
        assertThrows(MfrmRefusedException.class, () -> run(ratings, MfrmOptions.builder(FACETS).build()));
    }

    @Test
    void parallelGroups_conditionDescribesCandidates_modelRunsAndGroupsCompared() {
        List<Rating> ratings = DesignSimulationTest.parallel(11, 1.5);
        StudyDesign design = StudyDesign.of(ratings, null);
        MfrmOptions asked = MfrmOptions.builder(FACETS).bias("condition", "rater").build();
        MfrmOptions used = ConditionFacet.adapt(asked, design);
        assertEquals(List.of("task", "rater", "criterion"), used.facets());
        MfrmResult r = run(ratings, used);
        assertEquals(1, r.bias().size(), "the condition x rater bias pair still runs");
        Section s = ConditionFacet.annotate(MfrmSection.of(r), asked, design, r, ratings);
        assertEquals(ConditionFacet.DESCRIBES_CANDIDATES, s.summary().get("mfrm.condition_treatment"));
        assertTrue(((Number) s.summary().get("mfrm.condition_groups.welch_p")).doubleValue() < 0.05);
        assertTrue(((Number) s.summary().get("mfrm.condition_groups.difference")).doubleValue() > 0);
        assertTrue(s.tables().stream().anyMatch(t -> t.id().equals("mfrm_condition_groups")));
        assertTrue(s.paragraphs().stream().anyMatch(p -> p.contains("condition describes the candidates")));
    }

    @Test
    void threeWithinConditions_conditionStaysACrossedFacetWithBiasPairs() {
        List<Rating> ratings = DesignSimulationTest.threeConditions(12, 1.0);
        StudyDesign design = StudyDesign.of(ratings, null);
        MfrmOptions asked = MfrmOptions.builder(FACETS).bias("condition", "rater").build();
        MfrmOptions used = ConditionFacet.adapt(asked, design);
        assertEquals(FACETS, used.facets());
        MfrmResult r = run(ratings, used);
        MfrmResult.Facet condition = r.facets().stream().filter(f -> f.name().equals("condition")).findFirst()
                .orElseThrow();
        assertEquals(3, condition.elements().size());
        // 'full' carries the planted effect: the easiest condition, i.e. the lowest measure
        MfrmResult.Element full = condition.elements().stream().filter(e -> e.label().equals("full")).findFirst()
                .orElseThrow();
        assertTrue(condition.elements().stream().allMatch(e -> e == full || e.measure() > full.measure()),
                condition.elements().toString());
        assertEquals(6, r.bias().get(0).cells().size(), "3 conditions x 2 raters");
        Section s = ConditionFacet.annotate(MfrmSection.of(r), asked, design, r, ratings);
        assertEquals(ConditionFacet.CROSSED, s.summary().get("mfrm.condition_treatment"));
        assertFalse(s.tables().stream().anyMatch(t -> t.id().equals("mfrm_condition_groups")));
    }
}
