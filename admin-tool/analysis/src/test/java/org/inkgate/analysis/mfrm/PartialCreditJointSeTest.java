package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Joint SEs under partial credit by a modelled facet (issue 18): an element's measure trades off
 * against its own thresholds, so the covariance must be the one of the reported centring.
 * Reference: src/test/resources/reference/mfrm_clogit_pcm.R, R 4.2.2 survival::clogit fitting the
 * same fixed-effects adjacent-category likelihood as a conditional logit over each rating's
 * categories, SEs of the centred task and rater measures and thresholds from vcov() through the
 * contrast matrices; output mfrm_clogit_pcm.csv (and .txt) beside it.
 */
class PartialCreditJointSeTest {
    /** SEs and separation: R's fit converged to 1e-10, ours to the default 1e-4 logit change. */
    private static final double SE_LIMIT = 1e-5;

    @Test
    void partialCreditByTask_jointSesEqualConditionalLogitCovarianceOfCentredParameters() throws Exception {
        Map<String, Map<String, double[]>> ref = reference("mfrm_clogit_pcm.csv");
        MfrmResult r = ManyFacetRasch.analyse(ReferenceFits.data("ratingscale-2000"),
                MfrmOptions.builder(List.of("task", "rater")).structure(new ScaleStructure.PartialCredit("task")).build());
        assertTrue(r.convergence().converged(), r.convergence().toString());
        for (String facet : List.of("task", "rater")) {
            for (MfrmResult.Element e : r.facet(facet).elements()) {
                double[] expected = ref.get(facet).get(e.label());
                assertEquals(expected[0], e.measure(), 1e-4, facet + " " + e.label() + " measure");
                assertEquals(expected[1], e.jointSe(), SE_LIMIT, facet + " " + e.label() + " joint SE");
            }
        }
        for (MfrmResult.Scale s : r.scales()) {
            for (int k = 1; k < s.categories().size(); k++) {
                double[] expected = ref.get("threshold").get(s.label() + ":F" + k);
                assertEquals(expected[0], s.categories().get(k).threshold(), 1e-4, s.label() + " F" + k);
                assertEquals(expected[1], s.categories().get(k).thresholdJointSe(), SE_LIMIT,
                        s.label() + " F" + k + " joint SE");
            }
        }
        Map<String, double[]> summary = ref.get("task_summary");
        var sep = r.facet("task").separationJointSe();
        assertEquals(summary.get("rmse")[0], sep.rmse(), SE_LIMIT, "task RMSE from joint SEs");
        assertEquals(summary.get("separation")[0], sep.separation(), 1e-3, "task separation from joint SEs");
        assertEquals(summary.get("reliability")[0], sep.reliability(), 1e-4, "task reliability from joint SEs");
    }

    /** facet -> element -> {measure, se}, from a file written by an R script in /reference. */
    static Map<String, Map<String, double[]>> reference(String file) throws IOException {
        Map<String, Map<String, double[]>> out = new LinkedHashMap<>();
        try (InputStream in = PartialCreditJointSeTest.class.getResourceAsStream("/reference/" + file)) {
            List<String> lines = new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().toList();
            for (String line : lines.subList(1, lines.size())) {
                String[] f = line.split(",");
                out.computeIfAbsent(f[0], k -> new LinkedHashMap<>()).put(f[1],
                        new double[] {Double.parseDouble(f[2]), f.length < 4 || f[3].equals("NA") ? Double.NaN : Double.parseDouble(f[3])});
            }
        }
        return out;
    }
}
