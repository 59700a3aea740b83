package org.inkgate.packs.spelling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Clock;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.inkgate.packs.event.ToolAction;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.policy.Tool;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The checker on LanguageTool 6.6. One engine per mode is shared by the whole class (LanguageTool
 * takes seconds to start). Misspellings are commonly cited ones (from memory; they appear on
 * many published "commonly misspelled words" lists); the correct text is a passage of Strunk,
 * "The Elements of Style" (1918, public domain), rule 17, quoted from memory.
 */
class SpellingEngineTest {
    static final String STRUNK = "Vigorous writing is concise. A sentence should contain no unnecessary words, a paragraph "
            + "no unnecessary sentences, for the same reason that a drawing should have no unnecessary lines and a machine "
            + "no unnecessary parts.";
    static SpellingEngine grammar;
    static SpellingEngine suggestions;
    static SpellingEngine underline;
    static SpellingEngine british;

    @BeforeAll
    static void start() {
        Clock clock = Clock.systemUTC();
        grammar = SpellingEngine.create(EnglishVariant.EN_US, SpellingMode.SPELLING_AND_GRAMMAR, List.of("Zorvath"), clock);
        suggestions = SpellingEngine.create(EnglishVariant.EN_US, SpellingMode.SUGGESTIONS, List.of("Zorvath", "Quel Harbour"), clock);
        underline = SpellingEngine.create(EnglishVariant.EN_US, SpellingMode.UNDERLINE_ONLY, List.of(), clock);
        british = SpellingEngine.create(EnglishVariant.EN_GB, SpellingMode.SUGGESTIONS, List.of(), clock);
        // warm all four in parallel: each owns its own thread
        List.of(grammar.warmUp(), suggestions.warmUp(), underline.warmUp(), british.warmUp()).forEach(f -> f.join());
    }

    @AfterAll
    static void stop() {
        List.of(grammar, suggestions, underline, british).forEach(SpellingEngine::close);
    }

    private static List<CheckIssue> issues(SpellingEngine e, String text) {
        return e.check(text).join().issues();
    }

    @ParameterizedTest
    @ValueSource(strings = {"recieve", "definately", "seperate", "occured", "accomodate", "untill", "tommorow", "wierd"})
    void check_wellKnownMisspelling_isFlaggedWithTheCorrection(String word) {
        List<CheckIssue> found = issues(suggestions, "I will " + word + " it.");
        assertEquals(1, found.size(), found.toString());
        CheckIssue i = found.get(0);
        assertEquals(CheckIssue.Kind.SPELLING, i.kind());
        assertEquals("MORFOLOGIK_RULE_EN_US", i.ruleId());
        assertEquals(7, i.start());
        assertEquals(7 + word.length(), i.end());
        assertFalse(i.suggestions().isEmpty());
    }

    @Test
    void check_suggestions_includeTheUsualCorrection() {
        // the standard spellings of these words (any dictionary)
        assertTrue(issues(suggestions, "recieve").get(0).suggestions().contains("receive"));
        assertTrue(issues(suggestions, "seperate").get(0).suggestions().contains("separate"));
    }

    @Test
    void check_publishedStyleGuideText_hasNoIssuesInAnyMode() {
        assertEquals(List.of(), issues(grammar, STRUNK));
        assertEquals(List.of(), issues(suggestions, STRUNK));
        assertEquals(List.of(), issues(british, STRUNK));
    }

    @Test
    void check_underlineOnly_givesNoSuggestionAndANeutralMessage() {
        CheckIssue i = issues(underline, "I will recieve it.").get(0);
        assertEquals(List.of(), i.suggestions());
        assertEquals(SpellingEngine.UNDERLINE_MESSAGE, i.message());
    }

    @Test
    void check_grammarError_flaggedOnlyWhenGrammarIsAllowed() {
        String text = "This is a apple.";
        List<CheckIssue> g = issues(grammar, text);
        assertTrue(g.stream().anyMatch(i -> i.kind() == CheckIssue.Kind.GRAMMAR && i.ruleId().equals("EN_A_VS_AN")), g.toString());
        assertEquals(List.of(), issues(suggestions, text));
    }

    @Test
    void spellingOnlyModes_runNoGrammarRule() {
        for (SpellingEngine e : List.of(suggestions, underline, british)) {
            List<String> active = e.activeRuleIds().join();
            assertEquals(1, active.size(), active.toString());
            assertTrue(active.get(0).startsWith("MORFOLOGIK_RULE_EN_"), active.toString());
        }
    }

    @Test
    void check_variant_followsTheExamSpelling() {
        // "colour" is British, "color" American spelling (any English dictionary)
        assertEquals(List.of(), issues(british, "The colour of the sea."));
        assertEquals(1, issues(british, "The color of the sea.").size());
        assertEquals(1, issues(suggestions, "The colour of the sea.").size());
        assertEquals(List.of(), issues(suggestions, "The color of the sea."));
    }

    @Test
    void check_examWordList_isNotFlagged() {
        assertEquals(List.of(), issues(suggestions, "Zorvath sailed to Quel Harbour."));
        assertEquals(1, issues(underline, "Zorvath sailed home.").size());
    }

    @Test
    void ignoreWord_stopsFlaggingAndReturnsEvent() {
        SpellingChecker c = british;
        assertEquals(1, issues(british, "The Brannock flows north.").size());
        var event = c.ignoreWord("Brannock");
        assertEquals(ToolAction.IGNORE_WORD, event.action());
        assertEquals(Tool.SPELLING, event.tool());
        assertEquals("Brannock", event.query());
        assertEquals(List.of(), issues(british, "The Brannock flows north."));
        assertTrue(c.ignoredWords().contains("Brannock"));
    }

    @Test
    void check_editedParagraph_isTheOnlyOneChecked() {
        String a = "The first paragraph is about ferries.\nThe second paragraph talks about weather.\nThe third one ends here.";
        CheckResult first = grammar.check(a).join();
        assertEquals(3, first.paragraphs());
        String b = a.replace("talks about weather", "talks about the wether");
        CheckResult second = grammar.check(b).join();
        assertEquals(1, second.paragraphsChecked());
        assertEquals(0, grammar.check(b).join().paragraphsChecked());
        // offsets are in the whole text
        int at = b.indexOf("wether");
        assertTrue(second.issues().stream().anyMatch(i -> i.start() == at), second.issues().toString());
        assertEquals(Tool.GRAMMAR, second.event().tool());
        assertEquals(ToolAction.CHECK, second.event().action());
        assertEquals(second.issues().size(), second.event().hitCount());
    }

    /**
     * Issue 13: a paragraph typed without stopping. The first sentence is checked while the next
     * one is begun, so LanguageTool answers it from its sentence cache when the whole paragraph is
     * checked; its misspellings must still come back, as spelling, as on the first check.
     */
    @ParameterizedTest
    @ValueSource(strings = {"grammar", "suggestions", "underline", "british"})
    void check_sentenceAnsweredFromLanguageToolsCache_keepsItsSpellingFlags(String which) {
        SpellingEngine e = switch (which) {
            case "grammar" -> grammar;
            case "suggestions" -> suggestions;
            case "underline" -> underline;
            default -> british;
        };
        String paragraph = "I leeve on Saturday mornig. The folowing day is Sunday. Feed the cat in the evning.";
        issues(e, "I leeve on Saturday mornig. T");
        List<CheckIssue> found = issues(e, paragraph);
        // the four invented misspellings of the issue's text; every other word is standard English
        assertEquals(List.of("leeve", "mornig", "folowing", "evning"),
                found.stream().map(i -> paragraph.substring(i.start(), i.end())).toList(), found.toString());
        assertTrue(found.stream().allMatch(i -> i.kind() == CheckIssue.Kind.SPELLING), found.toString());
        // the same sentence again (answered from the cache a second time) gives the same flags
        assertEquals(found, issues(e, paragraph + " "));
    }

    /**
     * Found by the rehearsal (issue 14): LanguageTool answers a sentence unchanged since the last
     * check from its result cache, with stand-in rule objects; the misspelling in the first sentence
     * must stay flagged, as spelling, while the candidate goes on typing the second. Fresh engines,
     * so no other test's checks fill the cache first.
     */
    @Test
    void check_sentenceUnchangedSinceTheLastCheck_staysFlaggedAsSpelling() {
        String typing = "The ferry will recieve a new timetable. Passengers shoud buy a ";
        String typed = typing + "ticket.";
        for (SpellingMode mode : List.of(SpellingMode.SUGGESTIONS, SpellingMode.UNDERLINE_ONLY, SpellingMode.SPELLING_AND_GRAMMAR)) {
            SpellingEngine e = SpellingEngine.create(EnglishVariant.EN_GB, mode, List.of(), Clock.systemUTC());
            try {
                issues(e, typing);
                List<CheckIssue> found = issues(e, typed);
                for (String word : List.of("recieve", "shoud")) {
                    assertTrue(found.stream().anyMatch(i -> typed.substring(i.start(), i.end()).equals(word)
                            && i.kind() == CheckIssue.Kind.SPELLING), mode + ": " + word + " not flagged as spelling in " + found);
                }
            } finally {
                e.close();
            }
        }
    }

    @Test
    void check_newerCheck_cancelsTheStaleOne() throws Exception {
        CountDownLatch hold = new CountDownLatch(1);
        var busy = underline.runOnEngineThread(() -> {
            try {
                hold.await(30, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        });
        var stale = underline.check("An old verison of the text.");
        var fresh = underline.check("A new verison of the text.");
        assertTrue(stale.isCancelled());
        hold.countDown();
        busy.join();
        assertEquals(1, fresh.join().issues().size());
        assertThrows(CancellationException.class, stale::join);
    }

    @Test
    void create_offMode_isRefused() {
        assertThrows(IllegalArgumentException.class,
                () -> SpellingEngine.create(EnglishVariant.EN_US, SpellingMode.OFF, List.of(), Clock.systemUTC()));
    }

    @Test
    void fromTag_unknownVariant_namesTheOffered() {
        var e = assertThrows(IllegalArgumentException.class, () -> EnglishVariant.fromTag("en-IE"));
        assertTrue(e.getMessage().contains("en-ZA"));
        assertEquals(EnglishVariant.EN_NZ, EnglishVariant.fromTag("en-nz"));
    }
}
