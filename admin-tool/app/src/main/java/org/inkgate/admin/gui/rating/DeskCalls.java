package org.inkgate.admin.gui.rating;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.function.Consumer;
import javafx.application.Platform;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.SimpleIntegerProperty;

/**
 * Runs every call to the rating store on one background thread, in the order they were made, so
 * the window never waits on the disk and a draft saved before a submission is written before it.
 * Results and failures come back on the JavaFX thread.
 */
final class DeskCalls implements AutoCloseable {

    /** A call to the store, run off the JavaFX thread. */
    interface Call<T> {
        T run() throws Exception;
    }

    private final ExecutorService executor = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "inkgate-rating-desk");
        t.setDaemon(true);
        return t;
    });
    private final IntegerProperty pending = new SimpleIntegerProperty(0);

    /** Calls queued or running; 0 when everything asked for has been written or read. */
    ReadOnlyIntegerProperty pending() {
        return pending;
    }

    /** Queues {@code call}; {@code done} or {@code failed} (with the exception) runs on the JavaFX thread. Call on the JavaFX thread. */
    <T> void run(Call<T> call, Consumer<T> done, Consumer<Exception> failed) {
        pending.set(pending.get() + 1);
        executor.execute(() -> {
            T value = null;
            Exception failure = null;
            try {
                value = call.run();
            } catch (Exception e) {
                failure = e;
            }
            T result = value;
            Exception error = failure;
            Platform.runLater(() -> {
                pending.set(pending.get() - 1);
                if (error == null) {
                    done.accept(result);
                } else {
                    failed.accept(error);
                }
            });
        });
    }

    /** Lets queued calls finish (drafts reach the store), then stops the thread. */
    @Override
    public void close() {
        executor.shutdown();
        try {
            // a draft write is one small transaction; waiting lets the last change reach the disk
            executor.awaitTermination(10, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
