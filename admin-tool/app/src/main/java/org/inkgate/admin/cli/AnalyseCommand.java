package org.inkgate.admin.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.Reader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.export.QuestionnaireCsv;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.SqliteResultsStore;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.study.QuestionnaireInput;
import org.inkgate.admin.study.StoreRatings;
import org.inkgate.admin.study.StoreStudyInput;
import org.inkgate.analysis.data.Candidate;
import org.inkgate.analysis.data.CandidatesReader;
import org.inkgate.analysis.data.InputRejected;
import org.inkgate.analysis.data.ProcessEvent;
import org.inkgate.analysis.data.ProcessLogReader;
import org.inkgate.analysis.data.QuestionnaireData;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.data.RatingsReader;
import org.inkgate.analysis.data.ToolUse;
import org.inkgate.analysis.data.ToolUseReader;
import org.inkgate.analysis.mfrm.AnchorFile;
import org.inkgate.analysis.mfrm.FacetPair;
import org.inkgate.analysis.mfrm.ManyFacetRasch;
import org.inkgate.analysis.mfrm.MfrmOptions;
import org.inkgate.analysis.mfrm.MfrmRefusedException;
import org.inkgate.analysis.mfrm.MfrmResult;
import org.inkgate.analysis.mfrm.MfrmSection;
import org.inkgate.analysis.mfrm.RatingData;
import org.inkgate.analysis.mfrm.ScaleStructure;
import org.inkgate.analysis.mfrm.StudyRatings;
import org.inkgate.analysis.mfrm.bias.BiasEstimation;
import org.inkgate.analysis.process.ProcessMeasures;
import org.inkgate.analysis.report.Report;
import org.inkgate.analysis.report.ReportWriter;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.scores.ScoreRule;
import org.inkgate.analysis.study.QuestionnaireSection;
import org.inkgate.analysis.study.StudyAnalysis;
import org.inkgate.analysis.study.StudyData;
import org.inkgate.analysis.study.StudyOptions;
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

    @Option(names = "--store", paramLabel = "FILE.db",
            description = "Optional results store (from collect): candidates' levels, tool use and process events of"
                    + " --exam are read from it, and its ratings when --ratings is left out; not together with"
                    + " --tool-usage or --process")
    private Path store;

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

    /** The exam the store's data came from, for the provenance; null when the inputs are files only. */
    private String examAnalysed;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter outWriter = spec.commandLine().getOut();
        MfrmOptions mfrmOptions = mfrmOptions();
        StudyData data;
        QuestionnaireData answers = null;
        StudyOptions options;
        try {
            options = StudyOptions.DEFAULT.withScoreRule(scoreRule).withBaseline(baseline).withTitle(title)
                    .withProcess(new ProcessMeasures.Parameters(pauseMs, lookupWindowMs));
        } catch (IllegalArgumentException e) {
            err.println("inkgate-admin analyse: " + e.getMessage());
            return INPUT_REFUSED;
        }
        if (attributes != null && candidates == null) {
            throw new ParameterException(spec.commandLine(), "--attribute names a column of --candidates FILE.csv;"
                    + " give that file (or, with --store, --roster-attribute for a roster field)");
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
        try {
            List<Rating> r;
            if (ratings != null) {
                try (Reader in = open(ratings)) {
                    r = RatingsReader.read(ratings.getFileName().toString(), in);
                }
            } else {
                r = readStoreRatings(err);
                if (r == null) {
                    return INPUT_REFUSED;
                }
            }
            CandidatesReader.Result c = null;
            if (candidates != null) {
                try (Reader in = open(candidates)) {
                    c = CandidatesReader.read(candidates.getFileName().toString(), in, declared(attributes));
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
            List<Candidate> cands = c == null ? List.of() : c.candidates();
            if (store != null) {
                StoreStudyInput.Tables fromStore = readStore(err);
                if (fromStore == null) {
                    return INPUT_REFUSED;
                }
                cands = c == null ? fromStore.candidates() : cands;
                if (c != null && rosterAttributes != null) {
                    err.println("inkgate-admin analyse: --roster-attribute reads the store's roster, but --candidates"
                            + " replaces it; declare the column in the candidate table with --attribute instead");
                    return INPUT_REFUSED;
                }
                List<String> found = Candidate.attributeNames(cands);
                for (String a : declared(rosterAttributes)) {
                    if (!found.contains(a)) {
                        err.println("inkgate-admin analyse: --roster-attribute " + a + ": the roster in " + store
                                + " gives no candidate of the exam a value for it; name first_language or a column"
                                + " of the roster that was registered with collect --roster");
                        return INPUT_REFUSED;
                    }
                }
                u = fromStore.toolUse();
                p = fromStore.processLog();
            }
            data = new StudyData(r, cands, c == null ? List.of() : c.items(), u, p);
            if (questionnaire != null) {
                try (Reader in = open(questionnaire)) {
                    answers = QuestionnaireInput.read(questionnaire.getFileName().toString(), in);
                }
            } else if (store != null) {
                answers = readStoreQuestionnaire(err);
                if (answers == null) {
                    return INPUT_REFUSED;
                }
            }
        } catch (QuestionnaireCsv.Refused e) {
            err.println("inkgate-admin analyse: " + e.getMessage() + ":");
            e.problems().stream().limit(20).forEach(x -> err.println("  " + x.describe()));
            err.println("Fix the rows above and run again; no report was written.");
            return INPUT_REFUSED;
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
        List<Section> extra = new ArrayList<>();
        if (answers != null && !answers.isEmpty()) {
            extra.add(QuestionnaireSection.build(answers, data.toolUse()));
        }
        AnchorFile.Anchors anchors = null;
        if (mfrmAnchors != null) {
            if (mfrmOptions == null) {
                throw new ParameterException(spec.commandLine(), "--mfrm-anchors needs --mfrm-facets");
            }
            try (Reader r = open(mfrmAnchors)) {
                anchors = AnchorFile.read(r, mfrmAnchors.toString());
            } catch (IOException | IllegalArgumentException e) {
                err.println("inkgate-admin analyse: the anchor file was refused; nothing was written:");
                err.println("  " + e.getMessage().replace("\n", "\n  "));
                return INPUT_REFUSED;
            }
        }
        MfrmResult mfrmResult = null;
        if (mfrmOptions != null) {
            MfrmRun run = mfrmSection(data, mfrmOptions, anchors);
            run.leftOut().forEach(x -> err.println("inkgate-admin analyse: warning: " + x));
            mfrmResult = run.result();
            Section mfrm = run.section();
            if (Boolean.FALSE.equals(mfrm.summary().get(MfrmSection.ID + ".available"))) {
                err.println("inkgate-admin analyse: warning: the many-facet Rasch analysis was refused (the other"
                        + " sections are written as usual):");
                mfrm.paragraphs().stream().filter(x -> x.startsWith("Reason: ")).forEach(x -> err.println("  " + x));
            } else if (mfrm.summary().get(MfrmSection.ID + ".convergence") instanceof Map<?, ?> c
                    && Boolean.FALSE.equals(c.get("converged"))) {
                err.println("inkgate-admin analyse: warning: the many-facet Rasch estimation did not converge within"
                        + " --mfrm-max-iterations " + mfrmMaxIterations + "; its measures are provisional (see the report)");
            }
            if (mfrm.summary().get(MfrmSection.ID + ".warnings") instanceof List<?> w && !w.isEmpty()) {
                err.println("inkgate-admin analyse: the many-facet Rasch analysis raised " + w.size()
                        + " warning(s); read them in the report before using its measures");
            }
            extra.add(mfrm);
        }
        Report report = StudyAnalysis.report(data, options, extra);
        try {
            List<Section> sections = new ArrayList<>();
            sections.add(AnalyseProvenance.section(examAnalysed, inputFiles(),
                    spec.commandLine().getParseResult().originalArgs(), new InkgateAdmin.Version().getVersion()[0],
                    Instant.now()));
            sections.addAll(report.sections());
            report = new Report(report.title(), report.preamble(), sections);
        } catch (IOException e) {
            err.println("inkgate-admin analyse: could not read an input again to record its SHA-256: " + e.getMessage());
            return INPUT_REFUSED;
        }
        try {
            org.inkgate.format.io.OwnerOnly.folder(out);
            ReportWriter.write(report, out);
            org.inkgate.format.io.OwnerOnly.restrict(out.resolve("report.html"));
            org.inkgate.format.io.OwnerOnly.restrict(out.resolve("summary.json"));
            org.inkgate.format.io.OwnerOnly.tree(out.resolve("tables"));
            if (mfrmResult != null) {
                // the anchors a later run reads with --mfrm-anchors to report on this run's scale
                try (Writer w = Files.newBufferedWriter(out.resolve(AnchorFile.FILE_NAME), StandardCharsets.UTF_8)) {
                    AnchorFile.write(mfrmResult, w);
                }
                org.inkgate.format.io.OwnerOnly.restrict(out.resolve(AnchorFile.FILE_NAME));
            }
        } catch (IOException e) {
            err.println("inkgate-admin analyse: could not write the report to " + out + ": " + e.getMessage());
            return OUTPUT_FAILED;
        }
        outWriter.println("Report written to " + out.resolve("report.html") + " (" + data.ratings().size()
                + " ratings; tables in " + out.resolve("tables") + ", figures in " + out.resolve("summary.json") + ")");
        outWriter.flush();
        return 0;
    }

    /** The store's ratings of the chosen exam through the analysis's own reader, or null after saying why not. */
    private List<Rating> readStoreRatings(PrintWriter err) throws IOException, InputRejected {
        if (!Files.isRegularFile(store)) {
            err.println("inkgate-admin analyse: no results store at " + store + "; give the file collect wrote");
            return null;
        }
        String chosen = chooseExam(err);
        if (chosen == null) {
            return null;
        }
        try {
            List<Rating> r = StoreRatings.read(store, chosen);
            if (r.isEmpty()) {
                err.println("inkgate-admin analyse: the store holds no ratings of exam " + chosen + " yet; rate the"
                        + " responses first (inkgate-admin rate) or give --ratings FILE.csv");
                return null;
            }
            return r;
        } catch (org.inkgate.admin.core.rating.RatingException e) {
            err.println("inkgate-admin analyse: could not read ratings from " + store + ": " + e.getMessage());
            return null;
        }
    }

    /** The exam named by --exam, or the store's only exam; null after saying why neither works. */
    private String chooseExam(PrintWriter err) {
        try (ResultsStore s = SqliteResultsStore.open(store)) {
            List<String> exams = s.examIds();
            if (exam == null) {
                if (exams.size() != 1) {
                    err.println("inkgate-admin analyse: the store holds " + exams.size() + " exams " + exams
                            + "; name one with --exam");
                    return null;
                }
                examAnalysed = exams.get(0);
                return examAnalysed;
            }
            if (!exams.contains(exam)) {
                err.println("inkgate-admin analyse: the store holds no exam " + exam + "; it holds " + exams);
                return null;
            }
            examAnalysed = exam;
            return exam;
        } catch (StoreException e) {
            err.println("inkgate-admin analyse: could not read the results store " + store + ": " + e.getMessage());
            return null;
        }
    }

    /** The store's questionnaire answers of the chosen exam, or null after saying on err why they cannot be read. */
    private QuestionnaireData readStoreQuestionnaire(PrintWriter err) throws IOException, QuestionnaireCsv.Refused {
        String chosen = chooseExam(err);
        if (chosen == null) {
            return null;
        }
        try (ResultsStore s = SqliteResultsStore.open(store)) {
            return QuestionnaireInput.read(s, chosen, store.getFileName().toString());
        } catch (StoreException e) {
            err.println("inkgate-admin analyse: could not read the results store " + store + ": " + e.getMessage());
            return null;
        }
    }

    /** The store's tables of the chosen exam, or null after saying on err why they cannot be read. */
    private StoreStudyInput.Tables readStore(PrintWriter err) {
        if (toolUsage != null || process != null) {
            err.println("inkgate-admin analyse: give either --store or --tool-usage/--process, not both: the store"
                    + " already holds the tool use and process events");
            return null;
        }
        if (!Files.isRegularFile(store)) {
            err.println("inkgate-admin analyse: no results store at " + store + "; give the file collect wrote");
            return null;
        }
        try (ResultsStore s = SqliteResultsStore.open(store)) {
            List<String> exams = s.examIds();
            String chosen = exam;
            if (chosen == null) {
                if (exams.size() != 1) {
                    err.println("inkgate-admin analyse: the store holds " + exams.size() + " exams " + exams
                            + "; name one with --exam");
                    return null;
                }
                chosen = exams.get(0);
            } else if (!exams.contains(chosen)) {
                err.println("inkgate-admin analyse: the store holds no exam " + chosen + "; it holds " + exams);
                return null;
            }
            examAnalysed = chosen;
            return StoreStudyInput.read(s, chosen, declared(rosterAttributes));
        } catch (StoreException e) {
            err.println("inkgate-admin analyse: could not read the results store " + store + ": " + e.getMessage());
            return null;
        }
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
        List<String> facets = mfrmFacets.stream().map(String::trim).toList();
        for (String f : facets) {
            if (isAttribute(f)) {
                throw new ParameterException(spec.commandLine(), "--mfrm-facets: '" + f + "' is a candidate attribute,"
                        + " not a facet (each candidate has one value); use it in --mfrm-bias, e.g. condition:" + f);
            }
            if (!StudyRatings.COLUMNS.contains(f)) {
                throw new ParameterException(spec.commandLine(), "--mfrm-facets: '" + f + "' is not a ratings column;"
                        + " use some of " + StudyRatings.COLUMNS + " (candidate is always modelled)");
            }
        }
        try {
            MfrmOptions.Builder b = MfrmOptions.builder(facets).structure(structure(mfrmStructure))
                    .maxIterations(mfrmMaxIterations);
            for (String pair : mfrmBias == null ? List.<String>of() : mfrmBias.stream().distinct().toList()) {
                String[] ab = pair.trim().split(":", -1);
                if (ab.length != 2 || !isColumn(ab[0]) || !isColumn(ab[1])) {
                    throw new IllegalArgumentException("--mfrm-bias: '" + pair + "' is not COLUMN:COLUMN with columns"
                            + " among candidate, " + StudyRatings.COLUMNS + " and the attributes declared with"
                            + " --attribute or --roster-attribute " + declaredAttributes() + " (e.g. rater:task,"
                            + " condition:first_language)");
                }
                b.bias(ab[0], ab[1]);
            }
            b.biasEstimation(BiasEstimation.ofOption(mfrmBiasEstimation.trim()));
            return b.build();
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage(), e);
        }
    }

    private boolean isColumn(String c) {
        return RatingData.CANDIDATE.equals(c) || StudyRatings.COLUMNS.contains(c) || isAttribute(c);
    }

    private boolean isAttribute(String c) {
        return declaredAttributes().contains(c);
    }

    private List<String> declaredAttributes() {
        List<String> all = new ArrayList<>(declared(attributes));
        all.addAll(declared(rosterAttributes));
        return all;
    }

    private static List<String> declared(List<String> names) {
        return names == null ? List.of() : names.stream().map(String::trim).filter(n -> !n.isEmpty()).distinct().toList();
    }

    private static ScaleStructure structure(String text) {
        String t = text.trim();
        if (t.equals("rating-scale")) {
            return new ScaleStructure.RatingScale();
        }
        if (t.startsWith("partial-credit:") && t.length() > "partial-credit:".length()) {
            return new ScaleStructure.PartialCredit(t.substring("partial-credit:".length()));
        }
        throw new IllegalArgumentException("--mfrm-structure: '" + text + "'; use rating-scale or"
                + " partial-credit:FACET (e.g. partial-credit:task)");
    }

    /** Every input file given, by option, in a fixed order. */
    private Map<String, Path> inputFiles() {
        Map<String, Path> in = new java.util.LinkedHashMap<>();
        Object[][] options = {{"--ratings", ratings}, {"--candidates", candidates}, {"--tool-usage", toolUsage},
            {"--process", process}, {"--questionnaire", questionnaire}, {"--store", store}, {"--mfrm-anchors", mfrmAnchors}};
        for (Object[] o : options) {
            if (o[1] != null) {
                in.put((String) o[0], (Path) o[1]);
            }
        }
        return in;
    }

    /** The Rasch section, its result (null when refused) and the anchors that did not apply. */
    private record MfrmRun(Section section, MfrmResult result, List<String> leftOut) {
    }

    /** Runs the Rasch analysis on the ratings already read; a refusal becomes the section's text. */
    private static MfrmRun mfrmSection(StudyData data, MfrmOptions o, AnchorFile.Anchors anchors) {
        Map<String, String> levels = new HashMap<>();
        Map<String, Map<String, String>> attributes = new HashMap<>();
        data.candidates().forEach(c -> {
            levels.put(c.id(), c.level());
            c.attributes().forEach((name, group) -> attributes.computeIfAbsent(name, k -> new HashMap<>()).put(c.id(), group));
        });
        List<String> columns = new ArrayList<>(o.facets());
        for (FacetPair p : o.biasPairs()) {
            for (String c : List.of(p.first(), p.second())) {
                if (!RatingData.CANDIDATE.equals(c) && !columns.contains(c)) {
                    columns.add(c);
                }
                // a declared attribute nobody has a value for: refused per rating below, not an unknown column
                if (!RatingData.CANDIDATE.equals(c) && !StudyRatings.COLUMNS.contains(c)) {
                    attributes.putIfAbsent(c, Map.of());
                }
            }
        }
        List<String> leftOut = new ArrayList<>();
        try {
            // the Wright map draws the candidates by level: the candidate table's level, else the ratings'
            Map<String, String> levelOf = new HashMap<>(levels);
            data.ratings().forEach(r -> {
                if (levelOf.getOrDefault(r.candidate(), "").isBlank() && r.level() != null
                        && !r.level().isBlank()) {
                    levelOf.put(r.candidate(), r.level());
                }
            });
            RatingData ratingData = StudyRatings.of(data.ratings(), levels, attributes, columns);
            MfrmOptions options = o;
            if (anchors != null) {
                MfrmOptions.Builder b = o.toBuilder();
                leftOut.addAll(anchors.applyTo(b, ratingData, o.facets(), o.structure()));
                options = b.build();
            }
            MfrmResult result = ManyFacetRasch.analyse(ratingData, options);
            return new MfrmRun(MfrmSection.of(result, levelOf), result, leftOut);
        } catch (MfrmRefusedException e) {
            return new MfrmRun(MfrmSection.refused(e.reasons()), null, leftOut);
        } catch (IllegalArgumentException e) {
            // an anchor the ratings cannot take (e.g. thresholds for another number of categories)
            return new MfrmRun(MfrmSection.refused(List.of(e.getMessage())), null, leftOut);
        }
    }

    private static Reader open(Path file) throws IOException {
        // read whole and checked: a file that is not UTF-8 is refused naming its line, not "Input length = 1"
        return new java.io.StringReader(org.inkgate.format.io.Utf8Text.read(file));
    }
}
