package org.inkgate.client.sitting.course;

import java.util.ArrayList;
import java.util.List;
import org.inkgate.client.processlog.ProcessLog;
import org.inkgate.client.sitting.SittingPlan;
import org.inkgate.client.sitting.TaskStart;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.response.EventType;
import org.inkgate.packs.broker.TaskTools;

/** A window without a window: records what the course asks for, so tests read it back. */
final class RecordingView implements CourseView {

    final List<String> shown = new ArrayList<>();
    final List<String> announcements = new ArrayList<>();
    final List<String> eventNotes = new ArrayList<>();
    final List<String> focusNotes = new ArrayList<>();
    final List<String> toolsStatus = new ArrayList<>();
    final List<TypedKeys> keys = new ArrayList<>();
    final List<FakePage> pages = new ArrayList<>();
    final List<TaskPage> focused = new ArrayList<>();
    List<ReviewLine> review;
    String questionnaire;
    String resumedWhere;
    boolean covered;
    boolean candidateOut;
    Runnable afterTimeUp;

    /** The task page shown last. */
    FakePage page() {
        if (pages.isEmpty()) {
            throw new AssertionError("no task page was shown: " + shown);
        }
        return pages.getLast();
    }

    /** Ends the time-up message's pause, as the window's timer would. */
    void runTimeUpPause() {
        Runnable then = afterTimeUp;
        afterTimeUp = null;
        if (then == null) {
            throw new AssertionError("no time-up message is showing");
        }
        then.run();
    }

    @Override
    public void candidateIn(SittingPlan plan) {
        shown.add("candidate " + plan.candidateNumber());
        candidateOut = false;
    }

    @Override
    public void candidateOut() {
        candidateOut = true;
    }

    @Override
    public void showSignIn() {
        shown.add("sign-in");
    }

    @Override
    public void showInstructions(SittingPlan plan) {
        shown.add("instructions");
    }

    @Override
    public void toolsStatus(String text) {
        toolsStatus.add(text);
    }

    @Override
    public void showQuestionnaire(QuestionnaireSpec q) {
        shown.add("questionnaire " + q.id());
        questionnaire = q.id();
    }

    @Override
    public void showPreparingTask() {
        shown.add("preparing");
    }

    @Override
    public TaskPage showTask(int index, int taskCount, TaskStart start, TaskTools tools, ProcessLog log) {
        shown.add("task " + start.task().id());
        FakePage page = new FakePage(start.task().id(), start.text(), tools, log);
        pages.add(page);
        return page;
    }

    @Override
    public void focusAnswer(TaskPage page) {
        focused.add(page);
    }

    @Override
    public void showReview(List<ReviewLine> lines) {
        shown.add("review");
        review = lines;
    }

    @Override
    public void showSubmitting() {
        shown.add("submitting");
    }

    @Override
    public void showDeliveryFailed(String message) {
        shown.add("delivery failed: " + message);
    }

    @Override
    public void showFinished(HandedIn handedIn) {
        shown.add("finished");
    }

    @Override
    public void showResumed(String who, String where) {
        shown.add("resumed");
        resumedWhere = where;
    }

    @Override
    public void afterTimeUpMessage(Runnable then) {
        afterTimeUp = then;
    }

    @Override
    public void announce(String text) {
        announcements.add(text);
    }

    @Override
    public void clearAnnouncement() {
    }

    @Override
    public void eventNote(String text) {
        eventNotes.add(text);
    }

    @Override
    public void focusNote(String text) {
        focusNotes.add(text);
    }

    @Override
    public void coverPaused(boolean cover) {
        covered = cover;
    }

    @Override
    public void keys(TypedKeys what) {
        keys.add(what);
    }

    @Override
    public void clockChanged() {
    }

    /** A task page whose answer the test types, logged as the real workspace logs it. */
    static final class FakePage implements TaskPage {
        final String taskId;
        final StringBuilder text;
        private final TaskTools tools;
        private final ProcessLog log;
        boolean frozen;
        boolean closed;

        FakePage(String taskId, String startText, TaskTools tools, ProcessLog log) {
            this.taskId = taskId;
            this.text = new StringBuilder(startText);
            this.tools = tools;
            this.log = log;
        }

        void type(String typed) {
            if (frozen || closed) {
                throw new AssertionError("typed into a frozen or closed page");
            }
            int pos = text.length();
            text.append(typed);
            log.record(EventType.TEXT_INSERT, taskId, java.util.Map.of("pos", pos, "len", typed.length(), "text", typed,
                    "source", "typing"));
            log.snapshot(taskId, text.toString(), text.length());
        }

        @Override
        public TaskAnswer answer() {
            return new TaskAnswer(text.toString(), org.inkgate.client.practice.WordCount.of(text.toString()),
                    java.util.Map.of());
        }

        @Override
        public void setFrozen(boolean frozen) {
            this.frozen = frozen;
        }

        @Override
        public void focusEditor() {
        }

        @Override
        public void close() {
            closed = true;
            tools.close();
        }
    }
}
