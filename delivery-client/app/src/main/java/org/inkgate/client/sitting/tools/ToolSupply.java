package org.inkgate.client.sitting.tools;

import java.io.IOException;
import java.util.concurrent.CompletableFuture;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.packs.broker.TaskTools;

/**
 * Where a sitting's task tools come from: prepared for the candidate's form while the
 * instructions show, taken once per task. The sitting's course asks for them; the live client
 * serves them from the bundle's packs ({@link BundleToolSupply}), tests from a stand-in.
 */
public interface ToolSupply extends AutoCloseable {

    /**
     * Starts preparing every task's tools of the form, unless a form's tools are being prepared
     * already; completes when all are ready (or failed: {@link #take} then says why).
     *
     * @throws IOException when the bundle's packs cannot be unpacked
     */
    CompletableFuture<Void> prepare(FormSpec form) throws IOException;

    /** Whether a form's tools are being prepared or ready. */
    boolean started();

    /** The task's tools, when ready; the caller owns them from then on. */
    CompletableFuture<TaskTools> take(String taskId);

    /** Puts away the candidate's tools not taken (the next candidate's are prepared anew). */
    void clear();

    /** Closes everything, the packs too. */
    @Override
    void close();
}
