package org.inkgate.packs.glossary;

import java.util.List;
import java.util.Objects;

/**
 * One term of a concept in one language.
 *
 * @param text         the term itself
 * @param partOfSpeech part of speech as the source gives it (e.g. {@code noun}), or null
 * @param context      an example sentence showing the term in use, or null
 * @param notes        notes on the term
 * @param other        every other field of the source, kept as read
 */
public record GlossaryTerm(String text, String partOfSpeech, String context, List<String> notes, List<GlossaryField> other) {
    public GlossaryTerm {
        Objects.requireNonNull(text, "text");
        notes = notes == null ? List.of() : List.copyOf(notes);
        other = other == null ? List.of() : List.copyOf(other);
    }
}
