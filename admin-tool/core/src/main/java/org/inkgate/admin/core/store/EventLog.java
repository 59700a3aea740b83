package org.inkgate.admin.core.store;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;

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

    private final StringBuilder text;
    private int count;

    public EventLog(int expectedEvents) {
        text = new StringBuilder(Math.max(16, expectedEvents) * 160).append('[');
    }

    /** Appends one event. */
    public EventLog add(long seq, String at, long mono, String type, String task, String dataJson) {
        columnsBeforeData(seq, at, mono, type, task);
        string(dataJson).append(']');
        return this;
    }

    /**
     * Appends one event whose data is still a map: its compact JSON (what {@link EventText#json} returns) is
     * written into the array as a JSON string directly, without making the JSON and then escaping it, and the
     * data's {@code toString} is appended to {@code digestText} for the content digest on the way.
     */
    public EventLog add(long seq, String at, long mono, String type, String task, java.util.Map<String, Object> data,
            StringBuilder digestText) {
        columnsBeforeData(seq, at, mono, type, task);
        if (!EventText.appendJsonString(data, text, digestText)) {
            string(EventText.json(data, new StringBuilder(), digestText));
        }
        text.append(']');
        return this;
    }

    /** Opens an event's array and writes its columns up to the data's, with the comma after them. */
    private void columnsBeforeData(long seq, String at, long mono, String type, String task) {
        if (count++ > 0) {
            text.append(',');
        }
        text.append('[').append(seq).append(',');
        string(at).append(',').append(mono).append(',');
        string(type).append(',');
        string(task).append(',');
    }

    /** How many events were added. */
    public int count() {
        return count;
    }

    /** The array's text. */
    public String text() {
        return text + "]";
    }

    /** A JSON string as RFC 8259 section 7 requires it: quote, backslash and control characters escaped; null as null. */
    private StringBuilder string(String s) {
        if (s == null) {
            return text.append("null");
        }
        text.append('"');
        int from = 0;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '"' || c == '\\' || c < 0x20) {
                text.append(s, from, i).append('\\');
                switch (c) {
                    case '"', '\\' -> text.append(c);
                    case '\n' -> text.append('n');
                    case '\r' -> text.append('r');
                    case '\t' -> text.append('t');
                    default -> text.append(String.format("u%04x", (int) c));
                }
                from = i + 1;
            }
        }
        return text.append(s, from, s.length()).append('"');
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
