package org.inkgate.client.sitting.course;

import org.inkgate.client.sitting.recovery.UnfinishedSitting;
import org.inkgate.client.sitting.store.SittingScreen;

/** Where a recovered sitting continues, decided from what its database says about the moment it stopped. */
public enum ResumePoint {
    /** Handed in, but the package was not yet delivered: the delivery is tried again. */
    DELIVERY,
    /** Every task had ended and the review was showing: the review again. */
    REVIEW,
    /** Every task had ended: the questionnaire after the tasks (if the form has one), then the review. */
    AFTER_TASKS,
    /** A task was open, or is due: it continues with the text saved so far. */
    TASK,
    /** The questionnaire before the tasks was showing: it shows again. */
    QUESTIONNAIRE_BEFORE_TASKS,
    /** Nothing of the candidate's work had begun: the instructions again. */
    INSTRUCTIONS;

    /**
     * @param submitted  whether the sitting core holds a hand-in
     * @param tasksLeft  whether a task is still to be written
     */
    public static ResumePoint of(UnfinishedSitting found, boolean submitted, boolean tasksLeft) {
        if (found.stage() == UnfinishedSitting.Stage.AWAITING_DELIVERY || submitted) {
            return DELIVERY;
        }
        if (!tasksLeft) {
            return found.screen() == SittingScreen.REVIEW ? REVIEW : AFTER_TASKS;
        }
        if (found.currentTask().isPresent() || found.screen() == SittingScreen.TASK) {
            return TASK;
        }
        return found.screen() == SittingScreen.QUESTIONNAIRE ? QUESTIONNAIRE_BEFORE_TASKS : INSTRUCTIONS;
    }
}
