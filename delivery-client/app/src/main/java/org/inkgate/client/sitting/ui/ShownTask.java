package org.inkgate.client.sitting.ui;

import org.inkgate.client.sitting.course.CourseView;
import org.inkgate.client.sitting.course.TaskAnswer;
import org.inkgate.client.sitting.ui.screen.TaskScreen;
import org.inkgate.client.task.TaskWorkspace;

/** A task's workspace and screen, as the course sees it. */
final class ShownTask implements CourseView.TaskPage {
    private final TaskWorkspace workspace;
    private final TaskScreen screen;

    ShownTask(TaskWorkspace workspace, TaskScreen screen) {
        this.workspace = workspace;
        this.screen = screen;
    }

    /** The task's workspace, for the flow's focus handling. */
    TaskWorkspace workspace() {
        return workspace;
    }

    @Override
    public TaskAnswer answer() {
        return new TaskAnswer(workspace.text(), workspace.wordCount(), workspace.toolUse());
    }

    @Override
    public void setFrozen(boolean frozen) {
        workspace.setFrozen(frozen);
        screen.frozen(frozen);
    }

    @Override
    public void focusEditor() {
        workspace.focusEditor();
    }

    @Override
    public void close() {
        workspace.close();
    }
}
