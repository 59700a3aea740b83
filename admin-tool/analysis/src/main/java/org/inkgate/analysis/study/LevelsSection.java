package org.inkgate.analysis.study;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.scores.ScoreTable;

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
        Map<String, String> levelOf = new HashMap<>();
        for (String cand : scores.candidates()) {
            levelOf.put(cand, scores.levelOf(cand));
        }
        GroupComparisons.add(s, scores, options, new GroupComparisons.Grouping("levels", "", "chart_level_means",
                "level", "levels", "level", "levels", "proficiency level", levels, levelOf));
        return s.build();
    }
}
