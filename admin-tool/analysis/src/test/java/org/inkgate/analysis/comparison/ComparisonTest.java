package org.inkgate.analysis.comparison;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.inkgate.analysis.testutil.ReferenceData;
import org.junit.jupiter.api.Test;

class ComparisonTest {

    private static final double[] SLEEP_1 = ReferenceData.column("sleep.csv", "extra", "group", "1");
    private static final double[] SLEEP_2 = ReferenceData.column("sleep.csv", "extra", "group", "2");

    @Test
    void paired_sleep_matchesR() {
        // t.test(extra[group==1], extra[group==2], paired = TRUE): t -4.062128, df 9, p 0.002833,
        // CI [-2.4598858, -0.7001142]; d_z -1.2845576, d_av -0.8334963 (R 4.2.2, METHODS.md).
        // Ours reports b - a, so a = group 2, b = group 1 gives R's signs.
        PairedComparison c = PairedComparison.of(SLEEP_2, SLEEP_1, 0.95);
        assertEquals(-4.062128, c.t(), 1e-6);
        assertEquals(9, c.df());
        assertEquals(0.002833, c.p(), 5e-7);
        assertEquals(-2.4598858, c.differenceLower(), 1e-7);
        assertEquals(-0.7001142, c.differenceUpper(), 1e-7);
        assertEquals(-1.2845576, c.dz(), 1e-7);
        assertEquals(-0.8334963, c.dav(), 1e-7);
    }

    @Test
    void paired_sleepDzInterval_matchesScipyNoncentralT() {
        // scipy 1.10.1 stats.nct inverted by brentq: [0.41462775638, 2.11801651398]
        // (scipy_reference.py / scipy_reference.txt, line sleep_dz_ci)
        PairedComparison c = PairedComparison.of(SLEEP_1, SLEEP_2, 0.95);
        assertEquals(0.41462775638040206, c.dzLower(), 1e-6);
        assertEquals(2.118016513981466, c.dzUpper(), 1e-6);
    }

    @Test
    void paired_lakensMovies_matchesPaper() {
        // Lakens (2013): paired t(9) = 4.74, d_z = 1.50
        double[] m1 = {9, 7, 8, 9, 8, 9, 9, 10, 9, 9};
        double[] m2 = {9, 6, 7, 8, 7, 9, 8, 8, 8, 7};
        PairedComparison c = PairedComparison.of(m2, m1, 0.95);
        assertEquals(4.74, c.t(), 0.005);
        assertEquals(1.50, c.dz(), 0.005);
    }

    @Test
    void paired_allDifferencesEqual_explainsInsteadOfNaN() {
        PairedComparison c = PairedComparison.of(new double[] {1, 2, 3}, new double[] {2, 3, 4}, 0.95);
        assertTrue(c.cautions().get(0).contains("all paired differences are equal"));
    }

    @Test
    void independent_sleep_matchesR() {
        // Welch: t -1.8608, df 17.776, p 0.07939, CI [-3.3654832, 0.2054832];
        // Student: df 18, p 0.07919, CI [-3.363874, 0.203874] (R 4.2.2, METHODS.md)
        IndependentComparison c = IndependentComparison.of(SLEEP_1, SLEEP_2, 0.95);
        assertEquals(-1.8608, c.welchT(), 5e-5);
        assertEquals(17.776, c.welchDf(), 5e-4);
        assertEquals(0.07939, c.welchP(), 5e-6);
        assertEquals(-3.3654832, c.welchLower(), 1e-7);
        assertEquals(0.2054832, c.welchUpper(), 1e-7);
        assertEquals(-1.8608, c.studentT(), 5e-5);
        assertEquals(0.07919, c.studentP(), 5e-6);
        assertEquals(-3.363874, c.studentLower(), 1e-6);
        assertEquals(0.203874, c.studentUpper(), 1e-6);
    }

    @Test
    void independent_lakensMovies_matchPaperAndScipy() {
        // Lakens (2013): t(18) = 2.52, p = .022, d_s = 1.13 [0.16, 2.06], g_s = 1.08;
        // the CI to 1e-6 from scipy 1.10.1 nct (scipy_reference.txt, lakens_movie_ds_ci)
        double[] m1 = {9, 7, 8, 9, 8, 9, 9, 10, 9, 9};
        double[] m2 = {9, 6, 7, 8, 7, 9, 8, 8, 8, 7};
        IndependentComparison c = IndependentComparison.of(m1, m2, 0.95);
        assertEquals(2.52, c.studentT(), 0.005);
        assertEquals(0.022, c.studentP(), 0.0005);
        assertEquals(1.13, c.ds(), 0.005);
        assertEquals(1.08, c.hedgesG(), 0.005);
        assertEquals(0.16307653243951173, c.dsLower(), 1e-6);
        assertEquals(2.0621458336122, c.dsUpper(), 1e-6);
    }

    @Test
    void wilcoxon_sleepWithTiesAndZero_matchesScipyApprox() {
        // scipy 1.10.1 wilcoxon(zero_method='wilcox', correction=True, method='approx'): p 0.009090698015925054
        // (scipy_reference.txt); R's wilcox.test gives the same 0.009091 [memory]
        WilcoxonSignedRank w = WilcoxonSignedRank.of(SLEEP_1, SLEEP_2);
        assertEquals(9, w.nonZero());
        assertEquals(45, w.v());
        assertEquals(0.009090698015925054, w.p(), 1e-9);
        assertTrue(w.cautions().stream().anyMatch(c -> c.contains("zero difference")));
    }

    @Test
    void wilcoxon_noTies_isExactAndMatchesScipy() {
        // scipy 1.10.1 wilcoxon(x - 160.3, method='exact'): p 0.240234375, statistic min(V+, V-) 19 (scipy_reference.txt)
        double[] x = {148, 154, 158, 160, 161, 162, 166, 170, 182, 195, 236};
        double[] zero = new double[x.length];
        double[] shifted = java.util.Arrays.stream(x).map(v -> v - 160.3).toArray();
        WilcoxonSignedRank w = WilcoxonSignedRank.of(zero, shifted);
        assertTrue(w.exact());
        assertEquals(0.240234375, w.p(), 1e-12);
        assertEquals(47, w.v());
    }

    @Test
    void holm_textbookExample_matchesDefinition() {
        // Holm (1979) step-down by hand: sorted p .01 .02 .03 .04 times 4 3 2 1 -> .04 .06 .06 .06 (cumulative max)
        assertArrayEquals(new double[] {0.06, 0.04, 0.06, 0.06},
                Holm.adjust(new double[] {0.03, 0.01, 0.04, 0.02}), 1e-12);
    }

    @Test
    void holm_nanPValue_staysNaNAndIsNotCounted() {
        double[] adj = Holm.adjust(new double[] {0.01, Double.NaN, 0.04});
        assertEquals(0.02, adj[0], 1e-12);
        assertTrue(Double.isNaN(adj[1]));
        assertEquals(0.04, adj[2], 1e-12);
    }
}
