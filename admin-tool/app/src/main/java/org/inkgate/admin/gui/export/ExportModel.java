package org.inkgate.admin.gui.export;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.function.IntConsumer;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.inkgate.admin.core.export.OutputFolder;
import org.inkgate.admin.core.export.StoreExport;
import org.inkgate.admin.core.export.XapiExport;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.gui.Work;
import org.inkgate.admin.study.PartialFolder;

/**
 * The export step: {@link StoreExport} for every exam in the store (or the one named) into the
 * chosen folder, as {@code inkgate-admin export}, run on the background worker with progress.
 */
public final class ExportModel {

    private final AdminSession session;
    private final StringProperty store = new SimpleStringProperty("");
    private final StringProperty folder = new SimpleStringProperty("");
    private final StringProperty examId = new SimpleStringProperty("");
    private final StringProperty xapiBase = new SimpleStringProperty(XapiExport.BASE);
    private final BooleanProperty xapiLight = new SimpleBooleanProperty(false);
    private final StringProperty written = new SimpleStringProperty("");
    private final BooleanProperty running = new SimpleBooleanProperty(false);
    /** Told on the worker as each part starts (exam index times parts, plus the part); tests hold a part here. */
    volatile IntConsumer partStarting = part -> { };

    public ExportModel(AdminSession session) {
        this.session = session;
        Fields.link(store, session.store());
        folder.set(session.besideExam("export").toString());
        session.examFolder().addListener((o, was, now) -> folder.set(session.besideExam("export").toString()));
    }

    public StringProperty store() {
        return store;
    }

    public StringProperty folder() {
        return folder;
    }

    /** Blank for every exam in the store. */
    public StringProperty examId() {
        return examId;
    }

    public StringProperty xapiBase() {
        return xapiBase;
    }

    public BooleanProperty xapiLight() {
        return xapiLight;
    }

    /** What was written (or why nothing was). */
    public StringProperty written() {
        return written;
    }

    /** True while this step's export runs: only it may be cancelled. */
    public BooleanProperty running() {
        return running;
    }

    /** Cancels a running export: it stops before its next part and nothing of it stays in the folder. */
    public void cancel() {
        if (running.get()) {
            session.work().cancel();
        }
    }

    /** Starts the export on the worker; the summary lands in {@link #written}. */
    public void export() {
        Path storeFile = Fields.path(store.get());
        Path out = Fields.path(folder.get());
        if (storeFile == null || !Files.isRegularFile(storeFile)) {
            written.set("There is no results store " + (storeFile == null ? "named" : "at " + storeFile)
                    + ". Collect first (step 4) or name the store file.");
            return;
        }
        if (out == null) {
            written.set("Name the folder to export into.");
            return;
        }
        String only = examId.get() == null || examId.get().isBlank() ? null : examId.get().strip();
        XapiExport.Options options = new XapiExport.Options(xapiBase.get().strip(), xapiLight.get());
        written.set("Exporting ...");
        running.set(true);
        IntConsumer watcher = partStarting;
        session.work().run("Export", progress -> run(storeFile, out, only, options, progress, watcher),
                lines -> {
                    running.set(false);
                    written.set(String.join("\n", lines));
                },
                problem -> {
                    running.set(false);
                    written.set("The export stopped: " + problem + "\nNothing of this export was put into " + out
                            + "; files of earlier exports there are as they were.");
                },
                () -> {
                    running.set(false);
                    written.set("Cancelled. Nothing of this export was put into " + out
                            + "; files of earlier exports there are as they were.");
                });
    }

    /**
     * Every exam is written into a hidden folder beside {@code out} and moved in only when all are
     * complete ({@link PartialFolder}, as the analysis report), so a cancelled or failed export leaves nothing behind.
     */
    private static List<String> run(Path storeFile, Path out, String only, XapiExport.Options options,
            Work.Progress progress, IntConsumer watcher) throws Exception {
        List<String> lines = new ArrayList<>();
        try (ResultsStore s = Stores.openResultsForReading(StoreLocation.file(storeFile))) {
            List<String> exams = StoreExport.exams(s, only);
            if (exams.isEmpty()) {
                lines.add("The store holds no exam yet. Collect first (step 4).");
            } else {
                try {
                    PartialFolder.write(out, partial -> writeAll(storeFile, s, exams, partial, out, options, progress,
                            watcher, lines), progress::cancelled);
                } catch (StoreFailure f) {
                    throw f.store;
                }
            }
        }
        lines.add(StoreExport.HANDLING);
        return lines;
    }

    /** The store's exams into {@code partial}; the summary lines name their folders in {@code out}. */
    private static void writeAll(Path storeFile, ResultsStore s, List<String> exams, Path partial, Path out,
            XapiExport.Options options, Work.Progress progress, IntConsumer watcher, List<String> lines)
            throws java.io.IOException {
        int parts = StoreExport.PARTS.size();
        for (int i = 0; i < exams.size(); i++) {
            String id = exams.get(i);
            int done = i * parts;
            StoreExport.Written w;
            try {
                w = StoreExport.write(storeFile, s, id, partial, options, part -> {
                    progress.update(done + part, (long) exams.size() * parts, "Exporting " + id + ": "
                            + StoreExport.PARTS.get(part));
                    watcher.accept(done + part);
                    if (progress.cancelled()) {
                        throw new CancellationException("export cancelled before " + StoreExport.PARTS.get(part));
                    }
                });
            } catch (StoreException e) {
                throw new StoreFailure(e);
            }
            lines.addAll(moved(w, OutputFolder.file(out, id)).lines());
        }
        progress.update(exams.size() * parts, (long) exams.size() * parts, "Moving the export into " + out);
    }

    /** Carries a store failure through {@link PartialFolder.Contents}, which may throw only IOException. */
    private static final class StoreFailure extends java.io.IOException {
        private final transient StoreException store;

        StoreFailure(StoreException store) {
            super(store.getMessage(), store);
            this.store = store;
        }
    }

    /** The summary names the folder the files end up in, not the hidden one they were written to. */
    private static StoreExport.Written moved(StoreExport.Written w, Path folder) {
        return new StoreExport.Written(w.examId(), folder, w.responses(), w.toolUse(), w.events(), w.questionnaire(),
                w.qti(), w.xapi(), w.xapiLight(), w.conflicts());
    }
}
