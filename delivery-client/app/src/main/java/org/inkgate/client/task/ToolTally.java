package org.inkgate.client.task;

import java.util.EnumMap;
import java.util.Map;
import java.util.Set;
import org.inkgate.format.response.ToolUse;
import org.inkgate.packs.policy.Tool;

/** Counts each offered tool's use for the response package; a tool not offered is never counted. */
final class ToolTally {

    private enum Count { QUERIES, EMPTY_QUERIES, OPENED, SHOWN, ACCEPTED, IGNORED, INSERTIONS }

    private final Map<Tool, int[]> counts = new EnumMap<>(Tool.class);

    ToolTally(Set<Tool> offered) {
        for (Tool t : offered) {
            counts.put(t, new int[Count.values().length]);
        }
    }

    synchronized void query(Tool t, int hits) {
        add(t, Count.QUERIES);
        if (hits == 0) {
            add(t, Count.EMPTY_QUERIES);
        }
    }

    synchronized void opened(Tool t) {
        add(t, Count.OPENED);
    }

    synchronized void shown(Tool t) {
        add(t, Count.SHOWN);
    }

    synchronized void accepted(Tool t) {
        add(t, Count.ACCEPTED);
    }

    synchronized void ignored(Tool t) {
        add(t, Count.IGNORED);
    }

    synchronized void inserted(Tool t) {
        add(t, Count.INSERTIONS);
    }

    /** One {@link ToolUse} per offered tool. */
    synchronized Map<Tool, ToolUse> snapshot() {
        Map<Tool, ToolUse> out = new EnumMap<>(Tool.class);
        counts.forEach((t, c) -> out.put(t, new ToolUse(c[0], c[1], c[2], c[3], c[4], c[5], c[6])));
        return java.util.Collections.unmodifiableMap(out);
    }

    private void add(Tool t, Count c) {
        int[] row = counts.get(t);
        if (row == null) {
            throw new IllegalStateException(t + " is not offered in this task, so it cannot have been used");
        }
        row[c.ordinal()]++;
    }
}
