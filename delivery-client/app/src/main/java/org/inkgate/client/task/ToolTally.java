package org.inkgate.client.task;

import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.ToolUse;
import org.inkgate.packs.policy.Tool;

/**
 * Counts each offered tool's use for the response package; a tool not offered is never counted.
 * The counts are read off the logged events by one rule ({@link #count}): the live workspace
 * feeds it every event it records, and a task re-entered after a crash starts from the same rule
 * applied to the events logged before the crash, so the two can never count differently.
 */
final class ToolTally {

    private enum Count { QUERIES, EMPTY_QUERIES, OPENED, SHOWN, ACCEPTED, IGNORED, INSERTIONS }

    private final Map<Tool, int[]> counts = new EnumMap<>(Tool.class);

    ToolTally(Set<Tool> offered) {
        for (Tool t : offered) {
            counts.put(t, new int[Count.values().length]);
        }
    }

    /**
     * A tally that starts from a task's events logged before (by a process that crashed): every
     * event of the vocabulary is counted as {@link #count} counts it live. Events the vocabulary
     * does not know, or for a tool this task does not offer, count nothing (they cannot come from
     * this bundle's client; the collector reports them).
     */
    static ToolTally rebuilt(Set<Tool> offered, List<ProcessEvent> logged) {
        ToolTally tally = new ToolTally(offered);
        for (ProcessEvent e : logged) {
            if (e.parsedType() instanceof EventType.Known known) {
                Tool tool = toolOf(e.data());
                if (tool == null || tally.counts.containsKey(tool)) {
                    tally.count(known.type(), e.data());
                }
            }
        }
        return tally;
    }

    /**
     * The one counting rule: what an event of this type with these data adds to the tally.
     * A lookup counts as a query (and as an empty one when it found nothing), an opened entry,
     * a shown, accepted or ignored suggestion and an insertion from the panel count once each.
     */
    synchronized void count(EventType type, Map<String, ?> data) {
        switch (type) {
            case TOOL_QUERY -> {
                Tool t = required(type, data);
                add(t, Count.QUERIES);
                if (data.get("hits") instanceof Number hits && hits.intValue() == 0) {
                    add(t, Count.EMPTY_QUERIES);
                }
            }
            case TOOL_OPEN -> add(required(type, data), Count.OPENED);
            case SUGGESTION_SHOW -> add(required(type, data), Count.SHOWN);
            case SUGGESTION_ACCEPT -> add(required(type, data), Count.ACCEPTED);
            case SUGGESTION_IGNORE -> add(required(type, data), Count.IGNORED);
            case TOOL_INSERT -> add(required(type, data), Count.INSERTIONS);
            case SITTING_START, SITTING_RESUME, SITTING_END, FOCUS_LOST, FOCUS_RETURNED, PAUSE_START, PAUSE_END,
                    NAV_SCREEN, TASK_START, TASK_END, TASK_REPLAY_PROBLEM, TEXT_INSERT, TEXT_DELETE, PASTE_REFUSED,
                    PANEL_OPEN, PANEL_CLOSE, CHECK_RUN, TIMER_WARNING, TIMER_EXPIRED, TIME_ADDED -> {
                // not a use of a tool
            }
        }
    }

    /** One {@link ToolUse} per offered tool. */
    synchronized Map<Tool, ToolUse> snapshot() {
        Map<Tool, ToolUse> out = new EnumMap<>(Tool.class);
        counts.forEach((t, c) -> out.put(t, new ToolUse(c[0], c[1], c[2], c[3], c[4], c[5], c[6])));
        return java.util.Collections.unmodifiableMap(out);
    }

    private static Tool required(EventType type, Map<String, ?> data) {
        Tool t = toolOf(data);
        if (t == null) {
            throw new IllegalArgumentException(type.wireName() + " names no tool this client knows: " + data.get("tool"));
        }
        return t;
    }

    /** The tool an event's {@code tool} key names (its wire name, {@link TaskEvents#wire}), or null. */
    private static Tool toolOf(Map<String, ?> data) {
        if (!(data.get("tool") instanceof String name)) {
            return null;
        }
        for (Tool t : Tool.values()) {
            if (TaskEvents.wire(t).equals(name.toLowerCase(Locale.ROOT))) {
                return t;
            }
        }
        return null;
    }

    private void add(Tool t, Count c) {
        int[] row = counts.get(t);
        if (row == null) {
            throw new IllegalStateException(t + " is not offered in this task, so it cannot have been used");
        }
        row[c.ordinal()]++;
    }
}
