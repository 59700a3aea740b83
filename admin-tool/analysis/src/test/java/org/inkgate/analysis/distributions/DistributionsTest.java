package org.inkgate.analysis.distributions;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class DistributionsTest {

    @Test
    void studentizedRangeQuantile_rTable_matchesToSixDigits() {
        // qtukey(.95, 3, 10) = 3.876777 (R 4.2.2, METHODS.md)
        assertEquals(3.876777, StudentizedRange.quantile(0.95, 3, 10), 1e-6);
        // qtukey(.95, 2, df = 3..11) (R 4.2.2, METHODS.md), to 5e-5 only: R's own values differ
        // from the exact sqrt(2) qt(.975, df) by up to 2e-5 (see the next test)
        double[] expected = {4.500659, 3.926503, 3.635351, 3.460456, 3.344084, 3.261182, 3.199173,
            3.151064, 3.112663};
        for (int df = 3; df <= 11; df++) {
            assertEquals(expected[df - 3], StudentizedRange.quantile(0.95, 2, df), 5e-5, "df " + df);
        }
    }

    @Test
    void studentizedRangeQuantile_twoMeans_equalsSqrtTwoTimesT() {
        // for k = 2, Q = sqrt(2) |T_df| exactly, so qtukey(.95, 2, df) = sqrt(2) qt(.975, df)
        // (identity; t quantiles from Commons Math). R 4.2.2 prints 6.079637 for df = 2, which is
        // 0.005 below this exact 6.084870: R's qtukey stops its secant search at a coarse tolerance
        // ([memory]: its help page warns the quantile is accurate only to a few digits), so df = 2 is checked here.
        for (int df = 2; df <= 11; df++) {
            double exact = Math.sqrt(2) * new org.apache.commons.math3.distribution.TDistribution(df)
                    .inverseCumulativeProbability(0.975);
            assertEquals(exact, StudentizedRange.quantile(0.95, 2, df), 1e-8, "df " + df);
        }
    }

    @Test
    void studentizedRangeCdf_rValue_matches() {
        // ptukey(3.5, 3, 12) = 0.9300045 (R 4.2.2, METHODS.md)
        assertEquals(0.9300045, StudentizedRange.cdf(3.5, 3, 12), 1e-7);
    }

    @Test
    void rangeOfTwoNormals_closedForm_matches() {
        // the range of two standard normals is |Z1 - Z2| ~ sqrt(2) |Z|: P(R <= w) = 2 Phi(w / sqrt 2) - 1
        // (textbook identity; Phi from Commons Math)
        var std = new org.apache.commons.math3.distribution.NormalDistribution(0, 1);
        for (double w : new double[] {0.3, 1, 2.5, 4}) {
            assertEquals(2 * std.cumulativeProbability(w / Math.sqrt(2)) - 1, StudentizedRange.rangeCdf(w, 2), 1e-10);
        }
    }

    @Test
    void noncentralT_zeroDelta_equalsCentralT() {
        // delta = 0 is Student's t (Commons Math TDistribution as reference)
        var t = new org.apache.commons.math3.distribution.TDistribution(7);
        for (double x : new double[] {-3, -0.5, 0, 1.2, 4}) {
            assertEquals(t.cumulativeProbability(x), NoncentralT.cdf(x, 7, 0), 1e-10);
        }
    }

    @Test
    void noncentralT_rPtWithNcp_matches() {
        // R 4.2.2 pt(t, df, ncp) (Lenth's AS 243): planning_reference.R, output planning_reference.txt
        for (var m : org.inkgate.analysis.planning.PlanningReference.lines("pt")) {
            double t = m.get("t"), df = m.get("df"), ncp = m.get("ncp");
            assertEquals(m.get("lower"), NoncentralT.cdf(t, df, ncp), 1e-10, m.toString());
            assertEquals(m.get("upper"), NoncentralT.upper(t, df, ncp), 1e-10, m.toString());
        }
    }

    @Test
    void noncentralT_seriesAndQuadrature_agree() {
        // two independent computations of the same expectation: Lenth's series and quadrature over S.
        // They agree to 5e-8; the quadrature is the looser one at small df: for t -8, df 2.5, delta -6
        // it is 1.8e-8 below R's pt(-8, 2.5, -6) = 0.392919410538306 (R 4.2.2, run by hand), which the
        // series matches to 1e-15.
        for (double df : new double[] {1, 2.5, 7, 30, 250}) {
            for (double delta : new double[] {-6, -1.5, 0, 0.7, 3, 9}) {
                for (double t : new double[] {-8, -2, -0.3, 0, 0.4, 1.9, 5, 12}) {
                    assertEquals(NoncentralT.byQuadrature(t, df, delta), Lenth243.cdf(t, df, delta), 5e-8,
                            "t " + t + " df " + df + " delta " + delta);
                }
            }
        }
    }

    @Test
    void noncentralT_beyondTheSeriesLimit_usesQuadrature() {
        // |delta| above AS 243's underflow limit: the quadrature, still a distribution function
        double p = NoncentralT.cdf(40, 20, 39);
        assertEquals(NoncentralT.byQuadrature(40, 20, 39), p, 0);
        assertEquals(true, p > 0.3 && p < 0.8, "P(T <= 40 | delta 39, df 20) = " + p);
    }

    @Test
    void noncentralF_rPfWithNcp_matches() {
        // R 4.2.2 pf(f, df1, df2, ncp) both tails (R's pnbeta, error bound 1e-9): planning_reference.txt
        for (var m : org.inkgate.analysis.planning.PlanningReference.lines("pf")) {
            double f = m.get("f"), d1 = m.get("df1"), d2 = m.get("df2"), ncp = m.get("ncp");
            assertEquals(m.get("lower"), NoncentralF.cdf(f, d1, d2, ncp), 1e-8, m.toString());
            assertEquals(m.get("upper"), NoncentralF.upper(f, d1, d2, ncp), 1e-8, m.toString());
        }
    }

    @Test
    void noncentralF_zeroNoncentrality_isCentralF() {
        // lambda = 0 is the central F (Commons Math FDistribution as reference)
        var f = new org.apache.commons.math3.distribution.FDistribution(3, 17);
        for (double x : new double[] {0.2, 1, 2.7, 6}) {
            assertEquals(f.cumulativeProbability(x), NoncentralF.cdf(x, 3, 17, 0), 1e-12);
            assertEquals(1 - f.cumulativeProbability(x), NoncentralF.upper(x, 3, 17, 0), 1e-12);
        }
    }

    @Test
    void noncentralF_largeNoncentrality_tailsSumToOne() {
        // far above AS 226's underflow point (exp(-lambda/2) = 0 in doubles): the outward sum still works
        double lower = NoncentralF.cdf(300, 4, 50, 1600);
        double upper = NoncentralF.upper(300, 4, 50, 1600);
        assertEquals(1, lower + upper, 1e-12);
        assertEquals(true, lower > 0.05 && lower < 0.95, "lower " + lower);
    }
}
