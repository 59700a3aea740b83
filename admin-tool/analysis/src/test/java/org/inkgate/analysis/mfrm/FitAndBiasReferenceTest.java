package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.mfrm.bias.BiasCell;
import org.junit.jupiter.api.Test;

/**
 * Fit statistics and bias terms against R 4.2.2 on the committed dichotomous data set
 * (reference.R): infit, outfit and point-measure correlations computed from glm's fitted
 * probabilities, and each item x rater bias as a one-intercept binomial glm with the main-effects
 * linear predictor as offset (the same likelihood with everything else anchored).
 */
class FitAndBiasReferenceTest {

    private static List<String[]> rows(String file) throws Exception {
        try (InputStream in = FitAndBiasReferenceTest.class.getResourceAsStream("/mfrm/reference/" + file)) {
            List<String> lines = new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().toList();
            return lines.subList(1, lines.size()).stream().map(l -> l.split(",")).toList();
        }
    }

    @Test
    void analyse_dichotomousData_fitStatisticsMatchR() throws Exception {
        MfrmResult r = ManyFacetRasch.analyse(ReferenceFits.data("dichotomous"),
                MfrmOptions.builder(List.of("item", "rater")).convergence(1e-8, 1e-6).build());
        Map<String, MfrmResult.Element> byKey = new HashMap<>();
        for (MfrmResult.Facet f : r.facets()) {
            for (MfrmResult.Element e : f.elements()) {
                byKey.put(f.name() + "/" + e.label(), e);
            }
        }
        int checked = 0;
        for (String[] row : rows("dichotomous-fit.csv")) {
            MfrmResult.Element e = byKey.get(row[0] + "/" + row[1]);
            assertEquals(Double.parseDouble(row[2]), e.infit(), 1e-6, "infit " + row[1]);
            assertEquals(Double.parseDouble(row[3]), e.outfit(), 1e-6, "outfit " + row[1]);
            if (!row[4].equals("NA")) {
                assertEquals(Double.parseDouble(row[4]), e.pointMeasure(), 1e-6, "point-measure " + row[1]);
            }
            checked++;
        }
        assertEquals(71, checked, "60 candidates, 8 items, 3 raters");
    }

    @Test
    void bias_itemByRater_matchesOffsetGlmPerCell() throws Exception {
        MfrmResult r = ManyFacetRasch.analyse(ReferenceFits.data("dichotomous"),
                MfrmOptions.builder(List.of("item", "rater")).convergence(1e-8, 1e-6).bias("item", "rater").build());
        Map<String, BiasCell> cells = new HashMap<>();
        for (BiasCell c : r.bias().get(0).cells()) {
            cells.put(c.first() + "/" + c.second(), c);
        }
        List<String[]> ref = rows("dichotomous-bias.csv");
        assertEquals(24, ref.size());
        for (String[] row : ref) {
            BiasCell c = cells.get(row[0] + "/" + row[1]);
            assertTrue(!c.extreme());
            assertEquals(Double.parseDouble(row[2]), c.size(), 1e-5, "size " + row[0] + "/" + row[1]);
            assertEquals(Double.parseDouble(row[3]), c.se(), 1e-5, "SE " + row[0] + "/" + row[1]);
        }
    }
}
