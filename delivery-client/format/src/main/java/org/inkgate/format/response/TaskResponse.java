package org.inkgate.format.response;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.time.Instant;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeMap;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.Tool;

/**
 * One task's answer and the conditions it was written under.
 *
 * @param taskId            the task
 * @param conditionId       the condition it was sat under
 * @param text              the final text
 * @param wordCount         words in the final text, counted as the client showed them
 * @param startedAt         wall-clock start of the task
 * @param endedAt           wall-clock end of the task
 * @param extraTimeSeconds  time added for this candidate (roster accommodation plus invigilator additions)
 * @param policy            the resource policy the task ran under, as signed in the bundle
 * @param toolsOffered      the tools the client actually offered (must equal the policy's)
 * @param toolUse           use per offered tool; tools not offered never appear
 * @param endReason         why the task ended
 */
public record TaskResponse(
        String taskId,
        String conditionId,
        String text,
        int wordCount,
        Instant startedAt,
        Instant endedAt,
        long extraTimeSeconds,
        ResourcePolicy policy,
        Set<Tool> toolsOffered,
        Map<Tool, ToolUse> toolUse,
        EndReason endReason) {

    public enum EndReason {
        @JsonProperty("submitted") SUBMITTED,
        @JsonProperty("time-up") TIME_UP,
        @JsonProperty("ended-by-invigilator") ENDED_BY_INVIGILATOR
    }

    public TaskResponse {
        toolsOffered = Set.copyOf(Objects.requireNonNullElse(toolsOffered, Set.of()));
        toolUse = java.util.Collections.unmodifiableMap(new TreeMap<>(Objects.requireNonNullElse(toolUse, Map.of())));
    }
}
