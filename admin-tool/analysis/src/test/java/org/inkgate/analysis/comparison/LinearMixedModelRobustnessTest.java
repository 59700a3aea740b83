package org.inkgate.analysis.comparison;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.inkgate.analysis.testutil.ReferenceData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Small, noise-only rating sets (invented, seeded) of the shape a pilot or a test produces: a few
 * candidates, two to four raters, one to three tasks, integer scores drawn at random, so most
 * variance components lie at or near zero. Commons Math's BOBYQA stopped on about 1 in 80 of these
 * with "trust region step has failed to reduce Q", which ended a whole analysis run.
 */
class LinearMixedModelRobustnessTest {

    /** One invented data set: scores, conditions and factor levels. */
    record NoiseStudy(double[] score, String[] condition, Map<String, String[]> factors) {
    }

    static NoiseStudy noiseStudy(int seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        int candidates = 3 + rnd.nextInt(15);
        int raters = 2 + rnd.nextInt(3);
        int tasks = 1 + rnd.nextInt(3);
        int span = 2 + rnd.nextInt(5);
        List<Double> score = new ArrayList<>();
        List<String> cond = new ArrayList<>();
        List<String> cand = new ArrayList<>();
        List<String> rater = new ArrayList<>();
        List<String> task = new ArrayList<>();
        for (int c = 0; c < candidates; c++) {
            for (int t = 0; t < tasks; t++) {
                for (int r = 0; r < raters; r++) {
                    score.add((double) rnd.nextInt(span));
                    cond.add((c + t) % 2 == 0 ? "a" : "b");
                    cand.add("c" + c);
                    rater.add("r" + r);
                    task.add("t" + t);
                }
            }
        }
        Map<String, String[]> f = new LinkedHashMap<>();
        f.put("candidate", cand.toArray(String[]::new));
        f.put("rater", rater.toArray(String[]::new));
        f.put("task", task.toArray(String[]::new));
        return new NoiseStudy(score.stream().mapToDouble(Double::doubleValue).toArray(), cond.toArray(String[]::new),
                f);
    }

    @Test
    void noiseOnlyData_everyFitEndsWithAnEstimateOrAClearRefusal() {
        List<String> failures = new ArrayList<>();
        for (int seed = 0; seed < 3000; seed++) {
            NoiseStudy d = noiseStudy(seed);
            try {
                LinearMixedModel m = LinearMixedModel.fit(d.score(), d.condition(), List.of("a", "b"), d.factors(),
                        0.95);
                if (!Double.isFinite(m.remlCriterion())) {
                    failures.add(seed + ": REML criterion " + m.remlCriterion());
                }
            } catch (IllegalArgumentException e) {
                // a refusal that says why (e.g. conditions confounded) is an answer
            } catch (RuntimeException e) {
                failures.add(seed + ": " + e);
            }
        }
        assertTrue(failures.isEmpty(), failures.size() + " of 3000 fits failed, first: "
                + failures.subList(0, Math.min(5, failures.size())));
    }

    /**
     * Three sets on which BOBYQA used to stop (seeds 97, 123, 170) against lme4 1.1.31 (Debian
     * r-cran-lme4, R 4.2.2), fitted by src/test/resources/reference/lmm_noise_reference.R, output
     * committed as lmm_noise_reference.txt: every variance component lies on its boundary there, the
     * fixed effects, their SEs, the residual variance and the REML criterion agree to 1e-6.
     */
    @ParameterizedTest
    @ValueSource(ints = {97, 123, 170})
    void setsThatStoppedTheOptimiser_matchLme4(int seed) throws IOException {
        List<Map<String, String>> rows = ReferenceData.rows("lmm_noise_seed_" + seed + ".csv");
        Map<String, String[]> factors = new LinkedHashMap<>();
        for (String f : List.of("candidate", "rater", "task")) {
            factors.put(f, rows.stream().map(m -> m.get(f)).toArray(String[]::new));
        }
        LinearMixedModel m = LinearMixedModel.fit(rows.stream().mapToDouble(r -> Double.parseDouble(r.get("score")))
                .toArray(), rows.stream().map(r -> r.get("condition")).toArray(String[]::new), List.of("a", "b"),
                factors, 0.95);
        Map<String, Map<String, Double>> r = lme4();
        String p = "seed" + seed;
        // source of every value: lmm_noise_reference.txt, lines seedN_* (lme4 1.1.31)
        assertEquals(r.get(p + "_fit").get("ratings"), m.ratings(), 0, "ratings (lme4 nobs)");
        assertEquals(r.get(p + "_fit").get("reml"), m.remlCriterion(), 1e-6, "REML criterion (lme4 devcomp)");
        for (int j = 0; j < 2; j++) {
            Map<String, Double> b = r.get(p + "_fixed_" + (j + 1));
            assertEquals(b.get("estimate"), m.fixedEffects().get(j).estimate(), 1e-6, "fixed effect " + j + " (fixef)");
            assertEquals(b.get("se"), m.fixedEffects().get(j).se(), 1e-6, "its SE (vcov)");
        }
        assertEquals(r.get(p + "_variance_Residual").get("variance"), m.variance(LinearMixedModel.RESIDUAL).variance(),
                1e-6, "residual variance (VarCorr)");
        for (LinearMixedModel.VarianceComponent v : m.variances()) {
            if (!v.group().equals(LinearMixedModel.RESIDUAL)) {
                assertEquals(r.get(p + "_variance_" + v.group()).get("variance"), v.variance(), 1e-6,
                        v.group() + " variance (VarCorr: on the boundary)");
            }
        }
    }

    @Test
    void identicalScores_areRefusedWithTheReason() {
        NoiseStudy d = noiseStudy(727); // every one of its 6 scores is 1
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> LinearMixedModel.fit(d.score(),
                d.condition(), List.of("a", "b"), d.factors(), 0.95));
        assertTrue(e.getMessage().contains("same score"), e.getMessage());
    }

    private static Map<String, Map<String, Double>> lme4() throws IOException {
        Map<String, Map<String, Double>> all = new HashMap<>();
        try (InputStream in = LinearMixedModelRobustnessTest.class.getResourceAsStream(
                "/reference/lmm_noise_reference.txt")) {
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                String[] w = line.trim().split("\\s+");
                if (w.length < 3 || w[0].equals("version")) {
                    continue;
                }
                Map<String, Double> m = new HashMap<>();
                for (int i = 1; i + 1 < w.length; i += 2) {
                    m.put(w[i], Double.parseDouble(w[i + 1]));
                }
                all.put(w[0], m);
            }
        }
        return all;
    }
}
