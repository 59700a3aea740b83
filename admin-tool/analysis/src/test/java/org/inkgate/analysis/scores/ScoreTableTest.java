package org.inkgate.analysis.scores;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.inkgate.analysis.data.Rating;
import org.junit.jupiter.api.Test;

class ScoreTableTest {

    private static Rating r(String cand, String task, String cond, String rater, String crit, double score) {
        return new Rating(cand, "", "", task, cond, rater, crit, score);
    }

    @Test
    void scores_meanAndSum_followTheStatedRule() {
        // by hand: content (4 + 2) / 2 = 3, grammar (5 + 3) / 2 = 4; mean 3.5, sum 7
        List<Rating> ratings = List.of(r("C1", "t1", "none", "R1", "content", 4), r("C1", "t1", "none", "R2", "content", 2),
                r("C1", "t1", "none", "R1", "grammar", 5), r("C1", "t1", "none", "R2", "grammar", 3));
        ScoreTable mean = ScoreTable.of(ratings, ScoreRule.MEAN, Map.of("C1", "B1"));
        assertEquals(3.5, mean.responses().get(0).score());
        assertEquals(3.0, mean.responses().get(0).criterionScores().get("content"));
        assertEquals("B1", mean.levelOf("C1"));
        assertEquals(7.0, ScoreTable.of(ratings, ScoreRule.SUM, Map.of()).responses().get(0).score());
    }

    @Test
    void scores_missingCriterion_markedIncomplete() {
        List<Rating> ratings = List.of(r("C1", "t1", "none", "R1", "content", 4), r("C1", "t1", "none", "R1", "grammar", 2),
                r("C2", "t1", "none", "R1", "content", 3));
        ScoreTable t = ScoreTable.of(ratings, ScoreRule.MEAN, Map.of());
        assertTrue(t.responses().get(1).incomplete());
        assertEquals(3.0, t.responses().get(1).score());
    }

    @Test
    void candidateScore_twoTasksUnderOneCondition_isTheirMean() {
        List<Rating> ratings = List.of(r("C1", "t1", "with", "R1", "content", 4), r("C1", "t2", "with", "R1", "content", 2));
        ScoreTable t = ScoreTable.of(ratings, ScoreRule.MEAN, Map.of());
        assertEquals(3.0, t.candidateScores("with", null).get("C1"));
        assertEquals(1, t.candidatesWithSeveralResponses("with"));
    }
}
