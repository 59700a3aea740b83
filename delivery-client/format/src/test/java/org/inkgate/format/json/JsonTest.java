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

    @Test
    void bind_rosterEntryWithoutExtraTime_isMalformed() {
        byte[] json = "{\"candidateNumber\":\"1001\",\"formId\":\"A\"}".getBytes(StandardCharsets.UTF_8);
        assertThrows(MalformedJson.class, () -> Json.bind("x.inkexam", "manifest.json", json, RosterEntry.class));
    }
}
