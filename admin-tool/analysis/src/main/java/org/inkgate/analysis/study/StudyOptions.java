package org.inkgate.analysis.study;

import org.inkgate.analysis.process.ProcessMeasures;
import org.inkgate.analysis.scores.ScoreRule;

/**
 * Choices of one analysis: the score rule, which condition is the baseline of the paired
 * comparison (null: the first in alphabetical order), the significance level used to flag
 * assumption checks, the writing-process parameters, and a title.
 */
public record StudyOptions(ScoreRule scoreRule, String baselineCondition, double alpha,
        ProcessMeasures.Parameters process, String title) {

    public static final StudyOptions DEFAULT = new StudyOptions(ScoreRule.MEAN, null, 0.05,
            ProcessMeasures.Parameters.DEFAULT, "Analysis of ratings");

    public StudyOptions {
        if (!(alpha > 0 && alpha < 1)) {
            throw new IllegalArgumentException("alpha must lie between 0 and 1: " + alpha);
        }
    }

    public StudyOptions withScoreRule(ScoreRule rule) {
        return new StudyOptions(rule, baselineCondition, alpha, process, title);
    }

    public StudyOptions withBaseline(String baseline) {
        return new StudyOptions(scoreRule, baseline, alpha, process, title);
    }

    public StudyOptions withProcess(ProcessMeasures.Parameters p) {
        return new StudyOptions(scoreRule, baselineCondition, alpha, p, title);
    }

    public StudyOptions withTitle(String t) {
        return new StudyOptions(scoreRule, baselineCondition, alpha, process, t);
    }
}
