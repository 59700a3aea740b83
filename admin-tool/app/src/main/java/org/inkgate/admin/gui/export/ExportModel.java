package org.inkgate.admin.gui.export;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.inkgate.admin.core.export.StoreExport;
import org.inkgate.admin.core.export.XapiExport;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.gui.Work;

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
        written.set("");
        session.work().run("Export", progress -> run(storeFile, out, only, options, progress),
                lines -> written.set(String.join("\n", lines)),
                problem -> written.set("The export stopped: " + problem + "\nFiles already written in " + out
                        + " may be incomplete; export again into an empty folder."));
    }

    private static List<String> run(Path storeFile, Path out, String only, XapiExport.Options options,
            Work.Progress progress) throws Exception {
        List<String> lines = new ArrayList<>();
        try (ResultsStore s = Stores.openResults(StoreLocation.file(storeFile))) {
            List<String> exams = StoreExport.exams(s, only);
            int parts = StoreExport.PARTS.size();
            for (int i = 0; i < exams.size(); i++) {
                String id = exams.get(i);
                int done = i * parts;
                lines.addAll(StoreExport.write(storeFile, s, id, out, options, part -> progress.update(done + part,
                        (long) exams.size() * parts, "Exporting " + id + ": " + StoreExport.PARTS.get(part))).lines());
            }
            if (exams.isEmpty()) {
                lines.add("The store holds no exam yet. Collect first (step 4).");
            }
        }
        lines.add(StoreExport.HANDLING);
        return lines;
    }
}
