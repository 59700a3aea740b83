package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Adjusted scores (issue 18): each element's model-expected raw score of one rating with every
 * other facet at its mean. Reference: src/test/resources/reference/mfrm_adjusted_scores.R (R 4.2.2),
 * computed from the VGAM reference fits of ratingscale-2000.csv (rating scale, and partial credit by
 * task), output mfrm_adjusted_scores.csv.
 */
class AdjustedScoresReferenceTest {

    @Test
    void adjustedScores_equalExpectedScoresFromTheReferenceFits() throws Exception {
        Map<String, Double> ref = new HashMap<>();
        try (InputStream in = getClass().getResourceAsStream("/reference/mfrm_adjusted_scores.csv")) {
            List<String> lines = new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().toList();
            for (String line : lines.subList(1, lines.size())) {
                String[] f = line.split(",");
                ref.put(f[0] + "/" + f[1] + "/" + f[2], Double.parseDouble(f[3]));
            }
        }
        RatingData data = ReferenceFits.data("ratingscale-2000");
        int compared = 0;
        for (String structure : List.of("rating_scale", "partial_credit_task")) {
            MfrmOptions.Builder b = MfrmOptions.builder(List.of("task", "rater")).convergence(1e-7, 1e-6);
            if (structure.startsWith("partial")) {
                b.structure(new ScaleStructure.PartialCredit("task"));
            }
            MfrmResult r = ManyFacetRasch.analyse(data, b.build());
            for (MfrmResult.Facet f : r.facets()) {
                for (MfrmResult.Element e : f.elements()) {
                    String key = structure + "/" + f.name() + "/" + e.label();
                    assertEquals(ref.get(key), e.adjustedScore(), 1e-5, key);
                    assertTrue(e.adjustedLow() < e.adjustedScore() && e.adjustedScore() < e.adjustedHigh(), key);
                    assertTrue(e.adjustedLow() >= 0 && e.adjustedHigh() <= 4, key + " within the 0-4 scale");
                    compared++;
                }
            }
        }
        assertEquals(ref.size(), compared, "every reference value compared");
    }
}
