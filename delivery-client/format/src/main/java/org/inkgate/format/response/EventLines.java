package org.inkgate.format.response;

import java.util.Arrays;

/**
 * An event log's bytes and, for each event read from a <em>plain</em> line, where its fields lie in them. A
 * plain line is one in the writer's exact form ({@link EventLineScanner}) with no escape in any of its texts and
 * its time spelled as {@link org.inkgate.format.json.InstantText#text} spells it; each field's bytes are then
 * exactly the JSON that {@link org.inkgate.format.json.Json#writeLine} writes for the field's value (the data
 * object with its keys in order, as for any map). A reader that wants the values as text again, as the admin
 * tool's store and content digest do, may copy those bytes instead of writing every value out anew, and must
 * write the values of the other events out as before.
 *
 * <p>Why: writing a sitting's thousands of times, numbers and data maps back out as text was a third of a
 * collect's reading time (docs/benchmarks.md, issue 16). {@code EventLinesTest} holds every plain event's bytes
 * to the values read.
 */
public final class EventLines {

    /** The fields whose bytes a plain line gives, in the order of the line. */
    public enum Field {
        /** The sequence number's digits. */
        SEQ,
        /** The time's characters, without the quotes. */
        AT,
        /** The monotonic clock's digits. */
        MONO,
        /** The type's characters, without the quotes. */
        TYPE,
        /** The task id's characters, without the quotes; an empty span at -1 when the event has no task. */
        TASK,
        /** The data object, braces included. */
        DATA
    }

    private static final int STRIDE = 2 * Field.values().length;

    private final byte[] bytes;
    private int[] spans;
    private int count;
    /** The indexes of the events not read from plain lines, in order. */
    private int[] others = new int[8];
    private int otherCount;

    EventLines(byte[] bytes, int expectedEvents) {
        this.bytes = bytes;
        this.spans = new int[Math.max(1, expectedEvents) * STRIDE];
    }

    /** A log of which no line is known to be plain: every event is written out from its values. */
    public static EventLines nonePlain(byte[] bytes, int events) {
        EventLines lines = new EventLines(bytes, events);
        for (int i = 0; i < events; i++) {
            lines.addOther();
        }
        return lines;
    }

    /** The next event, from a plain line; {@code fields} holds start and end of each field in {@link Field}'s order. */
    void addPlain(int[] fields) {
        grow();
        System.arraycopy(fields, 0, spans, count * STRIDE, STRIDE);
        count++;
    }

    /** The next event, from a line that is not plain. */
    void addOther() {
        grow();
        spans[count * STRIDE] = -1;
        if (otherCount == others.length) {
            others = Arrays.copyOf(others, otherCount * 2);
        }
        others[otherCount++] = count;
        count++;
    }

    private void grow() {
        if ((count + 1) * STRIDE > spans.length) {
            spans = Arrays.copyOf(spans, spans.length * 2);
        }
    }

    /** The log's bytes, shared: read them, never change them. */
    public byte[] bytes() {
        return bytes;
    }

    /** How many events the log holds. */
    public int events() {
        return count;
    }

    /**
     * The indexes of the events not read from plain lines, in ascending order: for a reader that needs to look only at
     * those (a plain line has no escape and no control character), without going through thousands of plain ones.
     */
    public int[] others() {
        return Arrays.copyOf(others, otherCount);
    }

    /** Whether the event at {@code index} (0 for the first) was read from a plain line. */
    public boolean plain(int index) {
        return spans[check(index) * STRIDE] >= 0;
    }

    /** Where a plain event's field starts in {@link #bytes()}; -1 for a task the event does not have. */
    public int start(int index, Field field) {
        return spans[plainIndex(index) * STRIDE + 2 * field.ordinal()];
    }

    /** Where a plain event's field ends in {@link #bytes()} (exclusive); -1 for a task the event does not have. */
    public int end(int index, Field field) {
        return spans[plainIndex(index) * STRIDE + 2 * field.ordinal() + 1];
    }

    /**
     * Copies a plain event's field into {@code to} from {@code at} and returns where the copy ends; a task the event
     * does not have is copied as {@code null}, as JSON and a map's {@code toString} both spell it.
     */
    public int copy(int index, Field field, byte[] to, int at) {
        int from = start(index, field);
        if (from < 0) {
            System.arraycopy(NULL, 0, to, at, NULL.length);
            return at + NULL.length;
        }
        int n = end(index, field) - from;
        System.arraycopy(bytes, from, to, at, n);
        return at + n;
    }

    private static final byte[] NULL = {'n', 'u', 'l', 'l'};

    private int plainIndex(int index) {
        if (!plain(index)) {
            throw new IllegalStateException("event " + (index + 1) + " was not read from a plain line: write its values");
        }
        return index;
    }

    private int check(int index) {
        if (index < 0 || index >= count) {
            throw new IndexOutOfBoundsException("event index " + index + " of " + count);
        }
        return index;
    }
}
