package org.inkgate.format.response;

import java.time.Instant;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;

/**
 * One event of the process log: a text change, a tool use, a focus change, a timer event.
 * Event types and their data fields are listed in docs/formats.md.
 *
 * @param seq    1-based position in the log, without gaps
 * @param at     wall-clock time
 * @param mono   monotonic clock in nanoseconds, for intervals that a clock change cannot distort
 * @param type   event type, e.g. "text.insert", "tool.query", "focus.lost"
 * @param task   the task it happened in, or null for sitting-level events
 * @param data   type-specific fields (strings, numbers, booleans)
 */
public record ProcessEvent(long seq, Instant at, long mono, String type, String task, Map<String, Object> data) {

    public ProcessEvent {
        Objects.requireNonNull(at, "at");
        Objects.requireNonNull(type, "type");
        data = java.util.Collections.unmodifiableMap(new TreeMap<>(Objects.requireNonNullElse(data, Map.of())));
    }
}
