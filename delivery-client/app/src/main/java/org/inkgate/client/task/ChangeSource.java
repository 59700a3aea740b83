package org.inkgate.client.task;

/** Where a change to the answer came from, as the process log's {@code source} field names it. */
enum ChangeSource {
    TYPING("typing"),
    PASTE("paste"),
    PANEL("panel"),
    SUGGESTION("suggestion"),
    UNDO("undo"),
    REDO("redo");

    private final String wire;

    ChangeSource(String wire) {
        this.wire = wire;
    }

    /** The value written to the log. */
    String wire() {
        return wire;
    }
}
