package org.inkgate.format.json;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The mapper's own instant handling against the reference it replaced: the same mapper settings with only
 * Jackson's Java time module (jackson-datatype-jsr310) handling instants. Every input must give the same
 * value or be refused by both, and every instant must be written as the same text.
 */
class InstantModuleTest {

    private static final ObjectMapper REFERENCE = Json.configured().build();

    record Holder(Instant at) {
    }

    @ParameterizedTest
    @ValueSource(strings = {"\"2026-03-14T09:00:18.180Z\"", "\"2026-03-14T09:00:18Z\"", "\"2026-03-14T09:00:18+01:00\"",
        "\"2026-03-14T09:00:18.1234567890Z\"", "\"2026-02-30T00:00:00Z\"", "\"2026-03-14T23:59:60Z\"", "\"not a time\"",
        "\"\"", "\" 2026-03-14T09:00:18Z\"", "\"+10000-01-01T00:00:00Z\"", "\"-0001-01-01T00:00:00Z\"", "1773478818",
        "1773478818.5", "-1", "true", "null", "[]", "{}", "\"2026-03-14t09:00:18z\"", "\"2026-03-14T09:00:18.000Z\""})
    void everyForm_isReadAsTheTimeModuleReadsIt(String json) {
        String document = "{\"at\":" + json + "}";
        assertEquals(read(REFERENCE, document), read(Json.mapper(), document), document);
    }

    @Test
    void everyInstant_isWrittenAsTheTimeModuleWritesIt() throws Exception {
        for (Instant t : InstantTextTest.times()) {
            Holder h = new Holder(t);
            assertEquals(REFERENCE.writeValueAsString(h), Json.mapper().writeValueAsString(h));
        }
        ObjectMapper compact = REFERENCE.copy().disable(com.fasterxml.jackson.databind.SerializationFeature.INDENT_OUTPUT);
        assertEquals(compact.writeValueAsString(List.of(Instant.EPOCH)), new String(Json.writeLine(List.of(Instant.EPOCH)),
                java.nio.charset.StandardCharsets.UTF_8));
    }

    /** The value read, or the kind of refusal. */
    private static String read(ObjectMapper mapper, String document) {
        try {
            Holder h = mapper.readValue(document, Holder.class);
            return "value " + h.at();
        } catch (Exception e) {
            return "refused " + e.getClass().getSimpleName();
        }
    }
}
