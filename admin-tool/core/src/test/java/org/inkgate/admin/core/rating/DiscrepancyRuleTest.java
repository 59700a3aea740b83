package org.inkgate.admin.core.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * The discrepancy rule and final-score methods on small cases worked by hand from their
 * definitions (the rule and methods are common practice; the thresholds here are invented).
 */
class DiscrepancyRuleTest {

    private static final DiscrepancyRule BANDS_1 = new DiscrepancyRule(1, null,
            DiscrepancyRule.AdjudicatedScore.CLOSEST_PAIR_MEAN);

    private static Map<String, Integer> s(int content, int language) {
        return Map.of("content", content, "language", language);
    }

    @Test
    void disagreement_bandGap_countsRubricBandsNotPoints() {
        // bands 1-3, 4-6, 7-9: 3 and 4 are one point but one band apart; 4 and 6 two points, same band
        assertEquals(Optional.empty(), BANDS_1.disagreement(List.of(s(3, 5), s(4, 5)), InventedStore.RUBRIC));
        assertEquals(Optional.empty(), BANDS_1.disagreement(List.of(s(4, 5), s(6, 5)), InventedStore.RUBRIC));
        Optional<String> two = BANDS_1.disagreement(List.of(s(3, 5), s(7, 5)), InventedStore.RUBRIC);
        assertTrue(two.orElseThrow().contains("content: scores 3 and 7 lie 2 bands apart"), two.toString());
        DiscrepancyRule zero = new DiscrepancyRule(0, null, DiscrepancyRule.AdjudicatedScore.ADJUDICATOR);
        assertTrue(zero.disagreement(List.of(s(3, 5), s(4, 5)), InventedStore.RUBRIC).isPresent());
    }

    @Test
    void disagreement_totalGap_flagsOnlyBeyondTheThreshold() {
        DiscrepancyRule total = new DiscrepancyRule(null, 3, DiscrepancyRule.AdjudicatedScore.ADJUDICATOR);
        // totals 10 and 13: 3 apart, not more than 3
        assertEquals(Optional.empty(), total.disagreement(List.of(s(5, 5), s(7, 6)), InventedStore.RUBRIC));
        // totals 10 and 14: 4 apart
        assertTrue(total.disagreement(List.of(s(5, 5), s(7, 7)), InventedStore.RUBRIC).orElseThrow()
                .contains("totals 10 and 14 lie 4 points apart"));
        // three raters: the widest pair counts (totals 10, 12, 14)
        assertTrue(total.disagreement(List.of(s(5, 5), s(6, 6), s(7, 7)), InventedStore.RUBRIC).isPresent());
    }

    @Test
    void constructor_noThresholdOrNegative_isRefused() {
        assertThrows(IllegalArgumentException.class, () -> new DiscrepancyRule(null, null,
                DiscrepancyRule.AdjudicatedScore.ADJUDICATOR));
        assertThrows(IllegalArgumentException.class, () -> new DiscrepancyRule(-1, null,
                DiscrepancyRule.AdjudicatedScore.ADJUDICATOR));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> DiscrepancyRule.AdjudicatedScore.of("median"));
        assertTrue(e.getMessage().contains("closest-pair-mean or adjudicator"));
    }

    private static FinalScore.Submitted r(String rater, int content, int language) {
        return new FinalScore.Submitted(rater, RatingDesk.Kind.RATING, s(content, language));
    }

    private static FinalScore.Submitted adj(String rater, int content, int language) {
        return new FinalScore.Submitted(rater, RatingDesk.Kind.ADJUDICATION, s(content, language));
    }

    @Test
    void finalScore_methods_workedByHand() {
        var closest = DiscrepancyRule.AdjudicatedScore.CLOSEST_PAIR_MEAN;
        // agreeing pair: per criterion mean, (5 + 6) / 2 = 5.5 and (4 + 4) / 2 = 4
        FinalScore.Result mean = FinalScore.of(List.of(r("A", 5, 4), r("B", 6, 4)), 2, false, Optional.empty(), "",
                closest).orElseThrow();
        assertEquals("mean-of-ratings", mean.method());
        assertEquals(Map.of("content", 5.5, "language", 4.0), mean.scores());
        // pending: one of two ratings, or flagged without adjudication
        assertTrue(FinalScore.of(List.of(r("A", 5, 4)), 2, false, Optional.empty(), "", closest).isEmpty());
        assertTrue(FinalScore.of(List.of(r("A", 2, 2), r("B", 8, 8)), 2, true, Optional.empty(), "", closest).isEmpty());
        // totals 4 (A), 16 (B), 13 (C): closest pair B-C (3 apart); content (8 + 6) / 2 = 7, language (8 + 7) / 2 = 7.5
        FinalScore.Result pair = FinalScore.of(List.of(r("A", 2, 2), r("B", 8, 8), adj("C", 6, 7)), 2, true,
                Optional.empty(), "", closest).orElseThrow();
        assertEquals("closest-pair-mean", pair.method());
        assertEquals(List.of("B", "C"), pair.basis());
        assertEquals(Map.of("content", 7.0, "language", 7.5), pair.scores());
        // totals 4, 16, 10: A-C and B-C both 6 apart: mean of all three, content (2 + 8 + 5) / 3 = 5
        FinalScore.Result tie = FinalScore.of(List.of(r("A", 2, 2), r("B", 8, 8), adj("C", 5, 5)), 2, true,
                Optional.empty(), "", closest).orElseThrow();
        assertEquals("mean-of-all-tied", tie.method());
        assertEquals(5.0, tie.scores().get("content"), 1e-12);
        // adjudicator method: the adjudicator's scores
        FinalScore.Result third = FinalScore.of(List.of(r("A", 2, 2), r("B", 8, 8), adj("C", 6, 7)), 2, true,
                Optional.empty(), "", DiscrepancyRule.AdjudicatedScore.ADJUDICATOR).orElseThrow();
        assertEquals(Map.of("content", 6.0, "language", 7.0), third.scores());
        // resolution entry wins, with who
        FinalScore.Result entry = FinalScore.of(List.of(r("A", 2, 2), r("B", 8, 8)), 2, true, Optional.of(s(5, 6)),
                "Invented lead", closest).orElseThrow();
        assertEquals("resolution-entry", entry.method());
        assertEquals(List.of("Invented lead"), entry.basis());
        // one rater per response
        assertEquals("single-rating", FinalScore.of(List.of(r("A", 3, 3)), 1, false, Optional.empty(), "", closest)
                .orElseThrow().method());
    }

    @Test
    void number_formatsWholeHalvesAndThirds() {
        assertEquals("5", RatingExport.number(5.0));
        assertEquals("5.5", RatingExport.number(5.5));
        assertEquals("5.333333", RatingExport.number(16.0 / 3));
    }
}
