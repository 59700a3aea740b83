package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import org.inkgate.analysis.data.ToolUse;
import org.inkgate.analysis.raters.Correlation;
import org.inkgate.analysis.report.Chart;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.scores.ResponseScore;
import org.inkgate.analysis.scores.ScoreTable;
import org.inkgate.analysis.usage.Contingency;
import org.jfree.data.category.DefaultCategoryDataset;

/** Resource use per tool and level, its association with level, and use against score. */
final class UsageSection {

    private UsageSection() {
    }

    static Section build(List<ToolUse> uses, ScoreTable scores, StudyOptions options) {
        Section.Builder s = Section.builder("usage", "Resource use");
        s.paragraph("A candidate counts as offered a tool when the tool-use table has a row for them and the tool;"
                + " as a user when that row shows at least one use. Uses per candidate are over offered candidates.");
        // tool -> level -> candidate -> summed counts {uses, empty, accepted, ignored}
        Map<String, Map<String, Map<String, long[]>>> acc = new TreeMap<>();
        Map<String, Map<String, long[]>> perCandidateTask = new TreeMap<>(); // tool -> candidate\0task -> uses
        for (ToolUse u : uses) {
            String level = scores.levelOf(u.candidate());
            long[] c = acc.computeIfAbsent(u.tool(), k -> new TreeMap<>())
                    .computeIfAbsent(level.isEmpty() ? "(no level)" : level, k -> new HashMap<>())
                    .computeIfAbsent(u.candidate(), k -> new long[4]);
            c[0] += u.uses();
            c[1] += u.emptyQueries();
            c[2] += u.suggestionsAccepted();
            c[3] += u.suggestionsIgnored();
            perCandidateTask.computeIfAbsent(u.tool(), k -> new HashMap<>())
                    .merge(u.candidate() + '\u0000' + u.task(), new long[] {u.uses()}, (a, b) -> new long[] {a[0] + b[0]});
        }
        Table.Builder t = Table.builder("usage_by_level", "Tool use by level")
                .method("counts and shares", "")
                .columns("tool", "level", "candidates offered", "candidates using", "share using", "uses per candidate",
                        "queries finding nothing", "share of uses finding nothing", "suggestions accepted",
                        "suggestions ignored", "share accepted");
        Table.Builder test = Table.builder("usage_level_association", "Is use associated with level?")
                .method("level x used/not used: Pearson chi-square, or Fisher's exact test when an expected count is"
                        + " below 5", "Pearson 1900; Fisher 1922; Freeman & Halton 1951; Cochran 1954")
                .columns("tool", "candidates", "chi-square", "df", "chi-square p", "smallest expected", "Fisher p",
                        "Cramer's V", "test read");
        Table.Builder score = Table.builder("usage_score", "Use against score (responses where the tool was offered)")
                .method("Spearman rho between a response's uses of the tool and the response score", "Spearman 1904")
                .columns("tool", "responses", "Spearman rho", "p");
        DefaultCategoryDataset chart = new DefaultCategoryDataset();
        Map<String, ResponseScore> byResponse = new HashMap<>();
        for (ResponseScore r : scores.responses()) {
            byResponse.put(r.candidate() + '\u0000' + r.task(), r);
        }
        for (var tool : acc.entrySet()) {
            String tk = "tool." + Keys.slug(tool.getKey()) + ".";
            List<String> levels = new ArrayList<>(new TreeSet<>(tool.getValue().keySet()));
            long[][] table = new long[levels.size()][2];
            int li = 0;
            for (String level : levels) {
                Map<String, long[]> cands = tool.getValue().get(level);
                long offered = cands.size(), using = 0, total = 0, empty = 0, accepted = 0, ignored = 0;
                for (long[] c : cands.values()) {
                    using += c[0] > 0 ? 1 : 0;
                    total += c[0];
                    empty += c[1];
                    accepted += c[2];
                    ignored += c[3];
                }
                double share = (double) using / offered;
                t.row(tool.getKey(), level, offered, using, share, (double) total / offered, empty,
                        total == 0 ? Double.NaN : (double) empty / total, accepted, ignored,
                        accepted + ignored == 0 ? Double.NaN : (double) accepted / (accepted + ignored));
                String lk = tk + "level." + Keys.slug(level) + ".";
                s.put(lk + "offered", offered).put(lk + "share_using", share)
                        .put(lk + "uses_per_candidate", (double) total / offered).put(lk + "empty_queries", empty)
                        .put(lk + "suggestions_accepted", accepted).put(lk + "suggestions_ignored", ignored);
                chart.addValue(share, level, tool.getKey());
                table[li][0] = using;
                table[li][1] = offered - using;
                li++;
            }
            Contingency c = Contingency.of(table);
            test.row(tool.getKey(), (long) tool.getValue().values().stream().mapToInt(Map::size).sum(), c.chiSquare(),
                    (long) c.df(), c.chiSquareP(), c.minExpected(), c.fisherP(), c.cramersV(), c.method());
            c.cautions().forEach(x -> test.note(tool.getKey() + ": " + x));
            s.put(tk + "chi_square", c.chiSquare()).put(tk + "chi_square_p", c.chiSquareP())
                    .put(tk + "fisher_p", c.fisherP()).put(tk + "cramers_v", c.cramersV());
            List<Double> u = new ArrayList<>(), sc = new ArrayList<>();
            for (var e : perCandidateTask.get(tool.getKey()).entrySet()) {
                ResponseScore r = byResponse.get(e.getKey());
                if (r != null) {
                    u.add((double) e.getValue()[0]);
                    sc.add(r.score());
                }
            }
            Correlation rho = Correlation.spearman(Keys.values(u), Keys.values(sc));
            score.row(tool.getKey(), (long) u.size(), rho.r(), rho.p());
            rho.cautions().forEach(x -> score.note(tool.getKey() + ": " + x));
            s.put(tk + "use_score_spearman", rho.r()).put(tk + "use_score_p", rho.p());
        }
        test.note("The level '(no level)' holds candidates without a level; an association test with it included"
                + " mixes levels.");
        score.note("A correlation is not an effect of using the tool: stronger writers may use tools differently.");
        s.table(t.build());
        s.table(test.build());
        s.table(score.build());
        s.chart(Chart.of("chart_usage_by_level", "Share of candidates using each tool, by level",
                "Among candidates offered the tool.", Charts.bars("tool", "share using", chart), 760, 380));
        return s.build();
    }
}
