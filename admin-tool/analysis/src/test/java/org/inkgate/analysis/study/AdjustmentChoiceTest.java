package org.inkgate.analysis.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.inkgate.analysis.data.Candidate;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.report.Section;
import org.junit.jupiter.api.Test;

/**
 * Which adjustment the parallel-groups comparison makes: a named pre-test, a numeric level as a
 * covariate, named levels as a factor (SIMULATED, seeded; invented candidates).
 */
class AdjustmentChoiceTest {

    private static Map<String, Object> comparison(StudyData data, StudyOptions options) {
        Section s = StudyAnalysis.report(data, options).sections().stream()
                .filter(x -> x.id().equals("comparison")).findFirst().orElseThrow();
        return s.summary();
    }

    @Test
    void preTestNamed_isTheCovariate_andSharpensTheComparison() {
        Random rnd = new Random(77);
        List<Rating> ratings = new ArrayList<>();
        List<Candidate> candidates = new ArrayList<>();
        for (int i = 0; i < 30; i++) {
            String condition = i % 2 == 0 ? "none" : "tools";
            double ability = rnd.nextGaussian();
            double placement = 50 + 10 * ability + rnd.nextGaussian() * 3;
            Map<String, Double> survey = new LinkedHashMap<>();
            survey.put("placement", placement);
            candidates.add(new Candidate("C" + i, "", survey));
            double score = 3 + ability + (condition.equals("tools") ? 0.6 : 0) + rnd.nextGaussian() * 0.3;
            ratings.add(new Rating("C" + i, "", "", "letter", condition, "R1", "content", score));
        }
        StudyData data = new StudyData(ratings, candidates, List.of("placement"), List.of(), List.of());
        Map<String, Object> s = comparison(data, StudyOptions.DEFAULT.withBaseline("none").withPreTest("placement"));
        assertEquals("pre_test", s.get("comparison.adjusted.adjustment"));
        assertEquals(30, s.get("comparison.adjusted.candidates"));
        double adjusted = ((Number) s.get("comparison.adjusted.p")).doubleValue();
        double welch = ((Number) s.get("comparison.overall.welch_p")).doubleValue();
        assertTrue(adjusted < 0.05 && adjusted < welch, "adjusted p " + adjusted + ", Welch p " + welch);
    }

    @Test
    void numericLevels_areACovariate_namedLevelsAFactor() {
        List<Rating> numeric = new ArrayList<>(), named = new ArrayList<>();
        Random rnd = new Random(78);
        for (int i = 0; i < 24; i++) {
            String condition = i % 2 == 0 ? "none" : "tools";
            int level = 1 + (i / 2) % 3;
            double score = 2 + level * 0.5 + rnd.nextGaussian() * 0.5;
            numeric.add(new Rating("N" + i, Integer.toString(level), "", "t", condition, "R1", "c", score));
            named.add(new Rating("N" + i, "band " + level, "", "t", condition, "R1", "c", score));
        }
        assertEquals("level_numeric", comparison(StudyData.ofRatings(numeric), StudyOptions.DEFAULT)
                .get("comparison.adjusted.adjustment"));
        assertEquals("level_factor", comparison(StudyData.ofRatings(named), StudyOptions.DEFAULT)
                .get("comparison.adjusted.adjustment"));
    }
}
