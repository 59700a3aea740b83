package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.study.AnalysisRun;
import org.inkgate.admin.study.RaschChoices;
import org.inkgate.analysis.data.StudyDesign;
import org.inkgate.analysis.mfrm.MfrmOptions;
import org.inkgate.analysis.mfrm.StudyRatings;
import org.inkgate.analysis.process.ProcessMeasures;
import org.inkgate.analysis.scores.ScoreRule;
import org.inkgate.analysis.study.StudyOptions;
import org.inkgate.packs.cli.ProgressReporter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code inkgate-admin analyse}: reads a tidy ratings CSV (and optional candidate, tool-use and
 * process-log tables) and writes the analysis report, one CSV per table and summary.json.
 * With {@code --mfrm-facets} the many-facet Rasch analysis joins the report as one more section,
 * from the same ratings; a design it refuses leaves the other sections as they are (the section
 * says why, a warning is printed, the exit code stays 0).
 * Exit codes: 0 written, 1 input refused (each problem printed with file, row and column),
 * 2 usage error (picocli, including bad --mfrm-* values), 3 the output could not be written.
 */
@Command(name = "analyse", mixinStandardHelpOptions = true,
        description = {"Analyse ratings: descriptive statistics, the with/without-resources comparison, proficiency"
                + " levels, rater agreement, rubric consistency, resource use, writing process and questionnaire answers; with"
                + " --mfrm-facets also many-facet Rasch measurement.",
            "Writes report.html (self-contained), tables/*.csv and summary.json into the output folder."})
public final class AnalyseCommand implements Callable<Integer> {

    static final int INPUT_REFUSED = 1;
    static final int OUTPUT_FAILED = 3;

    @Spec
    private CommandSpec spec;

    @Option(names = "--ratings", paramLabel = "FILE.csv",
            description = "Ratings, one per row: candidate,level,form,task,condition,rater,criterion,score;"
                    + " may be left out with --store when the store holds ratings (from rate)")
    private Path ratings;

    @Option(names = "--candidates", paramLabel = "FILE.csv",
            description = "Optional: candidate,level and survey items (numeric answers) as further columns; columns"
                    + " declared with --attribute are categorical groups instead")
    private Path candidates;

    @Option(names = "--attribute", paramLabel = "NAME", split = ",",
            description = {"A column of --candidates that is a categorical background attribute (e.g. first_language,"
                + " gender): compared like proficiency levels, usable in --mfrm-bias (e.g. condition:first_language).",
                "Repeatable. Values are group names even when they look like numbers."})
    private List<String> attributes;

    @Option(names = "--roster-attribute", paramLabel = "FIELD", split = ",",
            description = {"With --store: use this roster field (first_language or a personal field such as gender) as"
                + " a categorical attribute. Personal fields are not read otherwise: give this only when the test"
                + " owner allows their use for research.", "Repeatable."})
    private List<String> rosterAttributes;

    @Option(names = "--tool-usage", paramLabel = "FILE.csv",
            description = "Optional: candidate,task,tool,uses,empty_queries,suggestions_accepted,suggestions_ignored")
    private Path toolUsage;

    @Option(names = "--process", paramLabel = "FILE.csv",
            description = "Optional process log: candidate,task,time_ms,type,position,text")
    private Path process;

    @Option(names = "--questionnaire", paramLabel = "FILE.csv",
            description = "Optional: questionnaire answers in the table export writes (csv/questionnaire_answers.csv);"
                    + " with --store it takes the place of the store's answers")
    private Path questionnaire;

    @Option(names = "--store", paramLabel = "STORE",
            description = "Optional results store (from collect; a file or postgresql://host:port/database): candidates' levels, tool use and process events of"
                    + " --exam are read from it, and its ratings when --ratings is left out; not together with"
                    + " --tool-usage or --process", converter = StoreLocationConverter.class)
    private StoreLocation store;

    @Option(names = "--store-password-file", paramLabel = "FILE", description = StorePasswordFile.DESCRIPTION)
    private Path storePasswordFile;

    @Option(names = "--exam", paramLabel = "ID",
            description = "The exam in --store; may be left out when the store holds one exam")
    private String exam;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "Folder for the report (created if absent)")
    private Path out;

    @Option(names = "--score-rule", paramLabel = "RULE", defaultValue = "MEAN",
            description = "How criteria combine into a response score: MEAN or SUM (default: ${DEFAULT-VALUE})")
    private ScoreRule scoreRule;

    @Option(names = "--baseline", paramLabel = "CONDITION",
            description = "The condition the other is compared against (default: the one without resources, as the"
                    + " tool-use table shows; else the first in alphabetical order)")
    private String baseline;

    @Option(names = "--design", paramLabel = "DESIGN",
            description = {"Optional: the study's design, within (every candidate under every condition) or parallel"
                + " (each candidate under one condition). The report checks it against the data and says where they"
                + " differ; without it the design is read from the data."})
    private String design;

    @Option(names = "--pre-test", paramLabel = "COLUMN",
            description = "Optional: a numeric column of --candidates (e.g. a placement score) that the parallel-groups"
                    + " comparison adjusts for; without it the adjustment is for level")
    private String preTest;

    @Option(names = "--pause-ms", paramLabel = "MS", defaultValue = "2000",
            description = "Pause threshold for the writing-process measures (default: ${DEFAULT-VALUE} ms)")
    private long pauseMs;

    @Option(names = "--lookup-window-ms", paramLabel = "MS", defaultValue = "60000",
            description = "Window in which a looked-up word must be typed to count as used (default: ${DEFAULT-VALUE} ms)")
    private long lookupWindowMs;

    @Option(names = "--title", paramLabel = "TEXT", defaultValue = "Analysis of ratings", description = "Report title")
    private String title;

    @Option(names = "--mfrm-facets", paramLabel = "LIST", split = ",",
            description = {"Also run many-facet Rasch measurement with these facets besides candidate, e.g."
                + " task,condition,rater,criterion (any of level, form, task, condition, rater, criterion).",
                "Off unless given."})
    private List<String> mfrmFacets;

    @Option(names = "--mfrm-structure", paramLabel = "STRUCTURE", defaultValue = "rating-scale",
            description = "rating-scale (one threshold set) or partial-credit:FACET (one set per element of FACET,"
                    + " a modelled facet); default: ${DEFAULT-VALUE}")
    private String mfrmStructure;

    @Option(names = "--mfrm-bias", paramLabel = "A:B", split = ",",
            description = "Bias/interaction pairs, e.g. rater:task,condition:level (candidate or any ratings column)")
    private List<String> mfrmBias;

    @Option(names = "--mfrm-bias-estimation", paramLabel = "HOW", defaultValue = "fixed",
            description = "fixed (each combination's size with the main effects held at their estimates; fast) or"
                    + " joint (each combination estimated jointly with the main effects, one refit per combination);"
                    + " default: ${DEFAULT-VALUE}")
    private String mfrmBiasEstimation;

    @Option(names = "--mfrm-anchors", paramLabel = "FILE.csv",
            description = "Anchor file (mfrm_anchors.csv written by an earlier analyse run, rows deleted as wanted):"
                    + " its elements and thresholds are fixed, putting this run on that run's scale")
    private Path mfrmAnchors;

    @Option(names = "--mfrm-max-iterations", paramLabel = "N", defaultValue = "1000",
            description = "Iteration cap of the Rasch estimation (default: ${DEFAULT-VALUE})")
    private int mfrmMaxIterations;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter outWriter = spec.commandLine().getOut();
        MfrmOptions mfrmOptions = mfrmOptions();
        StudyOptions options;
        try {
            options = StudyOptions.DEFAULT.withScoreRule(scoreRule).withBaseline(baseline).withTitle(title)
                    .withProcess(new ProcessMeasures.Parameters(pauseMs, lookupWindowMs))
                    .withDesign(design == null ? null : StudyDesign.parseDeclared(design)).withPreTest(preTest);
        } catch (IllegalArgumentException e) {
            err.println("inkgate-admin analyse: " + e.getMessage());
            return INPUT_REFUSED;
        }
        if (attributes != null && candidates == null) {
            throw new ParameterException(spec.commandLine(), "--attribute names a column of --candidates FILE.csv;"
                    + " give that file (or, with --store, --roster-attribute for a roster field)");
        }
        if (preTest != null && candidates == null) {
            throw new ParameterException(spec.commandLine(), "--pre-test names a numeric column of --candidates"
                    + " FILE.csv; give that file");
        }
        if (rosterAttributes != null && store == null) {
            throw new ParameterException(spec.commandLine(), "--roster-attribute reads the roster in --store DB;"
                    + " give the store");
        }
        for (String a : declared(rosterAttributes)) {
            if (a.equals("candidate") || a.equals("level") || a.equals("score") || StudyRatings.COLUMNS.contains(a)) {
                throw new ParameterException(spec.commandLine(), "--roster-attribute: '" + a + "' cannot be an"
                        + " attribute (candidate, level and the ratings' columns are read as such)");
            }
        }
        if (ratings == null && store == null) {
            throw new ParameterException(spec.commandLine(), "give --ratings FILE.csv, or --store DB holding ratings");
        }
        if (mfrmAnchors != null && mfrmOptions == null) {
            throw new ParameterException(spec.commandLine(), "--mfrm-anchors needs --mfrm-facets");
        }
        StoreLocation store;
        try {
            store = this.store == null ? null : StorePasswordFile.apply(this.store, storePasswordFile);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage());
        }
        AnalysisRun.Request request = new AnalysisRun.Request(ratings, candidates, attributes, rosterAttributes,
                toolUsage, process, questionnaire, store, exam, out, options, mfrmOptions, mfrmAnchors,
                ownArguments());
        AnalysisRun.Written written;
        try (ProgressReporter progress = ProgressReporter.onStandardError(err, "analyse", "stages", 0)) {
            written = AnalysisRun.run(request, new AnalysisRun.Listener() {
                @Override
                public void stage(int done, int total, String what) {
                    progress.total(total);
                    progress.stepTo(done, what);
                }

                @Override
                public void warn(String text) {
                    progress.clear();
                    err.println("inkgate-admin analyse: " + text);
                }
            });
        } catch (AnalysisRun.Refused e) {
            err.println("inkgate-admin analyse: " + e.lines().get(0));
            e.lines().stream().skip(1).forEach(err::println);
            return e.outputFailed() ? OUTPUT_FAILED : INPUT_REFUSED;
        }
        outWriter.println("Report written to " + out.resolve("report.html") + " (" + written.ratings()
                + " ratings; tables in " + out.resolve("tables") + ", figures in " + out.resolve("summary.json") + ")");
        outWriter.flush();
        return 0;
    }

    /** The MFRM options from the command line, or null when --mfrm-facets is not given; bad values are usage errors. */
    private MfrmOptions mfrmOptions() {
        if (mfrmFacets == null) {
            if (mfrmBias != null) {
                throw new ParameterException(spec.commandLine(), "--mfrm-bias needs --mfrm-facets (the model the"
                        + " bias terms are added to)");
            }
            return null;
        }
        try {
            return RaschChoices.parse(mfrmFacets, mfrmStructure, mfrmBias, mfrmBiasEstimation, mfrmMaxIterations,
                    declaredAttributes());
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage(), e);
        }
    }

    private List<String> declaredAttributes() {
        List<String> all = new ArrayList<>(declared(attributes));
        all.addAll(declared(rosterAttributes));
        return all;
    }

    private static List<String> declared(List<String> names) {
        return names == null ? List.of() : names.stream().map(String::trim).filter(n -> !n.isEmpty()).distinct().toList();
    }

    /**
     * The arguments after {@code analyse} itself, as typed: picocli gives a subcommand the whole
     * command line (root options and the subcommand's name included), and the provenance records
     * {@code inkgate-admin analyse} followed by these.
     */
    private List<String> ownArguments() {
        List<String> all = spec.commandLine().getParseResult().originalArgs();
        if (spec.root() == spec) {
            return all; // run on its own, without the root: the arguments are its own already
        }
        // the root takes no option with a value, so the first "analyse" is the subcommand's name
        int name = all.indexOf(spec.name());
        return name < 0 ? all : all.subList(name + 1, all.size());
    }
}
