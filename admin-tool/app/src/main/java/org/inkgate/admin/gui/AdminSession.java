package org.inkgate.admin.gui;

import java.nio.file.Path;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.inkgate.admin.core.source.ExamSource;

/**
 * What the steps share: the exam folder and the files each step writes for the next (assignment,
 * bundle, results store), so a test owner walks from one step to the next without retyping.
 */
public final class AdminSession {

    private final ObjectProperty<Path> examFolder = new SimpleObjectProperty<>();
    private final ObjectProperty<ExamSource> exam = new SimpleObjectProperty<>();
    private final ObjectProperty<Path> roster = new SimpleObjectProperty<>();
    private final ObjectProperty<Path> assignment = new SimpleObjectProperty<>();
    private final ObjectProperty<Path> bundle = new SimpleObjectProperty<>();
    private final ObjectProperty<Path> keys = new SimpleObjectProperty<>();
    private final StringProperty store = new SimpleStringProperty("");
    private final StringProperty storePasswordFile = new SimpleStringProperty("");
    private final Work work = new Work();
    private java.util.function.Consumer<String> browser;

    /** The exam folder as chosen (checked or not). */
    public ObjectProperty<Path> examFolder() {
        return examFolder;
    }

    /** The exam source as last checked without problems; null until then. */
    public ObjectProperty<ExamSource> exam() {
        return exam;
    }

    public ObjectProperty<Path> roster() {
        return roster;
    }

    public ObjectProperty<Path> assignment() {
        return assignment;
    }

    public ObjectProperty<Path> bundle() {
        return bundle;
    }

    public ObjectProperty<Path> keys() {
        return keys;
    }

    /** The results store as typed: a file, or a PostgreSQL store's address (see {@link StoreField}). */
    public StringProperty store() {
        return store;
    }

    /**
     * The password file of a PostgreSQL store, one for every step; blank: PGPASSWORD, PGPASSFILE,
     * ~/.pgpass. Only the file's path is kept, never the password.
     */
    public StringProperty storePasswordFile() {
        return storePasswordFile;
    }

    /** Opens a file: URI in the system browser; set by the application (HostServices), null in tests that do not. */
    public void browser(java.util.function.Consumer<String> opener) {
        this.browser = opener;
    }

    /** The system browser, or null when the window was started without one. */
    public java.util.function.Consumer<String> browser() {
        return browser;
    }

    public Work work() {
        return work;
    }

    /** A file beside the exam folder (where the steps suggest writing their output), or just the name. */
    public Path besideExam(String name) {
        Path folder = examFolder.get();
        Path parent = folder == null ? null : folder.toAbsolutePath().getParent();
        return parent == null ? Path.of(name) : parent.resolve(name);
    }
}
