package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.comparison.Friedman;
import org.inkgate.analysis.comparison.Holm;
import org.inkgate.analysis.comparison.PairedComparison;
import org.inkgate.analysis.comparison.RepeatedMeasuresAnova;
import org.inkgate.analysis.descriptive.ShapiroWilk;
import org.inkgate.analysis.report.Column;
import org.inkgate.analysis.report.PValueText;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.scores.ScoreTable;

/**
 * Three or more within-candidate conditions: the one-way repeated-measures ANOVA with Mauchly's test
 * and the Greenhouse-Geisser and Huynh-Feldt corrections, Friedman's test beside it, pairwise paired
 * t-tests with Holm's adjustment, and the mixed design with level between candidates.
 */
final class RepeatedMeasuresSection {

    private RepeatedMeasuresSection() {
    }

    static void build(Section.Builder s, ScoreTable scores, StudyOptions options, List<String> conditions) {
        int k = conditions.size();
        s.paragraph("Every candidate wrote under all " + k + " conditions, so the conditions are compared within"
                + " candidates by a one-way repeated-measures ANOVA. Its F-test assumes sphericity (equal variances"
                + " of every pairwise difference); Mauchly's test checks it, and the Greenhouse-Geisser and"
                + " Huynh-Feldt corrections shrink the degrees of freedom when it fails. Friedman's rank test beside"
                + " it does not assume normality. Which conditions differ is read from the pairwise table (paired"
                + " t-tests, Holm-adjusted across the pairs).");
        Table.Builder t = Table.builder("comparison_repeated", "Repeated-measures comparison of " + k + " conditions")
                .method("one-way repeated-measures ANOVA with partial eta squared; Mauchly's test of sphericity;"
                        + " Greenhouse-Geisser and Huynh-Feldt corrected p; Friedman's test with Kendall's W",
                        "Mauchly 1940; Greenhouse & Geisser 1959; Huynh & Feldt 1976; Lecoutre 1991; Friedman 1937")
                .columns(columns(conditions));
        List<String> measures = new ArrayList<>();
        measures.add(null);
        measures.addAll(scores.criteria());
        for (String criterion : measures) {
            String measure = criterion == null ? "overall" : criterion;
            Map<String, double[]> matrix = complete(scores, conditions, criterion);
            double[][] y = matrix.values().toArray(double[][]::new);
            String key = Keys.slug(measure) + ".";
            s.put(key + "candidates", y.length);
            if (y.length < 3) {
                t.note(measure + ": fewer than 3 candidates with a score under every condition: not compared");
                continue;
            }
            RepeatedMeasuresAnova r = RepeatedMeasuresAnova.of(y);
            Friedman fr = Friedman.of(y);
            List<Object> row = new ArrayList<>(List.of(measure, (long) y.length));
            for (int j = 0; j < k; j++) {
                row.add(columnMean(y, j));
            }
            RepeatedMeasuresAnova.Effect c = r.condition();
            String sphericity = Double.isNaN(r.mauchlyP()) ? "not tested"
                    : r.mauchlyP() < options.alpha() ? "sphericity fails (Mauchly p " + PValueText.of(r.mauchlyP())
                            + "): read the corrected p" : "no departure found";
            row.addAll(java.util.Arrays.asList(c.f(), c.df(), c.errorDf(), c.p(), c.partialEtaSquared(), r.mauchlyW(),
                    r.mauchlyP(), r.greenhouseGeisser(), c.pGreenhouseGeisser(), r.huynhFeldt(), c.pHuynhFeldt(),
                    sphericity, fr.q(), fr.df(), fr.p(), fr.kendallW()));
            t.row(row.toArray());
            r.cautions().forEach(x -> t.note(measure + ": " + x));
            fr.cautions().forEach(x -> t.note(measure + ", Friedman: " + x));
            s.put(key + "f", c.f()).put(key + "df1", c.df()).put(key + "df2", c.errorDf()).put(key + "p", c.p())
                    .put(key + "partial_eta_squared", c.partialEtaSquared()).put(key + "mauchly_w", r.mauchlyW())
                    .put(key + "mauchly_p", r.mauchlyP()).put(key + "greenhouse_geisser_epsilon",
                            r.greenhouseGeisser()).put(key + "p_greenhouse_geisser", c.pGreenhouseGeisser())
                    .put(key + "huynh_feldt_epsilon", r.huynhFeldt()).put(key + "p_huynh_feldt", c.pHuynhFeldt())
                    .put(key + "friedman_q", fr.q()).put(key + "friedman_p", fr.p())
                    .put(key + "kendall_w", fr.kendallW());
        }
        t.note("Only candidates with a score under every condition enter a row. The Huynh-Feldt epsilon is shown as"
                + " computed (it can exceed 1); its test uses at most 1. Mauchly's test has little power with few"
                + " candidates: a non-significant result does not show that sphericity holds.");
        s.table(t.build());
        pairwise(s, scores, conditions, options.alpha());
        MixedDesignTable.build(s, scores, options, conditions, complete(scores, conditions, null));
    }

    private static List<Column> columns(List<String> conditions) {
        List<Column> c = new ArrayList<>(List.of(Column.of("measure"), Column.of("candidates")));
        for (int j = 0; j < conditions.size(); j++) {
            c.add(Column.of("mean " + conditions.get(j), "mean_condition_" + (j + 1)));
        }
        for (String label : List.of("F", "df1", "df2", "p", "partial eta squared", "Mauchly W", "Mauchly p",
                "GG epsilon", "p (GG)", "HF epsilon", "p (HF)", "sphericity", "Friedman chi-square", "Friedman df",
                "Friedman p", "Kendall W")) {
            c.add(Column.of(label));
        }
        return c;
    }

    private static void pairwise(Section.Builder s, ScoreTable scores, List<String> conditions, double alpha) {
        List<String> normality = new ArrayList<>();
        Map<String, double[]> m = complete(scores, conditions, null);
        double[][] y = m.values().toArray(double[][]::new);
        if (y.length < 2) {
            return;
        }
        Table.Builder t = Table.builder("comparison_pairwise", "Pairwise comparisons of the conditions (overall score)")
                .method("paired t-tests with Holm adjustment across all pairs; Cohen's d_z", "Student 1908; Holm 1979;"
                        + " Lakens 2013")
                .columns(Column.of("second"), Column.of("first"), Column.of("pairs"), Column.of("difference"),
                        Column.of("CI lower"), Column.of("CI upper"), Column.of("t"), Column.of("df"), Column.of("p"),
                        Column.of("p (Holm)"), Column.of("d_z"), Column.of("normality of differences"));
        List<PairedComparison> pcs = new ArrayList<>();
        List<String[]> names = new ArrayList<>();
        for (int i = 0; i < conditions.size(); i++) {
            for (int j = i + 1; j < conditions.size(); j++) {
                pcs.add(PairedComparison.of(column(y, i), column(y, j), 0.95));
                names.add(new String[] {conditions.get(j), conditions.get(i)});
            }
        }
        double[] p = pcs.stream().mapToDouble(PairedComparison::p).toArray();
        double[] h = Holm.adjust(p);
        boolean anyNotNormal = false;
        for (int i = 0; i < conditions.size(); i++) {
            for (int j = i + 1; j < conditions.size(); j++) {
                double[] d = new double[y.length];
                for (int r = 0; r < y.length; r++) {
                    d[r] = y[r][j] - y[r][i];
                }
                ShapiroWilk.Result sw = ShapiroWilk.test(d);
                boolean rejects = !Double.isNaN(sw.p()) && sw.rejects(alpha);
                anyNotNormal |= rejects;
                normality.add(Double.isNaN(sw.p()) ? "not tested" : rejects ? "not normal (SW p "
                        + PValueText.of(sw.p()) + "): read Friedman" : "no departure found");
            }
        }
        for (int i = 0; i < pcs.size(); i++) {
            PairedComparison c = pcs.get(i);
            t.row(names.get(i)[0], names.get(i)[1], (long) c.n(), c.meanDifference(), c.differenceLower(),
                    c.differenceUpper(), c.t(), c.df(), c.p(), h[i], c.dz(), normality.get(i));
            s.put("pairwise." + Keys.slug(names.get(i)[0]) + "_minus_" + Keys.slug(names.get(i)[1]) + ".p_holm", h[i]);
        }
        t.note("Differences are the second condition minus the first. The CIs are not adjusted for the number of"
                + " pairs.");
        if (anyNotNormal) {
            t.note("Some differences between conditions are far from normal: the ANOVA and these t-tests may mislead"
                    + " there; read Friedman's test beside the ANOVA.");
        }
        s.put("pairwise.differences_not_normal", anyNotNormal);
        s.table(t.build());
    }

    /** Candidates with a score under every condition, in first-seen order, to their scores by condition. */
    static Map<String, double[]> complete(ScoreTable scores, List<String> conditions, String criterion) {
        Map<String, double[]> out = new LinkedHashMap<>();
        List<Map<String, Double>> per = conditions.stream().map(c -> scores.candidateScores(c, criterion)).toList();
        for (String cand : scores.candidates()) {
            double[] row = new double[conditions.size()];
            boolean all = true;
            for (int j = 0; j < row.length && all; j++) {
                Double v = per.get(j).get(cand);
                all = v != null;
                row[j] = all ? v : Double.NaN;
            }
            if (all) {
                out.put(cand, row);
            }
        }
        return out;
    }

    static double[] column(double[][] y, int j) {
        double[] c = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            c[i] = y[i][j];
        }
        return c;
    }

    private static double columnMean(double[][] y, int j) {
        double s = 0;
        for (double[] row : y) {
            s += row[j];
        }
        return s / y.length;
    }
}
