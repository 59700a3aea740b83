package org.inkgate.packs.policy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import org.junit.jupiter.api.Test;

class ResourcePolicyTest {

    @Test
    void offeredTools_noTools_isEmpty() {
        assertTrue(ResourcePolicy.noTools().offeredTools().isEmpty());
    }

    @Test
    void offeredTools_underlineOnly_offersSpellingWithoutGrammarOrSuggestions() {
        ResourcePolicy policy = new ResourcePolicy(SpellingMode.UNDERLINE_ONLY, null, null, false, true, PastePolicy.NONE);
        assertEquals(EnumSet.of(Tool.SPELLING), policy.offeredTools());
        assertFalse(policy.spelling().offersSuggestions());
    }

    @Test
    void offeredTools_everything_offersAllFourTools() {
        ResourcePolicy policy = new ResourcePolicy(
                SpellingMode.SPELLING_AND_GRAMMAR, "glossary-a", "wordnet-3.1", true, true, PastePolicy.WITHIN_RESPONSE);
        assertEquals(EnumSet.allOf(Tool.class), policy.offeredTools());
        assertTrue(policy.allows(Tool.DICTIONARY));
    }

    @Test
    void construct_blankPackId_isRefusedWithHowToFix() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new ResourcePolicy(SpellingMode.OFF, " ", null, false, true, PastePolicy.NONE));
        assertTrue(e.getMessage().contains("leave it out"), e.getMessage());
    }
}
