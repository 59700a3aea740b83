package org.inkgate.analysis.scores;

import java.util.Map;

/**
 * The score of one candidate's response to one task: overall and per criterion (mean over raters),
 * with the number of raters and whether any criterion of the rubric is missing.
 */
public record ResponseScore(String candidate, String level, String form, String task, String condition,
        double score, Map<String, Double> criterionScores, int raters, boolean incomplete) {

    public ResponseScore {
        criterionScores = Map.copyOf(criterionScores);
    }
}
