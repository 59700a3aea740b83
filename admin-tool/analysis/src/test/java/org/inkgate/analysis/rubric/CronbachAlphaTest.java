package org.inkgate.analysis.rubric;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.inkgate.analysis.testutil.ReferenceData;
import org.junit.jupiter.api.Test;

class CronbachAlphaTest {

    @Test
    void alpha_shroutFleissJudgesAsItems_matchesPsych() {
        // alpha 0.9093155 (= ICC3k), if-deleted 0.8833922 0.8665049 0.8715486 0.9178744 (R 4.2.2, METHODS.md)
        double[][] t = ReferenceData.rows("shrout_fleiss_1979.csv").stream()
                .map(r -> new double[] {Double.parseDouble(r.get("J1")), Double.parseDouble(r.get("J2")),
                    Double.parseDouble(r.get("J3")), Double.parseDouble(r.get("J4"))})
                .toArray(double[][]::new);
        CronbachAlpha a = CronbachAlpha.of(t, 0.95);
        assertEquals(0.9093155, a.alpha(), 1e-7);
        double[] deleted = {0.8833922, 0.8665049, 0.8715486, 0.9178744};
        for (int i = 0; i < 4; i++) {
            assertEquals(deleted[i], a.alphaIfDeleted()[i], 1e-7);
        }
    }

    @Test
    void feldtInterval_publishedArithmetic_matchesR() {
        // alpha .83, n 100, k 20 gives [0.7776476, 0.8748043] (R 4.2.2 arithmetic, METHODS.md)
        double[] ci = CronbachAlpha.feldt(0.83, 100, 20, 0.95);
        assertEquals(0.7776476, ci[0], 1e-7);
        assertEquals(0.8748043, ci[1], 1e-7);
    }
}
