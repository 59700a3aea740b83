package org.inkgate.analysis.data;

/**
 * One event of the writing-process log of a response. Types: {@code task.start}, {@code task.end}
 * (the task's bounds), {@code text.insert} (text inserted at position), {@code text.delete} (text
 * removed from position; text = the removed characters), {@code panel.open}, {@code panel.close}
 * (keyboard focus went into or left the resource panel, on a tool's page), {@code tool.query} (text = the word
 * or phrase looked up). The names are those of the response format's process log; the admin tool
 * maps a results store onto them in one place. Time in milliseconds from any fixed origin.
 */
public record ProcessEvent(String candidate, String task, long timeMs, Type type, int position, String text) {

    /** The event types the measures use. */
    public enum Type {
        TASK_START("task.start"), TASK_END("task.end"), INSERT("text.insert"), DELETE("text.delete"),
        PANEL_OPEN("panel.open"), PANEL_CLOSE("panel.close"), TOOL_QUERY("tool.query");

        private final String name;

        Type(String name) {
            this.name = name;
        }

        public String logName() {
            return name;
        }

        static Type parse(String s) {
            for (Type t : values()) {
                if (t.name.equals(s)) {
                    return t;
                }
            }
            return null;
        }
    }
}
