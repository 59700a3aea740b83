package org.inkgate.analysis.comparison;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * SIMULATED studies (seeded, invented): 60 candidates write under three conditions, one task per
 * condition rotated over 6 tasks, each response rated by 2 of 10 raters; candidate SD 1.0, rater SD
 * 0.4, task SD 0.3, residual SD 0.8. A planted effect of 0.5 for "full" is found (Wald interval
 * excludes 0) in every replication; the null "spelling" effect in at most 2 of 20 (a 95% interval
 * is expected to miss 0 about once in twenty). The variance components come out near the truth.
 */
class LinearMixedModelSimulationTest {

    private static final int REPLICATIONS = 20;
    private static final List<String> CONDITIONS = List.of("none", "spelling", "full");

    record Study(double[] score, String[] condition, Map<String, String[]> factors) {
    }

    static Study simulate(long seed, double spellingEffect, double fullEffect) {
        Random rnd = new Random(seed);
        double[] cand = gauss(rnd, 60, 1.0), rater = gauss(rnd, 10, 0.4), task = gauss(rnd, 6, 0.3);
        double[] effect = {0, spellingEffect, fullEffect};
        List<Double> y = new ArrayList<>();
        List<String> cond = new ArrayList<>(), c = new ArrayList<>(), r = new ArrayList<>(), t = new ArrayList<>();
        for (int i = 0; i < 60; i++) {
            for (int j = 0; j < 3; j++) {
                int k = (i + 2 * j) % 6;
                int r1 = rnd.nextInt(10), r2 = (r1 + 1 + rnd.nextInt(9)) % 10;
                for (int q : new int[] {r1, r2}) {
                    y.add(5 + effect[j] + cand[i] + rater[q] + task[k] + 0.8 * rnd.nextGaussian());
                    cond.add(CONDITIONS.get(j));
                    c.add("C" + i);
                    r.add("R" + q);
                    t.add("T" + k);
                }
            }
        }
        Map<String, String[]> f = new LinkedHashMap<>();
        f.put("candidate", c.toArray(String[]::new));
        f.put("rater", r.toArray(String[]::new));
        f.put("task", t.toArray(String[]::new));
        return new Study(y.stream().mapToDouble(Double::doubleValue).toArray(), cond.toArray(String[]::new), f);
    }

    private static double[] gauss(Random rnd, int n, double sd) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = sd * rnd.nextGaussian();
        }
        return v;
    }

    private static LinearMixedModel fit(Study s) {
        return LinearMixedModel.fit(s.score(), s.condition(), CONDITIONS, s.factors(), 0.95);
    }

    @Test
    void plantedEffectFound_nullEffectNot() {
        int nullFlagged = 0;
        double sumFull = 0, sumCandidate = 0, sumResidual = 0;
        for (int rep = 0; rep < REPLICATIONS; rep++) {
            LinearMixedModel m = fit(simulate(7_000 + rep, 0, 0.5));
            assertTrue(m.effectOf("full").intervalExcludesZero() && m.effectOf("full").estimate() > 0,
                    "replication " + rep + ": planted effect 0.5 not found: " + m.effectOf("full"));
            nullFlagged += m.effectOf("spelling").intervalExcludesZero() ? 1 : 0;
            sumFull += m.effectOf("full").estimate();
            sumCandidate += m.variance("candidate").variance();
            sumResidual += m.variance(LinearMixedModel.RESIDUAL).variance();
        }
        assertTrue(nullFlagged <= 2, "null effect flagged in " + nullFlagged + " of " + REPLICATIONS);
        assertEquals(0.5, sumFull / REPLICATIONS, 0.05, "mean estimate of the planted effect");
        assertEquals(1.0, sumCandidate / REPLICATIONS, 0.2, "mean candidate variance (true 1.0)");
        assertEquals(0.64, sumResidual / REPLICATIONS, 0.05, "mean residual variance (true 0.64)");
    }

    @Test
    void noEffectAnywhere_intervalsCoverZero_mostly() {
        int flagged = 0;
        for (int rep = 0; rep < REPLICATIONS; rep++) {
            LinearMixedModel m = fit(simulate(9_000 + rep, 0, 0));
            flagged += m.effectOf("full").intervalExcludesZero() ? 1 : 0;
        }
        assertTrue(flagged <= 2, "null effect flagged in " + flagged + " of " + REPLICATIONS);
    }

    @Test
    void singleTask_isLeftOutWithACaution_andUnknownConditionIsRefused() {
        Study s = simulate(1, 0, 0.5);
        String[] oneTask = new String[s.score().length];
        java.util.Arrays.fill(oneTask, "T");
        Map<String, String[]> f = new LinkedHashMap<>(s.factors());
        f.put("task", oneTask);
        LinearMixedModel m = LinearMixedModel.fit(s.score(), s.condition(), CONDITIONS, f, 0.95);
        assertEquals(3, m.variances().size(), "candidate, rater, residual");
        assertTrue(m.cautions().get(0).contains("only one task"), m.cautions().toString());
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> LinearMixedModel.fit(s.score(), s.condition(), List.of("none", "full"), s.factors(), 0.95));
        assertTrue(e.getMessage().contains("'spelling'"), e.getMessage());
    }
}
