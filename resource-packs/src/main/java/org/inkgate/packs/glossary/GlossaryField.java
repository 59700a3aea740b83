package org.inkgate.packs.glossary;

/**
 * A field of a term bank that has no place of its own in {@link GlossaryEntry}, kept so an
 * import loses nothing (e.g. TBX {@code termNote type="administrativeStatus"}, a source, a
 * transaction record).
 *
 * @param name   the data category, e.g. {@code termNote:administrativeStatus} or {@code definition/admin:source}
 * @param value  the text, whitespace collapsed
 * @param target the TBX {@code target} attribute, or null
 */
public record GlossaryField(String name, String value, String target) {
}
