package org.inkgate.client.sitting.course;

/** Where a sitting window is: what shows, and so which invigilator actions and which checks apply. */
public enum FlowScreen {
    /** Between screens (a task ended and the next is being chosen), or nothing shown yet. */
    NONE,
    /** The bundle could not be opened. */
    REFUSED,
    /** An unfinished sitting was found, or one was just resumed and waits for Continue. */
    RECOVERY,
    SETUP,
    SIGN_IN,
    INSTRUCTIONS,
    QUESTIONNAIRE,
    TASK,
    REVIEW,
    /** Handed in; the package is being written or its delivery failed and waits for a retry. */
    SUBMIT,
    /** The package is delivered: this candidate's sitting is over. */
    FINISHED
}
