package org.inkgate.analysis.descriptive;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.inkgate.analysis.testutil.ReferenceData;
import org.junit.jupiter.api.Test;

class DescriptiveTest {

    @Test
    void descriptives_sleep_matchJoanesGillValues() {
        // sleep$extra, n = 20 (R 4.2.2, METHODS.md; Joanes & Gill 1998 formulas)
        Descriptives d = Descriptives.of(ReferenceData.column("sleep.csv", "extra"));
        assertEquals(20, d.n());
        assertEquals(1.54, d.mean(), 1e-12);
        assertEquals(2.0179197, d.sd(), 1e-7);
        assertEquals(0.4518574, d.skewness(), 1e-7);
        assertEquals(-0.7747436, d.kurtosis(), 1e-7);
        assertEquals(0.5121033, d.skewnessSe(), 1e-7);
        assertEquals(0.9923836, d.kurtosisSe(), 1e-7);
    }

    @Test
    void descriptives_plantGrowth_matchJoanesGillValues() {
        // PlantGrowth weight (R 4.2.2, METHODS.md)
        Descriptives d = Descriptives.of(ReferenceData.column("PlantGrowth.csv", "weight"));
        assertEquals(-0.1615996, d.skewness(), 1e-7);
        assertEquals(-0.5534216, d.kurtosis(), 1e-7);
    }

    @Test
    void descriptives_constantValues_explainUndefinedShape() {
        Descriptives d = Descriptives.of(new double[] {3, 3, 3, 3, 3});
        assertEquals(0, d.sd());
        assertTrue(Double.isNaN(d.skewness()));
        assertTrue(d.cautions().stream().anyMatch(c -> c.contains("all values equal")));
    }

    @Test
    void descriptives_twoValues_explainMissingShape() {
        Descriptives d = Descriptives.of(new double[] {1, 2});
        assertTrue(d.cautions().stream().anyMatch(c -> c.contains("at least 3")));
    }

    @Test
    void shapiroWilk_referenceData_matchesR() {
        // R 4.2.2 shapiro.test values from METHODS.md
        ShapiroWilk.Result plant = ShapiroWilk.test(ReferenceData.column("PlantGrowth.csv", "weight"));
        assertEquals(0.98268, plant.w(), 5e-6);
        assertEquals(0.8915, plant.p(), 5e-5);
        ShapiroWilk.Result sleep = ShapiroWilk.test(ReferenceData.column("sleep.csv", "extra"));
        assertEquals(0.9460728, sleep.w(), 1e-7);
        assertEquals(0.3113754, sleep.p(), 1e-7);
        ShapiroWilk.Result tooth = ShapiroWilk.test(ReferenceData.column("ToothGrowth.csv", "len"));
        assertEquals(0.96743, tooth.w(), 5e-6);
        assertEquals(0.1091, tooth.p(), 5e-5);
    }

    @Test
    void shapiroWilk_elevenWeightsOfShapiroWilk1965_matchesR() {
        // Shapiro & Wilk (1965) example weights; W and p from R 4.2.2 (METHODS.md)
        ShapiroWilk.Result r = ShapiroWilk.test(new double[] {148, 154, 158, 160, 161, 162, 166, 170, 182, 195, 236});
        assertEquals(0.788815, r.w(), 1e-6);
        assertEquals(0.0067038, r.p(), 1e-7);
    }

    @Test
    void shapiroWilk_tooFewValues_saysSo() {
        ShapiroWilk.Result r = ShapiroWilk.test(new double[] {1, 2});
        assertTrue(Double.isNaN(r.w()));
        assertTrue(r.cautions().get(0).contains("at least 3"));
    }

    @Test
    void ranks_ties_getMidRanks() {
        // mid-ranks by definition (Kendall & Gibbons 1990)
        double[] r = Ranks.of(new double[] {10, 20, 20, 5});
        assertEquals(2, r[0]);
        assertEquals(3.5, r[1]);
        assertEquals(3.5, r[2]);
        assertEquals(1, r[3]);
    }
}
