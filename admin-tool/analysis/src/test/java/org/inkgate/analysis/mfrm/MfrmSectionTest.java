package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.report.Chart;
import org.inkgate.analysis.report.ReportWriter;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.junit.jupiter.api.Test;

/** The report section of the many-facet Rasch analysis: content, plain warnings, refusals. */
class MfrmSectionTest {

    private static Table table(Section s, String id) {
        return s.tables().stream().filter(t -> t.id().equals(id)).findFirst()
                .orElseThrow(() -> new AssertionError("no table " + id + " in " + s.tables().stream().map(Table::id)
                        .toList()));
    }

    @Test
    void of_ratingScaleReference_tablesCarryVgamMeasuresAndSummaryKeys() throws Exception {
        // simulated set and VGAM's acat(parallel = TRUE) fit from reference.R (R 4.2.2, VGAM 1.1.7);
        // limit 0.005 logits as in EquivalenceTest
        MfrmResult r = ManyFacetRasch.analyse(ReferenceFits.data("ratingscale-2000"),
                MfrmOptions.builder(List.of("task", "rater")).bias("rater", "task").build());
        Map<String, Map<String, Double>> ref = ReferenceFits.measures("ratingscale-2000-vgam.csv");
        Section s = MfrmSection.of(r);
        assertEquals("mfrm", s.id());
        Table raters = table(s, "mfrm_elements_rater");
        assertEquals(ref.get("rater").size(), raters.rows().size());
        for (List<Object> row : raters.rows()) {
            assertEquals(ref.get("rater").get((String) row.get(0)), (Double) row.get(2), 0.005, row.get(0).toString());
        }
        Table cats = table(s, "mfrm_categories");
        for (int k = 1; k < cats.rows().size(); k++) {
            assertEquals(ref.get("threshold").get("F" + k), (Double) cats.rows().get(k).get(7), 0.005, "F" + k);
        }
        // facet summaries: model and joint rows for non-candidate facets, one row for candidates
        assertEquals(1 + 2 + 2, table(s, "mfrm_facets").rows().size());
        for (String id : List.of("mfrm_elements_task", "mfrm_elements_candidate", "mfrm_bias", "mfrm_bias_rater_task",
                "mfrm_unexpected")) {
            assertFalse(table(s, id).method().isBlank() || table(s, id).source().isBlank(), id);
        }
        assertEquals(List.of("chart_mfrm_wright_map", "chart_mfrm_categories_0", "chart_mfrm_bias_0"),
                s.charts().stream().map(Chart::id).toList());
        assertEquals(true, s.summary().get("mfrm.available"));
        assertEquals(r.summary().keySet().stream().map(k -> "mfrm." + k).toList(),
                s.summary().keySet().stream().filter(k -> !k.equals("mfrm.available")).toList());
        assertTrue(s.paragraphs().stream().anyMatch(p -> p.startsWith("Convergence: reached after")));
        String html = ReportWriter.html(new org.inkgate.analysis.report.Report("t", List.of(), List.of(s)));
        assertTrue(html.contains("id=\"chart_mfrm_wright_map-svg\""), "the Wright map is inline SVG");
    }

    @Test
    void of_iterationCapReached_saysNotConvergedNextToTheResults() throws Exception {
        MfrmResult r = ManyFacetRasch.analyse(ReferenceFits.data("ratingscale-2000"),
                MfrmOptions.builder(List.of("task", "rater")).maxIterations(1).build());
        Section s = MfrmSection.of(r);
        assertTrue(s.paragraphs().stream().anyMatch(p -> p.startsWith("NOT CONVERGED") && p.contains("provisional")),
                s.paragraphs().toString());
        assertTrue(s.paragraphs().stream().anyMatch(p -> p.startsWith("WARNING: ")), s.paragraphs().toString());
    }

    @Test
    void analyse_confoundedDesign_givesRefusalSectionWithReasons() {
        // invented ratings: task a always under condition none, task b under tools
        List<Rating> ratings = new ArrayList<>();
        for (int c = 0; c < 30; c++) {
            for (String task : List.of("a", "b")) {
                for (String rater : List.of("R1", "R2")) {
                    ratings.add(new Rating("K" + c, "", "", task, task.equals("a") ? "none" : "tools", rater, "ideas",
                            (c + task.length() * 3 + rater.length()) % 4));
                }
            }
        }
        List<String> facets = List.of("task", "condition", "rater");
        Section s = MfrmSection.analyse(StudyRatings.of(ratings, Map.of(), facets),
                MfrmOptions.builder(facets).build());
        assertEquals(false, s.summary().get("mfrm.available"));
        String text = String.join(" | ", s.paragraphs());
        assertTrue(text.startsWith("NOT RUN."), text);
        // DesignCheck's wording for confounded facets (docs/analysis.md)
        assertTrue(text.contains("each task occurs with only one condition"), text);
        assertTrue(s.tables().isEmpty() && s.charts().isEmpty());
    }

    @Test
    void studyRatings_emptyLevelFilledFromCandidates_decimalScoreRefused() {
        List<Rating> ok = List.of(new Rating("C1", "", "", "t", "x", "R1", "k", 2),
                new Rating("C2", "B1", "", "t", "x", "R1", "k", 0));
        RatingData d = StudyRatings.of(ok, Map.of("C1", "A2"), List.of("rater", "level"));
        assertEquals(List.of("rater", "level"), d.columns());
        assertEquals(List.of("A2", "B1"), List.of(d.labels(1)));
        List<Rating> bad = List.of(new Rating("C1", "", "", "t", "x", "R1", "k", 1.5),
                new Rating("C2", "", "", "t", "x", "R1", "k", 1));
        MfrmRefusedException e = org.junit.jupiter.api.Assertions.assertThrows(MfrmRefusedException.class,
                () -> StudyRatings.of(bad, Map.of(), List.of("rater", "level")));
        assertEquals(2, e.reasons().size(), e.reasons().toString());
        assertTrue(e.reasons().get(0).contains("rating 1 (candidate C1") && e.reasons().get(0).contains("'level'"));
        assertTrue(e.reasons().get(1).contains("rating 2 (candidate C2"));
    }
}
