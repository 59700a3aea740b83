package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.inkgate.analysis.comparison.LinearMixedModel;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.report.Column;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.scores.ScoreRule;

/**
 * The linear mixed model beside the within-candidate comparison: every rating, not averaged scores,
 * with crossed random intercepts for candidate, rater and task and the condition as fixed effect
 * (each condition against the baseline). Overall, one observation is one rater's score of one
 * response (the mean, or under the sum rule the sum, of that rater's criterion ratings); per
 * criterion, one observation is one rating.
 */
final class LinearMixedModelSection {

    private static final String[] FACTORS = {"candidate", "rater", "task"};

    /** Above this many ratings only the overall model is fitted, to keep the report's time in bounds. */
    static final int PER_CRITERION_LIMIT = 200_000;

    private LinearMixedModelSection() {
    }

    static void build(Section.Builder s, List<Rating> ratings, StudyOptions options, List<String> conditions,
            List<String> criteria) {
        build(s, ratings, options, conditions, criteria, PER_CRITERION_LIMIT);
    }

    /** As above with the limit above which only the overall model is fitted (tests use a small one). */
    static void build(Section.Builder s, List<Rating> ratings, StudyOptions options, List<String> conditions,
            List<String> criteria, int perCriterionLimit) {
        s.paragraph("Beside it, a linear mixed model uses every rating rather than each candidate's averaged score:"
                + " the condition is a fixed effect (each condition against '" + conditions.get(0) + "'), and"
                + " candidates, raters and tasks are crossed random effects, so differences in rater severity and"
                + " task difficulty are modelled rather than averaged away. Fitted by REML. Assumptions: the scores"
                + " are treated as continuous; candidate, rater and task effects are normal, independent and add up;"
                + " residuals are normal with one variance; the condition shifts every candidate's score by the same"
                + " amount. The intervals are Wald intervals (estimate +- 1.96 SE), which treat the variance"
                + " components as known: with few raters or tasks they are too narrow. No p-values are given, as in"
                + " lme4, because their degrees of freedom are not defined exactly; read the interval, and follow the"
                + " test owner's regulations on how results may be used.");
        Table.Builder fixed = Table.builder("comparison_linear_mixed_model",
                "Linear mixed model: condition effects on every rating")
                .method("linear mixed model, score ~ condition + (1 | candidate) + (1 | rater) + (1 | task), REML;"
                        + " Wald 95% intervals (normal quantile, no degrees-of-freedom correction)",
                        "Patterson & Thompson 1971; Bates, Maechler, Bolker & Walker 2015")
                .columns(Column.of("measure"), Column.of("ratings"), Column.of("effect"), Column.of("estimate"),
                        Column.of("SE"), Column.of("t"), Column.of("Wald CI lower", "ci_lower"),
                        Column.of("Wald CI upper", "ci_upper"));
        Table.Builder variance = Table.builder("comparison_variance_components",
                "Linear mixed model: variance components")
                .method("REML variance components of the crossed random intercepts; REML criterion = -2 x the"
                        + " maximised restricted log-likelihood", "Bates, Maechler, Bolker & Walker 2015")
                .columns(Column.of("measure"), Column.of("ratings"), Column.of("candidates"), Column.of("raters"),
                        Column.of("tasks"), Column.of("candidate variance"), Column.of("rater variance"),
                        Column.of("task variance"), Column.of("residual variance"), Column.of("REML criterion"));
        List<String> measures = new ArrayList<>();
        measures.add(null);
        if (ratings.size() <= perCriterionLimit) {
            measures.addAll(criteria);
        } else if (!criteria.isEmpty()) {
            fixed.note("With more than " + perCriterionLimit + " ratings only the overall model is fitted (one"
                    + " model per criterion would add seconds each to the report); fit a criterion's model from the"
                    + " ratings CSV in a statistics package if needed.");
        }
        s.put("linear_mixed_model.per_criterion", ratings.size() <= perCriterionLimit);
        boolean any = false;
        for (String criterion : measures) {
            String measure = criterion == null ? "overall" : criterion;
            Observations o = criterion == null ? overall(ratings, options.scoreRule(), conditions)
                    : ofCriterion(ratings, criterion, conditions);
            String key = "linear_mixed_model." + Keys.slug(measure) + ".";
            LinearMixedModel m;
            try {
                m = LinearMixedModel.fit(o.score(), o.condition(), conditions, o.factors(), 0.95);
            } catch (IllegalArgumentException e) {
                fixed.note(measure + ": not fitted: " + e.getMessage());
                s.put(key + "fitted", false);
                continue;
            }
            any = true;
            s.put(key + "fitted", true).put(key + "ratings", m.ratings())
                    .put(key + "reml_criterion", m.remlCriterion());
            for (int j = 0; j < m.fixedEffects().size(); j++) {
                LinearMixedModel.FixedEffect b = m.fixedEffects().get(j);
                fixed.row(measure, (long) m.ratings(), b.term(), b.estimate(), b.se(), b.t(), b.lower(), b.upper());
                String term = j == 0 ? "intercept" : Keys.slug(conditions.get(j)) + "_minus_"
                        + Keys.slug(conditions.get(0));
                s.put(key + term + ".estimate", b.estimate()).put(key + term + ".se", b.se())
                        .put(key + term + ".ci_lower", b.lower()).put(key + term + ".ci_upper", b.upper());
            }
            Object[] row = {measure, (long) m.ratings(), null, null, null, null, null, null,
                    m.variance(LinearMixedModel.RESIDUAL).variance(), m.remlCriterion()};
            for (LinearMixedModel.VarianceComponent v : m.variances()) {
                for (int f = 0; f < FACTORS.length; f++) {
                    if (v.group().equals(FACTORS[f])) {
                        row[2 + f] = (long) v.levels();
                        row[5 + f] = v.variance();
                    }
                }
                s.put(key + "variance_" + v.group(), v.variance());
            }
            variance.row(row);
            m.cautions().forEach(c -> variance.note(measure + ": " + c));
            if (o.taskConfounded()) {
                fixed.note(measure + ": every task was written under one condition only, so task and condition are"
                        + " confounded: the condition effect includes the difference between the tasks.");
            }
        }
        s.put("linear_mixed_model.available", any);
        fixed.note("Effects are each condition minus '" + conditions.get(0) + "' on the rating scale; the intercept is"
                + " the model's mean under '" + conditions.get(0) + "'. t = estimate / SE. The Wald interval is too"
                + " narrow when there are few raters or tasks (Satterthwaite or Kenward-Roger degrees of freedom,"
                + " not computed here, would widen it).");
        variance.note("A dash: the factor has one level in these data and is left out of the model. Overall, one"
                + " observation is one rater's " + (options.scoreRule() == ScoreRule.SUM ? "sum" : "mean")
                + " of their criterion ratings of one response; per criterion, one rating.");
        s.table(fixed.build());
        s.table(variance.build());
    }

    /** One model's input: scores, conditions and the levels of the three factors, per observation. */
    record Observations(double[] score, String[] condition, Map<String, String[]> factors, boolean taskConfounded) {
    }

    static Observations ofCriterion(List<Rating> ratings, String criterion, List<String> conditions) {
        List<Rating> rows = ratings.stream().filter(r -> r.criterion().equals(criterion)
                && conditions.contains(r.condition())).toList();
        return observations(rows.stream().mapToDouble(Rating::score).toArray(), rows);
    }

    /** One observation per rater and response: the rater's mean (or sum) over the criteria they scored. */
    static Observations overall(List<Rating> ratings, ScoreRule rule, List<String> conditions) {
        Map<List<String>, double[]> byResponse = new LinkedHashMap<>();
        Map<List<String>, Rating> first = new HashMap<>();
        for (Rating r : ratings) {
            if (!conditions.contains(r.condition())) {
                continue;
            }
            List<String> k = List.of(r.candidate(), r.task(), r.condition(), r.rater());
            double[] sumCount = byResponse.computeIfAbsent(k, x -> new double[2]);
            sumCount[0] += r.score();
            sumCount[1]++;
            first.putIfAbsent(k, r);
        }
        List<Rating> rows = new ArrayList<>();
        double[] y = new double[byResponse.size()];
        int i = 0;
        for (Map.Entry<List<String>, double[]> e : byResponse.entrySet()) {
            y[i++] = rule == ScoreRule.SUM ? e.getValue()[0] : e.getValue()[0] / e.getValue()[1];
            rows.add(first.get(e.getKey()));
        }
        return observations(y, rows);
    }

    private static Observations observations(double[] y, List<Rating> rows) {
        Map<String, String[]> f = new LinkedHashMap<>();
        f.put("candidate", rows.stream().map(Rating::candidate).toArray(String[]::new));
        f.put("rater", rows.stream().map(Rating::rater).toArray(String[]::new));
        f.put("task", rows.stream().map(Rating::task).toArray(String[]::new));
        Map<String, Set<String>> conditionsOfTask = new HashMap<>();
        rows.forEach(r -> conditionsOfTask.computeIfAbsent(r.task(), k -> new TreeSet<>()).add(r.condition()));
        boolean confounded = conditionsOfTask.size() > 1
                && conditionsOfTask.values().stream().allMatch(c -> c.size() == 1);
        return new Observations(y, rows.stream().map(Rating::condition).toArray(String[]::new), f, confounded);
    }
}
