package org.inkgate.analysis.study;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.scores.ScoreRule;
import org.junit.jupiter.api.Test;

/** Reported-score pairs, worked by hand on four invented responses (two criteria a and b). */
class ReportedScoreAgreementTest {

    private static List<Rating> ratings() {
        List<Rating> r = new ArrayList<>();
        Object[][] rows = {
            {"C1", "R1", "a", 3}, {"C1", "R1", "b", 4}, {"C1", "R2", "a", 3}, {"C1", "R2", "b", 5}, // totals 7, 8
            {"C2", "R1", "a", 2}, {"C2", "R1", "b", 2}, {"C2", "R2", "a", 2}, {"C2", "R2", "b", 2}, // 4, 4
            {"C3", "R2", "a", 5}, {"C3", "R2", "b", 5}, {"C3", "R1", "a", 3}, {"C3", "R1", "b", 4}, // 10, 7 (R2 first)
            {"C4", "R1", "a", 1}, {"C4", "R1", "b", 2}, {"C4", "R2", "a", 1}, // R2 misses b: left out
        };
        for (Object[] x : rows) {
            r.add(new Rating((String) x[0], "", "", "t", "c", (String) x[1], (String) x[2], (Integer) x[3]));
        }
        return r;
    }

    private static Map<String, Object> summary(ScoreRule rule) {
        Section.Builder s = Section.builder("raters", "Raters");
        ReportedScoreAgreement.addTo(s, ratings(), rule);
        return s.build().summary();
    }

    @Test
    void addTo_sumRule_comparesTotalsOfCompleteRatersInInputOrder() {
        Map<String, Object> s = summary(ScoreRule.SUM);
        assertEquals(3, s.get("raters.reported_score.all.pairs"));
        assertEquals(1, s.get("raters.reported_score.left_out"));
        // by hand: |differences| of totals 1, 0, 3
        assertEquals(1 / 3.0, (Double) s.get("raters.reported_score.all.exact_agreement"), 1e-12);
        assertEquals(2 / 3.0, (Double) s.get("raters.reported_score.all.adjacent_agreement"), 1e-12);
        assertEquals(4 / 3.0, (Double) s.get("raters.reported_score.all.mean_abs_difference"), 1e-12);
        // by hand: x = (7, 4, 10), y = (8, 4, 7): Sxy = 9, Sxx = 18, Syy = 26/3, r = 9 / sqrt(156)
        assertEquals(9 / Math.sqrt(156), (Double) s.get("raters.reported_score.all.pearson_r"), 1e-12);
        assertEquals(3, s.get("raters.reported_score.task.t.pairs"));
        assertEquals(3, s.get("raters.reported_score.condition.c.pairs"));
    }

    @Test
    void addTo_meanRule_sameAgreementOnTotals_differenceOnTheMeanScale() {
        Map<String, Object> s = summary(ScoreRule.MEAN);
        assertEquals(2 / 3.0, (Double) s.get("raters.reported_score.all.adjacent_agreement"), 1e-12,
                "adjacent is judged on totals whatever the rule");
        assertEquals(2 / 3.0, (Double) s.get("raters.reported_score.all.mean_abs_difference"), 1e-12,
                "by hand: 0.5, 0, 1.5 on the mean scale");
        assertEquals(9 / Math.sqrt(156), (Double) s.get("raters.reported_score.all.pearson_r"), 1e-12);
    }
}
