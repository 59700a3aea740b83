package org.inkgate.analysis.usage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ContingencyTest {

    @Test
    void chiSquare_3x3_matchesScipy() {
        // scipy 1.10.1 chi2_contingency(correction=False): 45.77067669172933, df 4, p 2.7488765568966145e-09
        Contingency c = Contingency.of(new long[][] {{16, 4, 0}, {3, 12, 5}, {0, 5, 15}});
        assertEquals(45.77067669172933, c.chiSquare(), 1e-9);
        assertEquals(4, c.df());
        assertEquals(2.7488765568966145e-09, c.chiSquareP(), 1e-15);
        // every expected count is at least 5 (smallest 20 x 19 / 60): chi-square is the test read
        assertEquals("Pearson chi-square", c.method());
    }

    @Test
    void fisher_2x2_matchesScipy() {
        // scipy 1.10.1 fisher_exact: [[20,5],[10,15]] p 0.008578508150469124; [[3,1],[1,3]] p 0.48571428571428565
        assertEquals(0.008578508150469124, Contingency.FisherExact.p(new long[][] {{20, 5}, {10, 15}},
                new long[] {25, 25}, new long[] {30, 20}, 50, 1_000_000), 1e-12);
        Contingency small = Contingency.of(new long[][] {{3, 1}, {1, 3}});
        assertEquals(0.48571428571428565, small.fisherP(), 1e-12);
        assertEquals(small.fisherP(), small.p());
    }

    @Test
    void fisher_rByC_matchesR() {
        // R 4.2.2 fisher.test: 3x3 [[16,4,0],[3,12,5],[0,5,15]] p 4.17201431196158e-10;
        // 3x2 [[5,0],[3,1],[0,4]] (r_reference.R / r_reference.txt)
        assertEquals(4.17201431196158e-10, Contingency.fisherExact(new long[][] {{16, 4, 0}, {3, 12, 5}, {0, 5, 15}}),
                1e-15);
        assertEquals(0.00699300699300698, Contingency.of(new long[][] {{5, 0}, {3, 1}, {0, 4}}).fisherP(), 1e-12);
    }

    @Test
    void contingency_singleRow_saysWhy() {
        Contingency c = Contingency.of(new long[][] {{3, 4}, {0, 0}});
        assertTrue(c.cautions().get(0).contains("at least 2 non-empty rows"));
    }
}
