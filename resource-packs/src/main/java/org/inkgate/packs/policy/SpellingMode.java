package org.inkgate.packs.policy;

import com.fasterxml.jackson.annotation.JsonProperty;

/** How much help the spelling/grammar engine may give in a task, from none to the most. */
public enum SpellingMode {
    /** No checking at all: the engine is not constructed. */
    @JsonProperty("off") OFF,
    /** Misspellings are underlined, no suggestions are offered. */
    @JsonProperty("underline-only") UNDERLINE_ONLY,
    /** Misspellings are underlined and suggestions offered. */
    @JsonProperty("suggestions") SUGGESTIONS,
    /** Spelling and grammar are checked, both with suggestions. */
    @JsonProperty("spelling-and-grammar") SPELLING_AND_GRAMMAR;

    public boolean checksSpelling() {
        return this != OFF;
    }

    public boolean offersSuggestions() {
        return this == SUGGESTIONS || this == SPELLING_AND_GRAMMAR;
    }

    public boolean checksGrammar() {
        return this == SPELLING_AND_GRAMMAR;
    }
}
