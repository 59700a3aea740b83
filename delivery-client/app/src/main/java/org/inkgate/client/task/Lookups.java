package org.inkgate.client.task;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import java.util.function.Supplier;
import javafx.application.Platform;

/**
 * Runs the panel's glossary and dictionary work on one background thread, so a lookup never
 * holds up typing, and hands results back on the JavaFX thread. Each {@link Channel} keeps only
 * its newest request: an answer to an older one is still logged (the lookup happened) but not shown.
 */
final class Lookups implements AutoCloseable {

    private final ExecutorService worker;

    Lookups(String taskId) {
        worker = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "inkgate-panel-" + taskId);
            t.setDaemon(true);
            return t;
        });
    }

    /** One stream of requests whose answers replace each other (a search box, an entry view). */
    final class Channel {
        private final AtomicLong newest = new AtomicLong();
        private final Consumer<RuntimeException> failed;

        Channel(Consumer<RuntimeException> failed) {
            this.failed = failed;
        }

        /**
         * Runs {@code work} off the JavaFX thread; then, on the JavaFX thread, always calls
         * {@code logged} and calls {@code shown} only if no newer request came in meanwhile.
         */
        <T> void submit(Supplier<T> work, Consumer<T> logged, Consumer<T> shown) {
            long mine = newest.incrementAndGet();
            try {
                worker.execute(() -> {
                    T value;
                    try {
                        value = work.get();
                    } catch (RuntimeException e) {
                        Platform.runLater(() -> {
                            if (newest.get() == mine) {
                                failed.accept(e);
                            }
                        });
                        return;
                    }
                    Platform.runLater(() -> {
                        logged.accept(value);
                        if (newest.get() == mine) {
                            shown.accept(value);
                        }
                    });
                });
            } catch (RejectedExecutionException closed) {
                // the workspace is closed: nothing more is looked up
            }
        }

        /** Forgets every request still running (their answers are logged, not shown). */
        void cancel() {
            newest.incrementAndGet();
        }
    }

    /** A channel whose failures (a pack that cannot be read) go to {@code failed}, on the JavaFX thread. */
    Channel channel(Consumer<RuntimeException> failed) {
        return new Channel(failed);
    }

    /**
     * Stops taking requests and lets a lookup under way finish (briefly), so the packs can be closed
     * after it; no interrupt, which could close a Lucene file channel mid-read.
     */
    @Override
    public void close() {
        worker.shutdown();
        try {
            worker.awaitTermination(2, java.util.concurrent.TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
