package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.descriptive.Descriptives;
import org.inkgate.analysis.descriptive.ShapiroWilk;
import org.inkgate.analysis.groups.Groups;
import org.inkgate.analysis.groups.OneWayAnova;
import org.inkgate.analysis.groups.VarianceHomogeneity;
import org.inkgate.analysis.report.Chart;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.scores.ScoreTable;

/** Descriptive statistics per condition and measure, normality and variance checks across levels. */
final class DescriptivesSection {

    private DescriptivesSection() {
    }

    static Section build(ScoreTable scores, StudyOptions options) {
        Section.Builder s = Section.builder("descriptives", "Descriptive statistics");
        s.paragraph("Candidate scores per condition, overall and per criterion. Skewness and kurtosis are the"
                + " bias-corrected G1 and G2 with their standard errors; Shapiro-Wilk tests normality; Levene and"
                + " Brown-Forsythe test equal variances across proficiency levels.");
        Table.Builder t = Table.builder("descriptives", "Candidate scores by condition and measure")
                .method("n, mean, SD (n-1), min, max, G1 and G2 with SEs; Shapiro-Wilk W (AS R94)",
                        "Joanes & Gill 1998; Royston 1995")
                .columns("condition", "measure", "n", "mean", "SD", "min", "max", "skewness G1", "SE G1",
                        "kurtosis G2", "SE G2", "Shapiro-Wilk W", "SW p", "normality");
        Table.Builder v = Table.builder("variance_homogeneity", "Equality of variances across proficiency levels")
                .method("Levene (centre = mean) and Brown-Forsythe (centre = median): one-way ANOVA F on absolute"
                        + " deviations", "Levene 1960; Brown & Forsythe 1974")
                .columns("condition", "measure", "levels", "Levene F", "df1", "df2", "Levene p", "Brown-Forsythe F",
                        "BF p", "equal variances");
        Map<String, double[]> histogram = new LinkedHashMap<>();
        for (String condition : StudyAnalysis.orderedConditions(scores, options)) {
            List<String> measures = new ArrayList<>();
            measures.add(null);
            measures.addAll(scores.criteria());
            for (String criterion : measures) {
                String measure = criterion == null ? "overall" : criterion;
                Map<String, Double> cs = scores.candidateScores(condition, criterion);
                double[] x = Keys.values(cs.values());
                if (criterion == null) {
                    histogram.put(condition, x);
                }
                Descriptives d = Descriptives.of(x);
                ShapiroWilk.Result sw = ShapiroWilk.test(x);
                String normality = Double.isNaN(sw.p()) ? "not tested"
                        : sw.rejects(options.alpha()) ? "departs from normal (p < " + options.alpha() + ")" : "no departure found";
                t.row(condition, measure, (long) d.n(), d.mean(), d.sd(), d.min(), d.max(), d.skewness(),
                        d.skewnessSe(), d.kurtosis(), d.kurtosisSe(), sw.w(), sw.p(), normality);
                for (String c : d.cautions()) {
                    t.note(condition + ", " + measure + ": " + c);
                }
                for (String c : sw.cautions()) {
                    t.note(condition + ", " + measure + ": " + c);
                }
                String k = Keys.slug(condition) + "." + Keys.slug(measure) + ".";
                s.put(k + "n", d.n()).put(k + "mean", d.mean()).put(k + "sd", d.sd()).put(k + "min", d.min())
                        .put(k + "max", d.max()).put(k + "skewness", d.skewness()).put(k + "skewness_se", d.skewnessSe())
                        .put(k + "kurtosis", d.kurtosis()).put(k + "kurtosis_se", d.kurtosisSe())
                        .put(k + "shapiro_w", sw.w()).put(k + "shapiro_p", sw.p());
                // variance homogeneity across levels
                Map<String, List<Double>> byLevel = new LinkedHashMap<>();
                for (String level : scores.levels()) {
                    byLevel.put(level, new ArrayList<>());
                }
                cs.forEach((cand, val) -> {
                    List<Double> l = byLevel.get(scores.levelOf(cand));
                    if (l != null) {
                        l.add(val);
                    }
                });
                Map<String, double[]> g = new LinkedHashMap<>();
                byLevel.forEach((lv, l) -> g.put(lv, Keys.values(l)));
                if (g.size() >= 2) {
                    Groups groups = Groups.of(g);
                    OneWayAnova lev = VarianceHomogeneity.test(groups, VarianceHomogeneity.Centre.MEAN);
                    OneWayAnova bf = VarianceHomogeneity.test(groups, VarianceHomogeneity.Centre.MEDIAN);
                    String verdict = Double.isNaN(bf.p()) ? "not tested" : bf.p() < options.alpha()
                            ? "unequal (read Welch ANOVA and Games-Howell)" : "no difference found";
                    v.row(condition, measure, (long) lev.groups(), lev.f(), lev.dfBetween(), lev.dfWithin(), lev.p(),
                            bf.f(), bf.p(), verdict);
                    for (String c : bf.cautions()) {
                        v.note(condition + ", " + measure + ": " + c);
                    }
                    s.put(k + "levene_f", lev.f()).put(k + "levene_p", lev.p()).put(k + "brown_forsythe_f", bf.f())
                            .put(k + "brown_forsythe_p", bf.p());
                }
            }
        }
        t.note("Shapiro-Wilk is valid for 3 to 5000 values; with hundreds of candidates it flags departures too"
                + " small to matter, so look at skewness and kurtosis as well (common practice).");
        s.table(t.build());
        if (v.isEmpty()) {
            v.note("Fewer than two proficiency levels in the data: variances across levels cannot be compared.");
        }
        s.table(v.build());
        s.chart(Chart.of("chart_score_distribution", "Score distributions by condition",
                "Relative frequency of candidates' overall scores, one colour per condition (overlaid).",
                Charts.histogram("overall score", histogram, 20), 760, 380));
        return s.build();
    }
}
