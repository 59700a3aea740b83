package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.inkgate.analysis.mfrm.estimation.CategoryModel;
import org.junit.jupiter.api.Test;

/**
 * The whole path the admin tool will take: the tidy ratings table as text, read, analysed with
 * condition as a facet of its own (tasks and conditions crossed by two counterbalanced forms),
 * level as a grouping column for bias, and the summary map. Invented scenario, fixed seed.
 */
class TidyCsvEndToEndTest {

    private static String tidyCsv() {
        Random rng = new Random(2027);
        StringBuilder sb = new StringBuilder(String.join(",", RatingCsvReader.TIDY_HEADER)).append('\n');
        String[] conditions = {"no-tools", "dictionary"};
        double[] f = {0, -1.2, -0.3, 0.4, 1.1};
        double[] p = new double[5];
        for (int c = 0; c < 240; c++) {
            String level = c % 4 < 2 ? "B1" : "B2";
            String form = c % 2 == 0 ? "A" : "B";
            double ability = (level.equals("B2") ? 0.8 : -0.4) + 0.9 * rng.nextGaussian();
            int[] raters = Simulation.pick(rng, 6, 2);
            for (int t = 0; t < 2; t++) {
                int cond = (t + (form.equals("A") ? 0 : 1)) % 2;
                for (int r : raters) {
                    for (int k = 0; k < 3; k++) {
                        double eta = ability - (t == 0 ? -0.2 : 0.2) - (cond == 0 ? 0.15 : -0.15)
                                - (r - 2.5) * 0.2 - (k - 1) * 0.3;
                        CategoryModel.probabilities(eta, f, 4, p);
                        double u = rng.nextDouble();
                        int x = 0;
                        double cum = p[0];
                        while (u > cum && x < 4) {
                            cum += p[++x];
                        }
                        sb.append(String.format("k%03d,%s,%s,task%d,%s,rater%d,crit%d,%d%n", c, level, form, t + 1,
                                conditions[cond], r + 1, k + 1, x));
                    }
                }
            }
        }
        return sb.toString();
    }

    @Test
    void analyse_tidyTableWithCrossedConditions_separatesConditionFromTask() throws Exception {
        RatingData data = RatingCsvReader.read(new StringReader(tidyCsv()), "ratings.csv");
        MfrmResult r = ManyFacetRasch.analyse(data, MfrmOptions.builder(List.of("task", "condition", "rater", "criterion"))
                .bias("condition", "level").bias("task", "level").build());
        assertTrue(r.convergence().converged());
        assertEquals(240 * 2 * 2 * 3, r.model().ratings());
        // the dictionary condition was simulated 0.3 logits easier than no tools
        List<MfrmResult.Element> conds = r.facet("condition").elements();
        double noTools = conds.stream().filter(e -> e.label().equals("no-tools")).findFirst().orElseThrow().measure();
        double dict = conds.stream().filter(e -> e.label().equals("dictionary")).findFirst().orElseThrow().measure();
        assertEquals(0.3, noTools - dict, 0.15);
        Map<String, Object> summary = r.summary();
        assertEquals(List.of("model", "convergence", "facets", "scales", "unexpected", "bias", "warnings"),
                List.copyOf(summary.keySet()));
        assertEquals(2, ((List<?>) summary.get("bias")).size());
        assertNotNull(r.facet("condition").separationJointSe());
    }
}
