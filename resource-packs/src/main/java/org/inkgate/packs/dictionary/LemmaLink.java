package org.inkgate.packs.dictionary;

import com.fasterxml.jackson.annotation.JsonProperty;

/**
 * A link from one sense of a lemma to another lemma, as WordNet records it between words.
 *
 * @param kind         what the link means
 * @param lemma        the other lemma
 * @param partOfSpeech its part of speech
 */
public record LemmaLink(Kind kind, String lemma, PartOfSpeech partOfSpeech) {
    /** The word-level relations a learner uses. */
    public enum Kind {
        /** Opposite meaning (WordNet pointer "!"). */
        @JsonProperty("antonym") ANTONYM,
        /** Same root, other part of speech (WordNet pointer "+"). */
        @JsonProperty("derivation") DERIVATION,
        /** An adjective's related noun, or an adverb's adjective (WordNet pointer "\"). */
        @JsonProperty("pertainym") PERTAINYM
    }
}
