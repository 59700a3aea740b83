package org.inkgate.admin.gui.export;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.application.Platform;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.DoubleProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleDoubleProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.inkgate.admin.core.export.Cancellation;
import org.inkgate.admin.core.export.StoreExport;
import org.inkgate.admin.core.export.XapiExport;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.StoreField;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.gui.Work;

/**
 * The export step: {@link StoreExport} for every exam in the store (or the one named) into the
 * chosen folder, as {@code inkgate-admin export}, run on the background worker. Its progress is
 * the core's own steps (each part of each exam, then the move into place); Cancel goes through the
 * core's {@link Cancellation}, so it either wins before the files move (nothing is put into the
 * folder) or is refused once they are moving (the export completes and says so).
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
    private final DoubleProperty progress = new SimpleDoubleProperty(0);
    private final StringProperty step = new SimpleStringProperty("");
    /** The note of an earlier, killed export that this one finished first; empty when none. */
    private final StringProperty earlier = new SimpleStringProperty("");
    private volatile Cancellation current;
    private boolean cancelRefused;
    /** Told on the worker with the core's progress and commit-point moments; tests press Cancel there. */
    volatile StoreExport.Progress watch = StoreExport.Progress.NONE;

    public ExportModel(AdminSession session) {
        this.session = session;
        StoreField.link(store, session.store());
        folder.set(session.besideExam("export").toString());
        session.examFolder().addListener((o, was, now) -> folder.set(session.besideExam("export").toString()));
    }

    public StringProperty store() {
        return store;
    }

    /** The password file of a PostgreSQL store, shared by the steps. */
    public StringProperty storePasswordFile() {
        return session.storePasswordFile();
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

    /** How far the running export is, 0 to 1 (the core's steps done out of all). */
    public DoubleProperty progress() {
        return progress;
    }

    /** The step in hand ("EXAM: QTI results", "moving the files into FOLDER"), blank when idle. */
    public StringProperty step() {
        return step;
    }

    /**
     * Cancels a running export. Before its files move into the folder the cancel wins: the export
     * stops at its next step and removes what it wrote aside. Once they are moving it is refused,
     * and the test owner is told the export will complete.
     */
    public void cancel() {
        Cancellation c = current;
        if (!running.get() || c == null) {
            return;
        }
        if (c.cancel()) {
            written.set("Cancelling: the export stops at its next step and removes what it wrote aside.");
        } else {
            cancelRefused = true;
            written.set("Too late to cancel: the files are already being moved into " + folder.get()
                    + ". The export completes; what it wrote is shown when it is done.");
        }
    }

    /** Starts the export on the worker; the summary lands in {@link #written}. */
    public void export() {
        Path out = Fields.path(folder.get());
        StoreLocation storeFile;
        try {
            storeFile = StoreField.existing(store.get(), session.storePasswordFile().get());
        } catch (StoreException e) {
            written.set(e.getMessage());
            return;
        }
        if (out == null) {
            written.set("Name the folder to export into.");
            return;
        }
        String only = examId.get() == null || examId.get().isBlank() ? null : examId.get().strip();
        XapiExport.Options options = new XapiExport.Options(xapiBase.get().strip(), xapiLight.get());
        Cancellation cancellation = new Cancellation();
        current = cancellation;
        cancelRefused = false;
        written.set("Exporting ...");
        earlier.set("");
        progress.set(0);
        step.set("");
        running.set(true);
        StoreExport.Progress watcher = watch;
        session.work().run("Export", work -> run(storeFile, out, only, options, shown(work, watcher), cancellation),
                lines -> {
                    idle();
                    List<String> shownLines = new ArrayList<>(lines);
                    if (!earlier.get().isEmpty()) {
                        shownLines.add(0, earlier.get());
                    }
                    if (cancelRefused) {
                        shownLines.add(0, "Cancel came too late: the files were already being moved into place."
                                + " The export is complete:");
                    }
                    written.set(String.join("\n", shownLines));
                },
                problem -> {
                    idle();
                    written.set("The export stopped: " + problem + "\nNothing of this export was put into " + out
                            + "; files of earlier exports there are as they were.");
                },
                () -> {
                    idle();
                    written.set("Cancelled. Nothing of this export was put into " + out
                            + "; files of earlier exports there are as they were.");
                });
    }

    private void idle() {
        running.set(false);
        current = null;
        step.set("");
    }

    /** The core's progress, shown in this step and the status bar, and told to {@code watcher}. */
    private StoreExport.Progress shown(Work.Progress work, StoreExport.Progress watcher) {
        return new StoreExport.Progress() {
            @Override
            public void step(long done, long total, String what) {
                work.update(done, total, "Export: " + what);
                Platform.runLater(() -> {
                    progress.set(total <= 0 ? 0 : (double) done / total);
                    step.set(what);
                });
                watcher.step(done, total, what);
            }

            @Override
            public void beforePublish() {
                watcher.beforePublish();
            }

            @Override
            public void publishing() {
                watcher.publishing();
            }

            @Override
            public void earlierRunFinished(String note) {
                Platform.runLater(() -> earlier.set(note));
                watcher.earlierRunFinished(note);
            }
        };
    }

    private static List<String> run(StoreLocation storeFile, Path out, String only, XapiExport.Options options,
            StoreExport.Progress progress, Cancellation cancellation) throws Exception {
        List<String> lines = new ArrayList<>();
        try (ResultsStore s = Stores.openResultsForReading(storeFile)) {
            List<String> exams = StoreExport.exams(s, only);
            if (exams.isEmpty()) {
                lines.add("The store holds no exam yet. Collect first (step 4).");
            } else {
                for (StoreExport.Written w : StoreExport.write(storeFile, s, exams, out, options, false, progress,
                        cancellation)) {
                    lines.addAll(w.lines());
                }
            }
        }
        lines.add(StoreExport.HANDLING);
        return lines;
    }
}
