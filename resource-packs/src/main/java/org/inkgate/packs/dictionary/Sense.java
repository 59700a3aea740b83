package org.inkgate.packs.dictionary;

import java.util.List;

/**
 * One sense of a lemma, in WordNet's order (most frequent in the tagged corpus first).
 *
 * @param number   1-based sense number
 * @param gloss    the definition
 * @param examples example phrases from the gloss
 * @param synonyms other lemmas of the same synset
 * @param links    antonyms, derivations and pertainyms of this lemma in this sense
 */
public record Sense(int number, String gloss, List<String> examples, List<String> synonyms, List<LemmaLink> links) {
    public Sense {
        examples = List.copyOf(examples);
        synonyms = List.copyOf(synonyms);
        links = List.copyOf(links);
    }
}
