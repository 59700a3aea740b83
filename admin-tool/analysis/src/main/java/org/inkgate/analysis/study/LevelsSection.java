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

/** Proficiency levels: one-way ANOVA per condition, Welch, post-hoc tests, condition x level. */
final class LevelsSection {

    private LevelsSection() {
    }

    static Section build(ScoreTable scores, StudyOptions options) {
        Section.Builder s = Section.builder("levels", "Proficiency levels");
        List<String> levels = scores.levels();
        if (levels.size() < 2) {
            s.paragraph("The data name " + levels.size() + " proficiency level(s): comparing levels needs at least"
                    + " two. Give levels in the ratings' level column or in the candidate table.");
            s.put("available", false);
            return s.build();
        }
        s.paragraph("Candidates' scores compared across proficiency levels within each condition. Read the classical"
                + " ANOVA and Tukey HSD (Tukey-Kramer for unequal group sizes) when variances are equal and residuals"
                + " roughly normal; otherwise read Welch's ANOVA and Games-Howell, which do not assume equal variances.");
        Table.Builder anova = Table.builder("levels_anova", "One-way ANOVA of scores by level, per condition")
                .method("one-way ANOVA with eta squared and omega squared; Welch's ANOVA; Brown-Forsythe;"
                        + " Shapiro-Wilk per level", "Fisher 1925; Welch 1951; Brown & Forsythe 1974; Lakens 2013")
                .columns("condition", "measure", "levels", "n", "F", "df1", "df2", "p", "eta^2", "omega^2",
                        "Welch F", "Welch df2", "Welch p", "Brown-Forsythe p", "levels not normal", "read");
        Table.Builder post = Table.builder("levels_posthoc", "Pairwise comparisons of levels, per condition")
                .method("Tukey HSD (Tukey-Kramer SE for unequal n) and Games-Howell, p and 95% family-wise CIs from"
                        + " the studentized range distribution", "Tukey 1953; Kramer 1956; Games & Howell 1976")
                .columns("condition", "measure", "level A", "level B", "difference (B - A)", "Tukey lower",
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
                Groups g = byLevel(scores, scores.candidateScores(condition, criterion), levels);
                OneWayAnova a = OneWayAnova.of(g);
                WelchAnova w = WelchAnova.of(g);
                OneWayAnova bf = VarianceHomogeneity.test(g, VarianceHomogeneity.Centre.MEDIAN);
                List<String> notNormal = new ArrayList<>();
                for (int i = 0; i < g.count(); i++) {
                    ShapiroWilk.Result r = ShapiroWilk.test(g.values().get(i));
                    if (r.rejects(options.alpha())) {
                        notNormal.add(g.labels().get(i));
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
                String k = Keys.slug(condition) + "." + Keys.slug(measure) + ".";
                s.put(k + "f", a.f()).put(k + "df1", a.dfBetween()).put(k + "df2", a.dfWithin()).put(k + "p", a.p())
                        .put(k + "eta_squared", a.etaSquared()).put(k + "omega_squared", a.omegaSquared())
                        .put(k + "welch_f", w.f()).put(k + "welch_df2", w.df2()).put(k + "welch_p", w.p());
                List<PairwiseComparisons.Comparison> tk = PairwiseComparisons.compare(g,
                        PairwiseComparisons.Method.TUKEY_HSD, 0.95);
                List<PairwiseComparisons.Comparison> gh = PairwiseComparisons.compare(g,
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
                    for (int i = 0; i < g.count(); i++) {
                        double[] v = g.values().get(i);
                        double half = halfWidth(v);
                        if (v.length > 0) {
                            means.add(mean(v), half, condition, g.labels().get(i));
                        }
                    }
                }
            }
        }
        s.table(anova.build());
        post.note("Games-Howell is left out for levels with fewer than 2 candidates.");
        post.note("Studentized-range p-values are computed to about 1e-9; smaller ones are shown as 0.");
        s.table(post.build());
        if (conditions.size() == 2) {
            Table.Builder inter = Table.builder("levels_interaction", "Condition x level interaction")
                    .method("split-plot ANOVA interaction with two within-candidate conditions, computed as the"
                            + " one-way ANOVA of each candidate's difference (" + conditions.get(1) + " minus "
                            + conditions.get(0) + ") across levels", "Maxwell & Delaney 2004, ch. 12")
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
                OneWayAnova x = ConditionByLevel.interaction(byLevel(scores, diff, levels));
                inter.row(measure, (long) x.n(), x.f(), x.dfBetween(), x.dfWithin(), x.p(),
                        Double.isNaN(x.p()) ? "not tested" : x.p() < options.alpha()
                                ? "the effect of condition differs by level" : "no evidence that it differs by level");
                x.cautions().forEach(c -> inter.note(measure + ": " + c));
                String k = "interaction." + Keys.slug(measure) + ".";
                s.put(k + "f", x.f()).put(k + "df1", x.dfBetween()).put(k + "df2", x.dfWithin()).put(k + "p", x.p());
            }
            s.table(inter.build());
        }
        s.chart(Chart.of("chart_level_means", "Mean overall score by level and condition",
                "Means with 95% confidence intervals (t-based, per level and condition).",
                Charts.meansWithIntervals("proficiency level", "mean overall score", means), 760, 380));
        return s.build();
    }

    static Groups byLevel(ScoreTable scores, Map<String, Double> values, List<String> levels) {
        Map<String, List<Double>> m = new LinkedHashMap<>();
        for (String l : levels) {
            m.put(l, new ArrayList<>());
        }
        values.forEach((cand, v) -> {
            List<Double> l = m.get(scores.levelOf(cand));
            if (l != null) {
                l.add(v);
            }
        });
        Map<String, double[]> out = new LinkedHashMap<>();
        m.forEach((k, v) -> out.put(k, Keys.values(v)));
        return Groups.of(out);
    }

    private static double mean(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return s / v.length;
    }

    private static double halfWidth(double[] v) {
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
