package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.comparison.RepeatedMeasuresAnova;
import org.inkgate.analysis.report.Column;
import org.inkgate.analysis.report.PValueText;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.scores.ScoreTable;

/**
 * The mixed design: condition within candidates, level between them, on the overall score; the
 * interaction asks whether the conditions' effect differs by level.
 */
final class MixedDesignTable {

    private MixedDesignTable() {
    }

    static void build(Section.Builder s, ScoreTable scores, StudyOptions options, List<String> conditions,
            Map<String, double[]> complete) {
        Map<String, Integer> codes = new LinkedHashMap<>();
        List<double[]> rows = new ArrayList<>();
        List<Integer> group = new ArrayList<>();
        for (Map.Entry<String, double[]> e : complete.entrySet()) {
            String level = scores.levelOf(e.getKey());
            if (level == null || level.isBlank()) {
                continue;
            }
            group.add(codes.computeIfAbsent(level, x -> codes.size()));
            rows.add(e.getValue());
        }
        if (codes.size() < 2 || rows.size() - codes.size() < 1) {
            s.put("mixed.available", false);
            return;
        }
        RepeatedMeasuresAnova r = RepeatedMeasuresAnova.of(rows.toArray(double[][]::new),
                group.stream().mapToInt(Integer::intValue).toArray());
        Table.Builder t = Table.builder("comparison_mixed", "Condition (within) by level (between), overall score")
                .method("mixed-design ANOVA (split-plot), condition entered before the interaction; within effects"
                        + " with Greenhouse-Geisser and Huynh-Feldt corrected p from the pooled within-level"
                        + " covariance", "Maxwell & Delaney 2004, ch. 12; Huynh & Feldt 1976; Lecoutre 1991")
                .columns(Column.of("effect"), Column.of("F"), Column.of("df1"), Column.of("df2"), Column.of("p"),
                        Column.of("p (GG)"), Column.of("p (HF)"), Column.of("partial eta squared"));
        Object[][] effects = {{"level (between)", r.between(), "level"}, {"condition (within)", r.condition(), "condition"},
                {"condition x level", r.interaction(), "interaction"}};
        for (Object[] e : effects) {
            RepeatedMeasuresAnova.Effect x = (RepeatedMeasuresAnova.Effect) e[1];
            t.row(e[0], x.f(), x.df(), x.errorDf(), x.p(), nanToNull(x.pGreenhouseGeisser()),
                    nanToNull(x.pHuynhFeldt()), x.partialEtaSquared());
            s.put("mixed." + e[2] + ".f", x.f()).put("mixed." + e[2] + ".p", x.p())
                    .put("mixed." + e[2] + ".partial_eta_squared", x.partialEtaSquared());
        }
        s.put("mixed.available", true).put("mixed.levels", codes.size()).put("mixed.mauchly_p", r.mauchlyP());
        t.note(rows.size() + " candidates with a level and a score under every condition, in " + codes.size()
                + " levels. A significant interaction means the conditions' effect differs between levels: read the"
                + " condition effect level by level then, not as one effect.");
        if (!Double.isNaN(r.mauchlyP()) && r.mauchlyP() < options.alpha()) {
            t.note("Sphericity fails within levels (Mauchly p " + PValueText.of(r.mauchlyP()) + "): read the"
                    + " corrected p of the within effects.");
        }
        r.cautions().forEach(t::note);
        s.table(t.build());
    }

    private static Double nanToNull(double v) {
        return Double.isNaN(v) ? null : v;
    }
}
