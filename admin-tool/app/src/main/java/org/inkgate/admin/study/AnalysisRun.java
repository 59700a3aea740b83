package org.inkgate.admin.study;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import org.inkgate.admin.core.export.Cancellation;
import org.inkgate.admin.core.export.QuestionnaireCsv;
import org.inkgate.admin.core.export.StagedFolder;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.StoreException;
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
import org.inkgate.analysis.mfrm.MfrmOptions;
import org.inkgate.analysis.mfrm.MfrmResult;
import org.inkgate.analysis.mfrm.MfrmSection;
import org.inkgate.analysis.report.Report;
import org.inkgate.analysis.report.ReportWriter;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.study.QuestionnaireSection;
import org.inkgate.analysis.study.StudyAnalysis;
import org.inkgate.analysis.study.StudyData;
import org.inkgate.analysis.study.StudyOptions;
import org.inkgate.format.io.OwnerOnly;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.format.io.Utf8Text;

/**
 * One analysis run, as {@code inkgate-admin analyse} and the admin window's analysis step both
 * make it, so the two give the same report from the same inputs: read the inputs (files or a
 * results store), build the study sections and the many-facet Rasch section, and write
 * report.html, tables/*.csv, summary.json and the anchor file. The report is written into a
 * hidden folder beside the output folder and moved in only when complete (admin core's
 * {@link StagedFolder}, which the export uses too), so a cancelled or failed run leaves no
 * half-written report.
 */
public final class AnalysisRun {

    /** What to analyse; null paths are inputs not given; the store is a file or a PostgreSQL server. */
    public record Request(Path ratings, Path candidates, List<String> attributes, List<String> rosterAttributes,
            Path toolUsage, Path process, Path questionnaire, StoreLocation store, String exam, Path out,
            StudyOptions options, MfrmOptions mfrm, Path anchors, List<String> arguments) {

        public Request {
            attributes = declared(attributes);
            rosterAttributes = declared(rosterAttributes);
            arguments = List.copyOf(arguments);
        }

        /** A request whose store, if any, is a file (the window's store field). */
        public Request(Path ratings, Path candidates, List<String> attributes, List<String> rosterAttributes,
                Path toolUsage, Path process, Path questionnaire, Path storeFile, String exam, Path out,
                StudyOptions options, MfrmOptions mfrm, Path anchors, List<String> arguments) {
            this(ratings, candidates, attributes, rosterAttributes, toolUsage, process, questionnaire,
                    storeFile == null ? null : StoreLocation.file(storeFile), exam, out, options, mfrm, anchors, arguments);
        }

        /** Every input file given, by its command-line option, in a fixed order (for the provenance). */
        public Map<String, Path> inputFiles() {
            Map<String, Path> in = new LinkedHashMap<>();
            Object[][] options = {{"--ratings", ratings}, {"--candidates", candidates}, {"--tool-usage", toolUsage},
                {"--process", process}, {"--questionnaire", questionnaire},
                // a store file is an input file with a digest; a server store is named in the arguments only
                {"--store", store instanceof StoreLocation.File f ? f.path() : null},
                {"--mfrm-anchors", anchors}};
            for (Object[] o : options) {
                if (o[1] != null) {
                    in.put((String) o[0], (Path) o[1]);
                }
            }
            return in;
        }
    }

    /**
     * Hears how far the run is, and may ask it to stop; called on the running thread. It also hears
     * the moments around the report's commit point ({@link StagedFolder.Moments}).
     */
    public interface Listener extends StagedFolder.Moments {
        void stage(int done, int total, String what);

        /** A warning for the test owner (the report is still written). */
        void warn(String text);

        default boolean cancelled() {
            return false;
        }

        /**
         * The run's cancel-or-publish decision: a caller that cancels from another thread (the
         * window's Cancel) hands in its own and cancels through it, so that a cancel once the report
         * is moving into place is refused rather than claimed.
         */
        default Cancellation cancellation() {
            return new Cancellation();
        }
    }

    /** The run refused its inputs or could not write; nothing was written. Lines are for people. */
    public static final class Refused extends Exception {
        private final List<String> lines;
        private final boolean output;

        Refused(boolean output, String... lines) {
            this(output, List.of(lines));
        }

        Refused(boolean output, List<String> lines) {
            super(String.join("\n", lines));
            this.lines = List.copyOf(lines);
            this.output = output;
        }

        public List<String> lines() {
            return lines;
        }

        /** True when the inputs were fine but the report could not be written. */
        public boolean outputFailed() {
            return output;
        }
    }

    /** A written report. */
    public record Written(Path folder, int ratings, String exam) {
        public Path html() {
            return folder.resolve("report.html");
        }
    }

    static final int STAGES = 6;

    private final Request q;
    private final Listener listener;
    private final Cancellation cancellation;
    private String examAnalysed;

    private AnalysisRun(Request q, Listener listener) {
        this.q = q;
        this.listener = listener;
        this.cancellation = listener.cancellation();
    }

    /** Runs the analysis; throws {@link CancellationException} when the listener asked it to stop. */
    public static Written run(Request request, Listener listener) throws Refused {
        return new AnalysisRun(request, listener).run();
    }

    /** The software version line the provenance records. */
    public static String version() {
        String v = AnalysisRun.class.getPackage().getImplementationVersion();
        return "inkgate-admin " + (v == null ? "(development build)" : v);
    }

    private Written run() throws Refused {
        step(0, "Reading the inputs");
        StudyData data;
        QuestionnaireData answers;
        try {
            data = readData();
            answers = readAnswers();
        } catch (QuestionnaireCsv.Refused e) {
            List<String> lines = new ArrayList<>();
            lines.add(e.getMessage() + ":");
            e.problems().stream().limit(20).forEach(x -> lines.add("  " + x.describe()));
            lines.add("Fix the rows above and run again; no report was written.");
            throw new Refused(false, lines);
        } catch (InputRejected e) {
            throw new Refused(false, e.getMessage(), "Fix the rows above and run again; no report was written.");
        } catch (NoSuchFileException e) {
            throw new Refused(false, "no such file: " + e.getFile());
        } catch (IOException e) {
            throw new Refused(false, "could not read the input: " + e.getMessage());
        }
        StudyOptions options = q.options();
        if (options.baselineCondition() != null
                && data.ratings().stream().noneMatch(x -> x.condition().equals(options.baselineCondition()))) {
            throw new Refused(false, "--baseline " + options.baselineCondition()
                    + " is not a condition in the ratings; use one of "
                    + data.ratings().stream().map(Rating::condition).distinct().sorted().toList());
        }
        if (options.preTest() != null && data.surveyItems().stream().noneMatch(options.preTest()::equals)) {
            throw new Refused(false, "--pre-test " + options.preTest() + " is not a numeric column of the candidate"
                    + " table; use one of " + data.surveyItems() + " (a column declared with --attribute is a"
                    + " category, not a number)");
        }
        List<Section> extra = new ArrayList<>();
        if (answers != null && !answers.isEmpty()) {
            extra.add(QuestionnaireSection.build(answers, data.toolUse()));
        }
        AnchorFile.Anchors anchors = null;
        if (q.anchors() != null) {
            try (Reader r = open(q.anchors())) {
                anchors = AnchorFile.read(r, q.anchors().toString());
            } catch (IOException | IllegalArgumentException e) {
                throw new Refused(false, "the anchor file was refused; nothing was written:",
                        "  " + e.getMessage().replace("\n", "\n  "));
            }
        }
        MfrmResult mfrmResult = null;
        if (q.mfrm() != null) {
            step(1, "Many-facet Rasch measurement (the longest part)");
            RaschRun.Outcome run = RaschRun.of(data, q.mfrm(), anchors, options.design());
            run.leftOut().forEach(x -> listener.warn("warning: " + x));
            mfrmResult = run.result();
            Section mfrm = run.section();
            warnAbout(mfrm);
            extra.add(mfrm);
        }
        step(2, "Descriptive statistics, comparisons, agreement and the other sections");
        Report report = StudyAnalysis.report(data, options, extra);
        try {
            List<Section> sections = new ArrayList<>();
            sections.add(AnalyseProvenance.section(examAnalysed, q.inputFiles(), q.arguments(), version(),
                    Instant.now()));
            sections.addAll(report.sections());
            report = new Report(report.title(), report.preamble(), sections);
        } catch (IOException e) {
            throw new Refused(false, "could not read an input again to record its SHA-256: " + e.getMessage());
        }
        step(3, "Writing the report");
        Report finished = report;
        MfrmResult anchorsOut = mfrmResult;
        try {
            try (StagedFolder staged = StagedFolder.open(q.out(), cancellation)) {
                staged.tellEarlierRun(new StagedFolder.Moments() {
                    @Override
                    public void earlierRunFinished(String note) {
                        listener.warn(note); // a warning the command and the window both show
                    }
                });
                Path folder = staged.folder();
                ReportWriter.write(finished, folder);
                OwnerOnly.restrict(folder.resolve("report.html"));
                OwnerOnly.restrict(folder.resolve("summary.json"));
                OwnerOnly.tree(folder.resolve("tables"));
                if (anchorsOut != null) {
                    // the anchors a later run reads with --mfrm-anchors to report on this run's scale
                    try (Writer w = Files.newBufferedWriter(folder.resolve(AnchorFile.FILE_NAME), StandardCharsets.UTF_8)) {
                        AnchorFile.write(anchorsOut, w);
                    }
                    OwnerOnly.restrict(folder.resolve(AnchorFile.FILE_NAME));
                }
                step(4, "Moving the finished report into place");
                staged.publish(new StagedFolder.Moments() {
                    @Override
                    public void beforePublish() {
                        listener.beforePublish();
                        if (listener.cancelled()) {
                            cancellation.cancel();
                        }
                    }

                    @Override
                    public void publishing() {
                        listener.publishing();
                    }
                });
            }
        } catch (IOException e) {
            throw new Refused(true, "could not write the report to " + q.out() + ": " + e.getMessage());
        }
        listener.stage(STAGES, STAGES, "Report written");
        return new Written(q.out(), data.ratings().size(), examAnalysed);
    }

    private void warnAbout(Section mfrm) {
        if (Boolean.FALSE.equals(mfrm.summary().get(MfrmSection.ID + ".available"))) {
            StringBuilder b = new StringBuilder("warning: the many-facet Rasch analysis was refused (the other"
                    + " sections are written as usual):");
            mfrm.paragraphs().stream().filter(x -> x.startsWith("Reason: ")).forEach(x -> b.append("\n  ").append(x));
            listener.warn(b.toString());
        } else if (mfrm.summary().get(MfrmSection.ID + ".convergence") instanceof Map<?, ?> c
                && Boolean.FALSE.equals(c.get("converged"))) {
            listener.warn("warning: the many-facet Rasch estimation did not converge within --mfrm-max-iterations "
                    + q.mfrm().maxIterations() + "; its measures are provisional (see the report)");
        }
        if (mfrm.summary().get(MfrmSection.ID + ".warnings") instanceof List<?> w && !w.isEmpty()) {
            listener.warn("the many-facet Rasch analysis raised " + w.size()
                    + " warning(s); read them in the report before using its measures");
        }
    }

    private void step(int done, String what) {
        if (listener.cancelled() || cancellation.cancelled()) {
            throw new CancellationException("cancelled before: " + what);
        }
        listener.stage(done, STAGES, what);
    }

    private StudyData readData() throws Refused, IOException, InputRejected {
        List<Rating> r;
        if (q.ratings() != null) {
            try (Reader in = open(q.ratings())) {
                r = RatingsReader.read(q.ratings().getFileName().toString(), in);
            }
        } else {
            r = readStoreRatings();
        }
        CandidatesReader.Result c = null;
        if (q.candidates() != null) {
            try (Reader in = open(q.candidates())) {
                c = CandidatesReader.read(q.candidates().getFileName().toString(), in, q.attributes());
            }
        }
        List<ToolUse> u = List.of();
        if (q.toolUsage() != null) {
            try (Reader in = open(q.toolUsage())) {
                u = ToolUseReader.read(q.toolUsage().getFileName().toString(), in);
            }
        }
        List<ProcessEvent> p = List.of();
        if (q.process() != null) {
            try (Reader in = open(q.process())) {
                p = ProcessLogReader.read(q.process().getFileName().toString(), in);
            }
        }
        List<Candidate> cands = c == null ? List.of() : c.candidates();
        if (q.store() != null) {
            StoreStudyInput.Tables fromStore = readStore();
            cands = c == null ? fromStore.candidates() : cands;
            if (c != null && !q.rosterAttributes().isEmpty()) {
                throw new Refused(false, "--roster-attribute reads the store's roster, but --candidates"
                        + " replaces it; declare the column in the candidate table with --attribute instead");
            }
            List<String> found = Candidate.attributeNames(cands);
            for (String a : q.rosterAttributes()) {
                if (!found.contains(a)) {
                    throw new Refused(false, "--roster-attribute " + a + ": the roster in " + q.store()
                            + " gives no candidate of the exam a value for it; name first_language or a column"
                            + " of the roster that was registered with collect --roster");
                }
            }
            u = fromStore.toolUse();
            p = fromStore.processLog();
        }
        return new StudyData(r, cands, c == null ? List.of() : c.items(), u, p);
    }

    private QuestionnaireData readAnswers() throws Refused, IOException, QuestionnaireCsv.Refused {
        if (q.questionnaire() != null) {
            try (Reader in = open(q.questionnaire())) {
                return QuestionnaireInput.read(q.questionnaire().getFileName().toString(), in);
            }
        }
        if (q.store() == null) {
            return null;
        }
        String chosen = chooseExam();
        try (ResultsStore s = Stores.openResultsForReading(q.store())) {
            return QuestionnaireInput.read(s, chosen, storeName(q.store()));
        } catch (StoreException e) {
            throw new Refused(false, "could not read the results store " + q.store() + ": " + e.getMessage());
        }
    }

    /** The store's ratings of the chosen exam through the analysis's own reader. */
    private List<Rating> readStoreRatings() throws Refused, IOException, InputRejected {
        refuseMissingFile();
        String chosen = chooseExam();
        try {
            List<Rating> r = StoreRatings.read(q.store(), chosen);
            if (r.isEmpty()) {
                throw new Refused(false, "the store holds no ratings of exam " + chosen + " yet; rate the"
                        + " responses first (inkgate-admin rate) or give --ratings FILE.csv");
            }
            return r;
        } catch (RatingException e) {
            throw new Refused(false, "could not read ratings from " + q.store() + ": " + e.getMessage());
        }
    }

    /** A store file that is not there; a server store says for itself when it holds no store. */
    private void refuseMissingFile() throws Refused {
        if (q.store() instanceof StoreLocation.File f && !Files.isRegularFile(f.path())) {
            throw new Refused(false, "no results store at " + q.store() + "; give the file collect wrote");
        }
    }

    /** The store as a source name in the report: a file's name, a server store's address. */
    static String storeName(StoreLocation store) {
        return store instanceof StoreLocation.File f ? f.path().getFileName().toString() : store.toString();
    }

    /** The exam named by --exam, or the store's only exam. */
    private String chooseExam() throws Refused {
        try (ResultsStore s = Stores.openResultsForReading(q.store())) {
            List<String> exams = s.examIds();
            if (q.exam() == null) {
                if (exams.size() != 1) {
                    throw new Refused(false, "the store holds " + exams.size() + " exams " + exams
                            + "; name one with --exam");
                }
                examAnalysed = exams.get(0);
                return examAnalysed;
            }
            if (!exams.contains(q.exam())) {
                throw new Refused(false, "the store holds no exam " + q.exam() + "; it holds " + exams);
            }
            examAnalysed = q.exam();
            return examAnalysed;
        } catch (StoreException e) {
            throw new Refused(false, "could not read the results store " + q.store() + ": " + e.getMessage());
        }
    }

    /** The store's tables of the chosen exam. */
    private StoreStudyInput.Tables readStore() throws Refused {
        if (q.toolUsage() != null || q.process() != null) {
            throw new Refused(false, "give either --store or --tool-usage/--process, not both: the store"
                    + " already holds the tool use and process events");
        }
        refuseMissingFile();
        String chosen = chooseExam();
        try (ResultsStore s = Stores.openResultsForReading(q.store())) {
            return StoreStudyInput.read(s, chosen, q.rosterAttributes());
        } catch (StoreException e) {
            throw new Refused(false, "could not read the results store " + q.store() + ": " + e.getMessage());
        }
    }

    static List<String> declared(List<String> names) {
        return names == null ? List.of() : names.stream().map(String::trim).filter(n -> !n.isEmpty()).distinct().toList();
    }

    private static Reader open(Path file) throws IOException {
        // read whole and checked: a file that is not UTF-8 is refused naming its line, not "Input length = 1"
        return new StringReader(Utf8Text.read(file));
    }
}
