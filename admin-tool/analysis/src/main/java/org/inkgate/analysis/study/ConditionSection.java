package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.comparison.Holm;
import org.inkgate.analysis.comparison.PairedComparison;
import org.inkgate.analysis.comparison.WilcoxonSignedRank;
import org.inkgate.analysis.data.StudyDesign;
import org.inkgate.analysis.descriptive.ShapiroWilk;
import org.inkgate.analysis.report.Column;
import org.inkgate.analysis.report.PValueText;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.scores.ScoreTable;

/**
 * The condition comparison, chosen by the design: here the paired comparison of two within-candidate
 * conditions, overall and per criterion, with Holm across criteria; the other designs in
 * {@link RepeatedMeasuresSection}, {@link IndependentGroupsSection} (two groups) and
 * {@link ParallelConditionsSection} (three or more groups); every within-candidate design also
 * gets the linear mixed model on every rating ({@link LinearMixedModelSection}).
 */
final class ConditionSection {

    private ConditionSection() {
    }

    // the two means are named by role in the CSV, so the header does not change with the conditions' names
    private static List<Column> columns(String a, String b) {
        List<Column> c = new ArrayList<>(List.of(Column.of("measure"), Column.of("pairs"),
                Column.of("mean " + a, "baseline_mean"), Column.of("mean " + b, "other_mean")));
        for (String label : List.of("difference", "CI lower", "CI upper", "t", "df", "p", "p (Holm)", "d_z",
                "d_z lower", "d_z upper", "d_av", "d_av lower", "d_av upper", "Wilcoxon V", "Wilcoxon p",
                "Wilcoxon p (Holm)", "normality of differences")) {
            c.add(Column.of(label));
        }
        return c;
    }

    /**
     * The condition comparison the design calls for: paired (two within-candidate conditions),
     * repeated measures (three or more), independent groups (parallel groups, two or more), or, when the data fit
     * no design or contradict the declared one, the reason and the candidates concerned.
     */
    static Section build(StudyData data, ScoreTable scores, StudyOptions options, ComparisonDirection direction,
            StudyDesign design) {
        List<String> conditions = StudyAnalysis.orderedConditions(scores, options);
        StudyDesign.Kind kind = design.analysed();
        String title = switch (kind) {
            case WITHIN -> conditions.size() == 2 ? "Scores with and without resources (paired)"
                    : "Scores under " + conditions.size() + " conditions (within candidates)";
            case PARALLEL -> conditions.size() == 2 ? "Scores of the condition groups (parallel groups)"
                    : "Scores of " + conditions.size() + " condition groups (parallel groups)";
            default -> "Condition comparison: not made";
        };
        Section.Builder s = Section.builder("comparison", title);
        s.paragraph(design.reason());
        s.put("design", kind.word()).put("design_found", design.found().word())
                .put("design_declared", design.declared() == null ? null : design.declared().word())
                .put("design_mismatch", design.mismatch());
        if (!design.misfits().isEmpty()) {
            s.paragraph("Candidates concerned (" + design.misfits().size() + "): " + listed(design.misfits()) + ".");
            s.put("design_misfits", String.join(",", design.misfits()));
        }
        if (kind == StudyDesign.Kind.UNFIT || kind == StudyDesign.Kind.SINGLE_CONDITION) {
            s.put("available", false);
            return s.build();
        }
        s.put("available", true).put("baseline", conditions.get(0));
        if (kind == StudyDesign.Kind.PARALLEL && conditions.size() > 2) {
            s.paragraph(direction.reason());
            ParallelConditionsSection.build(s, scores, options, conditions);
            return s.build();
        }
        if (kind == StudyDesign.Kind.PARALLEL) {
            s.put("other", conditions.get(1));
            s.paragraph(direction.reason());
            IndependentGroupsSection.build(s, data, scores, options, conditions.get(0), conditions.get(1));
            return s.build();
        }
        if (conditions.size() > 2) {
            RepeatedMeasuresSection.build(s, scores, options, conditions);
        } else {
            paired(s, scores, options, direction, conditions);
        }
        LinearMixedModelSection.build(s, data.ratings(), options, conditions, scores.criteria());
        return s.build();
    }

    /** At most 30 identifiers, then how many more. */
    private static String listed(List<String> ids) {
        return ids.size() <= 30 ? String.join(", ", ids)
                : String.join(", ", ids.subList(0, 30)) + " and " + (ids.size() - 30) + " more";
    }

    private static void paired(Section.Builder s, ScoreTable scores, StudyOptions options, ComparisonDirection direction,
            List<String> conditions) {
        String a = conditions.get(0), b = conditions.get(1);
        s.paragraph("Each candidate's score under '" + b + "' minus their score under '" + a + "', for candidates"
                + " with a score under both. The paired t-test is read when the differences are roughly normal;"
                + " the Wilcoxon signed-rank test beside it does not assume normality. Criterion p-values are"
                + " adjusted by Holm's method across criteria (the overall row is not part of that family).");
        s.paragraph(direction.reason());
        Table.Builder t = Table.builder("comparison_paired", "Paired comparison: " + b + " minus " + a)
                .method("paired t-test with mean difference and 95% CI; Cohen's d_z and d_av with 95% CIs by"
                        + " inverting the noncentral t; Wilcoxon signed-rank test; Holm adjustment across criteria",
                        "Student 1908; Lakens 2013; Wilcoxon 1945; Holm 1979")
                .columns(columns(a, b));
        List<String> measures = new ArrayList<>();
        measures.add(null);
        measures.addAll(scores.criteria());
        int m = measures.size();
        PairedComparison[] pc = new PairedComparison[m];
        WilcoxonSignedRank[] wx = new WilcoxonSignedRank[m];
        ShapiroWilk.Result[] sw = new ShapiroWilk.Result[m];
        double[] pT = new double[m - 1], pW = new double[m - 1];
        for (int i = 0; i < m; i++) {
            Map<String, Double> sa = scores.candidateScores(a, measures.get(i));
            Map<String, Double> sb = scores.candidateScores(b, measures.get(i));
            List<Double> xa = new ArrayList<>(), xb = new ArrayList<>();
            sa.forEach((cand, v) -> {
                Double w = sb.get(cand);
                if (w != null) {
                    xa.add(v);
                    xb.add(w);
                }
            });
            double[] va = Keys.values(xa), vb = Keys.values(xb);
            pc[i] = PairedComparison.of(va, vb, 0.95);
            wx[i] = WilcoxonSignedRank.of(va, vb);
            double[] d = new double[va.length];
            for (int j = 0; j < d.length; j++) {
                d[j] = vb[j] - va[j];
            }
            sw[i] = ShapiroWilk.test(d);
            if (i > 0) {
                pT[i - 1] = pc[i].p();
                pW[i - 1] = wx[i].p();
            }
        }
        double[] hT = Holm.adjust(pT), hW = Holm.adjust(pW);
        for (int i = 0; i < m; i++) {
            String measure = measures.get(i) == null ? "overall" : measures.get(i);
            PairedComparison c = pc[i];
            String normality = Double.isNaN(sw[i].p()) ? "not tested" : sw[i].rejects(options.alpha())
                    ? "not normal (SW p " + PValueText.of(sw[i].p()) + "): read Wilcoxon"
                    : "no departure found";
            Double holmT = i == 0 ? null : hT[i - 1];
            Double holmW = i == 0 ? null : hW[i - 1];
            t.row(measure, (long) c.n(), c.meanA(), c.meanB(), c.meanDifference(), c.differenceLower(),
                    c.differenceUpper(), c.t(), c.df(), c.p(), holmT, c.dz(), c.dzLower(), c.dzUpper(), c.dav(),
                    c.davLower(), c.davUpper(), wx[i].v(), wx[i].p(), holmW, normality);
            c.cautions().forEach(x -> t.note(measure + ": " + x));
            wx[i].cautions().forEach(x -> t.note(measure + ", Wilcoxon: " + x));
            String k = Keys.slug(measure) + ".";
            s.put(k + "pairs", c.n()).put(k + "mean_difference", c.meanDifference())
                    .put(k + "ci_lower", c.differenceLower()).put(k + "ci_upper", c.differenceUpper())
                    .put(k + "t", c.t()).put(k + "df", c.df()).put(k + "p", c.p())
                    .put(k + "dz", c.dz()).put(k + "dz_lower", c.dzLower()).put(k + "dz_upper", c.dzUpper())
                    .put(k + "dav", c.dav()).put(k + "dav_lower", c.davLower()).put(k + "dav_upper", c.davUpper())
                    .put(k + "wilcoxon_v", wx[i].v()).put(k + "wilcoxon_p", wx[i].p())
                    .put(k + "differences_shapiro_p", sw[i].p());
            if (i > 0) {
                s.put(k + "p_holm", hT[i - 1]).put(k + "wilcoxon_p_holm", hW[i - 1]);
            }
        }
        t.note("The CI of d_av scales the d_z interval by sd(difference) / mean SD, treating that ratio as known:"
                + " an approximation, narrower than an exact interval would be.");
        s.put("other", b);
        s.table(t.build());
    }
}
