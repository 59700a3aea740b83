package org.inkgate.client.processlog;

import java.util.Map;
import org.inkgate.format.response.EventType;

/**
 * Where everything a candidate does in a sitting goes. The researcher's whole view of the writing
 * process is this log, so callers record every event of {@link EventType} (the format's vocabulary). Implementations
 * stamp each event with the monotonic and wall clocks when it is recorded, return at once (never
 * block the UI thread on disk), and make it durable within half a second.
 */
public interface ProcessLog {

    /**
     * Records one event now.
     *
     * @param type   the event's type
     * @param taskId the task it happened in, or null for sitting-level events (as the type's level says)
     * @param data   the type's data keys ({@link EventType#requiredKeys()}, {@link EventType#optionalKeys()}):
     *               strings, numbers, booleans
     */
    void record(EventType type, String taskId, Map<String, Object> data);

    /**
     * Offers the task's whole current text, so recovery does not have to replay the log from the
     * start. Implementations keep only the newest text per task and write it at most every two
     * seconds while typing goes on, and at once when typing pauses.
     */
    void snapshot(String taskId, String text, int caret);

    /** A log that keeps nothing: for the practice window and the test owner's preview only. */
    static ProcessLog discarding() {
        return new ProcessLog() {
            @Override
            public void record(EventType type, String taskId, Map<String, Object> data) {
            }

            @Override
            public void snapshot(String taskId, String text, int caret) {
            }
        };
    }
}
