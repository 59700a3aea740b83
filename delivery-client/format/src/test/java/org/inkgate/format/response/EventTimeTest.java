package org.inkgate.format.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import org.inkgate.format.refusal.FormatRefusal;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The event log's fast time reader gives exactly what the standard one gives: the same instant for
 * the writer's own form (checked against {@link Instant#parse}, the JDK's ISO 8601 reader), and the
 * standard reader's answer, acceptance or refusal, for everything else.
 */
class EventTimeTest {

    @ParameterizedTest
    @ValueSource(strings = {"2026-03-14T09:00:18.180Z", "2026-03-14T09:00:18Z", "1970-01-01T00:00:00Z",
        "2024-02-29T23:59:59.999999999Z", "2026-12-31T23:59:59.1Z", "0001-01-01T00:00:00.000001Z"})
    void theWritersOwnForm_readsAsTheJdkReadsIt_andRoundTripsThroughTheLog(String text) throws FormatRefusal {
        assertEquals(Instant.parse(text), EventTime.canonical(text));
        ProcessEvent e = new ProcessEvent(1, Instant.parse(text), 0, "text.insert", "t1", Map.of("len", 1));
        assertEquals(List.of(e), EventChain.decode("f", "events.jsonl", EventChain.encode(List.of(e))));
    }

    @ParameterizedTest
    @ValueSource(strings = {"2026-03-14T09:00:18+01:00", "2026-03-14 09:00:18Z", "2026-03-14T09:00Z",
        "2026-03-14T09:00:18.1234567890Z", "2026-03-14T09:00:18.Z", "+2026-03-14T09:00:18Z", "2026-3-14T09:00:18.18Z",
        "2026-03-14T23:59:60Z", "2026-02-30T00:00:00Z", "2026-03-14T09:00:1xZ"})
    void anyOtherForm_isLeftToTheStandardReader(String text) {
        assertNull(EventTime.canonical(text));
    }

    @ParameterizedTest
    @ValueSource(strings = {"2026-02-30T00:00:00Z", "2026-03-14T25:00:00Z", "not a time"})
    void anImpossibleTime_isStillRefused_withTheLine(String text) {
        String line = "{\"seq\":1,\"at\":\"" + text + "\",\"mono\":0,\"type\":\"text.insert\",\"task\":\"t1\",\"data\":{},"
                + "\"prev\":\"" + EventChain.GENESIS + "\"}\n";
        FormatRefusal refusal = assertThrows(FormatRefusal.class,
                () -> EventChain.decode("f", "events.jsonl", line.getBytes(StandardCharsets.UTF_8)));
        assertEquals(true, refusal.getMessage().contains("line 1"), refusal.getMessage());
    }
}
