package org.inkgate.packs.event;

import com.fasterxml.jackson.annotation.JsonProperty;

/** What a candidate (or the client on their behalf) did with a tool. */
public enum ToolAction {
    /** A search or lookup with a query. */
    @JsonProperty("query") QUERY,
    /** An entry from a result list was opened. */
    @JsonProperty("open-entry") OPEN_ENTRY,
    /** The text was checked (spelling/grammar). */
    @JsonProperty("check") CHECK,
    /** The candidate asked the checker to ignore a word. */
    @JsonProperty("ignore-word") IGNORE_WORD
}
