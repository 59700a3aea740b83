package org.inkgate.packs.spelling;

import java.time.Clock;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.inkgate.packs.policy.SpellingMode;

/**
 * Run in a JVM of its own by {@link CloseDuringWarmUpTest}: LanguageTool's classes must be loaded
 * for the first time here, so a class left broken by an interrupt shows. Closes an engine while its
 * warm-up is inside LanguageTool (as a sitting does when the invigilator leaves during the
 * instructions, or a test closes its tools early), then checks with a new engine and prints the
 * misspellings found, one a line, or "FAILED: ..." and exits 1.
 */
final class CloseDuringWarmUpProbe {
    private static final String ENGINE_THREAD = "inkgate-spelling-" + EnglishVariant.EN_GB.tag();

    private CloseDuringWarmUpProbe() {
    }

    public static void main(String[] args) throws Exception {
        Clock clock = Clock.systemUTC();
        SpellingEngine first = SpellingEngine.create(EnglishVariant.EN_GB, SpellingMode.SUGGESTIONS, List.of(), clock);
        first.warmUp();
        waitUntilInsideLanguageTool();
        first.close();

        SpellingEngine second = SpellingEngine.create(EnglishVariant.EN_GB, SpellingMode.SUGGESTIONS, List.of(), clock);
        try {
            String text = "I will recieve it tommorow.";
            for (CheckIssue issue : second.check(text).get(120, TimeUnit.SECONDS).issues()) {
                System.out.println(text.substring(issue.start(), issue.end()));
            }
        } catch (Exception e) {
            System.out.println("FAILED: " + e);
            System.exit(1);
        }
        System.exit(0);
    }

    /**
     * Polls the engine thread's stack until LanguageTool builds its rules (its constructor's
     * longest part, where rule classes run their static initialisers).
     */
    private static void waitUntilInsideLanguageTool() throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (System.nanoTime() < deadline) {
            for (var entry : Thread.getAllStackTraces().entrySet()) {
                if (entry.getKey().getName().equals(ENGINE_THREAD)) {
                    for (StackTraceElement frame : entry.getValue()) {
                        if (frame.getClassName().equals("org.languagetool.JLanguageTool")
                                && frame.getMethodName().equals("getAllBuiltinRules")) {
                            return;
                        }
                    }
                }
            }
            Thread.sleep(5);
        }
        System.out.println("FAILED: the warm-up never reached LanguageTool's rule building within 60 s");
        System.exit(2);
    }
}
