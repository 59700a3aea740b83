package org.inkgate.client.sitting.ui;

import org.inkgate.client.task.TaskContext;
import org.inkgate.client.task.TaskWorkspace;

/** Builds the workspace a task is written in; the sitting flow hosts whatever it returns. */
@FunctionalInterface
public interface WorkspaceFactory {

    /** The workspace for this task; it owns the context's tools from now on and closes them. */
    TaskWorkspace create(TaskContext context);
}
