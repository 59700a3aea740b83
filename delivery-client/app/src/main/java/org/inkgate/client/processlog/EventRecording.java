package org.inkgate.client.processlog;

import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.inkgate.format.response.EventContract;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ProcessEvent;

/** The check a process log applies to what the client records: the format's event contract, one event at a time. */
public final class EventRecording {

    private EventRecording() {
    }

    /**
     * True when the event keeps the contract of its type (data keys, level); otherwise throws, naming
     * what is wrong. Logs call it under {@code assert}, so a writer's drift fails the tests.
     */
    public static boolean keepsContract(EventType type, String taskId, Map<String, Object> data) {
        List<EventContract.Violation> v = EventContract.check(taskId == null ? List.of() : List.of(taskId),
                List.of(new ProcessEvent(0, Instant.EPOCH, 0, type, taskId, data)));
        if (!v.isEmpty()) {
            throw new IllegalArgumentException("the client recorded " + type.wireName() + " against the event contract: "
                    + v.stream().map(EventContract.Violation::detail).collect(Collectors.joining("; ")));
        }
        return true;
    }
}
