package org.inkgate.analysis.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.data.ProcessLogReader;
import org.inkgate.analysis.report.Column;
import org.inkgate.analysis.report.Report;
import org.inkgate.analysis.report.ReportWriter;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.testutil.SimulatedSitting;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The writing-process table: published construct names under headings of what a researcher asks. */
class ProcessSectionTest {

    @Test
    void processTable_groupsPublishedMeasuresUnderQuestionHeadings(@TempDir Path dir) throws Exception {
        // invented sitting (structure only, no check values)
        SimulatedSitting.writeProcessLog(30, 3, dir.resolve("process.csv"));
        StudyData data;
        try (Reader r = Files.newBufferedReader(dir.resolve("process.csv"))) {
            data = new StudyData(SimulatedSitting.ratings(30, 3), List.of(), List.of(), List.of(),
                    ProcessLogReader.read("process.csv", r));
        }
        Report report = StudyAnalysis.report(data, StudyOptions.DEFAULT);
        Table t = report.sections().stream().flatMap(s -> s.tables().stream())
                .filter(x -> x.id().equals("process_measures")).findFirst().orElseThrow();
        Map<String, List<String>> byHeading = new LinkedHashMap<>();
        for (Column c : t.header()) {
            List<String> under = byHeading.computeIfAbsent(c.group(), k -> new ArrayList<>());
            if (!c.subgroup().isEmpty() && !under.contains(c.subgroup())) {
                under.add(c.subgroup());
            }
        }
        assertEquals(List.of("Which responses", "How long did they write?", "How fluently did they write?",
                "How much did they revise?", "How were the tools used?"), List.copyOf(byHeading.keySet()));
        assertEquals(List.of("time on task (s)", "active writing time (s)"), byHeading.get("How long did they write?"));
        assertEquals(List.of("pauses", "mean pause (s)", "P-bursts", "mean P-burst length (characters)",
                "characters per minute"), byHeading.get("How fluently did they write?"));
        assertEquals(List.of("revisions", "R-bursts", "product/process ratio"),
                byHeading.get("How much did they revise?"));
        assertEquals(List.of("time in resource panel (s)", "lookups", "lookups followed by use"),
                byHeading.get("How were the tools used?"));
        assertTrue(t.names().containsAll(List.of("time_on_task_s_mean", "time_on_task_s_sd", "p_bursts_mean",
                "panel_time_s_mean", "lookups_used_mean")), t.names().toString());
        ReportWriter.write(report, dir.resolve("report"));
        String html = Files.readString(dir.resolve("report/report.html"));
        assertTrue(html.contains("<th scope=\"colgroup\" colspan=\"4\">How long did they write?</th>"), "headings"
                + " span their measures' mean and standard deviation columns");
        assertTrue(html.contains("<th scope=\"colgroup\" colspan=\"10\">How fluently did they write?</th>"));
        assertTrue(html.contains("<th scope=\"colgroup\" colspan=\"2\">P-bursts</th>"), "a measure heads its mean"
                + " and standard deviation");
    }
}
