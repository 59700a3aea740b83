package org.inkgate.client.task;

import java.util.Objects;

/**
 * Makes the task workspace of a sitting. Call on the JavaFX application thread. The workspace
 * offers exactly the tools in the context's {@code TaskTools} (which the broker built from the
 * task's policy) and records the candidate's writing and tool use in the context's process log.
 * {@code task.start} and {@code task.end} are the sitting flow's to record.
 */
public final class TaskWorkspaces {

    private TaskWorkspaces() {
    }

    /** A workspace on the system clipboard. */
    public static TaskWorkspace open(TaskContext context) {
        return new WritingWorkspace(Objects.requireNonNull(context, "context"), ClipboardAccess.system());
    }

    /** A workspace on the given clipboard (tests). */
    static WritingWorkspace open(TaskContext context, ClipboardAccess clipboard) {
        return new WritingWorkspace(Objects.requireNonNull(context, "context"), clipboard);
    }
}
