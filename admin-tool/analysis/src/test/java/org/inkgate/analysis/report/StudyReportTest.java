package org.inkgate.analysis.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.study.StudyAnalysis;
import org.inkgate.analysis.study.StudyData;
import org.inkgate.analysis.study.StudyOptions;
import org.inkgate.analysis.testutil.ReferenceData;
import org.inkgate.analysis.testutil.SimulatedSitting;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class StudyReportTest {

    @Test
    void report_simulatedSitting_writesHtmlCsvAndSummary(@TempDir Path dir) throws Exception {
        // smoke test on invented data: structure only, no statistical check values
        List<Rating> ratings = SimulatedSitting.ratings(300, 7);
        Report report = StudyAnalysis.report(StudyData.ofRatings(ratings), StudyOptions.DEFAULT);
        ReportWriter.write(report, dir);
        String html = Files.readString(dir.resolve("report.html"));
        assertTrue(html.contains("<svg"), "charts are inline SVG");
        assertFalse(html.contains("<script"), "no scripts");
        assertFalse(html.contains("src=\"http"), "nothing loaded from outside");
        assertTrue(Files.exists(dir.resolve("tables/comparison_paired.csv")));
        assertTrue(Files.exists(dir.resolve("tables/raters_icc.csv")));
        JsonNode summary = new ObjectMapper().readTree(dir.resolve("summary.json").toFile());
        assertEquals(ReportWriter.SUMMARY_FORMAT, summary.get("format").asText());
        assertEquals(6000, summary.get("input.ratings").asInt());
        assertTrue(summary.has("comparison.overall.dz"));
        assertTrue(summary.has("levels.interaction.overall.p"));
        assertTrue(summary.has("raters.all.icc1"));
    }

    @Test
    void report_sleepAsTwoConditions_carriesTheReferenceTTest(@TempDir Path dir) throws Exception {
        // sleep (Student 1908) as one rater, one criterion, two conditions: the report's paired
        // comparison must equal R's paired t-test: t 4.062128 for group 2 minus group 1 (R 4.2.2, METHODS.md)
        List<Rating> ratings = new java.util.ArrayList<>();
        for (var row : ReferenceData.rows("sleep.csv")) {
            ratings.add(new Rating("P" + row.get("ID"), "", "", "night" + row.get("group"), "drug" + row.get("group"),
                    "lab", "hours", Double.parseDouble(row.get("extra"))));
        }
        Report report = StudyAnalysis.report(StudyData.ofRatings(ratings), StudyOptions.DEFAULT);
        ReportWriter.write(report, dir);
        JsonNode summary = new ObjectMapper().readTree(dir.resolve("summary.json").toFile());
        assertEquals(4.062128, summary.get("comparison.overall.t").asDouble(), 1e-6);
        assertEquals(1.2845576, summary.get("comparison.overall.dz").asDouble(), 1e-7);
        // one level, one rater, one criterion: each section says why it has nothing to show
        assertFalse(summary.get("levels.available").asBoolean());
        assertFalse(summary.get("raters.available").asBoolean());
        assertFalse(summary.get("rubric.available").asBoolean());
        String html = Files.readString(dir.resolve("report.html"));
        assertTrue(html.contains("needs at least"));
        assertFalse(html.contains("NaN"), "no unexplained NaN in the report");
    }

    @Test
    void report_missingRatingsZeroVarianceAndTinyGroups_explainsEveryGap(@TempDir Path dir) throws Exception {
        // edge cases, no check values: a response without one criterion, a second rating missing,
        // one level with a single candidate, every score under one condition equal
        List<Rating> r = new java.util.ArrayList<>();
        String[] levels = {"A", "A", "A", "B"};
        for (int c = 0; c < 4; c++) {
            for (String crit : new String[] {"content", "grammar"}) {
                if (c == 3 && crit.equals("grammar")) {
                    continue; // missing criterion
                }
                r.add(new Rating("C" + c, levels[c], "", "t1", "none", "R1", crit, 3));
                if (c != 2) {
                    r.add(new Rating("C" + c, levels[c], "", "t1", "none", "R2", crit, 3));
                }
                r.add(new Rating("C" + c, levels[c], "", "t2", "with", "R1", crit, c + (crit.equals("content") ? 1 : 2)));
            }
        }
        Report report = StudyAnalysis.report(StudyData.ofRatings(r), StudyOptions.DEFAULT);
        ReportWriter.write(report, dir);
        String html = Files.readString(dir.resolve("report.html"));
        assertFalse(html.contains("NaN"));
        assertFalse(html.contains("Infinity"));
        assertTrue(html.contains("A dash marks a value that cannot be computed"));
        assertTrue(html.contains("response(s) lack ratings for some criterion"));
        assertTrue(html.contains("all values equal"), "zero variance under 'none' is explained");
        String json = Files.readString(dir.resolve("summary.json"));
        assertFalse(json.contains("NaN"));
    }

    @Test
    void pairedComparison_byDefault_isWithResourcesMinusWithout(@TempDir Path dir) throws Exception {
        // sleep (Student 1908): group 2 as the condition offering tools. Alphabetically 'with-tools' comes
        // first and used to be the baseline (t = -4.06); the default is now with resources minus without,
        // which is R's t.test(extra[group == 2], extra[group == 1], paired = TRUE): t 4.062128 (R 4.2.2, METHODS.md)
        List<Rating> ratings = new java.util.ArrayList<>();
        List<org.inkgate.analysis.data.ToolUse> tools = new java.util.ArrayList<>();
        for (var row : ReferenceData.rows("sleep.csv")) {
            boolean withTools = row.get("group").equals("2");
            String task = "night" + row.get("group");
            ratings.add(new Rating("P" + row.get("ID"), "", "", task, withTools ? "with-tools" : "without-tools",
                    "lab", "hours", Double.parseDouble(row.get("extra"))));
            if (withTools) {
                tools.add(new org.inkgate.analysis.data.ToolUse("P" + row.get("ID"), task, "spelling", 0, 0, 0, 0));
            }
        }
        Report withUse = StudyAnalysis.report(new StudyData(ratings, List.of(), List.of(), tools, List.of()),
                StudyOptions.DEFAULT);
        ReportWriter.write(withUse, dir.resolve("a"));
        JsonNode a = new ObjectMapper().readTree(dir.resolve("a/summary.json").toFile());
        assertEquals("without-tools", a.get("comparison.baseline").asText());
        assertEquals(4.062128, a.get("comparison.overall.t").asDouble(), 1e-6);
        String html = Files.readString(dir.resolve("a/report.html"));
        assertTrue(html.contains("Direction: with resources minus without (&#39;with-tools&#39; minus"
                + " &#39;without-tools&#39;)") || html.contains("Direction: with resources minus without ('with-tools'"
                + " minus 'without-tools')"), "the report says which way it subtracts");
        // without the tool-use table the report cannot know, and says so
        Report noUse = StudyAnalysis.report(StudyData.ofRatings(ratings), StudyOptions.DEFAULT);
        String said = noUse.sections().stream().filter(x -> x.id().equals("comparison")).findFirst().orElseThrow()
                .paragraphs().toString();
        assertTrue(said.contains("cannot tell which condition offered resources"), said);
        assertEquals(-4.062128, (Double) noUse.sections().stream().filter(x -> x.id().equals("comparison"))
                .findFirst().orElseThrow().summary().get("comparison.overall.t"), 1e-6);
    }
}
