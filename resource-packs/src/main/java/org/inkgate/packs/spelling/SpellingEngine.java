package org.inkgate.packs.spelling;

import java.io.IOException;
import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;
import org.inkgate.packs.event.ToolAction;
import org.inkgate.packs.event.ToolEvent;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.policy.Tool;
import org.languagetool.JLanguageTool;
import org.languagetool.Language;
import org.languagetool.Languages;
import org.languagetool.ResultCache;
import org.languagetool.UserConfig;
import org.languagetool.rules.Rule;
import org.languagetool.rules.RuleMatch;
import org.languagetool.rules.spelling.SpellingCheckRule;

/**
 * The spelling/grammar checker on LanguageTool 6.6. One single-thread executor owns the
 * {@link JLanguageTool} (it is not thread-safe); callers get futures. Results are cached per
 * paragraph content, and LanguageTool's own sentence cache makes a re-check of an edited
 * paragraph cost about one sentence.
 *
 * <p>LanguageTool's {@link ResultCache} keeps a sentence's matches serialized and hands them back
 * with a stand-in rule object that keeps the rule's id and category but none of its behaviour
 * ({@code isDictionaryBasedSpellingRule()} is false on it). So whether a match is a spelling
 * match is decided by rule id, against the ids of this engine's real spelling rules, never by
 * asking the match's rule object.
 *
 * <p>In modes without grammar every rule except the dictionary-based spelling rule is disabled
 * before the first check, so grammar rules never run. In {@link SpellingMode#UNDERLINE_ONLY}
 * suggestions are never asked for and the message is a fixed text that names no correction.
 */
public final class SpellingEngine implements SpellingChecker {
    /** Message shown in underline-only mode, naming no correction. */
    public static final String UNDERLINE_MESSAGE = "Possible spelling mistake.";
    private static final int PARAGRAPH_CACHE = 2_000;
    private static final int SENTENCE_CACHE = 10_000;
    private static final int MAX_SUGGESTIONS = 5;
    /** Invented text for warm-up: statements, a question, a list, numbers, a misspelling, a grammar slip. */
    private static final List<String> WARM_UP_TEXT = List.of(
            "This is a warm-up sentence with a mispeled word.",
            "When the weather turns, the harbour waits, and everyone reads the sky before the first crossing.",
            "Would a bridge really be cheaper than a new ferry, given the depth of the strait?",
            "The council should add an early crossing, improve the ramp, and buy a quieter vessel in 2027.",
            "She have been waiting for a hour, but the timetable was wrong.");

    private final EnglishVariant variant;
    private final SpellingMode mode;
    private final List<String> examWords;
    private final Clock clock;
    /** False only for the reference engine of the tests: every check from scratch. */
    private final boolean caching;
    private final ExecutorService executor;
    private final AtomicLong generation = new AtomicLong();
    private volatile boolean closed;
    private final AtomicReference<CompletableFuture<CheckResult>> pending = new AtomicReference<>();
    private final Set<String> ignored = Collections.synchronizedSet(new LinkedHashSet<>());
    // touched only on the executor thread
    private JLanguageTool tool;
    /** Ids of the dictionary-based spelling rules of {@link #tool}, learnt from the real rule objects. */
    private Set<String> spellingRuleIds = Set.of();
    private final Map<String, List<CheckIssue>> paragraphCache = new LinkedHashMap<>(256, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<String, List<CheckIssue>> eldest) {
            return size() > PARAGRAPH_CACHE;
        }
    };

    private SpellingEngine(EnglishVariant variant, SpellingMode mode, Collection<String> examWords, Clock clock, boolean caching) {
        this.caching = caching;
        this.variant = Objects.requireNonNull(variant, "variant");
        this.mode = Objects.requireNonNull(mode, "mode");
        this.examWords = List.copyOf(examWords);
        this.clock = clock;
        this.executor = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "inkgate-spelling-" + variant.tag());
            t.setDaemon(true);
            return t;
        });
    }

    /**
     * A checker for one mode and variant; the exam word list (names and terms of the prompts)
     * is never flagged. Construction is cheap: LanguageTool loads on {@link #warmUp} or the first check.
     *
     * @throws IllegalArgumentException for {@link SpellingMode#OFF}: a task without checking gets no checker
     */
    public static SpellingEngine create(EnglishVariant variant, SpellingMode mode, Collection<String> examWords, Clock clock) {
        refuseOff(mode);
        return new SpellingEngine(variant, mode, examWords, clock, true);
    }

    private static void refuseOff(SpellingMode mode) {
        if (mode == SpellingMode.OFF) {
            throw new IllegalArgumentException("spelling mode is OFF: no checker is built for a task that allows none");
        }
    }

    /**
     * A checker that keeps no cache at all, neither ours nor LanguageTool's: every check is made
     * from scratch, as a newly built engine would make it. It is the reference the property tests
     * compare the caching engine with (a newly built engine per text would take seconds each);
     * several times slower on long texts, never used in a sitting.
     */
    public static SpellingEngine withoutCaches(EnglishVariant variant, SpellingMode mode, Collection<String> examWords, Clock clock) {
        refuseOff(mode);
        return new SpellingEngine(variant, mode, examWords, clock, false);
    }

    @Override
    public SpellingMode mode() {
        return mode;
    }

    @Override
    public EnglishVariant variant() {
        return variant;
    }

    @Override
    public CompletableFuture<Void> warmUp() {
        return CompletableFuture.runAsync(() -> {
            try {
                JLanguageTool lt = engine();
                // several kinds of sentence, so more of LanguageTool's rules are loaded and compiled
                for (String sentence : WARM_UP_TEXT) {
                    if (closed) {
                        return; // closed while warming: the rest would be wasted
                    }
                    lt.check(sentence);
                }
            } catch (IOException e) {
                throw new IllegalStateException("LanguageTool could not check the warm-up text", e);
            }
        }, executor);
    }

    @Override
    public CompletableFuture<CheckResult> check(String text) {
        Objects.requireNonNull(text, "text");
        long mine = generation.incrementAndGet();
        CompletableFuture<CheckResult> result = new CompletableFuture<>();
        CompletableFuture<CheckResult> previous = pending.getAndSet(result);
        if (previous != null) {
            previous.cancel(false);
        }
        Instant at = clock.instant();
        executor.execute(() -> {
            if (result.isDone()) {
                return;
            }
            try {
                result.complete(checkNow(text, mine, at));
            } catch (CancellationException e) {
                result.cancel(false);
            } catch (IOException | RuntimeException e) {
                result.completeExceptionally(e);
            } catch (Error e) {
                // the caller must not wait for ever on a check that cannot finish
                result.completeExceptionally(e);
                throw e;
            }
        });
        return result;
    }

    @Override
    public ToolEvent ignoreWord(String word) {
        String w = Objects.requireNonNull(word, "word").strip();
        if (w.isEmpty()) {
            throw new IllegalArgumentException("the word to ignore is empty");
        }
        ignored.add(w);
        Tool t = mode.checksGrammar() ? Tool.GRAMMAR : Tool.SPELLING;
        return new ToolEvent(t, ToolAction.IGNORE_WORD, null, w, 0, null, clock.instant(), 0);
    }

    @Override
    public Set<String> ignoredWords() {
        synchronized (ignored) {
            return Set.copyOf(new LinkedHashSet<>(ignored));
        }
    }

    /**
     * Stops the engine: pending checks are cancelled, a check in progress stops at its next
     * paragraph, a warm-up at its next sentence. The engine thread is never interrupted:
     * LanguageTool reacts to an interrupt inside the static initialisers of its rule classes
     * (seen in 6.6: {@code EnglishRepeatedWordsRule}), and the JVM then refuses those classes for
     * the rest of its life, so every later engine would fail. A LanguageTool still loading
     * finishes loading on the engine's daemon thread, which then ends.
     */
    @Override
    public void close() {
        closed = true;
        generation.incrementAndGet();
        CompletableFuture<CheckResult> waiting = pending.getAndSet(null);
        if (waiting != null) {
            waiting.cancel(false);
        }
        executor.shutdown();
    }

    private CheckResult checkNow(String text, long mine, Instant at) throws IOException {
        long start = System.nanoTime();
        JLanguageTool lt = engine();
        List<CheckIssue> issues = new ArrayList<>();
        int paragraphs = 0;
        int checked = 0;
        int offset = 0;
        while (offset <= text.length()) {
            if (generation.get() != mine) {
                throw new CancellationException("a newer check replaced this one");
            }
            int nl = text.indexOf('\n', offset);
            int end = nl < 0 ? text.length() : nl;
            String paragraph = text.substring(offset, end);
            paragraphs++;
            List<CheckIssue> found = caching ? paragraphCache.get(paragraph) : null;
            if (found == null) {
                found = paragraph.isBlank() ? List.of() : toIssues(lt.check(paragraph));
                if (caching) {
                    paragraphCache.put(paragraph, found);
                }
                checked++;
            }
            for (CheckIssue i : found) {
                if (!isIgnored(paragraph, i)) {
                    issues.add(i.shift(offset));
                }
            }
            if (nl < 0) {
                break;
            }
            offset = nl + 1;
        }
        long micros = (System.nanoTime() - start) / 1000;
        Tool t = mode.checksGrammar() ? Tool.GRAMMAR : Tool.SPELLING;
        return new CheckResult(issues, paragraphs, checked, new ToolEvent(t, ToolAction.CHECK, null, null, issues.size(), null, at, micros));
    }

    private boolean isIgnored(String paragraph, CheckIssue issue) {
        if (issue.kind() != CheckIssue.Kind.SPELLING || ignored.isEmpty()) {
            return false;
        }
        String word = paragraph.substring(issue.start(), issue.end());
        synchronized (ignored) {
            return ignored.contains(word) || ignored.contains(word.toLowerCase(Locale.ROOT));
        }
    }

    private List<CheckIssue> toIssues(List<RuleMatch> matches) {
        List<CheckIssue> out = new ArrayList<>(matches.size());
        for (RuleMatch m : matches) {
            Rule rule = m.getRule();
            // by id: a match from LanguageTool's sentence cache carries a stand-in rule (see the class comment)
            boolean spelling = spellingRuleIds.contains(rule.getId());
            if (!spelling && !mode.checksGrammar()) {
                continue; // defensive: such rules are disabled in this mode
            }
            String message;
            List<String> suggestions;
            if (mode.offersSuggestions()) {
                message = plain(m.getMessage());
                List<String> all = m.getSuggestedReplacements();
                suggestions = all.subList(0, Math.min(MAX_SUGGESTIONS, all.size()));
            } else {
                message = UNDERLINE_MESSAGE;
                suggestions = List.of();
            }
            out.add(new CheckIssue(spelling ? CheckIssue.Kind.SPELLING : CheckIssue.Kind.GRAMMAR, rule.getId(),
                    rule.getCategory().getId().toString(), m.getFromPos(), m.getToPos(), message, suggestions));
        }
        return List.copyOf(out);
    }

    /** LanguageTool marks suggestions inside messages with tags; show them as quotes. */
    private static String plain(String message) {
        return message.replace("<suggestion>", "\u201C").replace("</suggestion>", "\u201D");
    }

    /** Builds LanguageTool on the executor thread the first time it is needed. */
    private JLanguageTool engine() {
        if (tool != null) {
            return tool;
        }
        Language language = Languages.getLanguageForShortCode(variant.tag());
        JLanguageTool lt = new JLanguageTool(language, null, caching ? new ResultCache(SENTENCE_CACHE) : null, new UserConfig());
        Set<String> spellingIds = new LinkedHashSet<>();
        for (Rule r : lt.getAllRules()) {
            if (r.isDictionaryBasedSpellingRule()) {
                spellingIds.add(r.getId());
            }
        }
        spellingRuleIds = Set.copyOf(spellingIds);
        if (!mode.checksGrammar()) {
            List<String> off = new ArrayList<>();
            for (Rule r : lt.getAllRules()) {
                if (!r.isDictionaryBasedSpellingRule()) {
                    off.add(r.getId());
                }
            }
            lt.disableRules(off);
        }
        List<String> single = new ArrayList<>();
        List<String> phrases = new ArrayList<>();
        for (String w : examWords) {
            String s = w.strip();
            if (!s.isEmpty()) {
                (s.contains(" ") ? phrases : single).add(s);
            }
        }
        for (Rule r : lt.getAllActiveRules()) {
            if (r instanceof SpellingCheckRule speller) {
                speller.addIgnoreTokens(single);
                if (!phrases.isEmpty()) {
                    speller.acceptPhrases(phrases);
                }
            }
        }
        tool = lt;
        return lt;
    }

    /** Runs a task on the engine thread (tests use it to hold the engine busy). */
    CompletableFuture<Void> runOnEngineThread(Runnable task) {
        return CompletableFuture.runAsync(task, executor);
    }

    /** Rule ids active in this engine (built on the engine thread); for tests and diagnostics. */
    public CompletableFuture<List<String>> activeRuleIds() {
        return CompletableFuture.supplyAsync(() -> engine().getAllActiveRules().stream().map(Rule::getId).toList(), executor);
    }
}
