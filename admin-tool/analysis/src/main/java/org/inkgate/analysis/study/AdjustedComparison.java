package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.comparison.Ancova;
import org.inkgate.analysis.data.Candidate;
import org.inkgate.analysis.report.Column;
import org.inkgate.analysis.report.PValueText;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.scores.ScoreTable;

/**
 * The level-adjusted comparison of two independent groups: ANCOVA of the overall score on group,
 * adjusting for the pre-test the user named (a numeric candidate-table column) or else the level,
 * as a numeric covariate when every level is a number and as a factor otherwise; with the
 * homogeneity-of-slopes check.
 */
final class AdjustedComparison {

    private AdjustedComparison() {
    }

    static void build(Section.Builder s, StudyData data, ScoreTable scores, StudyOptions options, String a, String b) {
        Map<String, Double> preTest = new HashMap<>();
        if (options.preTest() != null) {
            for (Candidate c : data.candidates()) {
                Double v = c.survey().get(options.preTest());
                if (v != null) {
                    preTest.put(c.id(), v);
                }
            }
        }
        List<Double> y = new ArrayList<>();
        List<Boolean> second = new ArrayList<>();
        List<String> level = new ArrayList<>();
        List<Double> covariate = new ArrayList<>();
        int left = 0;
        for (String cond : List.of(a, b)) {
            for (Map.Entry<String, Double> e : scores.candidateScores(cond, null).entrySet()) {
                String lv = scores.levelOf(e.getKey());
                Double pre = preTest.get(e.getKey());
                if (options.preTest() != null ? pre == null : lv == null || lv.isBlank()) {
                    left++;
                    continue;
                }
                y.add(e.getValue());
                second.add(cond.equals(b));
                level.add(lv);
                covariate.add(pre);
            }
        }
        boolean numericLevel = options.preTest() == null && !level.isEmpty()
                && level.stream().allMatch(AdjustedComparison::isNumber);
        String adjustment = options.preTest() != null ? "pre-test '" + options.preTest() + "' (numeric covariate)"
                : numericLevel ? "level (numeric covariate: every level is a number)"
                        : "level (categorical factor: the levels are names, not numbers)";
        s.put("adjusted.adjustment", options.preTest() != null ? "pre_test" : numericLevel ? "level_numeric"
                : "level_factor");
        Table.Builder t = Table.builder("comparison_adjusted", "Adjusted comparison: " + b + " minus " + a)
                .method("analysis of covariance (ordinary least squares; group tested by the extra sum of squares"
                        + " over the adjustment-only model) with the homogeneity-of-slopes check (the group x"
                        + " adjustment interaction)", "Maxwell & Delaney 2004, ch. 9")
                .columns(Column.of("adjusted for"), Column.of("candidates"), Column.of("adjusted difference"),
                        Column.of("CI lower"), Column.of("CI upper"), Column.of("F"), Column.of("df1"),
                        Column.of("df2"), Column.of("p"), Column.of("partial eta squared"), Column.of("slope"),
                        Column.of("slopes F"), Column.of("slopes df1"), Column.of("slopes df2"),
                        Column.of("slopes p"), Column.of("slopes verdict"));
        if (left > 0) {
            t.note(left + " candidate(s) without " + (options.preTest() != null ? "a pre-test value" : "a level")
                    + " are left out of the adjusted comparison");
        }
        int n = y.size();
        long inB = second.stream().filter(x -> x).count();
        if (inB < 2 || n - inB < 2) {
            t.note("Fewer than 2 candidates with " + (options.preTest() != null ? "a pre-test" : "a level")
                    + " in a group: no adjusted comparison.");
            t.row(adjustment, (long) n, null, null, null, null, null, null, null, null, null, null, null, null, null,
                    "not tested");
            s.table(t.build());
            s.put("adjusted.available", false);
            return;
        }
        double[] yv = y.stream().mapToDouble(Double::doubleValue).toArray();
        boolean[] g = new boolean[n];
        for (int i = 0; i < n; i++) {
            g[i] = second.get(i);
        }
        Ancova r;
        if (options.preTest() != null) {
            r = Ancova.numeric(yv, g, covariate.stream().mapToDouble(Double::doubleValue).toArray(), 0.95);
        } else if (numericLevel) {
            r = Ancova.numeric(yv, g, level.stream().mapToDouble(Double::parseDouble).toArray(), 0.95);
        } else {
            r = Ancova.factor(yv, g, level.toArray(String[]::new), 0.95);
        }
        String verdict = Double.isNaN(r.slopesP()) ? "not tested" : r.slopesP() < options.alpha()
                ? "slopes differ (p " + PValueText.of(r.slopesP()) + "): the adjusted difference depends on the "
                        + (r.factor() ? "level" : "covariate") + "; do not read it as one effect"
                : "no difference in slopes found";
        t.row(adjustment, (long) n, r.adjustedDifference(), r.differenceLower(), r.differenceUpper(), r.f(), r.df1(),
                r.df2(), r.p(), r.partialEtaSquared(), r.factor() ? null : r.slope(), r.slopesF(), r.slopesDf1(),
                r.slopesDf2(), r.slopesP(), verdict);
        r.cautions().forEach(t::note);
        t.note(r.factor() ? "Level is a factor: the adjusted difference is the group difference within levels"
                + " (one common difference); the slopes check asks whether that difference is the same at every"
                + " level." : "The slope is the common regression of score on the covariate within groups; the"
                + " slopes check asks whether it is the same in both groups.");
        s.table(t.build());
        s.put("adjusted.available", true).put("adjusted.candidates", n).put("adjusted.difference",
                r.adjustedDifference()).put("adjusted.ci_lower", r.differenceLower())
                .put("adjusted.ci_upper", r.differenceUpper()).put("adjusted.f", r.f()).put("adjusted.df2", r.df2())
                .put("adjusted.p", r.p()).put("adjusted.partial_eta_squared", r.partialEtaSquared())
                .put("adjusted.slopes_f", r.slopesF()).put("adjusted.slopes_p", r.slopesP());
    }

    private static boolean isNumber(String s) {
        try {
            Double.parseDouble(s.trim());
            return true;
        } catch (NumberFormatException e) {
            return false;
        }
    }
}
