package org.inkgate.analysis.groups;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.testutil.ReferenceData;
import org.junit.jupiter.api.Test;

class GroupsTest {

    private static final Groups PLANT = Groups.of(ReferenceData.groups("PlantGrowth.csv", "weight", "group"));

    @Test
    void anova_plantGrowth_matchesR() {
        // F(2,27) 4.846, p 0.01591, eta^2 0.2641483, omega^2 0.2040788 (R 4.2.2, METHODS.md)
        OneWayAnova a = OneWayAnova.of(PLANT);
        assertEquals(4.846, a.f(), 5e-4);
        assertEquals(2, a.dfBetween());
        assertEquals(27, a.dfWithin());
        assertEquals(0.01591, a.p(), 5e-6);
        assertEquals(0.2641483, a.etaSquared(), 1e-7);
        assertEquals(0.2040788, a.omegaSquared(), 1e-7);
    }

    @Test
    void welch_plantGrowth_matchesR() {
        // Welch F 5.181, df 2 and 17.128, p 0.01739 (R 4.2.2 oneway.test, METHODS.md)
        WelchAnova w = WelchAnova.of(PLANT);
        assertEquals(5.181, w.f(), 5e-4);
        assertEquals(17.128, w.df2(), 5e-4);
        assertEquals(0.01739, w.p(), 5e-6);
    }

    @Test
    void leveneAndBrownForsythe_plantGrowth_matchCar() {
        // median F(2,27) 1.1192 p 0.3412; mean F 1.23696 p 0.30619 (R 4.2.2 car::leveneTest, METHODS.md);
        // to 1e-9 from scipy 1.10.1 stats.levene (scipy_reference.txt)
        OneWayAnova bf = VarianceHomogeneity.test(PLANT, VarianceHomogeneity.Centre.MEDIAN);
        assertEquals(1.1191856948703909, bf.f(), 1e-9);
        assertEquals(0.3412266241254737, bf.p(), 1e-9);
        OneWayAnova lev = VarianceHomogeneity.test(PLANT, VarianceHomogeneity.Centre.MEAN);
        assertEquals(1.2369629544697844, lev.f(), 1e-9);
        assertEquals(0.30619492299144685, lev.p(), 1e-9);
    }

    @Test
    void tukey_plantGrowth_matchesR() {
        // TukeyHSD(aov(weight ~ group)) (R 4.2.2, METHODS.md)
        List<PairwiseComparisons.Comparison> c = PairwiseComparisons.compare(PLANT,
                PairwiseComparisons.Method.TUKEY_HSD, 0.95);
        check(c.get(0), "ctrl", "trt1", -0.371, -1.0622161, 0.3202161, 0.3908711);
        check(c.get(1), "ctrl", "trt2", 0.494, -0.1972161, 1.1852161, 0.1979960);
        check(c.get(2), "trt1", "trt2", 0.865, 0.1737839, 1.5562161, 0.0120064);
    }

    @Test
    void tukey_warpbreaksTensionAfterWool_matchesR() {
        // aov(breaks ~ wool + tension): MS_E from the two-factor model, tension ordered H, M, L.
        // M-H 4.722222 [-4.6311985, 14.07564] p 0.4474210; L-H 14.722222 [5.3688015, 24.07564] p 0.0011218;
        // L-M 10 [0.6465793, 19.35342] p 0.0336262 (R 4.2.2, METHODS.md). Removing wool's effect
        // from each value leaves the tension groups with the same MS_E once df is corrected by one.
        Map<String, double[]> byTension = new LinkedHashMap<>();
        var rows = ReferenceData.rows("warpbreaks.csv");
        double meanA = rows.stream().filter(r -> r.get("wool").equals("A")).mapToDouble(r -> Double.parseDouble(r.get("breaks"))).average().orElseThrow();
        double meanB = rows.stream().filter(r -> r.get("wool").equals("B")).mapToDouble(r -> Double.parseDouble(r.get("breaks"))).average().orElseThrow();
        for (String t : new String[] {"H", "M", "L"}) {
            byTension.put(t, rows.stream().filter(r -> r.get("tension").equals(t))
                    .mapToDouble(r -> Double.parseDouble(r.get("breaks")) - (r.get("wool").equals("A") ? meanA : meanB))
                    .toArray());
        }
        // balanced design: centring on the wool means removes the wool SS exactly; the error df
        // of the additive model is 54 - 1 - 1 - 2 = 50, one less than the one-way's 51
        List<PairwiseComparisons.Comparison> c = PairwiseComparisons.compareWithError(Groups.of(byTension),
                PairwiseComparisons.Method.TUKEY_HSD, 0.95, 50);
        check(c.get(0), "H", "M", 4.722222, -4.6311985, 14.07564, 0.4474210);
        check(c.get(1), "H", "L", 14.722222, 5.3688015, 24.07564, 0.0011218);
        check(c.get(2), "M", "L", 10, 0.6465793, 19.35342, 0.0336262);
    }

    @Test
    void gamesHowell_plantGrowth_matchesScipyStudentizedRange() {
        // Games-Howell by definition with scipy 1.10.1 studentized_range (scipy_reference.txt)
        List<PairwiseComparisons.Comparison> c = PairwiseComparisons.compare(PLANT,
                PairwiseComparisons.Method.GAMES_HOWELL, 0.95);
        check(c.get(0), "ctrl", "trt1", -0.37099999999999955, -1.1720875145224245, 0.43008751452242544,
                0.4745549221939487);
        check(c.get(1), "ctrl", "trt2", 0.49400000000000066, -0.10055444384752088, 1.088554443847522,
                0.11288917685382871);
        check(c.get(2), "trt1", "trt2", 0.8650000000000002, 0.1135129887016626, 1.6164870112983378,
                0.023703454738939533);
        assertEquals(16.5235850568593, c.get(0).df(), 1e-9);
    }

    @Test
    void conditionByLevel_warpbreaksSplitPlot_matchesRAov() {
        // R 4.2.2 aov(breaks ~ tension * wool + Error(id / wool)) with the i-th A and B loom of each
        // tension paired (an artificial pairing of published data, arithmetic check only):
        // tension:wool F 6.20417048579286, df 2 and 24, p 0.0067316917842379 (r_reference.R / .txt)
        Map<String, double[]> diffs = new LinkedHashMap<>();
        var rows = ReferenceData.rows("warpbreaks.csv");
        for (String t : new String[] {"L", "M", "H"}) {
            double[] a = rows.stream().filter(r -> r.get("tension").equals(t) && r.get("wool").equals("A"))
                    .mapToDouble(r -> Double.parseDouble(r.get("breaks"))).toArray();
            double[] b = rows.stream().filter(r -> r.get("tension").equals(t) && r.get("wool").equals("B"))
                    .mapToDouble(r -> Double.parseDouble(r.get("breaks"))).toArray();
            double[] d = new double[a.length];
            for (int i = 0; i < a.length; i++) {
                d[i] = b[i] - a[i];
            }
            diffs.put(t, d);
        }
        OneWayAnova x = ConditionByLevel.interaction(Groups.of(diffs));
        assertEquals(6.20417048579286, x.f(), 1e-9);
        assertEquals(24, x.dfWithin());
        assertEquals(0.0067316917842379, x.p(), 1e-10);
    }

    @Test
    void anova_singleLevel_saysItNeedsTwoGroups() {
        OneWayAnova a = OneWayAnova.of(Groups.of(Map.of("B1", new double[] {1, 2, 3})));
        assertTrue(Double.isNaN(a.f()));
        assertTrue(a.cautions().get(0).contains("at least 2 groups"));
    }

    @Test
    void welch_zeroVarianceGroup_saysWhy() {
        Map<String, double[]> m = new LinkedHashMap<>();
        m.put("A", new double[] {2, 2, 2});
        m.put("B", new double[] {1, 2, 3});
        WelchAnova w = WelchAnova.of(Groups.of(m));
        assertTrue(w.cautions().get(0).contains("zero variance"));
    }

    private static void check(PairwiseComparisons.Comparison c, String a, String b, double diff, double lo,
            double hi, double p) {
        assertEquals(a, c.groupA());
        assertEquals(b, c.groupB());
        assertEquals(diff, c.difference(), 1e-6);
        assertEquals(lo, c.lower(), 1e-6);
        assertEquals(hi, c.upper(), 1e-5);
        assertEquals(p, c.p(), 1e-7);
    }
}
