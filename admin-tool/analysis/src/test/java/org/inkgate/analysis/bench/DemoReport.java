package org.inkgate.analysis.bench;

import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.data.CandidatesReader;
import org.inkgate.analysis.data.ProcessLogReader;
import org.inkgate.analysis.data.RatingsReader;
import org.inkgate.analysis.data.ToolUseReader;
import org.inkgate.analysis.mfrm.MfrmOptions;
import org.inkgate.analysis.mfrm.MfrmSection;
import org.inkgate.analysis.mfrm.StudyRatings;
import org.inkgate.analysis.report.ReportWriter;
import org.inkgate.analysis.study.StudyAnalysis;
import org.inkgate.analysis.study.StudyData;
import org.inkgate.analysis.study.StudyOptions;
import org.inkgate.analysis.testutil.SimulatedSitting;

/** Writes the invented demo inputs (simulated, not real data) and their report into a folder. */
public final class DemoReport {

    private DemoReport() {
    }

    public static void main(String[] args) throws Exception {
        Path dir = Path.of(args.length > 0 ? args[0] : "target/analysis-demo");
        int n = Integer.getInteger("demo.candidates", 240);
        Files.createDirectories(dir);
        SimulatedSitting.writeCsv(SimulatedSitting.ratings(n, 11), dir.resolve("ratings.csv"));
        SimulatedSitting.writeCandidates(n, 12, dir.resolve("candidates.csv"));
        SimulatedSitting.writeToolUse(n, 13, dir.resolve("tool-usage.csv"));
        SimulatedSitting.writeProcessLog(n, 14, dir.resolve("process.csv"));
        try (Reader r = read(dir, "ratings.csv"); Reader c = read(dir, "candidates.csv");
                Reader u = read(dir, "tool-usage.csv"); Reader p = read(dir, "process.csv")) {
            var cands = CandidatesReader.read("candidates.csv", c);
            var data = new StudyData(RatingsReader.read("ratings.csv", r), cands.candidates(), cands.items(),
                    ToolUseReader.read("tool-usage.csv", u), ProcessLogReader.read("process.csv", p));
            // many-facet Rasch section as the analyse command builds it with
            // --mfrm-facets task,condition,rater,criterion --mfrm-bias condition:level,rater:task
            Map<String, String> levels = new HashMap<>();
            cands.candidates().forEach(x -> levels.put(x.id(), x.level()));
            var mfrm = MfrmSection.analyse(
                    StudyRatings.of(data.ratings(), levels, List.of("task", "condition", "rater", "criterion", "level")),
                    MfrmOptions.builder(List.of("task", "condition", "rater", "criterion"))
                            .bias("condition", "level").bias("rater", "task").build());
            var report = StudyAnalysis.report(data, StudyOptions.DEFAULT.withBaseline("none")
                    .withTitle("Demo report (simulated data, not a real sitting)"), List.of(mfrm));
            ReportWriter.write(report, dir.resolve("report"));
            // PNG copies of the charts, for documentation (the report itself embeds them as SVG)
            for (var section : report.sections()) {
                for (var chart : section.charts()) {
                    Files.write(dir.resolve(chart.id() + ".png"), chart.png());
                }
            }
        }
    }

    private static Reader read(Path dir, String name) throws Exception {
        return Files.newBufferedReader(dir.resolve(name), StandardCharsets.UTF_8);
    }
}
