package org.inkgate.client.sitting.ui;

import org.inkgate.client.task.TaskWorkspaces;

/** The workspace factory the real sitting uses. */
public final class Workspaces {

    private Workspaces() {
    }

    /** The task workspace of {@code org.inkgate.client.task}: the answer editor and the resource panel. */
    public static WorkspaceFactory standard() {
        return TaskWorkspaces::open;
    }
}
