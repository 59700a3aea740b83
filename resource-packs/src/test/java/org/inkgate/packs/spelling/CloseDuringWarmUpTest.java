package org.inkgate.packs.spelling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/**
 * Closing an engine while LanguageTool is still loading must not break checking for the rest of
 * the program. Closing used to interrupt the engine thread; LanguageTool reacts to the interrupt
 * inside static initialisers (seen: {@code EnglishRepeatedWordsRule}), the class is then marked
 * unusable for the JVM's lifetime, and every later engine failed with NoClassDefFoundError (and its
 * check never completed). Run in a JVM of its own ({@link CloseDuringWarmUpProbe}), because the
 * damage only shows where LanguageTool loads for the first time.
 */
class CloseDuringWarmUpTest {

    @Test
    void closeDuringWarmUp_laterEngineStillFindsMisspellings() throws Exception {
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        Process p = new ProcessBuilder(java.toString(), "-Xmx1g", "-cp", System.getProperty("java.class.path"),
                CloseDuringWarmUpProbe.class.getName())
                .redirectError(ProcessBuilder.Redirect.DISCARD)
                .start();
        String out;
        try {
            assertTrue(p.waitFor(240, TimeUnit.SECONDS), "the probe JVM did not end within 240 s");
            out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        } finally {
            p.destroyForcibly();
        }
        // "recieve" and "tommorow": commonly cited misspellings (from memory), as in SpellingEngineTest
        assertEquals(List.of("recieve", "tommorow"), out.lines().toList(), "probe output: " + out);
        assertEquals(0, p.exitValue(), out);
    }
}
