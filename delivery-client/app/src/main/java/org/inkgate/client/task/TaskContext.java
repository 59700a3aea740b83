package org.inkgate.client.task;

import java.util.List;
import java.util.Objects;
import org.inkgate.client.processlog.ProcessLog;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.response.ProcessEvent;
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
 * @param loggedBefore  the task's events logged before a restart (empty for a new task): the tool use
 *                      they record is counted on, not lost
 */
public record TaskContext(TaskSpec task, String promptMarkdown, TaskTools tools, ProcessLog log, String startText,
        int startCaret, DisplaySettings display, List<ProcessEvent> loggedBefore) {

    /** A task begun afresh: nothing logged before. */
    public TaskContext(TaskSpec task, String promptMarkdown, TaskTools tools, ProcessLog log, String startText,
            int startCaret, DisplaySettings display) {
        this(task, promptMarkdown, tools, log, startText, startCaret, display, List.of());
    }

    public TaskContext {
        Objects.requireNonNull(task, "task");
        Objects.requireNonNull(tools, "tools");
        Objects.requireNonNull(log, "log");
        startText = Objects.requireNonNullElse(startText, "");
        Objects.requireNonNull(display, "display");
        loggedBefore = List.copyOf(Objects.requireNonNullElse(loggedBefore, List.of()));
    }
}
