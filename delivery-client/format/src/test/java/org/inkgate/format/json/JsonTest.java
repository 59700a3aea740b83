package org.inkgate.format.json;

import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.StandardCharsets;
import org.inkgate.format.bundle.RosterEntry;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.refusal.MalformedJson;
import org.junit.jupiter.api.Test;

/** Absent numbers and booleans are refused, not read as 0 or false (docs/formats.md: required unless optional). */
class JsonTest {

    @Test
    void bind_taskWithoutTimeLimit_isMalformed() {
        byte[] json = "{\"id\":\"t1\",\"title\":\"A\",\"promptFile\":\"p.md\",\"warningMinutes\":[]}".getBytes(StandardCharsets.UTF_8);
        assertThrows(MalformedJson.class, () -> Json.bind("x.inkexam", "manifest.json", json, TaskSpec.class));
    }

    /** A number written as text or with a fraction, a boolean written as a number or text: refused, not converted. */
    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.ValueSource(strings = {"\"timeLimitSeconds\":\"60\"", "\"timeLimitSeconds\":60.5"})
    void bind_numberInAnotherType_isMalformed(String field) {
        byte[] json = ("{\"id\":\"t1\",\"title\":\"A\",\"promptFile\":\"p.md\",\"warningMinutes\":[]," + field + "}")
                .getBytes(StandardCharsets.UTF_8);
        assertThrows(MalformedJson.class, () -> Json.bind("x.inkexam", "manifest.json", json, TaskSpec.class));
    }

    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.ValueSource(strings = {"0", "\"true\""})
    void bind_booleanInAnotherType_isMalformed(String value) {
        byte[] json = ("{\"candidateNumber\":\"1001\",\"formId\":\"A\",\"extraTimePercent\":0,\"largePrint\":" + value
                + ",\"highContrast\":false}").getBytes(StandardCharsets.UTF_8);
        MalformedJson refusal = assertThrows(MalformedJson.class, () -> Json.bind("x.inkexam", "manifest.json", json, RosterEntry.class));
        org.junit.jupiter.api.Assertions.assertTrue(refusal.getMessage().contains("at largePrint"), refusal.getMessage());
    }

    @Test
    void bind_rosterEntryWithoutExtraTime_isMalformed() {
        byte[] json = "{\"candidateNumber\":\"1001\",\"formId\":\"A\"}".getBytes(StandardCharsets.UTF_8);
        MalformedJson refusal = assertThrows(MalformedJson.class, () -> Json.bind("x.inkexam", "manifest.json", json, RosterEntry.class));
        // the message is for test owners: Jackson's hint to programmers is left out
        org.junit.jupiter.api.Assertions.assertFalse(refusal.getMessage().contains("FAIL_ON"), refusal.getMessage());
    }
}
