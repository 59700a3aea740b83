package org.inkgate.admin.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.analysis.data.CandidatesReader;
import org.inkgate.analysis.data.InputRejected;
import org.inkgate.analysis.data.ProcessEvent;
import org.inkgate.analysis.data.ProcessLogReader;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.data.RatingsReader;
import org.inkgate.analysis.data.ToolUse;
import org.inkgate.analysis.data.ToolUseReader;
import org.inkgate.analysis.process.ProcessMeasures;
import org.inkgate.analysis.report.Report;
import org.inkgate.analysis.report.ReportWriter;
import org.inkgate.analysis.scores.ScoreRule;
import org.inkgate.analysis.study.StudyAnalysis;
import org.inkgate.analysis.study.StudyData;
import org.inkgate.analysis.study.StudyOptions;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code inkgate-admin analyse}: reads a tidy ratings CSV (and optional candidate, tool-use and
 * process-log tables) and writes the analysis report, one CSV per table and summary.json.
 * Exit codes: 0 written, 1 input refused (each problem printed with file, row and column),
 * 2 usage error (picocli), 3 the output could not be written.
 */
@Command(name = "analyse", mixinStandardHelpOptions = true,
        description = {"Analyse ratings: descriptive statistics, the with/without-resources comparison, proficiency"
                + " levels, rater agreement, rubric consistency, resource use and writing process.",
            "Writes report.html (self-contained), tables/*.csv and summary.json into the output folder."})
public final class AnalyseCommand implements Callable<Integer> {

    static final int INPUT_REFUSED = 1;
    static final int OUTPUT_FAILED = 3;

    @Spec
    private CommandSpec spec;

    @Option(names = "--ratings", required = true, paramLabel = "FILE.csv",
            description = "Ratings, one per row: candidate,level,form,task,condition,rater,criterion,score")
    private Path ratings;

    @Option(names = "--candidates", paramLabel = "FILE.csv",
            description = "Optional: candidate,level and survey items (numeric answers) as further columns")
    private Path candidates;

    @Option(names = "--tool-usage", paramLabel = "FILE.csv",
            description = "Optional: candidate,task,tool,uses,empty_queries,suggestions_accepted,suggestions_ignored")
    private Path toolUsage;

    @Option(names = "--process", paramLabel = "FILE.csv",
            description = "Optional process log: candidate,task,time_ms,type,position,text")
    private Path process;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "Folder for the report (created if absent)")
    private Path out;

    @Option(names = "--score-rule", paramLabel = "RULE", defaultValue = "MEAN",
            description = "How criteria combine into a response score: MEAN or SUM (default: ${DEFAULT-VALUE})")
    private ScoreRule scoreRule;

    @Option(names = "--baseline", paramLabel = "CONDITION",
            description = "The condition the other is compared against (default: the first in alphabetical order)")
    private String baseline;

    @Option(names = "--pause-ms", paramLabel = "MS", defaultValue = "2000",
            description = "Pause threshold for the writing-process measures (default: ${DEFAULT-VALUE} ms)")
    private long pauseMs;

    @Option(names = "--lookup-window-ms", paramLabel = "MS", defaultValue = "60000",
            description = "Window in which a looked-up word must be typed to count as used (default: ${DEFAULT-VALUE} ms)")
    private long lookupWindowMs;

    @Option(names = "--title", paramLabel = "TEXT", defaultValue = "Analysis of ratings", description = "Report title")
    private String title;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter outWriter = spec.commandLine().getOut();
        StudyData data;
        StudyOptions options;
        try {
            options = StudyOptions.DEFAULT.withScoreRule(scoreRule).withBaseline(baseline).withTitle(title)
                    .withProcess(new ProcessMeasures.Parameters(pauseMs, lookupWindowMs));
        } catch (IllegalArgumentException e) {
            err.println("inkgate-admin analyse: " + e.getMessage());
            return INPUT_REFUSED;
        }
        try {
            List<Rating> r;
            try (Reader in = open(ratings)) {
                r = RatingsReader.read(ratings.getFileName().toString(), in);
            }
            CandidatesReader.Result c = null;
            if (candidates != null) {
                try (Reader in = open(candidates)) {
                    c = CandidatesReader.read(candidates.getFileName().toString(), in);
                }
            }
            List<ToolUse> u = List.of();
            if (toolUsage != null) {
                try (Reader in = open(toolUsage)) {
                    u = ToolUseReader.read(toolUsage.getFileName().toString(), in);
                }
            }
            List<ProcessEvent> p = List.of();
            if (process != null) {
                try (Reader in = open(process)) {
                    p = ProcessLogReader.read(process.getFileName().toString(), in);
                }
            }
            data = new StudyData(r, c == null ? List.of() : c.candidates(), c == null ? List.of() : c.items(), u, p);
        } catch (InputRejected e) {
            err.println("inkgate-admin analyse: " + e.getMessage());
            err.println("Fix the rows above and run again; no report was written.");
            return INPUT_REFUSED;
        } catch (NoSuchFileException e) {
            err.println("inkgate-admin analyse: no such file: " + e.getFile());
            return INPUT_REFUSED;
        } catch (IOException e) {
            err.println("inkgate-admin analyse: could not read the input: " + e.getMessage());
            return INPUT_REFUSED;
        }
        if (options.baselineCondition() != null
                && data.ratings().stream().noneMatch(x -> x.condition().equals(options.baselineCondition()))) {
            err.println("inkgate-admin analyse: --baseline " + options.baselineCondition()
                    + " is not a condition in the ratings; use one of "
                    + data.ratings().stream().map(Rating::condition).distinct().sorted().toList());
            return INPUT_REFUSED;
        }
        Report report = StudyAnalysis.report(data, options);
        try {
            ReportWriter.write(report, out);
        } catch (IOException e) {
            err.println("inkgate-admin analyse: could not write the report to " + out + ": " + e.getMessage());
            return OUTPUT_FAILED;
        }
        outWriter.println("Report written to " + out.resolve("report.html") + " (" + data.ratings().size()
                + " ratings; tables in " + out.resolve("tables") + ", figures in " + out.resolve("summary.json") + ")");
        outWriter.flush();
        return 0;
    }

    private static Reader open(Path file) throws IOException {
        return Files.newBufferedReader(file, StandardCharsets.UTF_8);
    }
}
