package org.inkgate.packs.spelling;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.Clock;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.Stream;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.testutil.TypingScripts;
import org.inkgate.packs.testutil.TypingScripts.Script;
import org.inkgate.packs.testutil.TypingScripts.Step;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Issue 13's property on the engine, real LanguageTool: whatever a candidate types, in whatever
 * rhythm, once the checker settles its flags on the final text equal a newly built checker's.
 * Seeded typing scripts ({@link TypingScripts}) are played into one long-lived engine per mode, as
 * a sitting's checker lives through a task: checks run at the typist's stops and part-way through
 * words (most of them overtaken and cancelled by the next), suggestions are accepted from the
 * flags of the moment. The reference is {@link SpellingEngine#withoutCaches}, checked here once
 * against a newly built engine.
 *
 * <p>{@code -Dinkgate.typing.scripts=N} runs N scripts per mode (default 12),
 * {@code -Dinkgate.typing.scripts.seed=S} starts at seed S; a failure names its seed.
 */
class SpellingEnginePropertyTest {

    static final String SCRIPTS = "inkgate.typing.scripts";
    private static final List<SpellingMode> MODES = List.of(SpellingMode.SUGGESTIONS, SpellingMode.SPELLING_AND_GRAMMAR);
    private static final Map<SpellingMode, SpellingEngine> LIVE = new EnumMap<>(SpellingMode.class);
    private static final Map<SpellingMode, SpellingEngine> REFERENCE = new EnumMap<>(SpellingMode.class);

    @BeforeAll
    static void start() {
        for (SpellingMode mode : MODES) {
            LIVE.put(mode, SpellingEngine.create(EnglishVariant.EN_GB, mode, List.of(), Clock.systemUTC()));
            REFERENCE.put(mode, SpellingEngine.withoutCaches(EnglishVariant.EN_GB, mode, List.of(), Clock.systemUTC()));
        }
        Stream.concat(LIVE.values().stream(), REFERENCE.values().stream()).map(SpellingEngine::warmUp).toList()
                .forEach(f -> f.join());
    }

    @AfterAll
    static void stop() {
        Stream.concat(LIVE.values().stream(), REFERENCE.values().stream()).forEach(SpellingEngine::close);
    }

    static Stream<Arguments> scripts() {
        List<Arguments> out = new ArrayList<>();
        for (long seed : TypingScripts.seeds(SCRIPTS, 12, 1)) {
            for (SpellingMode mode : MODES) {
                out.add(Arguments.of(mode, seed));
            }
        }
        return out.stream();
    }

    @ParameterizedTest(name = "{0}, seed {1}")
    @MethodSource("scripts")
    void typingScript_flagsAfterSettling_equalANewEnginesOnTheFinalText(SpellingMode mode, long seed) {
        SpellingEngine live = LIVE.get(mode);
        Script script = TypingScripts.generate(seed);
        String text = play(script, live);
        List<CheckIssue> settled = live.check(text).join().issues();
        List<CheckIssue> expected = REFERENCE.get(mode).check(text).join().issues();
        assertEquals(expected, settled, script + " in " + mode + " (rerun with -D" + SCRIPTS + "=1 -D" + SCRIPTS
                + ".seed=" + seed + "); final text:\n" + text);
    }

    /** The reference is what a newly built engine finds (here on the issue's paragraph and on one script's text). */
    @Test
    void reference_findsWhatANewlyBuiltEngineFinds() {
        String text = play(TypingScripts.generate(1), REFERENCE.get(SpellingMode.SUGGESTIONS));
        for (String t : List.of("I leeve on Saturday mornig. The folowing day is Sunday. Feed the cat in the evning.", text)) {
            try (SpellingEngine fresh = SpellingEngine.create(EnglishVariant.EN_GB, SpellingMode.SUGGESTIONS, List.of(), Clock.systemUTC())) {
                assertEquals(fresh.check(t).join().issues(), REFERENCE.get(SpellingMode.SUGGESTIONS).check(t).join().issues(), t);
            }
        }
    }

    /** Plays the script into the engine; returns the final text. */
    private static String play(Script script, SpellingEngine engine) {
        Random when = new Random(script.seed() ^ 0x5eedL); // where mid-word checks fall; from the seed, so reruns repeat
        TypingScripts.Text t = new TypingScripts.Text();
        List<Step> steps = script.steps();
        for (int s = 0; s < steps.size(); s++) {
            Step step = steps.get(s);
            switch (step) {
                case Step.Type type -> {
                    String chunk = type.text();
                    if (chunk.length() > 1 && when.nextBoolean()) {
                        // the client's timer fires part-way through a word: a check of the text as it was then
                        int cut = 1 + when.nextInt(chunk.length() - 1);
                        t.type(chunk.substring(0, cut));
                        engine.check(t.text());
                        t.type(chunk.substring(cut));
                    } else {
                        t.type(chunk);
                    }
                    if (s + 1 == steps.size() || !(steps.get(s + 1) instanceof Step.Pause)) {
                        engine.check(t.text()); // overtaken by the next check unless the engine is quicker
                    }
                }
                case Step.Pause pause -> {
                    if (pause.millis() >= 300) {
                        engine.check(t.text()).join(); // a stop long enough for the check to come back
                    } else {
                        engine.check(t.text());
                    }
                }
                case Step.MoveCaret move -> t.moveCaret(move.where());
                case Step.Backspace back -> {
                    t.backspace(back.count());
                    engine.check(t.text());
                }
                case Step.Paste paste -> {
                    t.paste(paste);
                    engine.check(t.text());
                }
                case Step.AcceptSuggestion accept -> {
                    List<CheckIssue> offered = engine.check(t.text()).join().issues().stream()
                            .filter(i -> !i.suggestions().isEmpty()).toList();
                    if (!offered.isEmpty()) {
                        CheckIssue i = offered.get(Math.min(offered.size() - 1, (int) (accept.which() * offered.size())));
                        t.replace(i.start(), i.end(), i.suggestions().get(0));
                        engine.check(t.text());
                    }
                }
            }
        }
        return t.text();
    }
}
