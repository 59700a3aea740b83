package org.inkgate.packs.event;

import java.time.Instant;
import java.util.Objects;
import org.inkgate.packs.policy.Tool;

/**
 * One observable use of a writing tool, returned with every query, opened entry and check so
 * the client can log it beside the response.
 *
 * @param tool          the tool used
 * @param action        what was done
 * @param packId        id of the pack used, or null for the spelling/grammar engine
 * @param query         the query text, the ignored word, or null for a check
 * @param hitCount      hits returned, issues found, or 0
 * @param entryId       the opened entry's id, or null
 * @param at            when the use started (UTC)
 * @param elapsedMicros how long the tool took, in microseconds
 */
public record ToolEvent(Tool tool, ToolAction action, String packId, String query, int hitCount,
                        String entryId, Instant at, long elapsedMicros) {
    public ToolEvent {
        Objects.requireNonNull(tool, "tool");
        Objects.requireNonNull(action, "action");
        Objects.requireNonNull(at, "at");
    }
}
