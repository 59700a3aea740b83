package org.inkgate.analysis.study;

import org.inkgate.analysis.data.StudyDesign;
import org.inkgate.analysis.process.ProcessMeasures;
import org.inkgate.analysis.scores.ScoreRule;

/**
 * Choices of one analysis: the score rule, which condition is the baseline of the condition
 * comparison (null: the first in alphabetical order), the significance level used to flag
 * assumption checks, the writing-process parameters, a title, the declared design (null: read
 * from the data) and the pre-test (a numeric column of the candidate table that the parallel-groups
 * comparison adjusts for; null: adjust for level).
 */
public record StudyOptions(ScoreRule scoreRule, String baselineCondition, double alpha,
        ProcessMeasures.Parameters process, String title, StudyDesign.Kind design, String preTest) {

    public static final StudyOptions DEFAULT = new StudyOptions(ScoreRule.MEAN, null, 0.05,
            ProcessMeasures.Parameters.DEFAULT, "Analysis of ratings", null, null);

    public StudyOptions {
        if (!(alpha > 0 && alpha < 1)) {
            throw new IllegalArgumentException("alpha must lie between 0 and 1: " + alpha);
        }
        if (design != null && design != StudyDesign.Kind.WITHIN && design != StudyDesign.Kind.PARALLEL) {
            throw new IllegalArgumentException("a declared design is within or parallel, not " + design.word());
        }
    }

    public StudyOptions withScoreRule(ScoreRule rule) {
        return new StudyOptions(rule, baselineCondition, alpha, process, title, design, preTest);
    }

    public StudyOptions withBaseline(String baseline) {
        return new StudyOptions(scoreRule, baseline, alpha, process, title, design, preTest);
    }

    public StudyOptions withProcess(ProcessMeasures.Parameters p) {
        return new StudyOptions(scoreRule, baselineCondition, alpha, p, title, design, preTest);
    }

    public StudyOptions withTitle(String t) {
        return new StudyOptions(scoreRule, baselineCondition, alpha, process, t, design, preTest);
    }

    /** The declared design (null: read from the data). */
    public StudyOptions withDesign(StudyDesign.Kind d) {
        return new StudyOptions(scoreRule, baselineCondition, alpha, process, title, d, preTest);
    }

    /** The numeric candidate-table column the parallel-groups comparison adjusts for (null: level). */
    public StudyOptions withPreTest(String column) {
        return new StudyOptions(scoreRule, baselineCondition, alpha, process, title, design, column);
    }
}
