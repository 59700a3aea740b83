package org.inkgate.analysis.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.report.Report;
import org.inkgate.analysis.report.Section;
import org.junit.jupiter.api.Test;

/**
 * SIMULATED studies (seeded, invented candidates) with a planted condition effect and without one:
 * the analyses the design calls for find the planted effect in every replication and a null one in
 * at most one of five (a 5% test is expected to flag about one in twenty).
 */
class DesignSimulationTest {

    private static final int REPLICATIONS = 5;

    /** Ratings of one response: 2 raters x 2 criteria, 0..6, centred on 3 + true score. */
    private static void rate(List<Rating> out, Random rnd, String id, String level, String task, String condition,
            double trueScore) {
        for (String rater : new String[] {"R1", "R2"}) {
            for (String criterion : new String[] {"content", "language"}) {
                double x = 3 + trueScore + rnd.nextGaussian() * 0.7 + (rater.equals("R2") ? -0.3 : 0);
                out.add(new Rating(id, level, "", task, condition, rater, criterion,
                        Math.max(0, Math.min(6, Math.round(x)))));
            }
        }
    }

    static List<Rating> parallel(long seed, double effect) {
        Random rnd = new Random(seed);
        List<Rating> out = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            String level = i % 4 < 2 ? "B1" : "B2";
            String condition = i % 2 == 0 ? "none" : "tools";
            double ability = rnd.nextGaussian() * 0.8 + (level.equals("B2") ? 0.6 : -0.6)
                    + (condition.equals("tools") ? effect : 0);
            for (String task : new String[] {"letter", "essay"}) {
                rate(out, rnd, "P" + i, level, task, condition, ability);
            }
        }
        return out;
    }

    /** 48 candidates, 16 under each of none / spelling / full (one condition each); 'full' adds {@code effect}. */
    static List<Rating> parallelThree(long seed, double effect) {
        Random rnd = new Random(seed);
        List<Rating> out = new ArrayList<>();
        String[] conditions = {"none", "spelling", "full"};
        for (int i = 0; i < 48; i++) {
            String level = i % 6 < 3 ? "B1" : "B2";
            String condition = conditions[i % 3];
            double ability = rnd.nextGaussian() * 0.8 + (level.equals("B2") ? 0.6 : -0.6)
                    + (condition.equals("full") ? effect : 0);
            for (String task : new String[] {"letter", "essay"}) {
                rate(out, rnd, "Q" + i, level, task, condition, ability);
            }
        }
        return out;
    }

    static List<Rating> threeConditions(long seed, double effect) {
        Random rnd = new Random(seed);
        List<Rating> out = new ArrayList<>();
        String[] conditions = {"none", "spelling", "full"};
        String[] tasks = {"letter", "essay", "report"};
        for (int i = 0; i < 24; i++) {
            String level = i % 2 == 0 ? "B1" : "B2";
            double ability = rnd.nextGaussian() * 0.8 + (level.equals("B2") ? 0.5 : -0.5);
            for (int j = 0; j < 3; j++) {
                rate(out, rnd, "W" + i, level, tasks[(i + j) % 3], conditions[j], ability + (j == 2 ? effect : 0));
            }
        }
        return out;
    }

    private static Map<String, Object> comparison(List<Rating> ratings) {
        Report r = StudyAnalysis.report(StudyData.ofRatings(ratings), StudyOptions.DEFAULT.withBaseline("none"));
        Section s = r.sections().stream().filter(x -> x.id().equals("comparison")).findFirst().orElseThrow();
        return s.summary();
    }

    private static double p(Map<String, Object> s, String key) {
        return ((Number) s.get("comparison." + key)).doubleValue();
    }

    @Test
    void parallelGroups_plantedEffectFound_nullNot() {
        int nullHits = 0;
        for (int rep = 0; rep < REPLICATIONS; rep++) {
            Map<String, Object> planted = comparison(parallel(1000 + rep, 1.2));
            assertEquals("parallel", planted.get("comparison.design"));
            assertTrue(p(planted, "overall.welch_p") < 0.05, "Welch, replication " + rep + ": " + planted);
            assertTrue(p(planted, "overall.mann_whitney_p") < 0.05, "Mann-Whitney, replication " + rep);
            assertTrue(p(planted, "adjusted.p") < 0.05, "ANCOVA, replication " + rep);
            assertTrue(p(planted, "overall.difference") > 0, "direction tools minus none");
            Map<String, Object> none = comparison(parallel(2000 + rep, 0));
            if (p(none, "overall.welch_p") < 0.05 || p(none, "adjusted.p") < 0.05) {
                nullHits++;
            }
        }
        assertTrue(nullHits <= 1, "null effect flagged in " + nullHits + " of " + REPLICATIONS);
    }

    @Test
    void threeParallelGroups_plantedEffectFound_nullNot() {
        int nullHits = 0;
        for (int rep = 0; rep < REPLICATIONS; rep++) {
            Map<String, Object> planted = comparison(parallelThree(5000 + rep, 1.5));
            assertEquals("parallel", planted.get("comparison.design"));
            assertEquals(3, ((Number) planted.get("comparison.conditions")).intValue());
            assertTrue(p(planted, "overall.p") < 0.05, "ANOVA, replication " + rep + ": " + planted);
            assertTrue(p(planted, "overall.welch_p") < 0.05, "Welch, replication " + rep);
            assertTrue(p(planted, "overall.kruskal_wallis_p") < 0.05, "Kruskal-Wallis, replication " + rep);
            assertTrue(p(planted, "overall.pairwise.full_minus_none.tukey_p") < 0.05, "Tukey, replication " + rep);
            assertTrue(p(planted, "overall.pairwise.full_minus_none.games_howell_p") < 0.05, "Games-Howell " + rep);
            assertTrue(p(planted, "overall.pairwise.full_minus_none.difference") > 0, "direction full minus none");
            Map<String, Object> none = comparison(parallelThree(6000 + rep, 0));
            if (p(none, "overall.p") < 0.05 || p(none, "overall.welch_p") < 0.05) {
                nullHits++;
            }
        }
        assertTrue(nullHits <= 1, "null effect flagged in " + nullHits + " of " + REPLICATIONS);
    }

    @Test
    void threeConditions_plantedEffectFound_nullNot() {
        int nullHits = 0;
        for (int rep = 0; rep < REPLICATIONS; rep++) {
            Map<String, Object> planted = comparison(threeConditions(3000 + rep, 1.0));
            assertEquals("within", planted.get("comparison.design"));
            assertTrue(p(planted, "overall.p") < 0.05, "RM ANOVA, replication " + rep + ": " + planted);
            assertTrue(p(planted, "overall.p_greenhouse_geisser") < 0.05, "GG, replication " + rep);
            assertTrue(p(planted, "overall.friedman_p") < 0.05, "Friedman, replication " + rep);
            assertTrue(p(planted, "pairwise.full_minus_none.p_holm") < 0.05, "full vs none, replication " + rep);
            Map<String, Object> none = comparison(threeConditions(4000 + rep, 0));
            if (p(none, "overall.p") < 0.05) {
                nullHits++;
            }
        }
        assertTrue(nullHits <= 1, "null effect flagged in " + nullHits + " of " + REPLICATIONS);
    }
}
