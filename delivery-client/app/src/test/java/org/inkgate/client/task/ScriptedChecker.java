package org.inkgate.client.task;

import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.inkgate.packs.event.ToolAction;
import org.inkgate.packs.event.ToolEvent;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.policy.Tool;
import org.inkgate.packs.spelling.CheckIssue;
import org.inkgate.packs.spelling.CheckResult;
import org.inkgate.packs.spelling.EnglishVariant;
import org.inkgate.packs.spelling.SpellingChecker;

/**
 * A stand-in checker for UI tests that must not wait for LanguageTool: flags the words it is
 * given (whole words) with their suggestions, on its own thread like the real engine. Respects
 * the mode the same way the engine does: no suggestions in underline-only.
 */
final class ScriptedChecker implements SpellingChecker {
    private final SpellingMode mode;
    private final Map<String, List<String>> flagged;
    private final Set<String> ignored = new LinkedHashSet<>();
    private final ExecutorService thread = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "scripted-checker");
        t.setDaemon(true);
        return t;
    });
    volatile int checks;
    volatile boolean closed;

    ScriptedChecker(SpellingMode mode, Map<String, List<String>> flagged) {
        this.mode = mode;
        this.flagged = flagged;
    }

    @Override public SpellingMode mode() { return mode; }
    @Override public EnglishVariant variant() { return EnglishVariant.EN_GB; }
    @Override public CompletableFuture<Void> warmUp() { return CompletableFuture.completedFuture(null); }

    @Override
    public CompletableFuture<CheckResult> check(String text) {
        return CompletableFuture.supplyAsync(() -> {
            checks++;
            List<CheckIssue> issues = new ArrayList<>();
            Matcher m = Pattern.compile("\\p{L}+").matcher(text);
            while (m.find()) {
                List<String> s = flagged.get(m.group());
                if (s != null && !ignored.contains(m.group())) {
                    issues.add(new CheckIssue(CheckIssue.Kind.SPELLING, "SCRIPTED_SPELLING", "TYPOS", m.start(), m.end(),
                            mode.offersSuggestions() ? "Possible spelling mistake found." : "Possible spelling mistake.",
                            mode.offersSuggestions() ? s : List.of()));
                }
            }
            return new CheckResult(issues, 1, 1, new ToolEvent(Tool.SPELLING, ToolAction.CHECK, null, null, issues.size(), null, Instant.now(), 1));
        }, thread);
    }

    @Override
    public ToolEvent ignoreWord(String word) {
        ignored.add(word);
        return new ToolEvent(Tool.SPELLING, ToolAction.IGNORE_WORD, null, word, 0, null, Instant.now(), 0);
    }

    @Override public Set<String> ignoredWords() { return Set.copyOf(ignored); }

    @Override
    public void close() {
        closed = true;
        thread.shutdownNow();
    }
}
