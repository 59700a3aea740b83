package org.inkgate.client.sitting.replay;

/**
 * A stored text that differs from what the log replays to.
 *
 * @param taskId         the task
 * @param firstDifference the first UTF-16 index at which the two differ
 * @param storedLength   length of the stored text
 * @param replayedLength length of the replayed text
 */
public record ReplayMismatch(String taskId, int firstDifference, int storedLength, int replayedLength) {

    /** A sentence for the invigilator screen and the log. */
    public String describe() {
        return "task " + taskId + ": the saved text (" + storedLength + " characters) and the text rebuilt from the process log ("
                + replayedLength + " characters) differ from character " + firstDifference
                + " on; the saved text is kept and both are in the sitting database for the test owner to examine";
    }
}
