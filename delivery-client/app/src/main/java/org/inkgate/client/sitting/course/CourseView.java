package org.inkgate.client.sitting.course;

import java.util.List;
import org.inkgate.client.processlog.ProcessLog;
import org.inkgate.client.sitting.SittingPlan;
import org.inkgate.client.sitting.TaskStart;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.packs.broker.TaskTools;

/**
 * What the sitting's course asks of the window: show this screen, say this, hold or drop typed
 * keys. The window renders and forwards the people's actions back to {@link SittingCourse}; it
 * decides nothing about the sitting. Every call comes on the UI thread.
 */
public interface CourseView {

    /** A task on screen, as far as the course needs it. */
    interface TaskPage {
        /** The answer as it stands. */
        TaskAnswer answer();

        /** Freezes or unfreezes the answer and the task's buttons (pause, time up). */
        void setFrozen(boolean frozen);

        /** Puts the caret back in the answer. */
        void focusEditor();

        /** Releases the task's tools; the page is not used again. */
        void close();
    }

    /** The candidate's sitting began or resumed: name them, apply their display settings from the roster. */
    void candidateIn(SittingPlan plan);

    /** The candidate's sitting is closed (next candidate): back to the seat's standard display. */
    void candidateOut();

    void showSignIn();

    void showInstructions(SittingPlan plan);

    /** How the writing tools' preparation goes; shown on the instructions screen when it is up. */
    void toolsStatus(String text);

    void showQuestionnaire(QuestionnaireSpec questionnaire);

    /** The task's tools are not ready yet. */
    void showPreparingTask();

    /** Builds and shows the task's page; the log is where its workspace records. */
    TaskPage showTask(int index, int taskCount, TaskStart start, TaskTools tools, ProcessLog log);

    /** Puts the caret in the new task's answer and hands it the keys held on the way in. */
    void focusAnswer(TaskPage page);

    void showReview(List<ReviewLine> lines);

    /** The answers are being written as a response package. */
    void showSubmitting();

    /** The package could not be delivered; the screen offers to try again. */
    void showDeliveryFailed(String message);

    void showFinished(HandedIn handedIn);

    /** A recovered sitting is ready: who, and where they continue; the Continue button calls {@link SittingCourse#continueRecovered()}. */
    void showResumed(String who, String where);

    /** Keeps the time-up message on screen for a few seconds, then runs {@code then}. */
    void afterTimeUpMessage(Runnable then);

    /** Says something to the candidate (the announcement line, read by screen readers). */
    void announce(String text);

    void clearAnnouncement();

    /** A line in the invigilator's list of the sitting's events (pauses, added time, saving trouble, downtime). */
    void eventNote(String text);

    /** A line in the invigilator's focus list (focus losses and returns only). */
    void focusNote(String text);

    /** Covers or uncovers the candidate's screen while paused. */
    void coverPaused(boolean covered);

    void keys(TypedKeys what);

    /** The time left changed (a task began or ended, time was added): redraw the clock. */
    void clockChanged();
}
