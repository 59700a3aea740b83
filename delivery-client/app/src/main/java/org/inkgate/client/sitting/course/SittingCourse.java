package org.inkgate.client.sitting.course;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.time.Duration;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.Executor;
import org.inkgate.client.practice.WordCount;
import org.inkgate.client.sitting.Sitting;
import org.inkgate.client.sitting.SittingPlan;
import org.inkgate.client.sitting.SittingSignal;
import org.inkgate.client.sitting.TaskStart;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.sitting.recovery.UnfinishedSitting;
import org.inkgate.client.sitting.replay.ReplayException;
import org.inkgate.client.sitting.replay.TextReplay;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.store.SittingScreen;
import org.inkgate.client.sitting.submit.DeliveryFailure;
import org.inkgate.client.sitting.submit.InstallationKey;
import org.inkgate.client.sitting.submit.SubmissionResult;
import org.inkgate.client.sitting.timing.TimeText;
import org.inkgate.client.sitting.tools.ToolSupply;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.bundle.WordGuidance;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.TaskResponse.EndReason;
import org.inkgate.packs.broker.TaskTools;

/**
 * The course of the sittings at one seat, from a candidate's sign-in to the hand-in and the next
 * candidate: which screen follows which, when a task ends (time up, the candidate, the
 * invigilator), pause and resume, where a recovered sitting continues, when the writing tools are
 * prepared, the hand-off to submission. Every state change goes through the sitting core
 * ({@link Sitting}), which logs it and makes it durable; the window ({@link CourseView}) renders
 * what this class says and forwards what people do. No JavaFX: it runs and is tested on a fake
 * clock. All methods are called on the UI thread; background work comes back through {@code ui}.
 */
public final class SittingCourse {

    /** Wall-clock times as the invigilator reads them, in the machine's zone. */
    public static final DateTimeFormatter CLOCK = DateTimeFormatter.ofPattern("HH:mm:ss").withZone(ZoneId.systemDefault());

    /** What the candidate's screen says while paused. */
    public static final String PAUSED = "The exam is paused";

    private final ExamAtSeat exam;
    private final ClientDataFolder data;
    private final SittingClock clock;
    private final ToolSupply tools;
    private final CourseView view;
    private final Executor ui;
    private final Executor background;

    private Path outputFolder;
    private String seat = "";
    private String openForm;
    private Sitting sitting;
    private SittingPlan plan;
    private FlowScreen screen = FlowScreen.NONE;
    private TaskTurn turn = TaskTurn.NONE;
    private PauseState pause = PauseState.RUNNING;
    /** When the invigilator paused (monotonic), for the resume line; MIN_VALUE when not paused here. */
    private long pausedAtMono = Long.MIN_VALUE;
    /** Whether a focus loss was listed, so that its return is listed too. */
    private FocusWatch focus = FocusWatch.IN_WINDOW;

    /** Focus as the invigilator's list knows it. */
    private enum FocusWatch { IN_WINDOW, LOSS_LISTED }
    private int taskIndex = -1;
    private CourseView.TaskPage page;
    /** The task's text when it began, kept for a task whose tools never arrived. */
    private String startText;
    private QuestionnairePlace questionnairePlace;
    private ResumePoint resumePoint;
    private HandedIn handedIn;
    private final Map<String, Integer> words = new LinkedHashMap<>();

    /**
     * @param ui         runs work on the UI thread (the window's; a direct executor in tests)
     * @param background runs slow work (writing the response package) off it
     */
    public SittingCourse(ExamAtSeat exam, ClientDataFolder data, SittingClock clock, ToolSupply tools, CourseView view,
            Executor ui, Executor background) {
        this.exam = Objects.requireNonNull(exam, "exam");
        this.data = Objects.requireNonNull(data, "data");
        this.clock = Objects.requireNonNull(clock, "clock");
        this.tools = Objects.requireNonNull(tools, "tools");
        this.view = Objects.requireNonNull(view, "view");
        this.ui = Objects.requireNonNull(ui, "ui");
        this.background = Objects.requireNonNull(background, "background");
    }

    // ---- the seat and sign-in ----

    /** The invigilator's set-up is done: packages go to this folder; the sign-in screen shows. */
    public void seatReady(Path output, String seatLabel, String formId) {
        outputFolder = output.toAbsolutePath();
        seat = seatLabel == null ? "" : seatLabel;
        openForm = formId;
        showSignIn();
    }

    private void showSignIn() {
        screen = FlowScreen.SIGN_IN;
        view.showSignIn();
    }

    /**
     * The candidate typed their number: the sitting begins and the instructions show.
     *
     * @return what to tell the candidate when the number is refused or the sitting cannot start; empty when it began
     */
    public Optional<String> signIn(String number) {
        SittingPlan candidate;
        try {
            candidate = SittingPlan.forCandidate(exam.manifest(), exam.manifestSha256(), exam.bundleFile(), number, seat,
                    openForm, exam.clientVersion());
        } catch (IllegalArgumentException e) {
            return Optional.of(sentence(e.getMessage()));
        }
        try {
            sitting = Sitting.begin(candidate, data, clock, outputFolder);
        } catch (IOException | RuntimeException e) {
            return Optional.of("The sitting could not be started on this machine (" + e.getMessage()
                    + "). Ask the invigilator.");
        }
        plan = candidate;
        view.candidateIn(plan);
        showInstructions();
        return Optional.empty();
    }

    // ---- instructions, with the tools warming up ----

    private void showInstructions() {
        screen = FlowScreen.INSTRUCTIONS;
        sitting.showScreen(SittingScreen.INSTRUCTIONS);
        view.showInstructions(plan);
        prepareTools(plan.form(), true);
    }

    /** Starts the form's tools (once per candidate); with {@code report}, their progress shows on the instructions. */
    private void prepareTools(FormSpec form, boolean report) {
        boolean already = tools.started();
        if (report && !already) {
            view.toolsStatus("Preparing the writing tools...");
        }
        CompletableFuture<Void> ready;
        try {
            ready = tools.prepare(form);
        } catch (IOException | UncheckedIOException e) {
            if (report) {
                view.toolsStatus("The writing tools could not be prepared (" + e.getMessage() + "). Ask the invigilator.");
            }
            return;
        }
        if (report) {
            ready.thenRun(() -> ui.execute(() -> {
                if (screen == FlowScreen.INSTRUCTIONS) {
                    view.toolsStatus("The writing tools are ready.");
                }
            }));
        }
    }

    /** The candidate pressed Begin on the instructions: the questionnaire before the tasks, or the first task. */
    public void instructionsRead() {
        String pre = plan.form().preQuestionnaire();
        if (pre != null) {
            showQuestionnaire(pre, QuestionnairePlace.BEFORE_TASKS);
        } else {
            startAskedForTask();
        }
    }

    /** The candidate asked for the next task (Begin, Done, finish this task): what they type at once goes into it. */
    private void startAskedForTask() {
        view.keys(TypedKeys.HOLD_FOR_NEXT_TASK);
        startNextTask();
    }

    // ---- questionnaires ----

    private void showQuestionnaire(String id, QuestionnairePlace place) {
        screen = FlowScreen.QUESTIONNAIRE;
        questionnairePlace = place;
        sitting.showScreen(SittingScreen.QUESTIONNAIRE);
        view.showQuestionnaire(plan.manifest().questionnaire(id).orElseThrow());
    }

    /** The candidate answered the questionnaire on screen (item id to value): they are recorded and the sitting moves on. */
    public void questionnaireAnswered(Map<String, String> answers) {
        if (screen != FlowScreen.QUESTIONNAIRE) {
            return;
        }
        String id = questionnairePlace == QuestionnairePlace.BEFORE_TASKS ? plan.form().preQuestionnaire()
                : plan.form().postQuestionnaire();
        answers.forEach((item, value) -> sitting.answer(id, item, value));
        if (questionnairePlace == QuestionnairePlace.BEFORE_TASKS) {
            startAskedForTask();
        } else {
            showReview();
        }
    }

    // ---- tasks ----

    private void startNextTask() {
        Optional<String> next = sitting.nextTask();
        if (next.isEmpty()) {
            view.keys(TypedKeys.DROP);
            afterTasks(false);
            return;
        }
        List<FormSlot> slots = plan.form().slots();
        for (int i = 0; i < slots.size(); i++) {
            if (slots.get(i).taskId().equals(next.get())) {
                enterTask(i);
                return;
            }
        }
        throw new IllegalStateException("task " + next.get() + " is not in form " + plan.formId());
    }

    private void enterTask(int index) {
        FormSlot slot = plan.form().slots().get(index);
        if (pause == PauseState.PAUSED) {
            // a sitting recovered while paused: the task begins when the invigilator resumes
            view.keys(TypedKeys.DROP);
            turn = TaskTurn.WAITING_FOR_RESUME;
            return;
        }
        screen = FlowScreen.TASK;
        taskIndex = index;
        turn = TaskTurn.OPEN;
        sitting.showScreen(SittingScreen.TASK);
        TaskStart start;
        try {
            start = sitting.enterTask(slot.taskId());
        } catch (IOException e) {
            view.keys(TypedKeys.DROP);
            view.announce("Invigilator: the task could not be started, because the saved work could not"
                    + " be read (" + e.getMessage() + "). Do not close the program; contact the test owner's support.");
            return;
        }
        startText = start.text();
        view.showPreparingTask();
        prepareTools(plan.form(), false); // after a restart the instructions may be skipped
        CompletableFuture<TaskTools> taking;
        try {
            taking = tools.take(slot.taskId());
        } catch (IllegalStateException e) {
            taking = CompletableFuture.failedFuture(e); // the tools could not be prepared: said on the task's screen
        }
        taking.whenComplete((taken, failure) -> ui.execute(() -> toolsArrived(index, start, taken, failure)));
    }

    /** The task's tools are ready (or failed): show the task, unless it ended while they were being prepared. */
    private void toolsArrived(int index, TaskStart start, TaskTools taken, Throwable failure) {
        if (screen != FlowScreen.TASK || taskIndex != index || turn == TaskTurn.ENDING) {
            // the task ended (time, invigilator) while its tools were being prepared
            if (taken != null) {
                taken.close();
            }
            return;
        }
        if (failure != null) {
            view.keys(TypedKeys.DROP);
            view.announce(sentence(rootMessage(failure)) + " Ask the invigilator.");
            return;
        }
        page = view.showTask(index, plan.form().slots().size(), start, taken, sitting.log());
        view.clearAnnouncement();
        start.mismatch().ifPresent(m -> view.eventNote("Recovery note: " + m.describe()));
        view.clockChanged();
        if (pause == PauseState.PAUSED) {
            view.keys(TypedKeys.DROP);
            freeze(true);
        } else {
            view.focusAnswer(page);
        }
    }

    /** The timers' heartbeat (several times a second): warnings, time up, saving trouble. */
    public void tick() {
        if (sitting == null) {
            return;
        }
        for (SittingSignal signal : sitting.poll()) {
            switch (signal) {
                case SittingSignal.TimeWarning warning -> view.announce(warning.minutesLeft()
                        + (warning.minutesLeft() == 1 ? " minute" : " minutes") + " left in this task.");
                case SittingSignal.TaskTimeUp up -> timeUp(false);
                case SittingSignal.SittingTimeUp up -> timeUp(true);
                case SittingSignal.StorageTrouble trouble -> storageTrouble(trouble.message());
                case SittingSignal.StorageRecovered ok -> view.eventNote("Saving works again.");
            }
        }
    }

    private void timeUp(boolean wholeSitting) {
        if (screen != FlowScreen.TASK || turn == TaskTurn.ENDING) {
            return;
        }
        turn = TaskTurn.ENDING;
        view.keys(TypedKeys.DROP); // keys typed after the time is up belong to no task
        freeze(true);
        view.announce(wholeSitting ? "The time for the whole exam is up. Your answers have been saved."
                : "The time for this task is up. Your answer has been saved.");
        view.afterTimeUpMessage(() -> finishTask(EndReason.TIME_UP, wholeSitting));
    }

    /** The candidate confirmed "finish this task". */
    public void finishTaskAsked() {
        endTask(EndReason.SUBMITTED);
    }

    /** The invigilator confirmed "end the current task". */
    public void endTaskByInvigilator() {
        endTask(EndReason.ENDED_BY_INVIGILATOR);
    }

    private void endTask(EndReason reason) {
        // no page yet: the task's tools are still being prepared, and there is nothing to end
        if (screen != FlowScreen.TASK || turn == TaskTurn.ENDING || page == null) {
            return;
        }
        turn = TaskTurn.ENDING;
        view.keys(reason == EndReason.SUBMITTED ? TypedKeys.HOLD_FOR_NEXT_TASK : TypedKeys.DROP);
        finishTask(reason, false);
    }

    private void finishTask(EndReason reason, boolean endSitting) {
        String taskId = plan.form().slots().get(taskIndex).taskId();
        if (page != null) {
            TaskAnswer answer = page.answer();
            words.put(taskId, answer.words());
            sitting.endTask(taskId, reason, answer.text(), answer.words(), answer.toolUse());
            page.close();
        } else {
            // the time ran out before the task's tools were ready: the text is what was there when it began
            String text = startText == null ? "" : startText;
            words.put(taskId, WordCount.of(text));
            sitting.endTask(taskId, reason, text, WordCount.of(text), Map.of());
        }
        page = null;
        startText = null;
        turn = TaskTurn.NONE;
        screen = FlowScreen.NONE;
        view.clearAnnouncement();
        view.clockChanged();
        if (endSitting) {
            sitting.endUnstartedTasks(EndReason.TIME_UP);
        }
        startNextTask();
    }

    private void freeze(boolean frozen) {
        if (page != null) {
            page.setFrozen(frozen);
        }
    }

    // ---- after the tasks ----

    /** After the last task: the post-task questionnaire (unless it was done before a restart), then the review. */
    private void afterTasks(boolean questionnaireDone) {
        String post = plan.form().postQuestionnaire();
        if (post != null && !questionnaireDone) {
            showQuestionnaire(post, QuestionnairePlace.AFTER_TASKS);
        } else {
            showReview();
        }
    }

    private void showReview() {
        screen = FlowScreen.REVIEW;
        sitting.showScreen(SittingScreen.REVIEW);
        List<ReviewLine> lines = new ArrayList<>();
        for (FormSlot slot : plan.form().slots()) {
            TaskSpec task = plan.manifest().task(slot.taskId()).orElseThrow();
            lines.add(new ReviewLine(task.title(), wordsOf(task.id()), guidance(task.words())));
        }
        view.showReview(lines);
    }

    static String guidance(WordGuidance words) {
        if (words == null || (words.min() == 0 && words.max() == 0)) {
            return null;
        }
        if (words.max() == 0) {
            return "suggested: at least " + words.min();
        }
        return words.min() == 0 ? "suggested: up to " + words.max()
                : "suggested: " + words.min() + " to " + words.max();
    }

    /** Words in an ended task: counted at its end, or rebuilt from the log for tasks ended before a restart. */
    private int wordsOf(String taskId) {
        Integer counted = words.get(taskId);
        if (counted != null) {
            return counted;
        }
        try {
            return WordCount.of(TextReplay.replay(taskId, sitting.log().events(taskId, 0)).text());
        } catch (IOException | ReplayException e) {
            return 0;
        }
    }

    // ---- hand-in ----

    /** The candidate handed in on the review screen: the response package is written and delivered. */
    public void handIn() {
        if (screen != FlowScreen.REVIEW) {
            return;
        }
        screen = FlowScreen.SUBMIT;
        view.showSubmitting();
        deliverInBackground(() -> sitting.submit(outputFolder, InstallationKey.loadOrCreate(data)));
    }

    /** The candidate (or invigilator) asked to try the delivery again. */
    public void retryDelivery() {
        if (screen != FlowScreen.SUBMIT) {
            return;
        }
        view.showSubmitting();
        deliverInBackground(() -> sitting.retryDelivery(outputFolder));
    }

    /** Work that may fail with an I/O error. */
    @FunctionalInterface
    private interface Delivery {
        SubmissionResult run() throws IOException;
    }

    private void deliverInBackground(Delivery delivery) {
        CompletableFuture.supplyAsync(() -> {
            try {
                return delivery.run();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }, background).whenComplete((result, failure) -> ui.execute(() -> {
            if (failure != null) {
                String message = "The answers could not be saved as a response package (" + rootMessage(failure)
                        + "). Everything typed is still in this machine's sitting database.";
                view.eventNote(message);
                view.showDeliveryFailed(message);
                return;
            }
            delivered(result);
        }));
    }

    private void delivered(SubmissionResult result) {
        if (result.failure().isPresent()) {
            DeliveryFailure failure = result.failure().get();
            view.eventNote("Hand-in to the output folder failed: " + failure.message());
            view.showDeliveryFailed(failure.message());
            return;
        }
        screen = FlowScreen.FINISHED;
        handedIn = new HandedIn(result.delivered().orElseThrow(), result.localCopy(), clock.now());
        view.showFinished(handedIn);
    }

    // ---- recovery ----

    /** An unfinished sitting shows for the invigilator to resume: the tools start while they read, unless only the delivery is left. */
    public void recoveryFound(UnfinishedSitting found) {
        screen = FlowScreen.RECOVERY;
        if (found.stage() != UnfinishedSitting.Stage.AWAITING_DELIVERY) {
            // the restored text is then checked as soon as the task shows, not after LanguageTool's start
            exam.manifest().form(found.formId()).ifPresent(form -> prepareTools(form, false));
        }
    }

    /**
     * The invigilator resumed the unfinished sitting (PIN and output folder checked).
     *
     * @param down   how long the machine was down, as the recovery screen said
     * @param credit whether that time is given back to the candidate
     * @return why it could not be resumed; empty when the resumed screen shows
     */
    public Optional<String> resume(UnfinishedSitting found, Duration down, boolean credit, Path output) {
        try {
            sitting = Sitting.resume(found, exam.manifest(), exam.manifestSha256(), credit ? down : Duration.ZERO, data,
                    clock);
        } catch (IOException | RuntimeException e) {
            return Optional.of("The sitting could not be resumed (" + e.getMessage() + "). The saved answers are"
                    + " still in " + found.database() + "; keep that file and contact the test owner's support.");
        }
        plan = sitting.plan();
        outputFolder = output.toAbsolutePath();
        seat = plan.seat();
        view.candidateIn(plan);
        view.eventNote("The machine was down for " + TimeText.duration(down.toMillis()) + " (last saved at "
                + CLOCK.format(found.lastActivity()) + "); " + (credit ? "that time was given back"
                : "that time was not given back"));
        resumeAt(found);
        return Optional.empty();
    }

    /** Decides where the recovered candidate continues and shows it; the window's Continue goes there. */
    private void resumeAt(UnfinishedSitting found) {
        Optional<String> next = sitting.nextTask();
        resumePoint = ResumePoint.of(found, sitting.submitted(), next.isPresent());
        if (resumePoint == ResumePoint.DELIVERY) {
            screen = FlowScreen.SUBMIT;
            resumePoint = null;
            retryDelivery();
            return;
        }
        screen = FlowScreen.RECOVERY;
        if (sitting.paused()) {
            pause = PauseState.PAUSED;
            view.coverPaused(true);
        }
        String where;
        if (next.isPresent() && found.currentTask().isPresent()) {
            TaskSpec task = plan.manifest().task(next.get()).orElseThrow();
            where = "The task \"" + task.title() + "\" continues with the text saved so far. "
                    + sitting.remaining(task.id()).map(d -> TimeText.duration(d.toMillis()) + " left in it.")
                            .orElse("It is untimed.");
        } else if (next.isEmpty()) {
            where = "All tasks had ended; the candidate continues with the last questions and hands in.";
        } else {
            where = "The candidate continues where the sitting stopped.";
        }
        view.showResumed("Candidate " + plan.candidateNumber() + ", form " + plan.formId() + ".", where);
    }

    /** The invigilator pressed Continue on the resumed screen. */
    public void continueRecovered() {
        ResumePoint point = resumePoint;
        resumePoint = null;
        if (point == null || screen != FlowScreen.RECOVERY) {
            return;
        }
        switch (point) {
            case DELIVERY -> retryDelivery();
            case REVIEW -> afterTasks(true);
            case AFTER_TASKS -> afterTasks(false);
            case TASK -> startNextTask();
            case QUESTIONNAIRE_BEFORE_TASKS -> instructionsRead();
            case INSTRUCTIONS -> showInstructions();
        }
    }

    /** Where the recovered sitting continues, until the invigilator presses Continue; empty otherwise. */
    public Optional<ResumePoint> resumePoint() {
        return Optional.ofNullable(resumePoint);
    }

    // ---- the invigilator's actions ----

    /** Pauses or resumes every timer; a task due while paused begins on resume. */
    public void setPaused(boolean paused) {
        PauseState wanted = paused ? PauseState.PAUSED : PauseState.RUNNING;
        if (wanted == pause || sitting == null) {
            return;
        }
        pause = wanted;
        if (paused) {
            view.keys(TypedKeys.DROP);
            sitting.pauseAll();
            pausedAtMono = clock.monoNanos();
            view.eventNote("Paused by the invigilator");
            freeze(true);
            view.coverPaused(true);
            view.announce(PAUSED + ".");
            return;
        }
        sitting.resumeAll();
        view.eventNote("Resumed" + (pausedAtMono == Long.MIN_VALUE ? ""
                : " after a pause of " + TimeText.duration((clock.monoNanos() - pausedAtMono) / 1_000_000)));
        pausedAtMono = Long.MIN_VALUE;
        view.coverPaused(false);
        if (turn != TaskTurn.ENDING) {
            freeze(false);
        }
        view.announce("The exam has resumed. Your time is running again.");
        if (turn == TaskTurn.WAITING_FOR_RESUME) {
            turn = TaskTurn.NONE;
            startNextTask();
        }
    }

    /** Adds time to the task on screen; nothing outside a task. */
    public void addMinutes(int minutes) {
        if (screen != FlowScreen.TASK || sitting == null) {
            return;
        }
        sitting.addTime(Duration.ofMinutes(minutes));
        String added = minutes + (minutes == 1 ? " minute" : " minutes");
        view.announce(added + (minutes == 1 ? " was" : " were") + " added to this task.");
        view.eventNote(added + " added to the task \"" + currentTaskTitle() + "\"");
        view.clockChanged();
    }

    /**
     * After the hand-in, the next candidate at this seat: the handed-in sitting is closed (its
     * database, package and local copy stay as they are) and sign-in shows again with the set-up's
     * output folder, seat and form. The next candidate's sitting is a new one with its own database.
     */
    public void nextCandidate() {
        if (screen != FlowScreen.FINISHED) {
            return;
        }
        try {
            sitting.close();
        } catch (IOException | RuntimeException e) {
            // handed in: the package and its local copy are written; closing only flushes the log
            view.eventNote("The last sitting's database did not close cleanly: " + e.getMessage());
        }
        tools.clear();
        sitting = null;
        plan = null;
        taskIndex = -1;
        words.clear();
        pause = PauseState.RUNNING;
        pausedAtMono = Long.MIN_VALUE;
        focus = FocusWatch.IN_WINDOW;
        turn = TaskTurn.NONE;
        handedIn = null;
        view.candidateOut();
        showSignIn();
    }

    /** The invigilator exits: a sitting not handed in stays in the data folder and resumes on the next start. */
    public void exitByInvigilator() {
        if (sitting != null && !sitting.submitted()) {
            sitting.exitedByInvigilator();
        }
    }

    // ---- focus and storage ----

    /**
     * Focus is watched while a candidate's sitting runs, from sign-in to the hand-in: before it the
     * window is the invigilator's (and settles as it opens and goes full screen, which is no loss),
     * after it nothing is at stake. A return is listed only after a loss that was.
     */
    public void focusLost() {
        if (sitting == null || screen == FlowScreen.FINISHED) {
            return;
        }
        focus = FocusWatch.LOSS_LISTED;
        view.focusNote("Focus lost");
        sitting.log().record(EventType.FOCUS_LOST, currentTaskId(), Map.of());
    }

    public void focusReturned(long awayMillis) {
        if (focus != FocusWatch.LOSS_LISTED) {
            return;
        }
        focus = FocusWatch.IN_WINDOW;
        view.focusNote("Focus returned after " + TimeText.duration(awayMillis));
        if (sitting != null) {
            sitting.log().record(EventType.FOCUS_RETURNED, currentTaskId(), Map.of("awayMillis", awayMillis));
        }
    }

    private void storageTrouble(String message) {
        view.eventNote("Saving failed: " + message);
        view.announce("Invigilator: this machine cannot save the work at the moment (" + message
                + "). Keep the program open; do not switch the machine off.");
    }

    // ---- what the window reads ----

    /** Where the flow is. */
    public FlowScreen screen() {
        return screen;
    }

    /** Marks a screen the window shows by itself, before a candidate's sitting (refusal, set-up, an unfinished sitting). */
    public void showing(FlowScreen shown) {
        screen = shown;
    }

    public TaskTurn turn() {
        return turn;
    }

    public boolean paused() {
        return pause == PauseState.PAUSED;
    }

    /** The candidate's plan; empty before sign-in. */
    public Optional<SittingPlan> plan() {
        return Optional.ofNullable(plan);
    }

    /** The task page on screen, if any. */
    public Optional<CourseView.TaskPage> page() {
        return Optional.ofNullable(page);
    }

    /** The folder packages go to, once set up. */
    public Path outputFolder() {
        return outputFolder;
    }

    /** The last hand-in, while its candidate's finished screen shows. */
    public Optional<HandedIn> handedIn() {
        return Optional.ofNullable(handedIn);
    }

    /** Whether a candidate's sitting is open (signed in or resumed, not yet closed for the next one). */
    public boolean candidateSitting() {
        return sitting != null;
    }

    /** Time left in the task on screen, or in the whole sitting when that is shorter; empty when neither is timed. */
    public Optional<Duration> timeLeft() {
        if (sitting == null) {
            return Optional.empty();
        }
        Optional<Duration> task = currentTaskId() == null ? Optional.empty() : sitting.remaining(currentTaskId());
        Optional<Duration> whole = sitting.sittingRemaining();
        if (task.isPresent() && whole.isPresent()) {
            return Optional.of(task.get().compareTo(whole.get()) <= 0 ? task.get() : whole.get());
        }
        return task.isPresent() ? task : whole;
    }

    /** The position of the task on screen in the form (0-based); -1 outside a task. */
    public int taskIndex() {
        return screen == FlowScreen.TASK ? taskIndex : -1;
    }

    public String currentTaskTitle() {
        String id = currentTaskId();
        return id == null ? "" : plan.manifest().task(id).map(TaskSpec::title).orElse(id);
    }

    private String currentTaskId() {
        return screen == FlowScreen.TASK && taskIndex >= 0 ? plan.form().slots().get(taskIndex).taskId() : null;
    }

    /** Closes the candidate's sitting and the tools; never throws. */
    public void closeQuietly() {
        if (page != null) {
            page.close();
            page = null;
        }
        tools.close();
        try {
            if (sitting != null) {
                sitting.close();
            }
        } catch (RuntimeException | IOException ignored) {
            // the log is durable within half a second; closing only flushes the rest
        }
    }

    // ---- wording ----

    /** A message from a core exception as a sentence on screen. */
    public static String sentence(String message) {
        if (message == null || message.isBlank()) {
            return "Something went wrong.";
        }
        String s = Character.toUpperCase(message.charAt(0)) + message.substring(1);
        return s.endsWith(".") ? s : s + ".";
    }

    /** The message of what went wrong, under the wrappers of asynchronous work. */
    public static String rootMessage(Throwable t) {
        Throwable cause = t;
        while (cause.getCause() != null && (cause instanceof CompletionException || cause instanceof ExecutionException
                || cause instanceof UncheckedIOException)) {
            cause = cause.getCause();
        }
        return cause.getMessage();
    }
}
