package org.inkgate.packs.spelling;

import java.util.Set;
import java.util.concurrent.CompletableFuture;
import org.inkgate.packs.event.ToolEvent;
import org.inkgate.packs.policy.SpellingMode;

/**
 * The spelling (and, when the task allows, grammar) checker of one task. Work runs off the
 * caller's thread; a newer {@link #check} cancels an older one still running.
 */
public interface SpellingChecker extends AutoCloseable {
    /** The mode this checker was built for; it never does more. */
    SpellingMode mode();

    /** The English variant checked against. */
    EnglishVariant variant();

    /** Loads the engine and runs a throw-away check; call while the candidate reads the instructions. */
    CompletableFuture<Void> warmUp();

    /**
     * Checks the whole text, re-checking only paragraphs (split at line breaks) not seen before.
     * The future is cancelled (completes with a CancellationException) when a newer check starts first.
     */
    CompletableFuture<CheckResult> check(String text);

    /** Stops flagging this word for the rest of this checker's life; returns the event to log. */
    ToolEvent ignoreWord(String word);

    /** Words the candidate asked to ignore, in the order asked. */
    Set<String> ignoredWords();

    /** Stops the engine thread. */
    @Override
    void close();
}
