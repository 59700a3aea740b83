package org.inkgate.packs.dictionary;

import java.util.List;

/**
 * The answer to one dictionary lookup.
 *
 * @param query       what was asked, normalised (lower case, single spaces)
 * @param entries     the matching entries: the query itself or its base forms, nouns first
 * @param suggestions near spellings when nothing matched (empty otherwise)
 */
public record Lookup(String query, List<DictionaryEntry> entries, List<String> suggestions) {
    public Lookup {
        entries = List.copyOf(entries);
        suggestions = List.copyOf(suggestions);
    }
}
