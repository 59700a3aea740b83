package org.inkgate.admin.core.store.postgresql;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.inkgate.admin.core.store.SittingRecord;
import org.inkgate.format.response.ProcessEvent;

/**
 * A package's event rows in the text format of PostgreSQL's {@code COPY ... FROM STDIN}
 * (PostgreSQL docs, "COPY", "Text Format"): one line per row, columns separated by tabs, a null as
 * {@code \N}, and a backslash, tab, newline or carriage return inside a value written with a
 * backslash before it. Why: the server parses one stream instead of 25 statements of 1,400
 * parameters per package, which four collects into one server on two cores could not afford
 * (docs/benchmarks.md, issue 16). Values are encoded as UTF-8 by the JDK, as the driver encodes a
 * statement's text parameters; {@code StoredEventsUnchangedTest} checks the stored values on a real
 * server against the same fixture as a SQLite store.
 */
final class EventCopy {

    private EventCopy() {
    }

    /** The rows, columns in the order of {@code SqlResultsStore.EVENT_COLUMNS}. */
    static byte[] rows(long sitting, SittingRecord record) {
        List<ProcessEvent> events = record.opened().events();
        StringBuilder text = new StringBuilder(events.size() * 256);
        String sittingId = Long.toString(sitting);
        for (int i = 0; i < events.size(); i++) {
            ProcessEvent e = events.get(i);
            text.append(sittingId).append('\t').append(e.seq()).append('\t');
            value(text, record.eventAt()[i]).append('\t').append(e.mono()).append('\t');
            value(text, e.type()).append('\t');
            value(text, e.task()).append('\t');
            value(text, record.eventData()[i]).append('\n');
        }
        return text.toString().getBytes(StandardCharsets.UTF_8);
    }

    /** One column's value: escaped, or {@code \N} for null. */
    static StringBuilder value(StringBuilder out, String v) {
        if (v == null) {
            return out.append("\\N");
        }
        for (int i = 0; i < v.length(); i++) {
            char c = v.charAt(i);
            switch (c) {
                case '\\' -> out.append("\\\\");
                case '\t' -> out.append("\\t");
                case '\n' -> out.append("\\n");
                case '\r' -> out.append("\\r");
                default -> out.append(c);
            }
        }
        return out;
    }
}
