package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.distribution.TDistribution;
import org.inkgate.analysis.descriptive.ShapiroWilk;
import org.inkgate.analysis.groups.ConditionByLevel;
import org.inkgate.analysis.groups.Groups;
import org.inkgate.analysis.groups.OneWayAnova;
import org.inkgate.analysis.groups.PairwiseComparisons;
import org.inkgate.analysis.groups.VarianceHomogeneity;
import org.inkgate.analysis.groups.WelchAnova;
import org.inkgate.analysis.report.Chart;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.scores.ScoreTable;
import org.jfree.data.statistics.DefaultStatisticalCategoryDataset;

/**
 * The comparisons of candidates' scores across groups, per condition and measure: one-way ANOVA,
 * Welch and Brown-Forsythe, Tukey HSD and Games-Howell, the condition x group interaction and a
 * chart of means. Proficiency levels use it, and so does every categorical candidate attribute.
 */
final class GroupComparisons {

    /**
     * What to group by and how the tables name it.
     *
     * @param tableId   prefix of the table ids (e.g. {@code levels} gives {@code levels_anova})
     * @param keyPrefix prefix of the summary keys inside the section ("" for levels)
     * @param chartId   id of the chart of means
     * @param one       a group, in column labels ("level", "group")
     * @param many      groups, in column labels and notes ("levels", "groups")
     * @param byWhat    what the grouping is, in titles ("level", "first_language")
     * @param pairsOf   what pairs are compared, in the post-hoc title ("levels", "first_language groups")
     * @param axis      axis label of the chart
     * @param groups    the groups in report order
     * @param groupOf   candidate to group (absent: the candidate is left out)
     */
    record Grouping(String tableId, String keyPrefix, String chartId, String one, String many, String byWhat,
            String pairsOf, String axis, List<String> groups, Map<String, String> groupOf) {

        /** The values of candidates in a group, per group in order. */
        Groups split(Map<String, Double> values) {
            Map<String, List<Double>> m = new LinkedHashMap<>();
            for (String l : groups) {
                m.put(l, new ArrayList<>());
            }
            values.forEach((cand, v) -> {
                String group = groupOf.get(cand);
                List<Double> l = group == null ? null : m.get(group);
                if (l != null) {
                    l.add(v);
                }
            });
            Map<String, double[]> out = new LinkedHashMap<>();
            m.forEach((k, v) -> out.put(k, Keys.values(v)));
            return Groups.of(out);
        }
    }

    private GroupComparisons() {
    }

    /** Adds the tables and the chart to {@code s}. */
    static void add(Section.Builder s, ScoreTable scores, StudyOptions options, Grouping g) {
        Table.Builder anova = Table.builder(g.tableId() + "_anova", "One-way ANOVA of scores by " + g.byWhat() + ", per condition")
                .method("one-way ANOVA with eta squared and omega squared; Welch's ANOVA; Brown-Forsythe;"
                        + " Shapiro-Wilk per level", "Fisher 1925; Welch 1951; Brown & Forsythe 1974; Lakens 2013")
                .columns("condition", "measure", g.many(), "n", "F", "df1", "df2", "p", "eta^2", "omega^2",
                        "Welch F", "Welch df2", "Welch p", "Brown-Forsythe p", g.many() + " not normal", "read");
        Table.Builder post = Table.builder(g.tableId() + "_posthoc", "Pairwise comparisons of " + g.pairsOf() + ", per condition")
                .method("Tukey HSD (Tukey-Kramer SE for unequal n) and Games-Howell, p and 95% family-wise CIs from"
                        + " the studentized range distribution", "Tukey 1953; Kramer 1956; Games & Howell 1976")
                .columns("condition", "measure", g.one() + " A", g.one() + " B", "difference (B - A)", "Tukey lower",
                        "Tukey upper", "Tukey p", "Games-Howell lower", "Games-Howell upper", "Games-Howell df",
                        "Games-Howell p");
        DefaultStatisticalCategoryDataset means = new DefaultStatisticalCategoryDataset();
        List<String> conditions = StudyAnalysis.orderedConditions(scores, options);
        List<String> measures = new ArrayList<>();
        measures.add(null);
        measures.addAll(scores.criteria());
        for (String condition : conditions) {
            for (String criterion : measures) {
                String measure = criterion == null ? "overall" : criterion;
                Groups groups = g.split(scores.candidateScores(condition, criterion));
                OneWayAnova a = OneWayAnova.of(groups);
                WelchAnova w = WelchAnova.of(groups);
                OneWayAnova bf = VarianceHomogeneity.test(groups, VarianceHomogeneity.Centre.MEDIAN);
                List<String> notNormal = new ArrayList<>();
                for (int i = 0; i < groups.count(); i++) {
                    ShapiroWilk.Result r = ShapiroWilk.test(groups.values().get(i));
                    if (r.rejects(options.alpha())) {
                        notNormal.add(groups.labels().get(i));
                    }
                }
                boolean unequal = bf.p() < options.alpha();
                String read = unequal ? "Welch / Games-Howell (variances differ)"
                        : notNormal.isEmpty() ? "ANOVA / Tukey" : "ANOVA / Tukey, but normality doubtful";
                anova.row(condition, measure, (long) a.groups(), (long) a.n(), a.f(), a.dfBetween(), a.dfWithin(),
                        a.p(), a.etaSquared(), a.omegaSquared(), w.f(), w.df2(), w.p(), bf.p(),
                        notNormal.isEmpty() ? "none" : String.join(" ", notNormal), read);
                a.cautions().forEach(x -> anova.note(condition + ", " + measure + ": " + x));
                w.cautions().forEach(x -> anova.note(condition + ", " + measure + ", Welch: " + x));
                String k = g.keyPrefix() + Keys.slug(condition) + "." + Keys.slug(measure) + ".";
                s.put(k + "f", a.f()).put(k + "df1", a.dfBetween()).put(k + "df2", a.dfWithin()).put(k + "p", a.p())
                        .put(k + "eta_squared", a.etaSquared()).put(k + "omega_squared", a.omegaSquared())
                        .put(k + "welch_f", w.f()).put(k + "welch_df2", w.df2()).put(k + "welch_p", w.p());
                List<PairwiseComparisons.Comparison> tk = PairwiseComparisons.compare(groups,
                        PairwiseComparisons.Method.TUKEY_HSD, 0.95);
                List<PairwiseComparisons.Comparison> gh = PairwiseComparisons.compare(groups,
                        PairwiseComparisons.Method.GAMES_HOWELL, 0.95);
                for (PairwiseComparisons.Comparison c : tk) {
                    PairwiseComparisons.Comparison h = gh.stream()
                            .filter(x -> x.groupA().equals(c.groupA()) && x.groupB().equals(c.groupB())).findFirst()
                            .orElse(null);
                    post.row(condition, measure, c.groupA(), c.groupB(), c.difference(), c.lower(), c.upper(), c.p(),
                            h == null ? null : h.lower(), h == null ? null : h.upper(), h == null ? null : h.df(),
                            h == null ? null : h.p());
                    String pk = k + Keys.slug(c.groupB()) + "_vs_" + Keys.slug(c.groupA()) + ".";
                    s.put(pk + "difference", c.difference()).put(pk + "tukey_p", c.p())
                            .put(pk + "games_howell_p", h == null ? null : h.p());
                }
                if (criterion == null) {
                    for (int i = 0; i < groups.count(); i++) {
                        double[] v = groups.values().get(i);
                        double half = halfWidth(v);
                        if (v.length > 0) {
                            means.add(mean(v), half, condition, groups.labels().get(i));
                        }
                    }
                }
            }
        }
        s.table(anova.build());
        post.note("Games-Howell is left out for " + g.many() + " with fewer than 2 candidates.");
        post.note("Studentized-range p-values are computed to about 1e-9; smaller ones are shown as 0.");
        s.table(post.build());
        if (conditions.size() == 2) {
            Table.Builder inter = Table.builder(g.tableId() + "_interaction", "Condition x " + g.byWhat() + " interaction")
                    .method("split-plot ANOVA interaction with two within-candidate conditions, computed as the"
                            + " one-way ANOVA of each candidate's difference (" + conditions.get(1) + " minus "
                            + conditions.get(0) + ") across " + g.many(), "Maxwell & Delaney 2004, ch. 12")
                    .columns("measure", "candidates", "F", "df1", "df2", "p", "read");
            for (String criterion : measures) {
                String measure = criterion == null ? "overall" : criterion;
                Map<String, Double> a = scores.candidateScores(conditions.get(0), criterion);
                Map<String, Double> b = scores.candidateScores(conditions.get(1), criterion);
                Map<String, Double> diff = new LinkedHashMap<>();
                a.forEach((cand, v) -> {
                    Double w = b.get(cand);
                    if (w != null) {
                        diff.put(cand, w - v);
                    }
                });
                OneWayAnova x = ConditionByLevel.interaction(g.split(diff));
                inter.row(measure, (long) x.n(), x.f(), x.dfBetween(), x.dfWithin(), x.p(),
                        Double.isNaN(x.p()) ? "not tested" : x.p() < options.alpha()
                                ? "the effect of condition differs by " + g.byWhat() : "no evidence that it differs by " + g.byWhat());
                x.cautions().forEach(c -> inter.note(measure + ": " + c));
                String k = g.keyPrefix() + "interaction." + Keys.slug(measure) + ".";
                s.put(k + "f", x.f()).put(k + "df1", x.dfBetween()).put(k + "df2", x.dfWithin()).put(k + "p", x.p());
            }
            s.table(inter.build());
        }
        s.chart(Chart.of(g.chartId(), "Mean overall score by " + g.byWhat() + " and condition",
                "Means with 95% confidence intervals (t-based, per " + g.one() + " and condition).",
                Charts.meansWithIntervals(g.axis(), "mean overall score", means), 760, 380));
    }

    private static double mean(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return s / v.length;
    }

    /** Half-width of the t-based 95% CI of the mean (0 below 2 values). */
    static double halfWidth(double[] v) {
        if (v.length < 2) {
            return 0;
        }
        double m = mean(v), ss = 0;
        for (double x : v) {
            ss += (x - m) * (x - m);
        }
        double se = Math.sqrt(ss / (v.length - 1) / v.length);
        return new TDistribution(null, v.length - 1).inverseCumulativeProbability(0.975) * se;
    }
}
