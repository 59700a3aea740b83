package org.inkgate.client.task;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.inkgate.format.bundle.WordGuidance;
import org.junit.jupiter.api.Test;

/** Word guidance is advice: past the maximum it says so calmly, and nothing else changes. */
class WordStatusTest {

    @Test
    void adviceFor_withinAndPastTheGuidance() {
        WordGuidance g = new WordGuidance(80, 120);
        assertEquals("Aim for 80 to 120 words", WordStatus.adviceFor(10, g));
        assertEquals("Aim for 80 to 120 words", WordStatus.adviceFor(120, g));
        assertEquals("Aim for 80 to 120 words (you are past the suggested maximum; this is advice, not a limit)", WordStatus.adviceFor(121, g));
        assertEquals("", WordStatus.adviceFor(500, null));
    }
}
