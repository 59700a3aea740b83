package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.List;
import org.inkgate.analysis.raters.Correlation;
import org.inkgate.analysis.report.Chart;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.rubric.CronbachAlpha;
import org.inkgate.analysis.scores.ResponseScore;
import org.inkgate.analysis.scores.ScoreTable;

/** Internal consistency of the rubric: Cronbach's alpha over criteria, inter-criterion correlations. */
final class RubricSection {

    private RubricSection() {
    }

    static Section build(ScoreTable scores, StudyOptions options) {
        Section.Builder s = Section.builder("rubric", "Rubric");
        List<String> criteria = scores.criteria();
        if (criteria.size() < 2) {
            s.paragraph("The rubric has " + criteria.size() + " criterion: internal consistency needs at least two.");
            s.put("available", false);
            return s.build();
        }
        s.paragraph("Responses (criterion scores averaged over raters) with a score for every criterion. Alpha"
                + " assumes the criteria measure one trait with equal loadings (tau-equivalence); a criterion whose"
                + " deletion raises alpha measures something else or is rated inconsistently.");
        List<String> cols = new ArrayList<>(List.of("condition", "responses", "criteria", "alpha", "lower", "upper"));
        criteria.forEach(c -> cols.add("alpha without " + c));
        Table.Builder a = Table.builder("rubric_alpha", "Cronbach's alpha over criteria")
                .method("Cronbach's alpha with the Feldt 95% CI; alpha if each criterion is deleted",
                        "Cronbach 1951; Feldt, Woodruff & Salih 1987")
                .columns(cols.toArray(String[]::new));
        List<String> groups = new ArrayList<>(StudyAnalysis.orderedConditions(scores, options));
        groups.add("all conditions");
        double[][] overallTable = null;
        for (String g : groups) {
            boolean all = g.equals("all conditions");
            List<double[]> rows = new ArrayList<>();
            for (ResponseScore r : scores.responses()) {
                if ((all || r.condition().equals(g)) && !r.incomplete()) {
                    double[] row = new double[criteria.size()];
                    for (int j = 0; j < row.length; j++) {
                        row[j] = r.criterionScores().get(criteria.get(j));
                    }
                    rows.add(row);
                }
            }
            double[][] t = rows.toArray(double[][]::new);
            if (all) {
                overallTable = t;
            }
            CronbachAlpha c = CronbachAlpha.of(t, 0.95);
            List<Object> row = new ArrayList<>(List.of(g, (long) c.n(), (long) c.items(), c.alpha(), c.lower(), c.upper()));
            for (int j = 0; j < criteria.size(); j++) {
                row.add(j < c.alphaIfDeleted().length ? c.alphaIfDeleted()[j] : Double.NaN);
            }
            a.row(row.toArray());
            c.cautions().forEach(x -> a.note(g + ": " + x));
            String k = Keys.slug(all ? "all" : g) + ".";
            s.put(k + "alpha", c.alpha()).put(k + "alpha_lower", c.lower()).put(k + "alpha_upper", c.upper());
            for (int j = 0; j < c.alphaIfDeleted().length; j++) {
                s.put(k + "alpha_without." + Keys.slug(criteria.get(j)), c.alphaIfDeleted()[j]);
            }
        }
        s.table(a.build());
        // inter-criterion correlations over all responses
        int k = criteria.size();
        double[][] r = new double[k][k];
        List<String> ccols = new ArrayList<>(List.of("criterion"));
        ccols.addAll(criteria);
        Table.Builder corr = Table.builder("rubric_correlations", "Correlations between criteria (all responses)")
                .method("Pearson r between criterion scores of responses", "Pearson 1896")
                .columns(ccols.toArray(String[]::new));
        for (int i = 0; i < k; i++) {
            List<Object> row = new ArrayList<>(List.of(criteria.get(i)));
            for (int j = 0; j < k; j++) {
                double[] x = column(overallTable, i), y = column(overallTable, j);
                r[i][j] = x.length < 3 ? Double.NaN : Correlation.r(x, y);
                row.add(r[i][j]);
                if (j > i) {
                    s.put("correlation." + Keys.slug(criteria.get(i)) + "." + Keys.slug(criteria.get(j)), r[i][j]);
                }
            }
            corr.row(row.toArray());
        }
        s.table(corr.build());
        s.chart(Chart.of("chart_criterion_correlations", "Correlations between criteria",
                "Pearson r between criterion scores of all responses: deeper blue is a higher positive correlation,"
                + " vermilion a negative one; the diagonal is 1.", Charts.correlationMatrix(criteria, r), 560, 460));
        return s.build();
    }

    private static double[] column(double[][] t, int j) {
        double[] c = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            c[i] = t[i][j];
        }
        return c;
    }
}
