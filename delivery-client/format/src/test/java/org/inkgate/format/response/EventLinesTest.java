package org.inkgate.format.response;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.json.Json;
import org.inkgate.format.refusal.FormatRefusal;
import org.junit.jupiter.api.Test;

/**
 * A decoded log says which events came from plain lines and where their fields lie: lines as the writer
 * writes them are plain; a line with an escape, a time the writer would spell otherwise, or a line only
 * Jackson reads (spaces, fields in another order) is not, and its values must be written out.
 */
class EventLinesTest {

    private static final Instant T = Instant.parse("2026-03-14T09:00:18.180Z");

    @Test
    void writtenLines_arePlain_andTheirFieldsAreTheValuesJson() throws FormatRefusal {
        List<ProcessEvent> events = List.of(
                new ProcessEvent(1, T, 5, "text.insert", "t1", Map.of("len", 1, "text", "é", "pos", 0)),
                new ProcessEvent(2, T.plusNanos(1), -7, "sitting.pause", null, Map.of()),
                new ProcessEvent(3, T, 9, "text.insert", "t1", Map.of("text", "a \"quoted\" word", "ok", true)));
        EventChain.Decoded decoded = EventChain.decodeWithHead("f", "events.jsonl", EventChain.encode(events));
        EventLines lines = decoded.lines();
        assertEquals(3, lines.events());
        assertEquals(true, lines.plain(0));
        assertEquals(true, lines.plain(1));
        assertEquals(false, lines.plain(2), "an escaped quote");
        for (int i = 0; i < 2; i++) {
            ProcessEvent e = events.get(i);
            assertEquals(json(e.seq()), span(lines, i, EventLines.Field.SEQ));
            assertEquals("\"" + span(lines, i, EventLines.Field.AT) + "\"", json(e.at()));
            assertEquals(json(e.mono()), span(lines, i, EventLines.Field.MONO));
            assertEquals("\"" + span(lines, i, EventLines.Field.TYPE) + "\"", json(e.type()));
            assertEquals(json(e.data()), span(lines, i, EventLines.Field.DATA));
        }
        assertEquals("t1", span(lines, 0, EventLines.Field.TASK));
        assertEquals(-1, lines.start(1, EventLines.Field.TASK));
        assertThrows(IllegalStateException.class, () -> lines.start(2, EventLines.Field.DATA));
        assertArrayEquals(new int[] {2}, lines.others());
    }

    @Test
    void linesTheWriterWouldWriteOtherwise_areNotPlain() throws FormatRefusal {
        byte[] log = chain(
                "{\"seq\":1,\"at\":\"2026-03-14T09:00:18.180Z\",\"mono\":1,\"type\":\"a\",\"data\":{},\"prev\":\"%s\"}",
                "{\"seq\":2,\"at\":\"2026-03-14T09:00:18.000Z\",\"mono\":1,\"type\":\"a\",\"data\":{},\"prev\":\"%s\"}",
                "{\"seq\":3,\"at\":\"2026-03-14T09:00:18.18Z\",\"mono\":1,\"type\":\"a\",\"data\":{},\"prev\":\"%s\"}",
                "{\"seq\":4,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":1,\"type\":\"\\u0061\",\"data\":{},\"prev\":\"%s\"}",
                "{\"seq\": 5,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":1,\"type\":\"a\",\"data\":{},\"prev\":\"%s\"}",
                "{\"seq\":6,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":1,\"type\":\"a\",\"data\":{\"b\":1,\"a\":2},\"prev\":\"%s\"}",
                "{\"seq\":7,\"at\":\"2026-03-14T09:00:18Z\",\"mono\":1,\"type\":\"a\",\"data\":{\"a\":2,\"b\":1},\"prev\":\"%s\"}");
        EventLines lines = EventChain.decodeWithHead("f", "events.jsonl", log).lines();
        assertEquals(List.of(true, false, false, false, false, false, true), List.of(lines.plain(0), lines.plain(1),
                lines.plain(2), lines.plain(3), lines.plain(4), lines.plain(5), lines.plain(6)));
        assertEquals("{\"a\":2,\"b\":1}", span(lines, 6, EventLines.Field.DATA));
        assertArrayEquals(new int[] {1, 2, 3, 4, 5}, lines.others());
    }

    /** Lines given with %s for their prev, chained as the writer chains them. */
    private static byte[] chain(String... lines) {
        StringBuilder log = new StringBuilder();
        String prev = EventChain.GENESIS;
        for (String line : lines) {
            String filled = String.format(line, prev);
            log.append(filled).append('\n');
            prev = Sha256.hex(filled.getBytes(StandardCharsets.UTF_8));
        }
        return log.toString().getBytes(StandardCharsets.UTF_8);
    }

    private static String json(Object value) {
        return new String(Json.writeLine(value), StandardCharsets.UTF_8);
    }

    private static String span(EventLines lines, int event, EventLines.Field field) {
        int from = lines.start(event, field);
        return new String(lines.bytes(), from, lines.end(event, field) - from, StandardCharsets.UTF_8);
    }
}
