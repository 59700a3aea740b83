package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.ToDoubleFunction;
import org.inkgate.analysis.data.ProcessEvent;
import org.inkgate.analysis.descriptive.Descriptives;
import org.inkgate.analysis.process.ProcessMeasures;
import org.inkgate.analysis.report.Column;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.scores.ResponseScore;
import org.inkgate.analysis.scores.ScoreTable;

/** Writing-process measures per response, summarised by condition and level. */
final class ProcessSection {

    private ProcessSection() {
    }

    private record Measure(String name, String key, String question, ToDoubleFunction<ProcessMeasures> value) {
    }

    /** The headings: what a researcher asks of the process log. */
    static final String HOW_LONG = "How long did they write?";
    static final String HOW_FLUENT = "How fluently did they write?";
    static final String HOW_REVISED = "How much did they revise?";
    static final String HOW_TOOLS = "How were the tools used?";

    // published construct names kept (pause, P-burst, R-burst, product/process ratio), grouped by question
    private static final List<Measure> MEASURES = List.of(
            new Measure("time on task (s)", "time_on_task_s", HOW_LONG, ProcessMeasures::timeOnTaskS),
            new Measure("active writing time (s)", "active_writing_s", HOW_LONG, ProcessMeasures::activeWritingS),
            new Measure("pauses", "pauses", HOW_FLUENT, m -> m.pauses()),
            new Measure("mean pause (s)", "mean_pause_s", HOW_FLUENT, ProcessMeasures::meanPauseS),
            new Measure("P-bursts", "p_bursts", HOW_FLUENT, m -> m.pBursts()),
            new Measure("mean P-burst length (characters)", "mean_p_burst_chars", HOW_FLUENT,
                    ProcessMeasures::meanPBurstChars),
            new Measure("characters per minute", "chars_per_minute", HOW_FLUENT, ProcessMeasures::charsPerMinute),
            new Measure("revisions", "revisions", HOW_REVISED, m -> m.revisions()),
            new Measure("R-bursts", "r_bursts", HOW_REVISED, m -> m.rBursts()),
            new Measure("product/process ratio", "product_process_ratio", HOW_REVISED,
                    ProcessMeasures::productProcessRatio),
            new Measure("time in resource panel (s)", "panel_time_s", HOW_TOOLS, ProcessMeasures::panelTimeS),
            new Measure("lookups", "lookups", HOW_TOOLS, m -> m.lookups()),
            new Measure("lookups followed by use", "lookups_used", HOW_TOOLS, m -> m.lookupsUsed()));

    static Section build(List<ProcessEvent> log, ScoreTable scores, StudyOptions options) {
        Section.Builder s = Section.builder("process", "Writing process");
        ProcessMeasures.Parameters p = options.process();
        s.paragraph("Measures from the process log, one value per response, summarised as mean and SD by condition and"
                + " level. Pause threshold " + p.pauseThresholdMs() + " ms; a lookup counts as used when the looked-up"
                + " text is typed within " + p.lookupWindowMs() + " ms. Definitions and sources: docs/analysis.md"
                + " (Chenoweth & Hayes 2001; Wengelin 2006). The columns are grouped by the question they answer:"
                + " how long the candidates wrote, how fluently, how much they revised, and how they used the"
                + " tools.");
        Map<String, List<ProcessEvent>> byResponse = new LinkedHashMap<>();
        for (ProcessEvent e : log) {
            byResponse.computeIfAbsent(e.candidate() + '\u0000' + e.task(), k -> new ArrayList<>()).add(e);
        }
        Map<String, ResponseScore> resp = new HashMap<>();
        for (ResponseScore r : scores.responses()) {
            resp.put(r.candidate() + '\u0000' + r.task(), r);
        }
        Map<String, List<ProcessMeasures>> groups = new TreeMap<>();
        long unmatched = 0;
        for (var e : byResponse.entrySet()) {
            ProcessMeasures m = ProcessMeasures.of(e.getValue(), p);
            ResponseScore r = resp.get(e.getKey());
            if (r == null) {
                unmatched++;
            }
            String condition = r == null ? "(not rated)" : r.condition();
            String level = scores.levelOf(m.candidate());
            groups.computeIfAbsent(condition + '\u0000' + "all levels", k -> new ArrayList<>()).add(m);
            if (!level.isEmpty()) {
                groups.computeIfAbsent(condition + '\u0000' + level, k -> new ArrayList<>()).add(m);
            }
        }
        List<Column> cols = new ArrayList<>();
        for (String c : List.of("condition", "level", "responses")) {
            cols.add(Column.of(c).in("Which responses"));
        }
        for (Measure m : MEASURES) {
            // the measure's name heads its two columns, the question heads the measures that answer it
            cols.add(Column.of("mean", m.key() + "_mean").in(m.question()).under(m.name()));
            cols.add(Column.of("standard deviation", m.key() + "_sd").in(m.question()).under(m.name()));
        }
        Table.Builder t = Table.builder("process_measures", "Writing-process measures by condition and level,"
                        + " grouped by what they answer")
                .method("per-response measures from keystroke logs, mean and standard deviation over responses",
                        "Chenoweth & Hayes 2001; Wengelin 2006; Leijten & Van Waes 2013")
                .columns(cols);
        for (var g : groups.entrySet()) {
            String[] parts = g.getKey().split("\u0000");
            List<Object> row = new ArrayList<>(List.of(parts[0], parts[1], (long) g.getValue().size()));
            for (Measure m : MEASURES) {
                double[] v = g.getValue().stream().mapToDouble(m.value()).filter(x -> !Double.isNaN(x)).toArray();
                Descriptives d = Descriptives.of(v);
                row.add(d.mean());
                row.add(d.sd());
                s.put(Keys.slug(parts[0]) + "." + Keys.slug(parts[1]) + "." + m.key() + ".mean", d.mean());
            }
            t.row(row.toArray());
        }
        if (unmatched > 0) {
            t.note(unmatched + " logged response(s) have no ratings and appear under '(not rated)'.");
        }
        t.note("Means leave out responses where a measure is undefined (e.g. mean pause with no pause).");
        t.note("Time in resource panel is the time the candidate worked in the panel: keyboard focus inside it, with"
                + " the window focused (panel.open to panel.close, up to the task's end). Reading the panel without"
                + " moving focus there is not seen; packages from clients that logged the page in view from the"
                + " task's start give about the time on task.");
        s.table(t.build());
        s.put("responses", byResponse.size());
        return s.build();
    }
}
