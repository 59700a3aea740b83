package org.inkgate.packs.glossary;

import java.util.List;

/**
 * One glossary search result.
 *
 * @param entryId      the entry to open for the full record
 * @param term         the matching term
 * @param language     its language
 * @param partOfSpeech its part of speech, or null
 * @param match        how it matched
 * @param equivalents  the preferred term of each other language of the entry
 */
public record GlossaryHit(String entryId, String term, String language, String partOfSpeech, MatchKind match,
                          List<Equivalent> equivalents) {
    public GlossaryHit {
        equivalents = List.copyOf(equivalents);
    }

    /** A term of the same concept in another language. */
    public record Equivalent(String language, String term) {
    }
}
