package org.inkgate.client.sitting.course;

/** Where the current task is in its life; one value instead of flags that could contradict each other. */
public enum TaskTurn {
    /** No task is on screen. */
    NONE,
    /** The next task is due, but the sitting is paused: it begins when the invigilator resumes. */
    WAITING_FOR_RESUME,
    /** The task is open for writing (or its tools are still being prepared). */
    OPEN,
    /** The task is ending (time up, the candidate finished it, the invigilator ended it): no second end. */
    ENDING
}
