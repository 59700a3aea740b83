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

        /** True once the test owner cancelled the job; a job that can stop checks it between its parts. */
        default boolean cancelled() {
            return false;
        }
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
    private Task<?> current;

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
        run(what, job, done, failed, () -> failed.accept(what + " was cancelled."));
    }

    /**
     * As {@link #run(String, Job, Consumer, Consumer)}, for a job that stops when cancelled:
     * {@code cancelled} is called on the JavaFX thread at once when {@link #cancel} stops it, or
     * when the job itself ends by throwing {@link java.util.concurrent.CancellationException} (a job
     * with its own cancel decision, such as the export, whose Cancel must not win once its files
     * are being moved into place).
     */
    public <T> void run(String what, Job<T> job, Consumer<T> done, Consumer<String> failed, Runnable cancelled) {
        Task<T> task = new Task<>() {
            @Override
            protected T call() throws Exception {
                updateMessage(what + " ...");
                Task<T> self = this;
                return job.run(new Progress() {
                    @Override
                    public void update(long d, long total, String m) {
                        updateProgress(d, total);
                        updateMessage(m);
                    }

                    @Override
                    public boolean cancelled() {
                        return self.isCancelled();
                    }
                });
            }
        };
        current = task;
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
            if (task.getException() instanceof java.util.concurrent.CancellationException) {
                // a job cancelled through its own token (export: core's Cancellation) stops by throwing,
                // after it has removed what it wrote aside: only now is it reported as cancelled
                finish(what + ": cancelled.");
                cancelled.run();
                return;
            }
            String text = Messages.of(task.getException());
            finish(what + ": failed. " + firstLine(text));
            failed.accept(text);
        });
        task.setOnCancelled(e -> {
            finish(what + ": cancelled.");
            cancelled.run();
        });
        executor.execute(task);
    }

    /**
     * Asks the running job to stop. Only jobs that check {@link Progress#cancelled} offer this:
     * the job stops at its next check and writes nothing more.
     */
    public void cancel() {
        Task<?> task = current;
        if (task != null && !task.isDone()) {
            task.cancel(false);
        }
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
