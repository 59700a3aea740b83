package org.inkgate.packs.glossary;

/** How a glossary hit matched the query, best first; results are ranked in this order. */
public enum MatchKind {
    /** The whole term equals the query (ignoring case and width). */
    EXACT,
    /** The term starts with the query (search as you type). */
    PREFIX,
    /** The term's stems match the query's stems (e.g. "clusters" finds "cluster"). */
    STEMMED,
    /** The term or one of its words is within one or two edits of the query (misspellings). */
    FUZZY
}
