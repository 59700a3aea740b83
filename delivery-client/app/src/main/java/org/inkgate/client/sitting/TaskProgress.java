package org.inkgate.client.sitting;

import java.time.Instant;
import java.util.Optional;
import org.inkgate.format.response.TaskResponse.EndReason;

/**
 * Where one task of the form stands.
 *
 * @param taskId    the task
 * @param startedAt when it first began, empty if not yet
 * @param endedAt   when it ended, empty if not yet
 * @param endReason why it ended, empty if not yet
 */
public record TaskProgress(String taskId, Optional<Instant> startedAt, Optional<Instant> endedAt,
        Optional<EndReason> endReason) {

    /** Whether the task has ended. */
    public boolean ended() {
        return endedAt.isPresent();
    }
}
