package org.inkgate.client.sitting.ui;

import org.inkgate.client.sitting.ui.parts.Parts;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.Supplier;
import javafx.animation.KeyFrame;
import javafx.animation.PauseTransition;
import javafx.animation.Timeline;
import javafx.application.Platform;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.input.KeyEvent;
import javafx.stage.Stage;
import javafx.util.Duration;
import org.inkgate.client.practice.PromptText;
import org.inkgate.client.practice.TaskWording;
import org.inkgate.client.practice.ui.RefusalView;
import org.inkgate.client.practice.WordCount;
import org.inkgate.client.sitting.Sitting;
import org.inkgate.client.sitting.replay.ReplayException;
import org.inkgate.client.sitting.replay.TextReplay;
import org.inkgate.client.sitting.submit.EnrolmentExport;
import org.inkgate.client.sitting.submit.InstallationKey;
import org.inkgate.client.sitting.submit.SubmissionResult;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.sitting.SittingPlan;
import org.inkgate.client.sitting.SittingSignal;
import org.inkgate.client.sitting.TaskStart;
import org.inkgate.client.sitting.recovery.RecoveryScan;
import org.inkgate.client.sitting.recovery.UnfinishedSitting;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.store.SittingScreen;
import org.inkgate.client.sitting.submit.DeliveryFailure;
import org.inkgate.client.sitting.ui.lock.StageLock;
import org.inkgate.client.sitting.open.SittingLoad;
import org.inkgate.client.sitting.ui.overlay.InvigilatorPanel;
import org.inkgate.client.sitting.ui.overlay.PausedCover;
import org.inkgate.client.sitting.ui.overlay.PinPrompt;
import org.inkgate.client.sitting.ui.screen.FinishedScreen;
import org.inkgate.client.sitting.ui.screen.InstructionsScreen;
import org.inkgate.client.sitting.ui.screen.QuestionnaireScreen;
import org.inkgate.client.sitting.ui.screen.RecoveryScreen;
import org.inkgate.client.sitting.ui.screen.ReviewScreen;
import org.inkgate.client.sitting.ui.screen.SetupScreen;
import org.inkgate.client.sitting.ui.screen.SignInScreen;
import org.inkgate.client.sitting.ui.screen.SubmitScreen;
import org.inkgate.client.sitting.ui.screen.TaskScreen;
import org.inkgate.client.sitting.tools.BundlePacks;
import org.inkgate.client.sitting.tools.ExamWords;
import org.inkgate.client.sitting.tools.ToolShelf;
import org.inkgate.client.task.DisplaySettings;
import org.inkgate.client.task.TaskContext;
import org.inkgate.client.task.TaskWorkspace;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.PinHasher;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.bundle.WordGuidance;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.QuestionnaireAnswers;
import org.inkgate.format.response.TaskResponse.EndReason;
import org.inkgate.packs.spelling.EnglishVariant;

/**
 * The live sitting from the bundle to the finished screen: invigilator set-up, candidate sign-in,
 * instructions (while the tools warm up), questionnaires, the tasks in the form's order, review,
 * hand-in with retry, and the invigilator's overlay (pause, add time, end the task, exit) behind
 * the PIN. Every state change goes through the sitting core, which logs it and makes it durable;
 * this class only decides what is on screen.
 */
public final class SittingFlow {

    /** Opens the invigilator's PIN prompt during the sitting. */
    public static final KeyCombination INVIGILATOR_KEYS =
            new KeyCodeCombination(KeyCode.F12, KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN);
    /** How often the timers are read; the display shows whole seconds. */
    static final Duration TICK = Duration.millis(200);
    /** How long "time is up" stays on screen before the next task. */
    static final Duration TIME_UP_PAUSE = Duration.seconds(4);
    private static final DateTimeFormatter CLOCK = DateTimeFormatter.ofPattern("HH:mm:ss").withZone(ZoneId.systemDefault());

    /**
     * What a sitting window is made from.
     *
     * @param load       the opened bundle or its refusal
     * @param bundleFile the bundle's path, recorded so recovery can name it (null: its file name only)
     * @param dataFolder the client data folder, or null for the standard one
     * @param workspaces builds each task's workspace
     * @param clock      monotonic and wall clocks
     * @param demoNote   for the demo sitting only: its published PIN and candidate numbers, shown at set-up; else null
     * @param lock       lock the window (false only in tests that check the flow, not the lock)
     * @param onExit     what exiting does after the window closed (null: end the JavaFX runtime)
     */
    public record Setup(SittingLoad load, Path bundleFile, Path dataFolder, WorkspaceFactory workspaces,
            SittingClock clock, String demoNote, boolean lock, Runnable onExit) {
        public Setup {
            Objects.requireNonNull(load, "load");
            Objects.requireNonNull(workspaces, "workspaces");
            Objects.requireNonNull(clock, "clock");
            onExit = Objects.requireNonNullElse(onExit, Platform::exit);
        }
    }

    private final Stage stage;
    private final Setup setup;
    private final ExecutorService background = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "inkgate-sitting-work");
        t.setDaemon(true);
        return t;
    });
    private final Timeline ticker;
    private SittingShell shell;
    private Scene scene;
    /** Keys typed on the way into a task the candidate asked for, kept until its editor has focus. */
    private TypeAhead typeAhead;
    private StageLock lock;
    private OpenedBundle bundle;
    private ClientDataFolder data;
    private Path outputFolder;
    private String seat = "";
    private String openForm;
    private Sitting sitting;
    private SittingPlan plan;
    private DisplaySettings display = DisplaySettings.standard();
    private BundlePacks packs;
    private ToolShelf shelf;
    private int taskIndex = -1;
    private TaskWorkspace workspace;
    private TaskScreen taskScreen;
    private boolean paused;
    /** Where the task on screen is in its life; one value instead of two flags that could contradict. */
    private TaskTurn turn = TaskTurn.NONE;
    private String startText;
    private SubmitScreen submitScreen;
    private final Map<String, Integer> words = new LinkedHashMap<>();
    private InvigilatorDesk desk;
    private Screen current = Screen.NONE;
    /** A focus loss was listed, so its return is listed too. */
    private boolean lossNoted;
    /** When the invigilator paused (monotonic), for the resume line; MIN_VALUE when not paused here. */
    private long pausedAtMono = Long.MIN_VALUE;
    /** Where the last hand-in went, for the invigilator screen after it. */
    private HandedIn handedIn;

    /** Where a handed-in package went, and when. */
    private record HandedIn(Path delivered, Path localCopy, Instant at) {
    }

    /** Where the current task is: none, waiting for the invigilator to resume, open for writing, or ending. */
    enum TaskTurn { NONE, WAITING_FOR_RESUME, OPEN, ENDING }

    /** Where the flow is; the invigilator panel and the lock depend on it. */
    enum Screen { NONE, REFUSED, RECOVERY, SETUP, SIGN_IN, INSTRUCTIONS, QUESTIONNAIRE, TASK, REVIEW, SUBMIT, FINISHED }

    public SittingFlow(Stage stage, Setup setup) {
        this.stage = Objects.requireNonNull(stage, "stage");
        this.setup = setup;
        ticker = new Timeline(new KeyFrame(TICK, e -> tick()));
        ticker.setCycleCount(Timeline.INDEFINITE);
    }

    /** Shows the first screen: the refusal, a found unfinished sitting, or the invigilator set-up. */
    public void start() {
        switch (setup.load()) {
            case SittingLoad.Refused refused -> showRefusal(refused.message());
            case SittingLoad.Opened opened -> open(opened.bundle());
        }
    }

    // ---- opening ----

    private void showRefusal(String message) {
        current = Screen.REFUSED;
        RefusalView refusal = new RefusalView(message, this::exitApplication);
        shell = new SittingShell("Inkgate sitting");
        desk = new InvigilatorDesk(shell, setup.clock(), deskHost());
        shell.show(refusal);
        showStage("Inkgate - exam bundle not opened");
        refusal.closeButton().requestFocus();
    }

    private void open(OpenedBundle opened) {
        this.bundle = opened;
        BundleManifest m = opened.manifest();
        shell = new SittingShell(m.title());
        desk = new InvigilatorDesk(shell, setup.clock(), deskHost());
        showStage("Inkgate - " + m.title());
        if (setup.lock()) {
            lock = StageLock.apply(stage, new StageLock.FocusListener() {
                @Override
                public void focusLost() {
                    onFocusLost();
                }

                @Override
                public void focusReturned(long awayMillis) {
                    onFocusReturned(awayMillis);
                }
            }, () -> setup.clock().monoNanos() / 1_000_000);
        }
        scene.addEventFilter(KeyEvent.KEY_PRESSED, e -> {
            if (INVIGILATOR_KEYS.match(e)) {
                e.consume();
                openInvigilator();
            }
        });
        try {
            data = (setup.dataFolder() == null ? ClientDataFolder.standard() : new ClientDataFolder(setup.dataFolder()))
                    .create();
        } catch (IOException | RuntimeException e) {
            showRefusal("The client data folder cannot be used (" + e.getMessage() + "). The sitting keeps every"
                    + " keystroke there, so it cannot start without it. Start the client with --data FOLDER on a"
                    + " writable disk.");
            return;
        }
        Optional<UnfinishedSitting> unfinished = findUnfinished(opened.manifestSha256());
        if (unfinished.isPresent()) {
            showRecovery(unfinished.get());
        } else {
            showSetup();
        }
    }

    private Optional<UnfinishedSitting> findUnfinished(String manifestSha256) {
        try {
            return RecoveryScan.find(data).stream().filter(u -> u.bundleSha256().equals(manifestSha256)).findFirst();
        } catch (IOException e) {
            // the set-up screen says nothing about it; the invigilator sees the data folder problem on start
            shell.announcer().announce("Unfinished sittings could not be looked for in " + data.root() + ": "
                    + e.getMessage());
            return Optional.empty();
        }
    }

    private void showStage(String title) {
        if (scene == null) {
            scene = new Scene(shell.root(), 1280, 800);
            typeAhead = new TypeAhead(scene);
            SittingTheme.install(scene);
            stage.setScene(scene);
        } else {
            scene.setRoot(shell.root());
        }
        stage.setTitle(title);
        stage.show();
        // since JavaFX 20 a newly shown stage may not get focus by itself
        stage.requestFocus();
    }

    // ---- invigilator set-up ----

    private void showSetup() {
        current = Screen.SETUP;
        BundleManifest m = bundle.manifest();
        Path proposed = data.root().resolve("outbox");
        SetupScreen[] screen = new SetupScreen[1];
        List<String> openForms = m.roster().isEmpty() && m.forms().size() > 1
                ? m.forms().stream().map(f -> f.id()).toList() : List.of();
        screen[0] = new SetupScreen(m.title(), bundle.signerFingerprint(), bundle.sealed(), proposed,
                setup.demoNote(), openForms, input -> checkSetup(screen[0], input),
                this::exitApplication);
        offerEnrolment(screen[0]);
        shell.show(screen[0].root());
        screen[0].focus();
    }

    /** Shows this installation's fingerprint on the set-up screen and writes its enrolment file on request. */
    private void offerEnrolment(SetupScreen screen) {
        InstallationKey key;
        try {
            key = InstallationKey.loadOrCreate(data);
        } catch (IOException | RuntimeException e) {
            screen.showEnrolment("This machine's installation key cannot be read (" + e.getMessage() + "). Packages"
                    + " cannot be signed until it can; see the invigilator guide, \"Enrolling the machines\".");
            return;
        }
        screen.showInstallation(key.fingerprint(), (folder, seatLabel) -> {
            if (folder == null) {
                screen.showEnrolment("Enter the output folder first: the enrolment file is written there.");
                return;
            }
            work(() -> {
                try {
                    return "Enrolment file written: " + EnrolmentExport.write(key, seatLabel, folder, setup.clock().now())
                            + ". Hand it to the test owner.";
                } catch (IllegalArgumentException | IOException e) {
                    return "The enrolment file could not be written to " + folder + " (" + e.getMessage() + ").";
                }
            }, screen::showEnrolment);
        });
    }

    private void checkSetup(SetupScreen screen, SetupScreen.Input input) {
        if (input.outputFolder() == null) {
            screen.showError("Enter the output folder where response packages go.");
            return;
        }
        screen.busy(true);
        work(() -> {
            if (!PinHasher.matches(bundle.manifest().invigilatorPin(), input.pin())) {
                return "That is not this exam's invigilator PIN. Enter it again.";
            }
            String outputProblem = outputProblem(input.outputFolder());
            if (outputProblem != null) {
                return outputProblem;
            }
            if (bundle.sealed()) {
                try {
                    bundle.unseal(input.releaseCode());
                } catch (FormatRefusal e) {
                    return e.getMessage();
                } catch (IOException e) {
                    return "The sealed bundle could not be read (" + e.getMessage() + "). Check the disk and try again.";
                }
            }
            return null;
        }, problem -> {
            screen.busy(false);
            if (problem != null) {
                screen.showError(problem);
                return;
            }
            outputFolder = input.outputFolder().toAbsolutePath();
            seat = input.seat();
            openForm = input.formId();
            showSignIn();
        });
    }

    // ---- candidate sign-in ----

    private void showSignIn() {
        current = Screen.SIGN_IN;
        BundleManifest m = bundle.manifest();
        String hint = m.roster().isEmpty() ? "Type the number on your admission details."
                : "Type the number on your admission details, exactly as it is printed.";
        SignInScreen[] screen = new SignInScreen[1];
        screen[0] = new SignInScreen(m.title(), hint, number -> signIn(screen[0], number));
        shell.show(screen[0].root());
        screen[0].focus();
    }

    private void signIn(SignInScreen screen, String number) {
        SittingPlan candidate;
        try {
            candidate = SittingPlan.forCandidate(bundle.manifest(), bundle.manifestSha256(), bundleFile(), number, seat,
                    openForm, clientVersion());
        } catch (IllegalArgumentException e) {
            screen.showError(sentence(e.getMessage()));
            return;
        }
        try {
            sitting = Sitting.begin(candidate, data, setup.clock(), outputFolder);
        } catch (IOException | RuntimeException e) {
            screen.showError("The sitting could not be started on this machine (" + e.getMessage()
                    + "). Ask the invigilator.");
            return;
        }
        plan = candidate;
        applyDisplay();
        // the timeline runs from sign-in to the end: it drives the timers and reports saving trouble on every screen
        ticker.play();
        showInstructions();
    }

    private void applyDisplay() {
        display = SittingTheme.of(plan.manifest().roster().stream()
                .filter(r -> r.candidateNumber().equals(plan.candidateNumber())).findFirst().orElse(null));
        SittingTheme.apply(shell.root(), display);
        shell.who("Candidate " + plan.candidateNumber());
    }

    // ---- instructions, with the tools warming up ----

    private void showInstructions() {
        current = Screen.INSTRUCTIONS;
        sitting.showScreen(SittingScreen.INSTRUCTIONS);
        BundleManifest m = plan.manifest();
        PromptText instructions = readPrompt(m.instructionsFile());
        List<String> lines = new ArrayList<>();
        for (FormSlot slot : plan.form().slots()) {
            TaskSpec task = m.task(slot.taskId()).orElseThrow();
            lines.add(task.title() + " (" + timeText(task, plan.extraTimePercent()) + "; "
                    + String.join(", ", TaskWording.tools(slot.policy())).toLowerCase(java.util.Locale.ROOT) + ")");
        }
        InstructionsScreen screen = new InstructionsScreen(m.title(), "Candidate " + plan.candidateNumber() + ", form "
                + plan.formId(), instructions, lines, this::afterInstructions);
        shell.show(screen.root());
        screen.focus();
        startTools(screen, plan.form());
    }

    private void startTools(InstructionsScreen screen, FormSpec form) {
        if (shelf != null) {
            if (screen != null) {
                shelf.allReady().thenRun(() -> Platform.runLater(() -> screen.toolsStatus("The writing tools are ready.")));
            }
            return;
        }
        status(screen, "Preparing the writing tools...");
        try {
            if (packs == null) {
                packs = new BundlePacks(bundle); // the bundle's packs serve every candidate at this seat
            }
        } catch (IOException e) {
            status(screen, "The writing tools could not be prepared (" + e.getMessage() + "). Ask the invigilator.");
            return;
        }
        List<ToolShelf.Order> orders = new ArrayList<>();
        for (FormSlot slot : form.slots()) {
            TaskSpec task = bundle.manifest().task(slot.taskId()).orElseThrow();
            orders.add(new ToolShelf.Order(task.id(), slot.policy(), ExamWords.of(readText(task.promptFile()))));
        }
        shelf = new ToolShelf(packs.broker(), variant(), orders);
        shelf.allReady().thenRun(() -> Platform.runLater(() -> status(screen, "The writing tools are ready.")));
    }

    private static void status(InstructionsScreen screen, String text) {
        if (screen != null) {
            screen.toolsStatus(text);
        }
    }

    private EnglishVariant variant() {
        try {
            return EnglishVariant.fromTag(bundle.manifest().language());
        } catch (IllegalArgumentException e) {
            // the checker is only built for tasks that allow it; a non-English exam offering it fails there, visibly
            return EnglishVariant.EN_GB;
        }
    }

    private void afterInstructions() {
        String pre = plan.form().preQuestionnaire();
        if (pre != null) {
            showQuestionnaire(pre, this::startAskedForTask);
        } else {
            startAskedForTask();
        }
    }

    /** The candidate asked for the next task (Begin, Done, Yes, finish this task): what they type at once goes into it. */
    private void startAskedForTask() {
        typeAhead.hold();
        startNextTask();
    }

    // ---- questionnaires ----

    private void showQuestionnaire(String id, Runnable then) {
        current = Screen.QUESTIONNAIRE;
        sitting.showScreen(SittingScreen.QUESTIONNAIRE);
        QuestionnaireSpec q = plan.manifest().questionnaire(id).orElseThrow();
        QuestionnaireScreen screen = new QuestionnaireScreen(q, answers -> {
            answers.forEach((item, value) -> sitting.answer(q.id(), item, value));
            then.run();
        });
        shell.show(screen.root());
        screen.focus();
    }

    // ---- tasks ----

    private void startNextTask() {
        Optional<String> next = sitting.nextTask();
        if (next.isEmpty()) {
            typeAhead.drop();
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
        if (paused) {
            // a sitting recovered while paused: the task begins when the invigilator resumes
            typeAhead.drop();
            turn = TaskTurn.WAITING_FOR_RESUME;
            return;
        }
        current = Screen.TASK;
        taskIndex = index;
        turn = TaskTurn.OPEN;
        sitting.showScreen(SittingScreen.TASK);
        TaskStart start;
        try {
            start = sitting.enterTask(slot.taskId());
        } catch (IOException e) {
            typeAhead.drop();
            shell.announcer().announce("Invigilator: the task could not be started, because the saved work could not"
                    + " be read (" + e.getMessage() + "). Do not close the program; contact the test owner's support.");
            return;
        }
        startText = start.text();
        shell.show(Parts.card("preparingTask", Parts.heading("Preparing the task..."),
                Parts.quiet("The writing tools are still getting ready. This takes a few seconds.")));
        shelf.take(slot.taskId()).whenComplete((tools, failure) -> Platform.runLater(() -> {
            if (current != Screen.TASK || taskIndex != index || turn == TaskTurn.ENDING) {
                // the task ended (time, invigilator) while its tools were being prepared
                if (tools != null) {
                    tools.close();
                }
                return;
            }
            if (failure != null) {
                typeAhead.drop();
                shell.announcer().announce(sentence(rootMessage(failure)) + " Ask the invigilator.");
                return;
            }
            TaskContext context = new TaskContext(start.task(), readText(start.task().promptFile()), tools,
                    sitting.log(), start.text(), start.caret(), display, start.loggedBefore());
            workspace = setup.workspaces().create(context);
            int total = plan.form().slots().size();
            taskScreen = new TaskScreen("Task " + (index + 1) + " of " + total + ": " + start.task().title(),
                    workspace.view(), () -> endTask(EndReason.SUBMITTED));
            shell.show(taskScreen.root());
            shell.announcer().clear();
            if (start.mismatch().isPresent()) {
                desk.eventNote("Recovery note: " + start.mismatch().get().describe());
            }
            updateClock();
            ticker.play();
            if (paused) {
                typeAhead.drop();
                freeze(true);
            } else {
                focusEditorOnceShown(workspace);
            }
        }));
    }

    /**
     * Puts the caret in the new task's editor and hands it the keys typed on the way in. The
     * editor takes focus only once its skin is laid out, which can take a few pulses (more in
     * large print, on a busy machine); until then the scene gives focus to the first button it
     * finds. So the request is repeated each 30 ms until focus is inside the workspace (at most
     * five seconds), and never after the task has changed, the exam is paused or the invigilator's
     * screen is open; keys typed meanwhile are kept ({@link TypeAhead}) and delivered in order.
     */
    private void focusEditorOnceShown(TaskWorkspace shown) {
        Timeline retry = new Timeline();
        retry.getKeyFrames().add(new KeyFrame(Duration.millis(30), e -> {
            if (workspace != shown) {
                retry.stop(); // a later task took over, with its own keys and retry
                return;
            }
            if (paused || desk.showing()) {
                typeAhead.drop();
                retry.stop();
                return;
            }
            if (focusInside(shown.view())) {
                typeAhead.deliverTo(scene.getFocusOwner());
                retry.stop();
                return;
            }
            shown.focusEditor();
        }));
        retry.setCycleCount(167);
        typeAhead.awaitFocusIn(shown.view());
        retry.setOnFinished(e -> {
            if (workspace == shown) {
                typeAhead.drop(); // focus never reached the editor: keys typed now go where focus is
            }
        });
        shown.focusEditor();
        retry.play();
    }

    private boolean focusInside(Node container) {
        for (Node n = scene.getFocusOwner(); n != null; n = n.getParent()) {
            if (n == container) {
                return true;
            }
        }
        return false;
    }

    private void tick() {
        if (sitting == null) {
            return;
        }
        for (SittingSignal signal : sitting.poll()) {
            switch (signal) {
                case SittingSignal.TimeWarning warning -> shell.announcer().announce(warning.minutesLeft()
                        + (warning.minutesLeft() == 1 ? " minute" : " minutes") + " left in this task.");
                case SittingSignal.TaskTimeUp up -> timeUp(false);
                case SittingSignal.SittingTimeUp up -> timeUp(true);
                case SittingSignal.StorageTrouble trouble -> storageTrouble(trouble.message());
                case SittingSignal.StorageRecovered ok -> desk.eventNote("Saving works again.");
            }
        }
        updateClock();
        desk.refresh();
    }

    private void updateClock() {
        if (current != Screen.TASK || sitting == null) {
            shell.time(null, "", false);
            return;
        }
        Optional<java.time.Duration> left = remainingNow();
        if (left.isEmpty()) {
            shell.time("Untimed", "This task is untimed", false);
        } else {
            long ms = left.get().toMillis();
            shell.time(TimeText.clock(ms), TimeText.spoken(ms), ms < 5 * 60_000);
        }
    }

    /** Time left in the current task, or in the whole sitting when that is shorter; empty when neither is timed. */
    private Optional<java.time.Duration> remainingNow() {
        Optional<java.time.Duration> task = currentTaskId() == null ? Optional.empty() : sitting.remaining(currentTaskId());
        Optional<java.time.Duration> whole = sitting.sittingRemaining();
        if (task.isPresent() && whole.isPresent()) {
            return Optional.of(task.get().compareTo(whole.get()) <= 0 ? task.get() : whole.get());
        }
        return task.isPresent() ? task : whole;
    }

    private void timeUp(boolean wholeSitting) {
        if (current != Screen.TASK || turn == TaskTurn.ENDING) {
            return;
        }
        turn = TaskTurn.ENDING;
        typeAhead.drop(); // keys typed after the time is up belong to no task
        freeze(true);
        shell.announcer().announce(wholeSitting ? "The time for the whole exam is up. Your answers have been saved."
                : "The time for this task is up. Your answer has been saved.");
        PauseTransition wait = new PauseTransition(TIME_UP_PAUSE);
        wait.setOnFinished(e -> finishTask(EndReason.TIME_UP, wholeSitting));
        wait.play();
    }

    private void endTask(EndReason reason) {
        // no workspace yet: the task's tools are still being prepared, and there is nothing to end
        if (current != Screen.TASK || turn == TaskTurn.ENDING || workspace == null) {
            return;
        }
        turn = TaskTurn.ENDING;
        if (reason == EndReason.SUBMITTED) {
            typeAhead.hold(); // the candidate moves on: what they type now belongs to the next task
        } else {
            typeAhead.drop(); // time or the invigilator ended it: keys typed now belong to no task
        }
        finishTask(reason, false);
    }

    private void finishTask(EndReason reason, boolean endSitting) {
        FormSlot slot = plan.form().slots().get(taskIndex);
        if (workspace != null) {
            words.put(slot.taskId(), workspace.wordCount());
            sitting.endTask(slot.taskId(), reason, workspace.text(), workspace.wordCount(), workspace.toolUse());
            workspace.close();
        } else {
            // the time ran out before the task's tools were ready: the text is what was there when it began
            String text = startText == null ? "" : startText;
            words.put(slot.taskId(), WordCount.of(text));
            sitting.endTask(slot.taskId(), reason, text, WordCount.of(text), Map.of());
        }
        workspace = null;
        startText = null;
        taskScreen = null;
        shell.announcer().clear();
        current = Screen.NONE;
        updateClock();
        if (endSitting) {
            sitting.endUnstartedTasks(EndReason.TIME_UP);
        }
        startNextTask();
    }

    private void freeze(boolean frozen) {
        if (workspace != null) {
            workspace.setFrozen(frozen);
        }
        if (taskScreen != null) {
            taskScreen.frozen(frozen);
        }
    }

    // ---- after the tasks ----

    /** After the last task: the post-task questionnaire (unless it was done before a restart), then the review. */
    private void afterTasks(boolean questionnaireDone) {
        String post = plan.form().postQuestionnaire();
        if (post != null && !questionnaireDone) {
            showQuestionnaire(post, this::showReview);
        } else {
            showReview();
        }
    }

    private void showReview() {
        current = Screen.REVIEW;
        sitting.showScreen(SittingScreen.REVIEW);
        List<ReviewScreen.Row> rows = new ArrayList<>();
        for (FormSlot slot : plan.form().slots()) {
            TaskSpec task = plan.manifest().task(slot.taskId()).orElseThrow();
            rows.add(new ReviewScreen.Row(task.title(), wordsOf(task.id()), guidance(task.words())));
        }
        ReviewScreen screen = new ReviewScreen(rows, this::submit);
        shell.show(screen.root());
        screen.focus();
    }

    private static String guidance(WordGuidance words) {
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

    private void submit() {
        current = Screen.SUBMIT;
        submitScreen = new SubmitScreen(this::retryDelivery);
        shell.show(submitScreen.root());
        submitScreen.working();
        workOrFail(() -> sitting.submit(outputFolder, InstallationKey.loadOrCreate(data)), this::delivered);
    }

    private void retryDelivery() {
        submitScreen.working();
        workOrFail(() -> sitting.retryDelivery(outputFolder), this::delivered);
    }

    private void delivered(SubmissionResult result) {
        if (result.failure().isPresent()) {
            DeliveryFailure failure = result.failure().get();
            desk.eventNote("Hand-in to the output folder failed: " + failure.message());
            submitScreen.failed(failure.message());
            return;
        }
        showFinished(result.delivered().orElseThrow(), result.localCopy());
    }

    private void showFinished(Path delivered, Path localCopy) {
        current = Screen.FINISHED;
        handedIn = new HandedIn(delivered, localCopy, setup.clock().now());
        ticker.stop();
        shell.time(null, "", false);
        FinishedScreen screen = new FinishedScreen("For the invigilator: the response package is " + delivered
                + "; a copy is kept at " + localCopy + ". Open the invigilator screen (Ctrl+Shift+F12) for the next"
                + " candidate or to exit.");
        shell.show(screen.root());
    }

    // ---- recovery ----

    private void showRecovery(UnfinishedSitting found) {
        current = Screen.RECOVERY;
        Instant now = setup.clock().now();
        java.time.Duration down = found.downtime(now);
        List<String> facts = new ArrayList<>();
        facts.add("Candidate: " + found.candidateNumber() + ", form " + found.formId());
        facts.add("On screen when it stopped: " + found.currentTask().flatMap(id -> bundle.manifest().task(id))
                .map(t -> "the task \"" + t.title() + "\"").orElse(found.screen() == SittingScreen.START ? "the start" : "the "
                        + found.screen().wireName() + " screen"));
        facts.add("Last saved: " + CLOCK.format(found.lastActivity()) + ", " + TimeText.duration(down.toMillis())
                + " ago (measured on the system clock, so a changed clock distorts it)");
        if (found.paused()) {
            facts.add("The exam was paused by the invigilator when it stopped; it continues paused.");
        }
        if (found.stage() == UnfinishedSitting.Stage.AWAITING_DELIVERY) {
            facts.add("The answers were handed in and saved on this machine, but not yet written to the output folder.");
        }
        if (found.stage() != UnfinishedSitting.Stage.AWAITING_DELIVERY) {
            // the writing tools start while the invigilator reads this screen, so the restored text is
            // checked as soon as the task shows, not after LanguageTool's start (seconds on a busy machine)
            bundle.manifest().form(found.formId()).ifPresent(form -> startTools(null, form));
        }
        String creditText = "_Give back the " + TimeText.duration(down.toMillis()) + " the machine was down";
        RecoveryScreen[] screen = new RecoveryScreen[1];
        // the folder chosen at set-up (the room's stick), remembered in the sitting's database
        screen[0] = new RecoveryScreen(facts, creditText, found.outputFolder().orElse(data.root().resolve("outbox")),
                input -> resume(screen[0], found, input, down), this::exitApplication);
        shell.show(screen[0].root());
        screen[0].focus();
    }

    private void resume(RecoveryScreen screen, UnfinishedSitting found, RecoveryScreen.Input input,
            java.time.Duration down) {
        // the output folder is made and checked as at set-up: the folder proposed here may not exist (the stick was taken out)
        work(() -> !PinHasher.matches(bundle.manifest().invigilatorPin(), input.pin())
                ? "That is not this exam's invigilator PIN. Enter it again."
                : input.outputFolder() == null ? "Enter the output folder where response packages go."
                : outputProblem(input.outputFolder()), problem -> {
            if (problem != null) {
                screen.showError(problem);
                return;
            }
            try {
                sitting = Sitting.resume(found, bundle.manifest(), bundle.manifestSha256(),
                        input.credit() ? down : java.time.Duration.ZERO, data, setup.clock());
            } catch (IOException | RuntimeException e) {
                screen.showError("The sitting could not be resumed (" + e.getMessage() + "). The saved answers are"
                        + " still in " + found.database() + "; keep that file and contact the test owner's support.");
                return;
            }
            plan = sitting.plan();
            ticker.play();
            outputFolder = input.outputFolder().toAbsolutePath();
            seat = plan.seat();
            applyDisplay();
            desk.eventNote("The machine was down for " + TimeText.duration(down.toMillis()) + " (last saved at "
                    + CLOCK.format(found.lastActivity()) + "); " + (input.credit() ? "that time was given back"
                    : "that time was not given back"));
            continueRecovered(found);
        });
    }

    /** Makes the output folder if needed; what is wrong with it, or null when packages can be written there. */
    private static String outputProblem(Path folder) {
        try {
            Files.createDirectories(folder);
        } catch (IOException e) {
            return "The output folder " + folder + " cannot be created (" + e.getMessage()
                    + "). Choose a folder on a writable disk.";
        }
        if (!Files.isWritable(folder)) {
            return "The output folder " + folder + " is not writable. Choose another folder.";
        }
        return null;
    }

    /** Shows what the candidate continues with after a restart, with the time left after the invigilator's choice. */
    private void continueRecovered(UnfinishedSitting found) {
        if (found.stage() == UnfinishedSitting.Stage.AWAITING_DELIVERY || sitting.submitted()) {
            current = Screen.SUBMIT;
            submitScreen = new SubmitScreen(this::retryDelivery);
            shell.show(submitScreen.root());
            retryDelivery();
            return;
        }
        paused = sitting.paused();
        if (paused) {
            desk.coverPaused(true);
        }
        Optional<String> next = sitting.nextTask();
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
        SittingScreen screenAtStop = found.screen();
        Runnable go = () -> {
            if (next.isEmpty()) {
                prepareToolsQuietly();
                afterTasks(screenAtStop == SittingScreen.REVIEW);
            } else if (found.currentTask().isPresent() || screenAtStop == SittingScreen.TASK) {
                prepareToolsQuietly();
                startNextTask();
            } else if (screenAtStop == SittingScreen.QUESTIONNAIRE) {
                prepareToolsQuietly();
                afterInstructions();
            } else {
                showInstructions();
            }
        };
        current = Screen.RECOVERY;
        shell.show(Parts.card("resumedScreen", Parts.heading("The sitting is ready to continue"),
                Parts.text("Candidate " + plan.candidateNumber() + ", form " + plan.formId() + "."),
                Parts.text(where), Parts.primary("continueButton", "_Continue", go)));
    }

    /** After a restart the instructions screen may be skipped, but the tools must still be prepared. */
    private void prepareToolsQuietly() {
        if (shelf == null) {
            startTools(null, plan.form());
        }
    }

    // ---- invigilator ----

    private void openInvigilator() {
        if (current == Screen.NONE || current == Screen.REFUSED || current == Screen.SETUP
                || current == Screen.RECOVERY) {
            return;
        }
        typeAhead.drop(); // the PIN typed next is never the candidate's text
        desk.open();
    }

    private InvigilatorDesk.Host deskHost() {
        return new InvigilatorDesk.Host() {
            @Override
            public boolean pinMatches(char[] pin) {
                return PinHasher.matches(bundle.manifest().invigilatorPin(), pin);
            }

            @Override
            public String stateLine() {
                return SittingFlow.this.stateLine();
            }

            @Override
            public boolean paused() {
                return paused;
            }

            @Override
            public InvigilatorPanel.Moment moment() {
                return SittingFlow.this.moment();
            }

            @Override
            public void setPaused(boolean pause) {
                SittingFlow.this.setPaused(pause);
            }

            @Override
            public void addMinutes(int minutes) {
                if (current == Screen.TASK && sitting != null) {
                    sitting.addTime(java.time.Duration.ofMinutes(minutes));
                    String added = minutes + (minutes == 1 ? " minute" : " minutes");
                    shell.announcer().announce(added + (minutes == 1 ? " was" : " were") + " added to this task.");
                    desk.eventNote(added + " added to the task \"" + currentTaskTitle() + "\"");
                    updateClock();
                }
            }

            @Override
            public void endTask() {
                SittingFlow.this.endTask(EndReason.ENDED_BY_INVIGILATOR);
            }

            @Override
            public void nextCandidate() {
                SittingFlow.this.nextCandidate();
            }

            @Override
            public void exit() {
                exitByInvigilator();
            }

            @Override
            public void backToCandidate() {
                refocus();
            }

            @Override
            public <T> void work(Supplier<T> job, java.util.function.Consumer<T> then) {
                SittingFlow.this.work(job, then);
            }
        };
    }

    /** Where the sitting is, as far as the invigilator's actions go. */
    private InvigilatorPanel.Moment moment() {
        if (plan == null) {
            return InvigilatorPanel.Moment.NO_CANDIDATE;
        }
        return switch (current) {
            case TASK -> InvigilatorPanel.Moment.IN_TASK;
            case SUBMIT -> InvigilatorPanel.Moment.HANDING_IN;
            case FINISHED -> InvigilatorPanel.Moment.HANDED_IN;
            case NONE, REFUSED, RECOVERY, SETUP, SIGN_IN, INSTRUCTIONS, QUESTIONNAIRE, REVIEW ->
                InvigilatorPanel.Moment.AT_WORK;
        };
    }

    private String stateLine() {
        StringBuilder state = new StringBuilder();
        if (plan != null && current == Screen.FINISHED && handedIn != null) {
            return "Candidate " + plan.candidateNumber() + ", form " + plan.formId() + ": the answers were handed in"
                    + " at " + CLOCK.format(handedIn.at()) + ". The response package is written to " + handedIn.delivered()
                    + "; a copy is kept at " + handedIn.localCopy() + ". This candidate's sitting is over.";
        }
        if (plan != null && current == Screen.SUBMIT) {
            return "Candidate " + plan.candidateNumber() + ", form " + plan.formId() + ": the answers are handed in and"
                    + " saved on this machine, but the response package is not yet written to the output folder "
                    + outputFolder + ". The candidate's screen says what is wrong and offers to try again.";
        }
        if (plan == null) {
            state.append("No candidate has signed in yet.");
        } else {
            state.append("Candidate ").append(plan.candidateNumber()).append(", form ").append(plan.formId());
            if (plan.extraTimePercent() > 0) {
                state.append(", ").append(plan.extraTimePercent()).append("% extra time (roster)");
            }
            state.append(". ");
            if (current == Screen.TASK && taskIndex >= 0) {
                TaskSpec task = plan.manifest().task(plan.form().slots().get(taskIndex).taskId()).orElseThrow();
                state.append("Task ").append(taskIndex + 1).append(" of ").append(plan.form().slots().size())
                        .append(": ").append(task.title()).append(", ");
                state.append(remainingNow().map(d -> TimeText.duration(d.toMillis()) + " left").orElse("untimed"));
                state.append(". ");
            } else {
                state.append("Screen: ").append(current.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' '))
                        .append(". ");
            }
        }
        if (plan != null || paused) {
            state.append(paused ? "The exam is PAUSED." : "The exam is running.");
        }
        return state.toString().strip();
    }

    private void setPaused(boolean pause) {
        if (pause == paused || sitting == null) {
            return;
        }
        paused = pause;
        if (pause) {
            typeAhead.drop();
            sitting.pauseAll();
            pausedAtMono = setup.clock().monoNanos();
            desk.eventNote("Paused by the invigilator");
            freeze(true);
            desk.coverPaused(true);
            shell.announcer().announce(PausedCover.HEADING + ".");
        } else {
            sitting.resumeAll();
            desk.eventNote("Resumed" + (pausedAtMono == Long.MIN_VALUE ? "" : " after a pause of "
                    + TimeText.duration((setup.clock().monoNanos() - pausedAtMono) / 1_000_000)));
            pausedAtMono = Long.MIN_VALUE;
            desk.coverPaused(false);
            if (turn != TaskTurn.ENDING) {
                freeze(false);
            }
            shell.announcer().announce("The exam has resumed. Your time is running again.");
            if (turn == TaskTurn.WAITING_FOR_RESUME) {
                turn = TaskTurn.NONE;
                startNextTask();
            }
        }
    }

    /**
     * After the hand-in, the next candidate at this seat: the handed-in sitting is closed (its
     * database, package and local copy stay as they are) and sign-in shows again with the set-up's
     * output folder, seat and form. The next candidate's sitting is a new one with its own database.
     */
    private void nextCandidate() {
        if (current != Screen.FINISHED) {
            return;
        }
        try {
            sitting.close();
        } catch (IOException | RuntimeException e) {
            // handed in: the package and its local copy are written; closing only flushes the log
            desk.eventNote("The last sitting's database did not close cleanly: " + e.getMessage());
        }
        if (shelf != null) {
            shelf.close();
            shelf = null;
        }
        sitting = null;
        plan = null;
        taskIndex = -1;
        words.clear();
        paused = false;
        pausedAtMono = Long.MIN_VALUE;
        lossNoted = false;
        turn = TaskTurn.NONE;
        submitScreen = null;
        handedIn = null;
        display = DisplaySettings.standard();
        SittingTheme.apply(shell.root(), display);
        shell.who("");
        desk.clear();
        showSignIn();
    }

    private void exitByInvigilator() {
        if (sitting != null && !sitting.submitted()) {
            // not an end of the sitting: it stays in the data folder and resumes on the next start
            sitting.exitedByInvigilator();
        }
        exitApplication();
    }

    private void refocus() {
        if (workspace != null && !paused) {
            workspace.focusEditor();
        }
    }

    // ---- focus, storage ----

    /**
     * Focus is watched while a candidate's sitting runs, from sign-in to the hand-in: before it the
     * window is the invigilator's (and settles as it opens and goes full screen, which is no loss),
     * after it nothing is at stake. A return is listed only after a loss that was.
     */
    private void onFocusLost() {
        if (sitting == null || current == Screen.FINISHED) {
            return;
        }
        lossNoted = true;
        desk.focusNote("Focus lost");
        sitting.log().record(EventType.FOCUS_LOST, currentTaskId(), Map.of());
    }

    private void onFocusReturned(long awayMillis) {
        if (!lossNoted) {
            return;
        }
        lossNoted = false;
        desk.focusNote("Focus returned after " + TimeText.duration(awayMillis));
        if (sitting != null) {
            sitting.log().record(EventType.FOCUS_RETURNED, currentTaskId(), Map.of("awayMillis", awayMillis));
        }
    }

    private String currentTaskTitle() {
        String id = currentTaskId();
        return id == null ? "" : plan.manifest().task(id).map(TaskSpec::title).orElse(id);
    }

    private String currentTaskId() {
        return current == Screen.TASK && taskIndex >= 0 ? plan.form().slots().get(taskIndex).taskId() : null;
    }

    private void storageTrouble(String message) {
        desk.eventNote("Saving failed: " + message);
        shell.announcer().announce("Invigilator: this machine cannot save the work at the moment (" + message
                + "). Keep the program open; do not switch the machine off.");
    }

    // ---- helpers ----

    private PromptText readPrompt(String entry) {
        return entry == null ? new PromptText(List.of()) : PromptText.parse(readText(entry));
    }

    private String readText(String entry) {
        try {
            return bundle.readText(entry);
        } catch (IOException e) {
            throw new IllegalStateException("the bundle entry " + entry + " could not be read again: " + e.getMessage(), e);
        }
    }

    private String bundleFile() {
        return setup.bundleFile() == null ? bundle.fileName() : setup.bundleFile().toString();
    }

    private static String timeText(TaskSpec task, int extraPercent) {
        if (task.timeLimitSeconds() <= 0) {
            return "untimed";
        }
        long seconds = task.timeLimitSeconds() + task.timeLimitSeconds() * (long) extraPercent / 100;
        return TimeText.duration(seconds * 1000) + (extraPercent > 0 ? " with your extra time" : "");
    }

    private static String clientVersion() {
        return Objects.requireNonNullElse(SittingFlow.class.getPackage().getImplementationVersion(), "development");
    }

    private static String rootMessage(Throwable t) {
        Throwable cause = t;
        while (cause.getCause() != null && (cause instanceof java.util.concurrent.CompletionException
                || cause instanceof java.util.concurrent.ExecutionException)) {
            cause = cause.getCause();
        }
        return cause.getMessage();
    }

    /** A message from a core exception as a sentence on screen. */
    static String sentence(String message) {
        if (message == null || message.isBlank()) {
            return "Something went wrong.";
        }
        String s = Character.toUpperCase(message.charAt(0)) + message.substring(1);
        return s.endsWith(".") ? s : s + ".";
    }

    /** Work that may fail with an I/O error. */
    @FunctionalInterface
    private interface IoJob<T> {
        T run() throws IOException;
    }

    /** As {@link #work}, for submission: an I/O failure keeps the retry screen up with its message. */
    private <T> void workOrFail(IoJob<T> job, java.util.function.Consumer<T> then) {
        CompletableFuture.supplyAsync(() -> {
            try {
                return job.run();
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }, background).whenComplete((result, failure) -> Platform.runLater(() -> {
            if (failure != null) {
                String message = "The answers could not be saved as a response package (" + rootMessage(failure)
                        + "). Everything typed is still in this machine's sitting database.";
                desk.eventNote(message);
                submitScreen.failed(message);
                return;
            }
            then.accept(result);
        }));
    }

    /** Runs slow work (PIN hashing, disk) off the JavaFX thread and hands the result back to it. */
    private <T> void work(Supplier<T> job, java.util.function.Consumer<T> then) {
        CompletableFuture.supplyAsync(job, background).whenComplete((result, failure) -> Platform.runLater(() -> {
            if (failure != null) {
                shell.announcer().announce("Something went wrong: " + rootMessage(failure));
                return;
            }
            then.accept(result);
        }));
    }

    private void exitApplication() {
        closeQuietly();
        if (lock != null) {
            lock.release();
        }
        stage.close();
        setup.onExit().run();
    }

    /** Closes what the sitting holds (tools, bundle, core); never throws. */
    public void closeQuietly() {
        ticker.stop();
        if (workspace != null) {
            workspace.close();
            workspace = null;
        }
        if (shelf != null) {
            shelf.close();
        }
        try {
            if (sitting != null) {
                sitting.close();
            }
        } catch (RuntimeException | IOException ignored) {
            // the log is durable within half a second; closing only flushes the rest
        }
        try {
            if (packs != null) {
                packs.close();
            }
            if (bundle != null) {
                bundle.close();
            }
        } catch (IOException ignored) {
            // temporary folders only
        }
        background.shutdown();
    }

    // ---- for tests ----

    /** The window's shell, for tests and screenshots. */
    SittingShell shell() {
        return shell;
    }

    /** The lock, when applied. */
    StageLock lock() {
        return lock;
    }

    /** Whether the writing tools are being prepared (or ready); for tests. */
    boolean toolsStarted() {
        return shelf != null;
    }

    /** Lines the invigilator screen's focus list shows, oldest first. */
    List<String> focusLines() {
        return desk.focusLines();
    }

    Screen screen() {
        return current;
    }

    Parent root() {
        return shell.root();
    }
}
