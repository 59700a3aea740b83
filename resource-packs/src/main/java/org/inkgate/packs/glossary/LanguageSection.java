package org.inkgate.packs.glossary;

import java.util.List;
import java.util.Objects;

/**
 * The part of a concept in one language.
 *
 * @param language   BCP 47 tag, e.g. {@code en}, {@code es}
 * @param definition the definition in this language, or null
 * @param notes      notes at language level
 * @param terms      the terms, first one preferred
 * @param other      every other field of the source, kept as read
 */
public record LanguageSection(String language, String definition, List<String> notes, List<GlossaryTerm> terms,
                              List<GlossaryField> other) {
    public LanguageSection {
        Objects.requireNonNull(language, "language");
        notes = notes == null ? List.of() : List.copyOf(notes);
        terms = terms == null ? List.of() : List.copyOf(terms);
        other = other == null ? List.of() : List.copyOf(other);
    }
}
