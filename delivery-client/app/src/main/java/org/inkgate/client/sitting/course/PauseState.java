package org.inkgate.client.sitting.course;

/** Whether the invigilator has paused the sitting. */
public enum PauseState {
    RUNNING,
    PAUSED
}
