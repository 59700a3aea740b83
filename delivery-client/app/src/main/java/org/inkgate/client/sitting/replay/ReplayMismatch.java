package org.inkgate.client.sitting.replay;

/**
 * A stored text that differs from what the log replays to.
 *
 * @param taskId         the task
 * @param firstDifference the first UTF-16 index at which the two differ
 * @param storedLength   length of the stored text
 * @param replayedLength length of the replayed text, -1 when the log does not replay at all
 * @param reason         why the log does not replay, empty when it replays to a different text
 */
public record ReplayMismatch(String taskId, int firstDifference, int storedLength, int replayedLength, String reason) {

    public ReplayMismatch {
        reason = java.util.Objects.requireNonNullElse(reason, "");
    }

    /** A mismatch between two texts. */
    public ReplayMismatch(String taskId, int firstDifference, int storedLength, int replayedLength) {
        this(taskId, firstDifference, storedLength, replayedLength, "");
    }

    /** A log that does not replay (an event that does not fit). */
    public static ReplayMismatch unreplayable(String taskId, int storedLength, ReplayException e) {
        return new ReplayMismatch(taskId, 0, storedLength, -1, e.getMessage());
    }

    /** A sentence for the invigilator screen and the log. */
    public String describe() {
        if (replayedLength < 0) {
            return "task " + taskId + ": the process log cannot be replayed (" + reason + "); the saved text is kept and the"
                    + " sitting database holds both for the test owner to examine";
        }
        return "task " + taskId + ": the saved text (" + storedLength + " characters) and the text rebuilt from the process log ("
                + replayedLength + " characters) differ from character " + firstDifference
                + " on; the saved text is kept and both are in the sitting database for the test owner to examine";
    }
}
