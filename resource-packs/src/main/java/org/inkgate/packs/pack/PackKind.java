package org.inkgate.packs.pack;

import com.fasterxml.jackson.annotation.JsonProperty;

/** What a resource pack holds; a task names a pack for one tool, and the kind must match it. */
public enum PackKind {
    /** A term bank: concepts with terms in one or more languages. */
    @JsonProperty("glossary") GLOSSARY,
    /** A monolingual dictionary: lemmas with senses, glosses, examples and links. */
    @JsonProperty("dictionary") DICTIONARY
}
