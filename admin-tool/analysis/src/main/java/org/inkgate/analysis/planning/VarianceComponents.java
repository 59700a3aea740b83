package org.inkgate.analysis.planning;

/**
 * The variance components of a G study in which candidates, raters and tasks are fully crossed
 * (every rater scores every candidate's response to every task): candidate (the universe-score
 * variance), rater, task, the three two-way interactions, and the residual (candidate x rater x
 * task confounded with error). Notation of Brennan (2001), Generalizability Theory, ch. 4, and
 * Shavelson &amp; Webb (1991), ch. 6.
 *
 * <p>A G study can estimate a component below 0; the common practice (Brennan 2001, section 3.4)
 * is to set it to 0, which the test owner does before planning: negative values are refused here.
 */
public record VarianceComponents(double candidate, double rater, double task, double candidateRater,
        double candidateTask, double raterTask, double residual) {

    public VarianceComponents {
        nonNegative("candidate", candidate);
        nonNegative("rater", rater);
        nonNegative("task", task);
        nonNegative("candidate x rater", candidateRater);
        nonNegative("candidate x task", candidateTask);
        nonNegative("rater x task", raterTask);
        nonNegative("residual", residual);
        if (candidate == 0) {
            throw new IllegalArgumentException("the candidate variance component is 0: there are no differences between"
                    + " candidates to measure, so no coefficient can be planned");
        }
    }

    private static void nonNegative(String name, double v) {
        if (!(v >= 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException("the " + name + " variance component must be 0 or more (set a negative"
                    + " G-study estimate to 0, common practice): " + v);
        }
    }
}
