package org.inkgate.admin.gui;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.Consumer;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.DoubleProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleDoubleProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.concurrent.Task;

/**
 * Runs long steps (bundle, collect) on one background thread so the window never freezes, and
 * publishes their progress as properties the status bar binds to. One job at a time: the steps
 * disable their buttons while {@link #busy} is true.
 */
public final class Work {

    /** Lets a job report how far it is; safe to call from the background thread. */
    public interface Progress {
        void update(long done, long total, String message);
    }

    /** A job run off the JavaFX thread. */
    public interface Job<T> {
        T run(Progress progress) throws Exception;
    }

    private final ExecutorService executor = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "inkgate-admin-work");
        t.setDaemon(true);
        return t;
    });
    private final BooleanProperty busy = new SimpleBooleanProperty(false);
    private final DoubleProperty progress = new SimpleDoubleProperty(0);
    private final StringProperty message = new SimpleStringProperty("Ready.");

    public BooleanProperty busy() {
        return busy;
    }

    public DoubleProperty progress() {
        return progress;
    }

    public StringProperty message() {
        return message;
    }

    /**
     * Runs {@code job}; on success {@code done} gets its result, on failure {@code failed} gets a
     * message for people (never a stack trace). Both are called on the JavaFX thread.
     */
    public <T> void run(String what, Job<T> job, Consumer<T> done, Consumer<String> failed) {
        Task<T> task = new Task<>() {
            @Override
            protected T call() throws Exception {
                updateMessage(what + " ...");
                return job.run((d, total, m) -> {
                    updateProgress(d, total);
                    updateMessage(m);
                });
            }
        };
        busy.set(true);
        progress.unbind();
        message.unbind();
        progress.bind(task.progressProperty());
        message.bind(task.messageProperty());
        task.setOnSucceeded(e -> {
            finish(what + ": done.");
            done.accept(task.getValue());
        });
        task.setOnFailed(e -> {
            String text = Messages.of(task.getException());
            finish(what + ": failed. " + firstLine(text));
            failed.accept(text);
        });
        executor.execute(task);
    }

    private void finish(String text) {
        progress.unbind();
        message.unbind();
        progress.set(0);
        message.set(text);
        busy.set(false);
    }

    private static String firstLine(String text) {
        int nl = text.indexOf('\n');
        return nl < 0 ? text : text.substring(0, nl);
    }
}
