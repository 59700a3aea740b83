package org.inkgate.client.sitting.course;

import java.util.Map;
import org.inkgate.format.response.ToolUse;
import org.inkgate.packs.policy.Tool;

/** A task's answer as it stands when the task ends: text, words counted as the candidate saw them, tool use. */
public record TaskAnswer(String text, int words, Map<Tool, ToolUse> toolUse) {
    public TaskAnswer {
        toolUse = Map.copyOf(toolUse);
    }
}
