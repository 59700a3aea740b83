package org.inkgate.packs.glossary;

import java.util.List;
import java.util.Objects;

/**
 * One concept of a term bank (a TBX {@code conceptEntry}), with its terms per language.
 *
 * @param id           the entry id, unique in the pack
 * @param subjectField the subject field, or null
 * @param notes        notes at concept level
 * @param languages    the language sections
 * @param other        every other field of the source, kept as read
 */
public record GlossaryEntry(String id, String subjectField, List<String> notes, List<LanguageSection> languages,
                            List<GlossaryField> other) {
    public GlossaryEntry {
        Objects.requireNonNull(id, "id");
        notes = notes == null ? List.of() : List.copyOf(notes);
        languages = languages == null ? List.of() : List.copyOf(languages);
        other = other == null ? List.of() : List.copyOf(other);
    }
}
