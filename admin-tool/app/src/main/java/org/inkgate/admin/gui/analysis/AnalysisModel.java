package org.inkgate.admin.gui.analysis;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.inkgate.admin.core.export.Cancellation;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.StoreField;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.study.AnalysisRun;
import org.inkgate.admin.study.RaschChoices;
import org.inkgate.analysis.data.StudyDesign;
import org.inkgate.analysis.mfrm.MfrmOptions;
import org.inkgate.analysis.mfrm.StudyRatings;
import org.inkgate.analysis.scores.ScoreRule;
import org.inkgate.analysis.study.StudyOptions;

/**
 * The analysis step: the choices of {@code inkgate-admin analyse} as properties, run through the
 * same {@link AnalysisRun} off the JavaFX thread. The run is recorded in the report's provenance
 * as the command line that gives the same report, and shown so.
 */
public final class AnalysisModel {

    /** The design choice that declares none: the analysis reads the design from the data, as the command without --design. */
    public static final String FROM_THE_DATA = "";
    /** The designs the window offers: none declared, then the words {@code analyse --design} takes. */
    public static final List<String> DESIGNS = List.of(FROM_THE_DATA, "within", "parallel");

    /** The Rasch estimation's iteration cap: the command's default, not offered in the window. */
    static final int MAX_ITERATIONS = 1000;

    private final AdminSession session;
    private final StringProperty store = new SimpleStringProperty("");
    private final StringProperty exam = new SimpleStringProperty("");
    private final StringProperty ratings = new SimpleStringProperty("");
    private final StringProperty candidates = new SimpleStringProperty("");
    private final StringProperty out = new SimpleStringProperty("");
    private final StringProperty title = new SimpleStringProperty("Analysis of ratings");
    private final ObjectProperty<ScoreRule> scoreRule = new SimpleObjectProperty<>(ScoreRule.MEAN);
    private final StringProperty design = new SimpleStringProperty(FROM_THE_DATA);
    private final StringProperty preTest = new SimpleStringProperty("");
    private final BooleanProperty rasch = new SimpleBooleanProperty(false);
    private final Map<String, BooleanProperty> facets = new LinkedHashMap<>();
    private final StringProperty structure = new SimpleStringProperty(RaschChoices.RATING_SCALE);
    private final StringProperty biasPairs = new SimpleStringProperty("");
    private final StringProperty biasEstimation = new SimpleStringProperty("fixed");
    private final StringProperty anchors = new SimpleStringProperty("");
    private final StringProperty result = new SimpleStringProperty("");
    private final StringProperty warnings = new SimpleStringProperty("");
    private final StringProperty commandLine = new SimpleStringProperty("");
    private final ObjectProperty<Path> report = new SimpleObjectProperty<>();
    private final BooleanProperty running = new SimpleBooleanProperty(false);
    private volatile Cancellation current;
    private boolean cancelRefused;
    /** Told on the worker at the report's commit point; tests press Cancel there. */
    volatile AnalysisRun.Listener watch = new AnalysisRun.Listener() {
        @Override
        public void stage(int done, int total, String what) {
        }

        @Override
        public void warn(String text) {
        }
    };

    public AnalysisModel(AdminSession session) {
        this.session = session;
        for (String c : StudyRatings.COLUMNS) {
            facets.put(c, new SimpleBooleanProperty(false));
        }
        StoreField.link(store, session.store());
        if (!store.get().isBlank()) {
            out.set(besideStore("report"));
        }
        store.addListener((o, was, now) -> {
            if (out.get().isBlank() && now != null && !now.isBlank()) {
                out.set(besideStore("report"));
            }
        });
    }

    private String besideStore(String name) {
        if (StoreField.isServer(store.get())) {
            return session.besideExam(name).toString(); // a server store has no folder here
        }
        Path s = Fields.path(store.get()).toAbsolutePath();
        return (s.getParent() == null ? Path.of(name) : s.getParent().resolve(name)).toString();
    }

    public StringProperty store() {
        return store;
    }

    /** The password file of a PostgreSQL store, shared by the steps. */
    public StringProperty storePasswordFile() {
        return session.storePasswordFile();
    }

    /** The exam in the store; blank when the store holds one. */
    public StringProperty exam() {
        return exam;
    }

    /** A ratings CSV instead of the store's ratings; blank to use the store's. */
    public StringProperty ratings() {
        return ratings;
    }

    public StringProperty candidates() {
        return candidates;
    }

    public StringProperty out() {
        return out;
    }

    public StringProperty title() {
        return title;
    }

    public ObjectProperty<ScoreRule> scoreRule() {
        return scoreRule;
    }

    /**
     * The declared study design, as {@code --design} takes it ({@link #DESIGNS}); {@link #FROM_THE_DATA}
     * declares none. The report checks a declaration against the data and says where they differ.
     */
    public StringProperty design() {
        return design;
    }

    /** A numeric column of the candidates CSV the parallel-groups comparison adjusts for; blank for level. */
    public StringProperty preTest() {
        return preTest;
    }

    /** Many-facet Rasch measurement on or off. */
    public BooleanProperty rasch() {
        return rasch;
    }

    /** One switch per ratings column that can be a facet (candidate is always modelled). */
    public Map<String, BooleanProperty> facets() {
        return facets;
    }

    /** rating-scale or partial-credit:FACET, as the command writes it. */
    public StringProperty structure() {
        return structure;
    }

    /** Bias pairs A:B separated by commas. */
    public StringProperty biasPairs() {
        return biasPairs;
    }

    /** fixed or joint. */
    public StringProperty biasEstimation() {
        return biasEstimation;
    }

    public StringProperty anchors() {
        return anchors;
    }

    public StringProperty result() {
        return result;
    }

    public StringProperty warnings() {
        return warnings;
    }

    /** The command line that gives the same report, once a run has started. */
    public StringProperty commandLine() {
        return commandLine;
    }

    /** The report.html last written, or null. */
    public ObjectProperty<Path> report() {
        return report;
    }

    /**
     * True while this step's analysis runs: only it may be cancelled (the other steps' jobs, such as
     * collect, do not stop halfway and must not be reported as cancelled).
     */
    public BooleanProperty running() {
        return running;
    }

    /** Opens the written report in the system browser; false when the window has none. */
    public boolean openInBrowser() {
        Path html = report.get();
        if (html == null || session.browser() == null) {
            return false;
        }
        session.browser().accept(html.toUri().toString());
        return true;
    }

    /** Runs the analysis in the background; outcome, warnings and the report land in the properties. */
    public void analyse() {
        warnings.set("");
        AnalysisRun.Request request;
        try {
            request = request();
        } catch (IllegalArgumentException e) {
            result.set("Not run: " + e.getMessage());
            return;
        }
        commandLine.set("inkgate-admin analyse " + String.join(" ",
                request.arguments().stream().map(org.inkgate.admin.study.AnalyseProvenance::quoted).toList()));
        result.set("Analysing ...");
        running.set(true);
        Cancellation cancellation = new Cancellation();
        current = cancellation;
        cancelRefused = false;
        AnalysisRun.Listener watcher = watch;
        List<String> heard = new ArrayList<>();
        session.work().run("Analysing", progress -> AnalysisRun.run(request, new AnalysisRun.Listener() {
            @Override
            public void stage(int done, int total, String what) {
                progress.update(done, total, what);
            }

            @Override
            public void warn(String text) {
                synchronized (heard) {
                    heard.add(text);
                }
            }

            @Override
            public Cancellation cancellation() {
                return cancellation;
            }

            @Override
            public void beforePublish() {
                watcher.beforePublish();
            }

            @Override
            public void publishing() {
                watcher.publishing();
            }
        }), written -> {
            running.set(false);
            current = null;
            report.set(written.html());
            result.set((cancelRefused ? "Cancel came too late: the report was already being moved into place. " : "")
                    + "Report written to " + written.html() + " (" + written.ratings() + " ratings"
                    + (written.exam() == null ? "" : " of exam " + written.exam()) + "). Tables are in "
                    + written.folder().resolve("tables") + ", figures in " + written.folder().resolve("summary.json")
                    + ".");
            showWarnings(heard);
        }, message -> {
            running.set(false);
            current = null;
            result.set("No report was written.\n" + message);
            showWarnings(heard);
        }, () -> {
            running.set(false);
            current = null;
            result.set("Cancelled. No report was written; the output folder is as it was.");
        });
    }

    private void showWarnings(List<String> heard) {
        synchronized (heard) {
            warnings.set(String.join("\n", heard));
        }
    }

    /** The run's request and its command-line arguments, from the fields; a bad choice throws with a message for people. */
    AnalysisRun.Request request() {
        StoreLocation storeFile;
        try {
            storeFile = store.get().isBlank() ? null : StoreField.location(store.get(), session.storePasswordFile().get());
        } catch (StoreException e) {
            throw new IllegalArgumentException(e.getMessage(), e);
        }
        Path ratingsFile = Fields.path(ratings.get());
        Path outFolder = Fields.path(out.get());
        if (storeFile == null && ratingsFile == null) {
            throw new IllegalArgumentException("name the results store (from collect) or a ratings CSV file.");
        }
        if (outFolder == null) {
            throw new IllegalArgumentException("name the folder for the report.");
        }
        List<String> args = new ArrayList<>();
        add(args, "--ratings", ratingsFile);
        add(args, "--candidates", Fields.path(candidates.get()));
        if (storeFile != null) {
            // as typed, so the report's command line names the same store; a password file by its path only
            args.add("--store");
            args.add(store.get().strip());
            if (storeFile instanceof StoreLocation.Server s && s.passwordFile() != null) {
                add(args, "--store-password-file", s.passwordFile());
            }
        }
        String examId = exam.get().isBlank() || storeFile == null ? null : exam.get().strip();
        if (examId != null) {
            args.add("--exam");
            args.add(examId);
        }
        args.add("--out");
        args.add(outFolder.toString());
        if (scoreRule.get() != ScoreRule.MEAN) {
            args.add("--score-rule");
            args.add(scoreRule.get().name());
        }
        String reportTitle = title.get().isBlank() ? "Analysis of ratings" : title.get().strip();
        if (!reportTitle.equals("Analysis of ratings")) {
            args.add("--title");
            args.add(reportTitle);
        }
        StudyOptions options = StudyOptions.DEFAULT.withScoreRule(scoreRule.get()).withTitle(reportTitle);
        String declared = design.get() == null ? FROM_THE_DATA : design.get().strip();
        if (!declared.equals(FROM_THE_DATA)) {
            // the command's own parsing, so the window accepts and refuses exactly what --design does
            options = options.withDesign(StudyDesign.parseDeclared(declared));
            args.add("--design");
            args.add(declared);
        }
        String column = preTest.get().strip();
        if (!column.isEmpty()) {
            if (Fields.path(candidates.get()) == null) {
                throw new IllegalArgumentException("the pre-test is a numeric column of the candidates CSV: name that"
                        + " file, or clear the pre-test column to adjust for level.");
            }
            options = options.withPreTest(column);
            args.add("--pre-test");
            args.add(column);
        }
        MfrmOptions mfrm = null;
        Path anchorFile = null;
        if (rasch.get()) {
            List<String> chosen = facets.entrySet().stream().filter(e -> e.getValue().get()).map(Map.Entry::getKey)
                    .toList();
            if (chosen.isEmpty()) {
                throw new IllegalArgumentException("tick at least one facet besides the candidates (e.g. rater)"
                        + " for many-facet Rasch measurement.");
            }
            List<String> pairs = java.util.Arrays.stream(biasPairs.get().split(",")).map(String::strip)
                    .filter(p -> !p.isEmpty()).toList();
            mfrm = RaschChoices.parse(chosen, structure.get(), pairs, biasEstimation.get(), MAX_ITERATIONS, List.of());
            args.add("--mfrm-facets");
            args.add(String.join(",", chosen));
            if (!structure.get().equals(RaschChoices.RATING_SCALE)) {
                args.add("--mfrm-structure");
                args.add(structure.get());
            }
            if (!pairs.isEmpty()) {
                args.add("--mfrm-bias");
                args.add(String.join(",", pairs));
            }
            if (!biasEstimation.get().equals("fixed")) {
                args.add("--mfrm-bias-estimation");
                args.add(biasEstimation.get());
            }
            anchorFile = Fields.path(anchors.get());
            add(args, "--mfrm-anchors", anchorFile);
        } else if (Fields.path(anchors.get()) != null) {
            throw new IllegalArgumentException("an anchor file fixes many-facet Rasch measures: switch many-facet"
                    + " Rasch measurement on, or clear the anchor file.");
        }
        return new AnalysisRun.Request(ratingsFile, Fields.path(candidates.get()), List.of(), List.of(), null, null,
                null, storeFile, examId, outFolder, options, mfrm, anchorFile, args);
    }

    private static void add(List<String> args, String option, Path file) {
        if (file != null) {
            args.add(option);
            args.add(file.toString());
        }
    }

    /**
     * Cancels a running analysis through its {@link Cancellation}: before the report moves into
     * place the cancel wins (the run stops at its next stage and writes nothing); once it is moving
     * the cancel is refused and the step says the report will be complete.
     */
    public void cancel() {
        Cancellation c = current;
        if (!running.get() || c == null) {
            return;
        }
        if (c.cancel()) {
            result.set("Cancelling: the analysis stops at the end of its current stage and writes nothing.");
        } else {
            cancelRefused = true;
            result.set("Too late to cancel: the report is already being moved into place; it will be complete.");
        }
    }
}
