package org.inkgate.analysis.comparison;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * A linear mixed model of the condition effect on every rating: fixed effects intercept + condition
 * (treatment contrasts against the first condition), crossed random intercepts for each grouping
 * factor given (candidate, rater, task), fitted by REML. The criterion is profiled over the
 * relative standard deviations and minimised by BOBYQA (Powell 2009) with lower bounds 0, as lme4
 * does (Bates, Maechler, Bolker &amp; Walker 2015); {@link ProfiledReml} evaluates it sparsely.
 *
 * <p>Intervals are Wald intervals, estimate +- z(1 - alpha/2) SE (as lme4's {@code confint(...,
 * method = "Wald")}): they treat the variance components as known and use the normal distribution,
 * so with few raters or tasks they are too narrow. No degrees of freedom (Satterthwaite,
 * Kenward-Roger) and no p-values are computed.
 *
 * @param ratings      ratings in the fit
 * @param conditions   conditions, the reference (intercept) first
 * @param fixedEffects the intercept (mean under the reference condition) and each other condition
 *                     minus the reference
 * @param variances    one per grouping factor in the fit, then the residual
 * @param remlCriterion -2 times the maximised restricted log-likelihood (lme4's "REML criterion")
 * @param confidence   level of the Wald intervals
 * @param cautions     plain sentences for the report (dropped factors, boundary fits)
 */
public record LinearMixedModel(int ratings, List<String> conditions, List<FixedEffect> fixedEffects,
        List<VarianceComponent> variances, double remlCriterion, double confidence, int evaluations,
        List<String> cautions) {

    /** Largest dense block (levels outside the largest factor, plus the fixed effects) fitted. */
    public static final int MAX_DENSE = 3000;

    /** The name of the residual component in {@link #variances()}. */
    public static final String RESIDUAL = "residual";

    /** A fixed effect with its standard error, t = estimate / SE and Wald interval. */
    public record FixedEffect(String term, double estimate, double se, double t, double lower, double upper) {

        /** True when the Wald interval does not contain 0. */
        public boolean intervalExcludesZero() {
            return lower > 0 || upper < 0;
        }
    }

    /** A variance component: a grouping factor (with its number of levels) or the residual (levels 0). */
    public record VarianceComponent(String group, int levels, double variance) {

        public double sd() {
            return Math.sqrt(variance);
        }
    }

    public LinearMixedModel {
        conditions = List.copyOf(conditions);
        fixedEffects = List.copyOf(fixedEffects);
        variances = List.copyOf(variances);
        cautions = List.copyOf(cautions);
    }

    /** The effect of a condition against the reference, by the condition's name. */
    public FixedEffect effectOf(String condition) {
        int i = conditions.indexOf(condition);
        if (i < 1) {
            throw new IllegalArgumentException("'" + condition + "' is not a non-reference condition of " + conditions);
        }
        return fixedEffects.get(i);
    }

    /** The variance of a grouping factor or of the residual, by name. */
    public VarianceComponent variance(String group) {
        return variances.stream().filter(v -> v.group().equals(group)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no variance component '" + group + "'"));
    }

    /**
     * Fits the model.
     *
     * @param score      one score per rating
     * @param condition  the condition of each rating
     * @param conditions the conditions to fit, the reference first (every one must occur)
     * @param factors    grouping factor name to each rating's level, in the order to report them;
     *                   a factor with a single level is left out (its variance cannot be told from the
     *                   intercept) and a caution says so
     * @param confidence level of the Wald intervals, e.g. 0.95
     */
    public static LinearMixedModel fit(double[] score, String[] condition, List<String> conditions,
            Map<String, String[]> factors, double confidence) {
        int n = score.length;
        if (condition.length != n || factors.values().stream().anyMatch(f -> f.length != n)) {
            throw new IllegalArgumentException("every rating needs a score, a condition and a level of every factor");
        }
        int p = conditions.size();
        if (p < 1) {
            throw new IllegalArgumentException("the mixed model needs at least one condition");
        }
        int[] cond = new int[n];
        int[] perCondition = new int[p];
        Map<String, Integer> condIndex = new HashMap<>();
        for (int j = 0; j < p; j++) {
            condIndex.put(conditions.get(j), j);
        }
        for (int r = 0; r < n; r++) {
            Integer c = condIndex.get(condition[r]);
            if (c == null) {
                throw new IllegalArgumentException("rating " + (r + 1) + " has condition '" + condition[r]
                        + "', not one of " + conditions);
            }
            cond[r] = c;
            perCondition[c]++;
            if (!Double.isFinite(score[r])) {
                throw new IllegalArgumentException("rating " + (r + 1) + " has no finite score");
            }
        }
        for (int j = 0; j < p; j++) {
            if (perCondition[j] == 0) {
                throw new IllegalArgumentException("condition '" + conditions.get(j) + "' has no ratings");
            }
        }
        List<String> cautions = new ArrayList<>();
        List<String> names = new ArrayList<>();
        List<int[]> codes = new ArrayList<>();
        List<Integer> levels = new ArrayList<>();
        factors.forEach((name, values) -> {
            Map<String, Integer> code = new LinkedHashMap<>();
            int[] c = new int[n];
            for (int r = 0; r < n; r++) {
                c[r] = code.computeIfAbsent(values[r], k -> code.size());
            }
            if (code.size() < 2) {
                cautions.add("only one " + name + " in the data: no " + name + " variance is estimated (it cannot"
                        + " be told apart from the intercept)");
                return;
            }
            names.add(name);
            codes.add(c);
            levels.add(code.size());
        });
        if (names.isEmpty()) {
            throw new IllegalArgumentException("the mixed model needs a grouping factor with two or more levels");
        }
        if (Arrays.stream(score).distinct().count() == 1) {
            throw new IllegalArgumentException("all " + n + " ratings have the same score (" + score[0] + "): there"
                    + " is no variation for the mixed model to divide among candidates, raters and tasks");
        }
        if (n <= p) {
            throw new IllegalArgumentException("the mixed model needs more ratings (" + n + ") than fixed effects ("
                    + p + ")");
        }
        int largest = levels.stream().mapToInt(Integer::intValue).max().orElse(0);
        int dense = levels.stream().mapToInt(Integer::intValue).sum() - largest + p;
        if (dense > MAX_DENSE) {
            throw new IllegalArgumentException("the mixed model keeps the levels of every factor but the largest ("
                    + "here " + (dense - p) + " levels of " + names + " outside the largest) in one dense block,"
                    + " and more than " + MAX_DENSE + " would take too long and too much memory; fit it in R (lme4)"
                    + " or with fewer levels (e.g. raters grouped into rating teams)");
        }
        CrossedCrossProducts x = new CrossedCrossProducts(score, cond, p, codes.toArray(int[][]::new),
                levels.stream().mapToInt(Integer::intValue).toArray());
        ProfiledReml reml = new ProfiledReml(x);
        RemlSearch.Result search = RemlSearch.minimise(reml, names.size());
        double[] theta = search.theta();
        ProfiledReml.Evaluation e = reml.evaluate(theta, true);
        if (e == null) {
            throw new IllegalArgumentException("the fixed effects cannot be estimated: the conditions are confounded"
                    + " with each other");
        }
        if (!Double.isFinite(e.criterion()) || !(e.sigmaSquared() > 0)) {
            throw new IllegalArgumentException("the random effects reproduce every rating exactly (no residual"
                    + " variation is left), so the model is not identified; look at the ratings table");
        }
        double z = new NormalDistribution().inverseCumulativeProbability(1 - (1 - confidence) / 2);
        List<FixedEffect> fixed = new ArrayList<>();
        for (int j = 0; j < p; j++) {
            double se = Math.sqrt(e.sigmaSquared() * e.betaCovarianceUnscaled()[j][j]);
            String term = j == 0 ? "intercept (" + conditions.get(0) + ")" : conditions.get(j) + " minus "
                    + conditions.get(0);
            double b = e.beta()[j];
            fixed.add(new FixedEffect(term, b, se, b / se, b - z * se, b + z * se));
        }
        List<VarianceComponent> vc = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            vc.add(new VarianceComponent(names.get(i), levels.get(i), theta[i] * theta[i] * e.sigmaSquared()));
            if (theta[i] < 1e-4) {
                cautions.add("the " + names.get(i) + " variance is estimated at or near zero (a boundary, or"
                        + " singular, fit): the other estimates hold, but that component is not identified as"
                        + " different from zero");
            }
        }
        vc.add(new VarianceComponent(RESIDUAL, 0, e.sigmaSquared()));
        return new LinearMixedModel(n, conditions, fixed, vc, e.criterion(), confidence, search.evaluations(),
                cautions);
    }
}
