package org.inkgate.client.sitting.course;

/** What becomes of keys the candidate types while no editor has focus. */
public enum TypedKeys {
    /** The candidate asked for the next task: what they type now belongs to it, and is kept until its editor has focus. */
    HOLD_FOR_NEXT_TASK,
    /** Time, the invigilator or a pause took the task away: keys typed now belong to no task. */
    DROP
}
