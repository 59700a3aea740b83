package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.mfrm.bias.BiasCell;
import org.inkgate.analysis.mfrm.bias.BiasEstimation;
import org.inkgate.analysis.mfrm.bias.BiasPair;
import org.junit.jupiter.api.Test;

/**
 * The interaction estimated jointly with the main effects (issue 18). Reference:
 * src/test/resources/reference/mfrm_clogit_interaction.R (R 4.2.2, survival 3.5.3): invented
 * ratings with a planted rater r2 x task t1 effect of +0.6 logit, and for each rater x task
 * combination a conditional logit with the main effects plus that combination's own term; its
 * coefficient and SE are in mfrm_clogit_interaction.csv.
 */
class BiasJointReferenceTest {

    @Test
    void jointBias_equalsConditionalLogitWithTheCombinationsTerm() throws Exception {
        RatingData data;
        try (InputStream in = getClass().getResourceAsStream("/reference/mfrm_interaction_ratings.csv")) {
            data = RatingCsvReader.read(new InputStreamReader(in, StandardCharsets.UTF_8), "mfrm_interaction_ratings.csv");
        }
        MfrmResult joint = ManyFacetRasch.analyse(data, MfrmOptions.builder(List.of("task", "rater"))
                .bias("rater", "task").biasEstimation(BiasEstimation.JOINT).build());
        MfrmResult fixed = ManyFacetRasch.analyse(data, MfrmOptions.builder(List.of("task", "rater"))
                .bias("rater", "task").build());
        Map<String, BiasCell> jointCells = cells(joint.bias().get(0));
        Map<String, BiasCell> fixedCells = cells(fixed.bias().get(0));
        assertEquals(BiasEstimation.JOINT, joint.bias().get(0).estimation());
        List<String> ref;
        try (InputStream in = getClass().getResourceAsStream("/reference/mfrm_clogit_interaction.csv")) {
            ref = new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().toList();
        }
        for (String line : ref.subList(1, ref.size())) {
            String[] f = line.split(",");
            BiasCell c = jointCells.get(f[0] + "/" + f[1]);
            // (R's count includes the one extreme candidate's ratings, set aside here as in R's limit)
            assertEquals(Double.parseDouble(f[3]), c.size(), 1e-4, "size " + line);
            assertEquals(Double.parseDouble(f[4]), c.se(), 1e-4, "SE " + line);
        }
        assertEquals(12, ref.size() - 1, "every rater x task combination compared");
        // the planted combination: held-fixed main effects absorb part of it, the joint term does not
        double fixedSize = fixedCells.get("r2/t1").size();
        double jointSize = jointCells.get("r2/t1").size();
        assertTrue(jointSize > fixedSize + 0.05, "joint " + jointSize + " vs fixed " + fixedSize);
    }

    private static Map<String, BiasCell> cells(BiasPair pair) {
        Map<String, BiasCell> out = new HashMap<>();
        for (BiasCell c : pair.cells()) {
            out.put(c.first() + "/" + c.second(), c);
        }
        return out;
    }
}
