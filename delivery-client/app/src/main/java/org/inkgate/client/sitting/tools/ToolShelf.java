package org.inkgate.client.sitting.tools;

import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import org.inkgate.packs.broker.ResourceBroker;
import org.inkgate.packs.broker.TaskTools;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.spelling.EnglishVariant;

/**
 * Prepares each task's tools while the candidate reads the instructions: the broker's
 * {@code toolsFor} once per task (only the tools the task's policy allows are built) on one
 * background thread, then the spelling engine's warm-up on the engine's own thread. A task's
 * tools are handed out as soon as they are built, not after the warm-up, so the editor is
 * typable at once; the first checks simply wait behind the warm-up. A task takes its tools
 * once; tools never taken are closed with the shelf.
 */
public final class ToolShelf implements AutoCloseable {

    /** What one task needs its tools for. */
    public record Order(String taskId, ResourcePolicy policy, Collection<String> examWords) {
    }

    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "inkgate-tool-warm-up");
        t.setDaemon(true);
        return t;
    });
    private final Map<String, CompletableFuture<TaskTools>> shelf = new LinkedHashMap<>();
    private final List<CompletableFuture<TaskTools>> untaken = new ArrayList<>();
    private final List<CompletableFuture<Void>> warmUps = new ArrayList<>();

    /** Starts preparing every task's tools, in the form's order. */
    public ToolShelf(ResourceBroker broker, EnglishVariant variant, List<Order> orders) {
        Objects.requireNonNull(broker, "broker");
        for (Order order : orders) {
            CompletableFuture<TaskTools> tools = CompletableFuture.supplyAsync(() -> {
                try {
                    return broker.toolsFor(order.policy(), variant, order.examWords());
                } catch (org.inkgate.packs.pack.PackRefusal e) {
                    throw new ToolsNotReady(order.taskId(), e.getMessage(), e);
                }
            }, worker);
            shelf.put(order.taskId(), tools);
            untaken.add(tools);
            warmUps.add(tools.thenCompose(built -> built.spelling()
                    .map(checker -> checker.warmUp())
                    .orElse(CompletableFuture.completedFuture(null))));
        }
    }

    /** All tools are built and warmed up (or failed). */
    public CompletableFuture<Void> allReady() {
        return CompletableFuture.allOf(warmUps.toArray(CompletableFuture[]::new)).exceptionally(e -> null);
    }

    /**
     * The task's tools, when ready; the caller owns them from then on (the workspace closes them).
     *
     * @throws IllegalStateException for a task not ordered, or taken before
     */
    public synchronized CompletableFuture<TaskTools> take(String taskId) {
        CompletableFuture<TaskTools> tools = shelf.remove(taskId);
        if (tools == null) {
            throw new IllegalStateException("no tools were prepared for task \"" + taskId + "\", or they were taken");
        }
        untaken.remove(tools);
        return tools;
    }

    /** Closes the tools no task took, and stops the worker. */
    @Override
    public synchronized void close() {
        for (CompletableFuture<TaskTools> tools : untaken) {
            tools.thenAccept(TaskTools::close);
        }
        untaken.clear();
        shelf.clear();
        worker.shutdown();
    }

    /** A task's tools could not be built: a pack is missing, damaged or of the wrong kind. */
    public static final class ToolsNotReady extends RuntimeException {
        private static final long serialVersionUID = 1L;

        ToolsNotReady(String taskId, String message, Throwable cause) {
            super("the writing tools of task \"" + taskId + "\" could not be prepared: " + message, cause);
        }
    }
}
