package org.inkgate.client.task;

import java.util.Objects;
import org.inkgate.client.sitting.ProcessLog;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.packs.broker.TaskTools;

/**
 * Everything a task workspace is built from.
 *
 * @param task          the task as the bundle states it
 * @param promptMarkdown the prompt text (Markdown)
 * @param tools         the tools the broker constructed for this task's policy, and only those
 * @param log           where the workspace records text changes and tool use
 * @param startText     the answer so far (empty for a new task, the recovered text after a restart)
 * @param startCaret    where the caret goes
 * @param display       the candidate's display accommodations
 */
public record TaskContext(TaskSpec task, String promptMarkdown, TaskTools tools, ProcessLog log, String startText,
        int startCaret, DisplaySettings display) {

    public TaskContext {
        Objects.requireNonNull(task, "task");
        Objects.requireNonNull(tools, "tools");
        Objects.requireNonNull(log, "log");
        startText = Objects.requireNonNullElse(startText, "");
        Objects.requireNonNull(display, "display");
    }
}
