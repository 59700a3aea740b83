package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Random;
import org.inkgate.analysis.mfrm.bias.BiasCell;
import org.inkgate.analysis.mfrm.bias.BiasPair;
import org.inkgate.analysis.mfrm.estimation.CategoryModel;
import org.junit.jupiter.api.Test;

/** Planted interactions are found with the right sign and size; a column that is not a facet works too. */
class BiasTest {
    private static final double PLANTED = 1.0;

    /** 300 candidates (level A or B, crossed with form), 2 conditions by form, 2 tasks, 6 raters, 4 categories. */
    private static RatingData planted() {
        Random rng = new Random(99);
        double[] rater = Simulation.spread(6, 0.6);
        double[] task = {-0.2, 0.2};
        double[] cond = {-0.15, 0.15};
        double[] f = {0, -1.0, 0.0, 1.0};
        RatingData.Builder b = RatingData.builder(List.of("level", "task", "condition", "rater"));
        double[] p = new double[4];
        for (int c = 0; c < 300; c++) {
            String level = (c / 2) % 2 == 0 ? "A" : "B"; // half each, crossed with form (c % 2)
            double ability = (level.equals("A") ? 1.0 : -0.5) + rng.nextGaussian() * 0.8;
            for (int t = 0; t < 2; t++) {
                int k = (t + c) % 2;
                for (int r = 0; r < 6; r++) {
                    double eta = ability - task[t] - cond[k] - rater[r];
                    if (r == 0 && t == 1) {
                        eta -= PLANTED; // rater1 harsher on task2 than overall
                    }
                    if (k == 1 && level.equals("B")) {
                        eta += 0.8; // condition2 helps level B more
                    }
                    CategoryModel.probabilities(eta, f, 3, p);
                    double u = rng.nextDouble();
                    int x = 0;
                    double cum = p[0];
                    while (u > cum && x < 3) {
                        cum += p[++x];
                    }
                    b.add("c" + c, new String[] {level, "task" + (t + 1), "cond" + (k + 1), "rater" + (r + 1)}, x);
                }
            }
        }
        return b.build();
    }

    @Test
    void bias_raterByTask_findsThePlantedInteraction() {
        MfrmResult r = ManyFacetRasch.analyse(planted(), MfrmOptions.builder(List.of("task", "condition", "rater"))
                .bias("rater", "task").bias("condition", "level").build());
        BiasPair rt = r.bias().get(0);
        assertEquals(12, rt.cells().size());
        BiasCell cell = rt.cells().stream().filter(c -> c.first().equals("rater1") && c.second().equals("task2"))
                .findFirst().orElseThrow();
        // the main effects absorb part of the planted -1 (rater1 and task2 look harsher overall),
        // so the cell's bias is clearly negative but smaller in size than the plant
        assertTrue(cell.size() < -0.4 && cell.size() > -1.3, "size " + cell.size());
        assertTrue(cell.t() < -3, "t " + cell.t());
        assertTrue(cell.observedMinusExpectedAverage() < 0);
        assertEquals(cell.count() - 1, cell.df());
        assertTrue(cell.count() >= 290, "about 300 ratings, fewer if a candidate was extreme");
        assertTrue(rt.p() < 0.001, "chi-square p " + rt.p());

        BiasPair cl = r.bias().get(1);
        assertEquals("condition", cl.first());
        BiasCell b2 = cl.cells().stream().filter(c -> c.first().equals("cond2") && c.second().equals("B"))
                .findFirst().orElseThrow();
        // the condition and candidate main effects absorb most of the plant; what is left is
        // positive for cond2 x B and negative for cond2 x A
        assertTrue(b2.size() > 0 && b2.p() < 0.01, b2.toString());
        BiasCell a2 = cl.cells().stream().filter(c -> c.first().equals("cond2") && c.second().equals("A"))
                .findFirst().orElseThrow();
        assertTrue(a2.size() < 0 && a2.p() < 0.01, a2.toString());
        assertTrue(cl.p() < 0.001, "chi-square p " + cl.p());
    }

    @Test
    void summary_biasSection_hasStableKeys() {
        MfrmResult r = ManyFacetRasch.analyse(planted(), MfrmOptions.builder(List.of("task", "condition", "rater"))
                .bias("rater", "task").build());
        @SuppressWarnings("unchecked")
        Map<String, Object> b = (Map<String, Object>) ((List<?>) r.summary().get("bias")).get(0);
        assertEquals(List.of("first", "second", "cellCount", "chiSquare", "df", "p", "significantCells", "estimation", "notEstimable",
                "cells"),
                List.copyOf(b.keySet()));
        @SuppressWarnings("unchecked")
        Map<String, Object> top = (Map<String, Object>) ((List<?>) b.get("cells")).get(0);
        // listed largest |t| first: with two tasks, rater1's cells on task1 and task2 mirror each other
        assertEquals("rater1", top.get("first"));
        @SuppressWarnings("unchecked")
        Map<String, Object> second = (Map<String, Object>) ((List<?>) b.get("cells")).get(1);
        assertEquals("rater1", second.get("first"));
    }
}
