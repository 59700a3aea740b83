package org.inkgate.analysis.study;

import java.util.HashSet;
import java.util.Set;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.scores.ResponseScore;
import org.inkgate.analysis.scores.ScoreTable;

/** What was read and how scores were formed. */
final class InputSection {

    private InputSection() {
    }

    static Section build(StudyData data, ScoreTable scores, StudyOptions options) {
        Section.Builder s = Section.builder("input", "Data and scoring rules");
        Set<String> raters = new HashSet<>();
        Set<String> tasks = new HashSet<>();
        for (Rating r : data.ratings()) {
            raters.add(r.rater());
            tasks.add(r.task());
        }
        long incomplete = scores.responses().stream().filter(ResponseScore::incomplete).count();
        long noLevel = scores.candidates().stream().filter(c -> scores.levelOf(c).isEmpty()).count();
        s.paragraph(options.scoreRule().describe());
        Table.Builder t = Table.builder("input_counts", "What was analysed")
                .method("counts of the input", "")
                .columns("what", "count")
                .row("ratings", (long) data.ratings().size())
                .row("responses (candidate x task)", (long) scores.responses().size())
                .row("candidates", (long) scores.candidates().size())
                .row("tasks", (long) tasks.size())
                .row("raters", (long) raters.size())
                .row("criteria", (long) scores.criteria().size())
                .row("conditions", (long) scores.conditions().size())
                .row("proficiency levels", (long) scores.levels().size())
                .row("responses missing a criterion", incomplete)
                .row("candidates without a level", noLevel);
        if (incomplete > 0) {
            t.note(incomplete + " response(s) lack ratings for some criterion: their score uses the criteria present"
                    + (options.scoreRule() == org.inkgate.analysis.scores.ScoreRule.SUM
                            ? ", so with the SUM rule their totals are not comparable with complete responses" : ""));
        }
        if (noLevel > 0) {
            t.note(noLevel + " candidate(s) have no level and are left out of the level comparisons");
        }
        s.table(t.build());
        s.put("ratings", data.ratings().size()).put("responses", scores.responses().size())
                .put("candidates", scores.candidates().size()).put("tasks", tasks.size())
                .put("raters", raters.size()).put("criteria", scores.criteria())
                .put("conditions", StudyAnalysis.orderedConditions(scores, options)).put("levels", scores.levels())
                .put("score_rule", options.scoreRule().name().toLowerCase(java.util.Locale.ROOT))
                .put("incomplete_responses", incomplete).put("candidates_without_level", noLevel);
        return s.build();
    }
}
