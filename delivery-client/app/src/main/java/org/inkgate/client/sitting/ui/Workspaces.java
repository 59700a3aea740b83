package org.inkgate.client.sitting.ui;

/** The workspace factory the real sitting uses. */
public final class Workspaces {

    private Workspaces() {
    }

    /** The task workspace of {@code org.inkgate.client.task} (editor and resource panel). */
    public static WorkspaceFactory standard() {
        // PENDING: wired to i4-task's workspace when that branch is merged
        return context -> {
            throw new UnsupportedOperationException("the task workspace is not in this build yet");
        };
    }
}
