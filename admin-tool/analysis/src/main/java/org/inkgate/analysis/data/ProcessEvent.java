package org.inkgate.analysis.data;

/**
 * One event of the writing-process log of a response. Types: {@code text.insert} (text inserted
 * at position), {@code text.delete} (text removed from position; text = the removed characters),
 * {@code tool.open}, {@code tool.close} (the resource panel), {@code tool.query} (text = the
 * word or phrase looked up). Time in milliseconds from any fixed origin.
 */
public record ProcessEvent(String candidate, String task, long timeMs, Type type, int position, String text) {

    /** The event types the measures use. */
    public enum Type {
        INSERT("text.insert"), DELETE("text.delete"), TOOL_OPEN("tool.open"), TOOL_CLOSE("tool.close"),
        TOOL_QUERY("tool.query");

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
