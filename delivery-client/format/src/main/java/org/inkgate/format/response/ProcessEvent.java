package org.inkgate.format.response;

import java.time.Instant;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;

/**
 * One event of the process log: a text change, a tool use, a focus change, a timer event.
 * The type is kept as written on the wire, so that a log with a type this version does not know
 * can still be read and reported; {@link EventType} is the vocabulary and {@link EventContract}
 * checks a log against it.
 *
 * @param seq    1-based position in the log, without gaps
 * @param at     wall-clock time
 * @param mono   monotonic clock in nanoseconds, for intervals that a clock change cannot distort
 * @param type   the type's wire name ({@link EventType#wireName()}), e.g. "text.insert"
 * @param task   the task it happened in, or null for sitting-level events
 * @param data   type-specific fields (strings, numbers, booleans)
 */
public record ProcessEvent(long seq, Instant at, long mono, String type, String task, Map<String, Object> data) {

    public ProcessEvent {
        Objects.requireNonNull(at, "at");
        Objects.requireNonNull(type, "type");
        // data the line reader made is sorted and read-only already (EventData); anything else is copied
        data = data instanceof EventData ? data
                : java.util.Collections.unmodifiableMap(new TreeMap<>(Objects.requireNonNullElse(data, Map.of())));
    }

    /** An event of one of the vocabulary's types. */
    public ProcessEvent(long seq, Instant at, long mono, EventType type, String task, Map<String, Object> data) {
        this(seq, at, mono, type.wireName(), task, data);
    }

    /** The type read from the wire name: known, or unknown to this version. */
    public EventType.Parsed parsedType() {
        return EventType.parse(type);
    }
}
