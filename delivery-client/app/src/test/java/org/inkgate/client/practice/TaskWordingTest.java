package org.inkgate.client.practice;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.inkgate.format.bundle.WordGuidance;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;
import org.junit.jupiter.api.Test;

class TaskWordingTest {

    @Test
    void tools_noTools_saysSoPlainly() {
        assertEquals(List.of(TaskWording.NO_TOOLS), TaskWording.tools(ResourcePolicy.noTools()));
    }

    @Test
    void tools_spellingWithSuggestions_namesItInPlainWords() {
        ResourcePolicy policy = new ResourcePolicy(SpellingMode.SUGGESTIONS, null, null, false, true, PastePolicy.NONE);
        assertEquals(List.of("Spelling check with suggestions"), TaskWording.tools(policy));
    }

    @Test
    void tools_everything_listsEveryToolOnItsOwnLine() {
        ResourcePolicy policy = new ResourcePolicy(SpellingMode.SPELLING_AND_GRAMMAR, "g", "d", true, true,
                PastePolicy.WITHIN_RESPONSE);
        assertEquals(List.of("Spelling and grammar check with suggestions", "Glossary of terms", "Dictionary",
                "Insert text from the resource panel", "Copy and paste within your own answer"),
                TaskWording.tools(policy));
    }

    @Test
    void guidance_rangeMinimumMaximumOrNone_readsAsAdvice() {
        assertEquals("Aim for 80 to 120 words", TaskWording.guidance(new WordGuidance(80, 120)));
        assertEquals("Aim for at least 50 words", TaskWording.guidance(new WordGuidance(50, 0)));
        assertEquals("Aim for at most 200 words", TaskWording.guidance(new WordGuidance(0, 200)));
        assertEquals("", TaskWording.guidance(null));
    }

    @Test
    void time_limitAndUntimed_sayPracticeIsNotTimed() {
        assertEquals("20 minutes in a real sitting. Practice is not timed.", TaskWording.time(1200));
        assertEquals("1 minute in a real sitting. Practice is not timed.", TaskWording.time(45));
        assertEquals("Untimed. Practice is not timed either.", TaskWording.time(0));
    }

    @Test
    void wordCount_oneAndMany_useTheRightNoun() {
        assertEquals("1 word", TaskWording.wordCount(1));
        assertEquals("0 words", TaskWording.wordCount(0));
    }
}
