package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.comparison.Holm;
import org.inkgate.analysis.comparison.IndependentComparison;
import org.inkgate.analysis.comparison.MannWhitney;
import org.inkgate.analysis.descriptive.ShapiroWilk;
import org.inkgate.analysis.groups.Groups;
import org.inkgate.analysis.groups.OneWayAnova;
import org.inkgate.analysis.groups.VarianceHomogeneity;
import org.inkgate.analysis.report.Column;
import org.inkgate.analysis.report.PValueText;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.scores.ScoreTable;

/**
 * Two independent groups (a parallel-groups design: each candidate under one condition): Welch's and
 * Student's t with Levene's test beside them, Hedges' g with its CI, the Mann-Whitney U test, per
 * measure with Holm across criteria; then the level-adjusted comparison ({@link AdjustedComparison}).
 */
final class IndependentGroupsSection {

    private IndependentGroupsSection() {
    }

    private static List<Column> columns(String a, String b) {
        List<Column> c = new ArrayList<>(List.of(Column.of("measure"), Column.of("n " + a, "baseline_n"),
                Column.of("n " + b, "other_n"), Column.of("mean " + a, "baseline_mean"),
                Column.of("mean " + b, "other_mean")));
        for (String label : List.of("difference", "Welch t", "Welch df", "Welch p", "Welch p (Holm)", "CI lower",
                "CI upper", "Student t", "Student df", "Student p", "Levene F", "Levene p", "Hedges g", "g lower",
                "g upper", "Mann-Whitney U", "Mann-Whitney p", "Mann-Whitney p (Holm)", "normality in groups")) {
            c.add(Column.of(label));
        }
        return c;
    }

    static void build(Section.Builder s, StudyData data, ScoreTable scores, StudyOptions options, String a, String b) {
        s.paragraph("Each candidate wrote under one condition, so the two groups of candidates are compared as"
                + " independent samples: '" + b + "' minus '" + a + "'. Welch's t-test does not assume equal"
                + " variances and is the one to read; Student's t is beside it with Levene's test of equal"
                + " variances. The Mann-Whitney U test does not assume normality. Criterion p-values are adjusted"
                + " by Holm's method across criteria (the overall row is not part of that family). Groups formed"
                + " by random allocation differ only by chance at the start; the level-adjusted comparison below"
                + " takes out what the groups' levels explain.");
        Table.Builder t = Table.builder("comparison_independent", "Independent groups: " + b + " minus " + a)
                .method("Welch's and Student's t-tests with 95% CIs; Levene's test (centre = mean); Hedges' g with"
                        + " 95% CI (noncentral t, times the small-sample factor J); Mann-Whitney U (exact without"
                        + " ties and under 50 per group, else normal approximation with tie and continuity"
                        + " corrections); Holm adjustment across criteria",
                        "Welch 1947; Levene 1960; Hedges 1981; Lakens 2013; Mann & Whitney 1947; Holm 1979")
                .columns(columns(a, b));
        List<String> measures = new ArrayList<>();
        measures.add(null);
        measures.addAll(scores.criteria());
        int m = measures.size();
        double[] pW = new double[m - 1], pU = new double[m - 1];
        List<Object[]> rows = new ArrayList<>();
        List<List<String>> notes = new ArrayList<>();
        for (int i = 0; i < m; i++) {
            String measure = measures.get(i) == null ? "overall" : measures.get(i);
            double[] va = Keys.values(scores.candidateScores(a, measures.get(i)).values());
            double[] vb = Keys.values(scores.candidateScores(b, measures.get(i)).values());
            List<String> cautions = new ArrayList<>();
            String k = Keys.slug(measure) + ".";
            s.put(k + "baseline_n", va.length).put(k + "other_n", vb.length);
            if (va.length < 2 || vb.length < 2) {
                cautions.add(measure + ": fewer than 2 candidates in a group: not compared");
                rows.add(new Object[] {measure, (long) va.length, (long) vb.length});
                notes.add(cautions);
                if (i > 0) {
                    pW[i - 1] = Double.NaN;
                    pU[i - 1] = Double.NaN;
                }
                continue;
            }
            IndependentComparison c = IndependentComparison.of(vb, va, 0.95);
            OneWayAnova levene = VarianceHomogeneity.test(new Groups(List.of(a, b), List.of(va, vb)),
                    VarianceHomogeneity.Centre.MEAN);
            MannWhitney u = MannWhitney.of(vb, va);
            ShapiroWilk.Result swa = ShapiroWilk.test(va), swb = ShapiroWilk.test(vb);
            boolean notNormal = swa.rejects(options.alpha()) || swb.rejects(options.alpha());
            String normality = Double.isNaN(swa.p()) || Double.isNaN(swb.p()) ? "not tested"
                    : notNormal ? "not normal in a group (SW p " + PValueText.of(Math.min(swa.p(), swb.p()))
                            + "): read Mann-Whitney" : "no departure found";
            if (levene.p() < options.alpha()) {
                cautions.add(measure + ": Levene's test finds unequal variances (p " + PValueText.of(levene.p())
                        + "): Student's t assumes them equal; read Welch's");
            }
            c.cautions().forEach(x -> cautions.add(measure + ": " + x));
            u.cautions().forEach(x -> cautions.add(measure + ", Mann-Whitney: " + x));
            rows.add(new Object[] {measure, (long) va.length, (long) vb.length, mean(va), mean(vb), c.difference(),
                    c.welchT(), c.welchDf(), c.welchP(), null, c.welchLower(), c.welchUpper(), c.studentT(),
                    c.studentDf(), c.studentP(), levene.f(), levene.p(), c.hedgesG(), c.hedgesLower(),
                    c.hedgesUpper(), u.u(), u.p(), null, normality});
            notes.add(cautions);
            s.put(k + "difference", c.difference()).put(k + "welch_t", c.welchT()).put(k + "welch_df", c.welchDf())
                    .put(k + "welch_p", c.welchP()).put(k + "ci_lower", c.welchLower())
                    .put(k + "ci_upper", c.welchUpper()).put(k + "student_t", c.studentT())
                    .put(k + "student_p", c.studentP()).put(k + "levene_f", levene.f())
                    .put(k + "levene_p", levene.p()).put(k + "hedges_g", c.hedgesG())
                    .put(k + "hedges_g_lower", c.hedgesLower()).put(k + "hedges_g_upper", c.hedgesUpper())
                    .put(k + "mann_whitney_u", u.u()).put(k + "mann_whitney_p", u.p());
            if (i > 0) {
                pW[i - 1] = c.welchP();
                pU[i - 1] = u.p();
            }
        }
        double[] hW = Holm.adjust(pW), hU = Holm.adjust(pU);
        for (int i = 0; i < m; i++) {
            Object[] row = rows.get(i);
            if (row.length > 3 && i > 0) {
                row[9] = hW[i - 1];
                row[22] = hU[i - 1];
                s.put(Keys.slug(measures.get(i)) + ".welch_p_holm", hW[i - 1])
                        .put(Keys.slug(measures.get(i)) + ".mann_whitney_p_holm", hU[i - 1]);
            }
            t.row(row.length > 3 ? row : java.util.Arrays.copyOf(row, 24));
            notes.get(i).forEach(t::note);
        }
        t.note("Hedges' g is the difference over the pooled SD times J(df), the small-sample correction; its CI is"
                + " the noncentral-t interval of Cohen's d_s times J. Mann-Whitney U counts the pairs in which the"
                + " '" + b + "' candidate scores higher (ties count a half).");
        s.table(t.build());
        AdjustedComparison.build(s, data, scores, options, a, b);
    }

    private static double mean(double[] v) {
        double sum = 0;
        for (double x : v) {
            sum += x;
        }
        return sum / v.length;
    }

    /** Candidate scores under a condition as a map, for the adjusted comparison. */
    static Map<String, Double> overall(ScoreTable scores, String condition) {
        return scores.candidateScores(condition, null);
    }
}
