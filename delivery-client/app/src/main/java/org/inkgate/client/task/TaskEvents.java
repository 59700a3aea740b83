package org.inkgate.client.task;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import org.inkgate.client.processlog.ProcessLog;
import org.inkgate.format.response.EventType;
import org.inkgate.packs.event.ToolEvent;
import org.inkgate.packs.policy.Tool;

/** The workspace's door to the process log: one task's events, with the data keys of its {@link EventType}. */
final class TaskEvents {

    private final ProcessLog log;
    private final String taskId;
    private final ToolTally tally;

    /** Events of one task; every event recorded is also counted in the tally (the one counting rule). */
    TaskEvents(ProcessLog log, String taskId, ToolTally tally) {
        this.log = Objects.requireNonNull(log, "log");
        this.taskId = Objects.requireNonNull(taskId, "taskId");
        this.tally = Objects.requireNonNull(tally, "tally");
    }

    /** Records an event with fields given as name, value, name, value... in the order written. */
    void record(EventType type, Object... nameValue) {
        if (nameValue.length % 2 != 0) {
            throw new IllegalArgumentException("fields come in name/value pairs: " + nameValue.length + " given for " + type);
        }
        Map<String, Object> data = new LinkedHashMap<>();
        for (int k = 0; k < nameValue.length; k += 2) {
            data.put((String) nameValue[k], nameValue[k + 1]);
        }
        log.record(type, taskId, data);
        tally.count(type, data);
    }

    void snapshot(String text, int caret) {
        log.snapshot(taskId, text, caret);
    }

    /** A lookup, an opened entry or a check, as the resource engines reported it. */
    void tool(ToolEvent e) {
        switch (e.action()) {
            case QUERY -> record(EventType.TOOL_QUERY, "tool", wire(e.tool()), "pack", e.packId(), "query", e.query(),
                    "hits", e.hitCount(), "micros", e.elapsedMicros());
            case OPEN_ENTRY -> record(EventType.TOOL_OPEN, "tool", wire(e.tool()), "pack", e.packId(), "entry", e.entryId());
            case CHECK -> record(EventType.CHECK_RUN, "issues", e.hitCount(), "micros", e.elapsedMicros());
            case IGNORE_WORD -> throw new IllegalArgumentException("an ignored word is logged with its rule: use ignored(...)");
        }
    }

    /** The name a tool has in the log and in response packages ({@code spelling}, {@code glossary}...). */
    static String wire(Tool tool) {
        return tool.name().toLowerCase(Locale.ROOT);
    }

    String taskId() {
        return taskId;
    }
}
