package org.inkgate.packs.policy;

import com.fasterxml.jackson.annotation.JsonProperty;

/** What the editor pastes. External clipboard content is never pasted under any policy. */
public enum PastePolicy {
    /** Paste is disabled entirely. */
    @JsonProperty("none") NONE,
    /** Only text cut or copied inside the same response may be pasted. */
    @JsonProperty("within-response") WITHIN_RESPONSE
}
