package org.inkgate.packs.dictionary;

import java.util.List;

/**
 * A lemma in one part of speech with all its senses; its id is {@code <pos>:<lemma>}.
 *
 * @param lemma        the base form, words separated by spaces (WordNet's underscores replaced)
 * @param partOfSpeech the part of speech
 * @param senses       the senses, most frequent first
 */
public record DictionaryEntry(String lemma, PartOfSpeech partOfSpeech, List<Sense> senses) {
    public DictionaryEntry {
        senses = List.copyOf(senses);
    }

    /** The id events and callers use for this entry, e.g. {@code noun:goose}. */
    public String id() {
        return partOfSpeech.label() + ":" + lemma;
    }
}
