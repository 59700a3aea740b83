package org.inkgate.admin.core.store;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import org.inkgate.format.response.EventLines;

/**
 * How the results store keeps one sitting's process events: one JSON array per sitting (table
 * {@code event_logs}), each event an array of its six columns in the order of {@link #COLUMNS}:
 * {@code [seq, "at", mono, "type", "task" or null, "data as JSON text"]}. The view
 * {@code process_events} (schema version 10) turns the arrays back into one row per event with the
 * same columns and values as the table it replaced, so SQL written against it keeps working.
 *
 * <p>Why: a collect of 1,000 packages of 5,000 events bound 35,000 values per package, one by one,
 * on its single storing thread: some 15 ms of a package's time that no second core could share
 * (docs/benchmarks.md, issue 16). Now the reading threads write the array and the storing thread
 * binds one value. The data stays text inside the array (a JSON string, not an object) so that the
 * view hands back exactly the characters the store kept before, whatever JSON spelling a database
 * would choose for an object.
 */
public final class EventLog {

    /** The columns of an event, in the order of each event's array and of the view (Schema, version 10). */
    public static final String COLUMNS = "seq, at, mono, type, task_id, data_json";

    /** The array so far, in UTF-8. */
    private byte[] bytes;
    private int used;
    /** An event written out from its values, before it joins the bytes. */
    private final StringBuilder pending = new StringBuilder(256);
    private int count;

    public EventLog(int expectedEvents) {
        bytes = new byte[Math.max(16, expectedEvents) * 160];
        bytes[used++] = '[';
    }

    /** Appends one event. */
    public EventLog add(long seq, String at, long mono, String type, String task, String dataJson) {
        pending.setLength(0);
        columnsBeforeData(seq, at, mono, type, task);
        string(dataJson).append(']');
        return flushPending();
    }

    /**
     * Appends one event whose data is still a map: its compact JSON (what {@link EventText#json} returns) is
     * written into the array as a JSON string directly, without making the JSON and then escaping it, and the
     * data's {@code toString} is appended to {@code digestText} for the content digest on the way.
     */
    public EventLog add(long seq, String at, long mono, String type, String task, java.util.Map<String, Object> data,
            StringBuilder digestText) {
        pending.setLength(0);
        columnsBeforeData(seq, at, mono, type, task);
        if (!EventText.appendJsonString(data, pending, digestText)) {
            string(EventText.json(data, new StringBuilder(), digestText));
        }
        pending.append(']');
        return flushPending();
    }

    /**
     * Appends the event at {@code index} of a log read from plain lines, by copying its fields' bytes: a plain
     * line's fields are the JSON of their values as the mapper writes them ({@link EventLines}), so the array
     * gets the same characters as from {@link #add(long, String, long, String, String, java.util.Map, StringBuilder)};
     * the data's JSON becomes a JSON string by escaping its quotes, the only characters of it that need it, since
     * a plain line has no backslash and no control character.
     */
    public EventLog addPlain(EventLines lines, int index) {
        byte[] b = lines.bytes();
        int dataFrom = lines.start(index, EventLines.Field.DATA);
        int dataTo = lines.end(index, EventLines.Field.DATA);
        // at most: the line's own bytes, every quote of the data escaped, and the punctuation around the columns
        room(lines.end(index, EventLines.Field.DATA) - lines.start(index, EventLines.Field.SEQ) + (dataTo - dataFrom) + 16);
        byte[] out = bytes;
        int n = used;
        if (count++ > 0) {
            out[n++] = ',';
        }
        out[n++] = '[';
        n = lines.copy(index, EventLines.Field.SEQ, out, n);
        out[n++] = ',';
        out[n++] = '"';
        n = lines.copy(index, EventLines.Field.AT, out, n);
        out[n++] = '"';
        out[n++] = ',';
        n = lines.copy(index, EventLines.Field.MONO, out, n);
        out[n++] = ',';
        out[n++] = '"';
        n = lines.copy(index, EventLines.Field.TYPE, out, n);
        out[n++] = '"';
        out[n++] = ',';
        if (lines.start(index, EventLines.Field.TASK) < 0) {
            n = lines.copy(index, EventLines.Field.TASK, out, n); // null, unquoted
        } else {
            out[n++] = '"';
            n = lines.copy(index, EventLines.Field.TASK, out, n);
            out[n++] = '"';
        }
        out[n++] = ',';
        out[n++] = '"';
        for (int k = dataFrom; k < dataTo; k++) {
            byte c = b[k];
            if (c == '"') {
                out[n++] = '\\';
            }
            out[n++] = c;
        }
        out[n++] = '"';
        out[n++] = ']';
        used = n;
        return this;
    }

    /** Opens an event's array and writes its columns up to the data's, with the comma after them. */
    private void columnsBeforeData(long seq, String at, long mono, String type, String task) {
        if (count++ > 0) {
            pending.append(',');
        }
        pending.append('[').append(seq).append(',');
        string(at).append(',').append(mono).append(',');
        string(type).append(',');
        string(task).append(',');
    }

    /** Moves the event written out in {@link #pending} into the bytes, in UTF-8. */
    private EventLog flushPending() {
        int n = pending.length();
        room(n);
        for (int i = 0; i < n; i++) {
            char c = pending.charAt(i);
            if (c >= 0x80) {
                // the JDK's encoder, as the database driver would have used on the text before
                byte[] encoded = pending.substring(i).getBytes(StandardCharsets.UTF_8);
                room(encoded.length);
                System.arraycopy(encoded, 0, bytes, used, encoded.length);
                used += encoded.length;
                return this;
            }
            bytes[used++] = (byte) c;
        }
        return this;
    }

    private void room(int more) {
        if (used + more + 1 > bytes.length) {
            bytes = Arrays.copyOf(bytes, Math.max(bytes.length * 2, used + more + 1));
        }
    }

    /** How many events were added. */
    public int count() {
        return count;
    }

    /** The array's text. */
    public String text() {
        room(1);
        bytes[used] = ']';
        return new String(bytes, 0, used + 1, StandardCharsets.UTF_8);
    }

    /** A JSON string as RFC 8259 section 7 requires it: quote, backslash and control characters escaped; null as null. */
    private StringBuilder string(String s) {
        if (s == null) {
            return pending.append("null");
        }
        pending.append('"');
        int from = 0;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '"' || c == '\\' || c < 0x20) {
                pending.append(s, from, i).append('\\');
                switch (c) {
                    case '"', '\\' -> pending.append(c);
                    case '\n' -> pending.append('n');
                    case '\r' -> pending.append('r');
                    case '\t' -> pending.append('t');
                    default -> pending.append(String.format("u%04x", (int) c));
                }
                from = i + 1;
            }
        }
        return pending.append(s, from, s.length()).append('"');
    }

    /** One event as the store gives it back. */
    public record Event(long seq, String at, long mono, String type, String task, String dataJson) {
    }

    /** Reads a stored array back, event by event, in the order stored (the package's, by seq). */
    public static void forEach(String stored, java.util.function.Consumer<Event> sink) {
        try (JsonParser p = org.inkgate.format.json.Json.mapper().getFactory().createParser(stored)) {
            expect(p.nextToken(), JsonToken.START_ARRAY);
            while (p.nextToken() == JsonToken.START_ARRAY) {
                expect(p.nextToken(), JsonToken.VALUE_NUMBER_INT);
                long seq = p.getLongValue();
                String at = text(p);
                expect(p.nextToken(), JsonToken.VALUE_NUMBER_INT);
                long mono = p.getLongValue();
                String type = text(p);
                String task = text(p);
                String data = text(p);
                expect(p.nextToken(), JsonToken.END_ARRAY);
                sink.accept(new Event(seq, at, mono, type, task, data));
            }
            expect(p.currentToken(), JsonToken.END_ARRAY);
        } catch (IOException e) {
            throw new Unreadable(e.getMessage(), e);
        }
    }

    /** A stored log that is not what this program writes: the store was changed by something else. */
    public static final class Unreadable extends RuntimeException {

        private static final long serialVersionUID = 1L;

        Unreadable(String message, Throwable cause) {
            super(message, cause);
        }
    }

    private static String text(JsonParser p) throws IOException {
        JsonToken t = p.nextToken();
        if (t == JsonToken.VALUE_NULL) {
            return null;
        }
        expect(t, JsonToken.VALUE_STRING);
        return p.getText();
    }

    private static void expect(JsonToken got, JsonToken wanted) throws IOException {
        if (got != wanted) {
            throw new IOException("expected " + wanted + ", found " + got);
        }
    }
}
