package org.inkgate.analysis.planning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Power and sample sizes against base R 4.2.2 (pt, pf with ncp; qt, qf; power.t.test with strict =
 * TRUE): src/test/resources/reference/planning_reference.R, output in planning_reference.txt. Power
 * to 1e-6 (the brief's bar; R's own noncentral F is accurate to about 1e-9), sample sizes exactly.
 */
class PowerDesignsTest {

    private static Sides sides(Map<String, Double> m) {
        return m.get("sides") == 1 ? Sides.ONE_SIDED : Sides.TWO_SIDED;
    }

    private static int integer(Map<String, Double> m, String key) {
        return (int) Math.round(m.get(key));
    }

    @Test
    void pairedPower_rReference_matchesToOneMillionth() {
        for (var m : PlanningReference.lines("paired_power")) {
            var design = new PairedDesign(m.get("dz"), m.get("alpha"), sides(m));
            assertEquals(m.get("power"), design.power(integer(m, "n")), 1e-6, m.toString());
            assertEquals(m.get("power_t_test"), design.power(integer(m, "n")), 1e-6, "power.t.test " + m);
        }
    }

    @Test
    void pairedCandidates_rReference_exactIntegerAndPowerEitherSide() {
        for (var m : PlanningReference.lines("paired_n")) {
            var design = new PairedDesign(m.get("dz"), m.get("alpha"), sides(m));
            int n = SampleSize.smallest(design, m.get("target"));
            assertEquals(integer(m, "n"), n, m.toString());
            // power.t.test's continuous n rounds up to the same integer
            assertEquals(n, (int) Math.ceil(m.get("power_t_test_n")), m.toString());
            assertEquals(m.get("power_at_n"), design.power(n), 1e-6, m.toString());
            assertEquals(m.get("power_below"), design.power(n - 1), 1e-6, m.toString());
        }
    }

    @Test
    void pairedEffect_fromScoreEffectAndCorrelation_rReference() {
        var m = PlanningReference.lines("paired_dz").get(0);
        assertEquals(m.get("dz"), Effects.ofDifferences(m.get("d"), m.get("rho")), 1e-12);
    }

    @Test
    void twoGroupsPower_rReference_matchesToOneMillionth() {
        for (var m : PlanningReference.lines("groups_power")) {
            var design = new TwoGroupsDesign(m.get("d"), m.get("alpha"), sides(m), m.get("ratio"));
            assertEquals(m.get("power"), design.power(integer(m, "n1")), 1e-6, m.toString());
            if (m.containsKey("power_t_test")) {
                assertEquals(m.get("power_t_test"), design.power(integer(m, "n1")), 1e-6, "power.t.test " + m);
            }
        }
    }

    @Test
    void twoGroupsCandidates_rReference_exactIntegers() {
        for (var m : PlanningReference.lines("groups_n")) {
            var design = new TwoGroupsDesign(m.get("d"), m.get("alpha"), sides(m), m.get("ratio"));
            int n1 = SampleSize.smallest(design, m.get("target"));
            assertEquals(integer(m, "n1"), n1, m.toString());
            assertEquals(integer(m, "n2"), design.secondGroup(n1), m.toString());
            assertEquals(m.get("power_at_n"), design.power(n1), 1e-6, m.toString());
            assertEquals(m.get("power_below"), design.power(n1 - 1), 1e-6, m.toString());
        }
    }

    @Test
    void twoGroupsCandidates_cohensPowerPrimer_mediumAndLargeEffects() {
        // Cohen (1992), "A power primer", Psychological Bulletin 112, Table 2 (from memory): two
        // independent means, alpha .05 two-sided, power .80: medium d = .5 needs 64 per group, large
        // d = .8 needs 26. (Its small-effect entry, 393, is one below the exact 394 in
        // planning_reference.txt: Cohen's tables used an approximation to the noncentral t.)
        assertEquals(64, SampleSize.smallest(new TwoGroupsDesign(0.5, 0.05, Sides.TWO_SIDED, 1), 0.8));
        assertEquals(26, SampleSize.smallest(new TwoGroupsDesign(0.8, 0.05, Sides.TWO_SIDED, 1), 0.8));
    }

    @Test
    void repeatedMeasuresPower_rReference_matchesToOneMillionth() {
        for (var m : PlanningReference.lines("rm_power")) {
            var design = new RepeatedMeasuresDesign(integer(m, "k"), m.get("f"), m.get("rho"), m.get("eps"), m.get("alpha"));
            assertEquals(m.get("power"), design.power(integer(m, "n")), 1e-6, m.toString());
        }
    }

    @Test
    void repeatedMeasuresCandidates_rReference_exactIntegers() {
        for (var m : PlanningReference.lines("rm_n")) {
            var design = new RepeatedMeasuresDesign(integer(m, "k"), m.get("f"), m.get("rho"), m.get("eps"), m.get("alpha"));
            int n = SampleSize.smallest(design, m.get("target"));
            assertEquals(integer(m, "n"), n, m.toString());
            assertEquals(m.get("power_at_n"), design.power(n), 1e-6, m.toString());
            assertEquals(m.get("power_below"), design.power(n - 1), 1e-6, m.toString());
        }
    }

    @Test
    void repeatedMeasuresWithTwoConditions_equalsPairedT() {
        // identity: with k = 2 and epsilon 1, F = T^2, f = d / 2, so d_z = 2 f / sqrt(2 (1 - rho))
        var m = PlanningReference.lines("rm_vs_paired").get(0);
        double rm = new RepeatedMeasuresDesign(2, 0.2, 0.5, 1, 0.05).power(30);
        double paired = new PairedDesign(Effects.ofDifferences(0.4, 0.5), 0.05, Sides.TWO_SIDED).power(30);
        assertEquals(m.get("rm"), rm, 1e-6);
        assertEquals(m.get("paired"), paired, 1e-6);
        assertEquals(rm, paired, 1e-8);
    }

    @Test
    void cohensF_fromPlannedMeans_rReference() {
        var m = PlanningReference.lines("cohens_f").get(0);
        assertEquals(m.get("f"), Effects.cohensF(new double[] {m.get("m1"), m.get("m2"), m.get("m3")}, m.get("sd")), 1e-12);
    }

    @Test
    void simulatedStudies_rSeededSimulation_agreeWithinMonteCarloError() {
        // R's seeded simulation (4,000 studies each with the planted effect): the formula's power lies
        // within 3 Monte Carlo standard errors of the share of studies that found the effect
        var p = PlanningReference.lines("sim_paired").get(0);
        double paired = new PairedDesign(p.get("dz"), 0.05, Sides.TWO_SIDED).power(integer(p, "n"));
        assertEquals(p.get("power"), paired, 3 * Math.sqrt(paired * (1 - paired) / p.get("reps")));
        var r = PlanningReference.lines("sim_rm").get(0);
        double rm = new RepeatedMeasuresDesign(integer(r, "k"), r.get("f"), r.get("rho"), 1, 0.05).power(integer(r, "n"));
        assertEquals(r.get("formula"), rm, 1e-6);
        assertEquals(r.get("power"), rm, 3 * Math.sqrt(rm * (1 - rm) / r.get("reps")));
    }

    @Test
    void logitDifference_overCandidateSd_isTheStandardizedEffect() {
        // 0.5 logits with candidate measures spread 1.25 logits: 0.4 standard deviations (arithmetic)
        assertEquals(0.4, Effects.fromLogits(0.5, 1.25), 1e-15);
        assertThrows(IllegalArgumentException.class, () -> Effects.fromLogits(0.5, 0));
    }

    @Test
    void sampleSize_zeroEffect_refusesWithAReason() {
        var e = assertThrows(IllegalArgumentException.class,
                () -> SampleSize.smallest(new PairedDesign(0, 0.05, Sides.TWO_SIDED), 0.8));
        assertTrue(e.getMessage().contains("too small"), e.getMessage());
    }

    @Test
    void repeatedMeasures_epsilonBelowItsLowerBound_isRefused() {
        var e = assertThrows(IllegalArgumentException.class, () -> new RepeatedMeasuresDesign(3, 0.25, 0.5, 0.4, 0.05));
        assertTrue(e.getMessage().contains("between 1/2 and 1"), e.getMessage());
    }

    @Test
    void repeatedMeasures_wuenschWorkedExample_noncentralityAndPower() {
        // Wuensch (2005), "Power analysis for one-way repeated measures ANOVA" (course handout, East
        // Carolina University; read from a stored copy of the page): n = 64, m = 3 conditions, f^2 = .01,
        // rho = .79 give lambda = n m f^2 / (1 - rho); entered as "effect size" .143 (rounded) with
        // df 2 and 128, power = .7677. Our noncentrality is that lambda; the handout's denominator df
        // n (m - 1) = 128 differs from our (n - 1)(m - 1) = 126, so its power is checked through the
        // noncentral F with its own df and its own rounded lambda = .143 x 64, to its four decimals.
        var design = new RepeatedMeasuresDesign(3, 0.1, 0.79, 1, 0.05);
        assertEquals(64 * 3 * 0.01 / 0.21, design.test(64).noncentrality(), 1e-12);
        double critical = new org.apache.commons.math3.distribution.FDistribution(2, 128).inverseCumulativeProbability(0.95);
        assertEquals(0.7677, org.inkgate.analysis.distributions.NoncentralF.upper(critical, 2, 128, 0.143 * 64), 5e-5);
    }
}
