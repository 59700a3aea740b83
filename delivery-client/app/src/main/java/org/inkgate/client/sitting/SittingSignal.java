package org.inkgate.client.sitting;

/** Something the sitting's UI must act on, returned by {@code Sitting.poll()}. */
public sealed interface SittingSignal {

    /** Announce (WCAG 4.1.3 status message) that {@code minutesLeft} minutes remain in the task. */
    record TimeWarning(String taskId, int minutesLeft) implements SittingSignal {
    }

    /** The task's time ran out: freeze the editor and end the task with reason time-up. */
    record TaskTimeUp(String taskId) implements SittingSignal {
    }

    /** The whole sitting's time ran out: end the current task with reason time-up and go to submission. */
    record SittingTimeUp() implements SittingSignal {
    }

    /**
     * The local database refuses writes: events are held in memory and retried. Tell the
     * invigilator at once (the candidate's work is at risk if the client then stops).
     */
    record StorageTrouble(String message) implements SittingSignal {
    }

    /** Writes succeed again after a {@link StorageTrouble}. */
    record StorageRecovered() implements SittingSignal {
    }
}
