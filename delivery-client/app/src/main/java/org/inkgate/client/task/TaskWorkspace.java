package org.inkgate.client.task;

import java.util.Map;
import javafx.scene.Parent;
import org.inkgate.format.response.ToolUse;
import org.inkgate.packs.policy.Tool;

/**
 * One task on screen: the prompt, the answer editor and, when the task's policy offers any tool,
 * the resource panel. The sitting flow owns timing and navigation; the workspace owns the text,
 * the tools and the events they produce, which it records in the context's process log.
 */
public interface TaskWorkspace extends AutoCloseable {

    /** The node to show. */
    Parent view();

    /** The answer as it stands. */
    String text();

    /** The caret position in {@link #text()}. */
    int caret();

    /** Words in the answer, counted as the candidate sees them. */
    int wordCount();

    /**
     * Freezes or unfreezes the workspace: while frozen (pause, time up, invigilator ending the
     * task) the text cannot change and the panel answers nothing.
     */
    void setFrozen(boolean frozen);

    /** Moves keyboard focus into the editor. */
    void focusEditor();

    /** Use of each offered tool so far; tools not offered never appear. */
    Map<Tool, ToolUse> toolUse();

    /** Releases the task's tools; the workspace is not used again. */
    @Override
    void close();
}
