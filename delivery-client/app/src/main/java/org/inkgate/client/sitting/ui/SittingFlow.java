package org.inkgate.client.sitting.ui;

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
import org.inkgate.client.sitting.EventTypes;
import org.inkgate.client.sitting.Sitting;
import org.inkgate.client.sitting.SittingClock;
import org.inkgate.client.sitting.SittingPlan;
import org.inkgate.client.sitting.SittingSignal;
import org.inkgate.client.sitting.TaskStart;
import org.inkgate.client.sitting.recovery.RecoveryScan;
import org.inkgate.client.sitting.recovery.UnfinishedSitting;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.submit.DeliveryFailure;
import org.inkgate.client.sitting.ui.lock.StageLock;
import org.inkgate.client.sitting.ui.open.SittingLoad;
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
import org.inkgate.client.sitting.ui.tools.BundlePacks;
import org.inkgate.client.sitting.ui.tools.ExamWords;
import org.inkgate.client.sitting.ui.tools.ToolShelf;
import org.inkgate.client.task.DisplaySettings;
import org.inkgate.client.task.TaskContext;
import org.inkgate.client.task.TaskWorkspace;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.PinHasher;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.bundle.WordGuidance;
import org.inkgate.format.refusal.FormatRefusal;
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
    static final String DEMO_NOTE = "DEMO ONLY: this is the invented demo sitting. Its PIN and candidate numbers are"
            + " published (printed on the console and in docs/invigilator-guide.md), so it protects nothing.";
    private static final DateTimeFormatter CLOCK = DateTimeFormatter.ofPattern("HH:mm:ss").withZone(ZoneId.systemDefault());

    /**
     * What a sitting window is made from.
     *
     * @param load       the opened bundle or its refusal
     * @param dataFolder the client data folder, or null for the standard one
     * @param workspaces builds each task's workspace
     * @param clock      monotonic and wall clocks
     * @param demo       the demo sitting (shows the demo-only note)
     * @param lock       lock the window (false only in tests that check the flow, not the lock)
     */
    public record Setup(SittingLoad load, Path dataFolder, WorkspaceFactory workspaces, SittingClock clock,
            boolean demo, boolean lock) {
        public Setup {
            Objects.requireNonNull(load, "load");
            Objects.requireNonNull(workspaces, "workspaces");
            Objects.requireNonNull(clock, "clock");
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
    private StageLock lock;
    private OpenedBundle bundle;
    private ClientDataFolder data;
    private Path outputFolder;
    private String seat = "";
    private Sitting sitting;
    private SittingPlan plan;
    private DisplaySettings display = DisplaySettings.standard();
    private BundlePacks packs;
    private ToolShelf shelf;
    private int taskIndex = -1;
    private TaskWorkspace workspace;
    private TaskScreen taskScreen;
    private boolean paused;
    private boolean taskEnding;
    private final PausedCover pausedCover = new PausedCover();
    private PinPrompt pinPrompt;
    private InvigilatorPanel panel;
    private final List<String> focusLines = new ArrayList<>();
    private Screen current = Screen.NONE;

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
        shell.show(refusal);
        showStage("Inkgate - exam bundle not opened");
        refusal.closeButton().requestFocus();
    }

    private void open(OpenedBundle opened) {
        this.bundle = opened;
        BundleManifest m = opened.manifest();
        shell = new SittingShell(m.title());
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
        screen[0] = new SetupScreen(m.title(), bundle.signerFingerprint(), bundle.sealed(), proposed,
                setup.demo() ? DEMO_NOTE : null, input -> checkSetup(screen[0], input));
        shell.show(screen[0].root());
        screen[0].focus();
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
            try {
                Files.createDirectories(input.outputFolder());
            } catch (IOException e) {
                return "The output folder " + input.outputFolder() + " cannot be created (" + e.getMessage()
                        + "). Choose a folder on a writable disk.";
            }
            if (!Files.isWritable(input.outputFolder())) {
                return "The output folder " + input.outputFolder() + " is not writable. Choose another folder.";
            }
            if (bundle.sealed()) {
                try {
                    bundle.unseal(input.releaseCode());
                } catch (FormatRefusal e) {
                    return e.getMessage();
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
                    null, clientVersion());
        } catch (IllegalArgumentException e) {
            screen.showError(sentence(e.getMessage()));
            return;
        }
        try {
            sitting = Sitting.start(data, candidate, outputFolder, setup.clock());
        } catch (IOException | RuntimeException e) {
            screen.showError("The sitting could not be started on this machine (" + e.getMessage()
                    + "). Ask the invigilator.");
            return;
        }
        plan = candidate;
        applyDisplay();
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
        sitting.screen("instructions");
        BundleManifest m = plan.manifest();
        PromptText instructions = readPrompt(m.instructionsFile());
        List<String> lines = new ArrayList<>();
        for (FormSlot slot : plan.form().slots()) {
            TaskSpec task = m.task(slot.taskId()).orElseThrow();
            lines.add(task.title() + " (" + TaskWording.time(task.timeLimitSeconds(), plan.extraTimePercent()) + "; "
                    + TaskWording.tools(slot.policy()) + ")");
        }
        InstructionsScreen screen = new InstructionsScreen(m.title(), "Candidate " + plan.candidateNumber() + ", form "
                + plan.formId(), instructions, lines, this::afterInstructions);
        shell.show(screen.root());
        screen.focus();
        startTools(screen);
    }

    private void startTools(InstructionsScreen screen) {
        if (shelf != null) {
            return;
        }
        screen.toolsStatus("Preparing the writing tools...");
        try {
            packs = new BundlePacks(bundle);
        } catch (IOException e) {
            screen.toolsStatus("The writing tools could not be prepared (" + e.getMessage() + "). Ask the invigilator.");
            return;
        }
        List<ToolShelf.Order> orders = new ArrayList<>();
        for (FormSlot slot : plan.form().slots()) {
            TaskSpec task = plan.manifest().task(slot.taskId()).orElseThrow();
            orders.add(new ToolShelf.Order(task.id(), slot.policy(), ExamWords.of(readText(task.promptFile()))));
        }
        shelf = new ToolShelf(packs.broker(), variant(), orders);
        shelf.allReady().thenRun(() -> Platform.runLater(() -> screen.toolsStatus("The writing tools are ready.")));
    }

    private EnglishVariant variant() {
        try {
            return EnglishVariant.fromTag(plan.manifest().language());
        } catch (IllegalArgumentException e) {
            // the checker is only built for tasks that allow it; a non-English exam offering it fails there, visibly
            return EnglishVariant.EN_GB;
        }
    }

    private void afterInstructions() {
        String pre = plan.form().preQuestionnaire();
        if (pre != null) {
            showQuestionnaire(pre, this::startNextTask);
        } else {
            startNextTask();
        }
    }

    // ---- questionnaires ----

    private void showQuestionnaire(String id, Runnable then) {
        current = Screen.QUESTIONNAIRE;
        sitting.screen("questionnaire");
        QuestionnaireSpec q = plan.manifest().questionnaire(id).orElseThrow();
        QuestionnaireScreen screen = new QuestionnaireScreen(q, answers -> {
            sitting.answer(new QuestionnaireAnswers(q.id(), answers));
            then.run();
        });
        shell.show(screen.root());
        screen.focus();
    }

    // ---- tasks ----

    private void startNextTask() {
        int next = nextUnfinishedTask();
        if (next < 0) {
            afterTasks();
            return;
        }
        enterTask(next);
    }

    private int nextUnfinishedTask() {
        List<FormSlot> slots = plan.form().slots();
        for (int i = 0; i < slots.size(); i++) {
            if (!sitting.taskEnded(slots.get(i).taskId())) {
                return i;
            }
        }
        return -1;
    }

    private void enterTask(int index) {
        current = Screen.TASK;
        taskIndex = index;
        taskEnding = false;
        FormSlot slot = plan.form().slots().get(index);
        TaskStart start = sitting.enterTask(slot.taskId());
        shell.show(new javafx.scene.control.Label("Preparing the task..."));
        shelf.take(slot.taskId()).whenComplete((tools, failure) -> Platform.runLater(() -> {
            if (failure != null) {
                shell.announcer().announce(sentence(rootMessage(failure)) + " Ask the invigilator.");
                return;
            }
            TaskContext context = new TaskContext(start.task(), readText(start.task().promptFile()), tools,
                    sitting.log(), start.text(), start.caret(), display);
            workspace = setup.workspaces().create(context);
            int total = plan.form().slots().size();
            taskScreen = new TaskScreen("Task " + (index + 1) + " of " + total + ": " + start.task().title(),
                    workspace.view(), () -> endTask(EndReason.SUBMITTED));
            shell.show(taskScreen.root());
            shell.announcer().clear();
            if (start.mismatch().isPresent()) {
                shell.announcer().announce("Note for the invigilator: " + start.mismatch().get().getMessage());
            }
            updateClock();
            ticker.play();
            if (paused) {
                freeze(true);
            } else {
                workspace.focusEditor();
            }
        }));
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
                case SittingSignal.StorageRecovered ok -> focusLine("Saving works again.");
            }
        }
        updateClock();
    }

    private void updateClock() {
        if (current != Screen.TASK || sitting == null) {
            shell.time(null, "", false);
            return;
        }
        long left = sitting.remainingMillis();
        if (left == Long.MAX_VALUE) {
            shell.time("Untimed", "This task is untimed", false);
        } else {
            shell.time(TimeText.clock(left), TimeText.spoken(left), left < 5 * 60_000);
        }
    }

    private void timeUp(boolean wholeSitting) {
        if (current != Screen.TASK || taskEnding) {
            return;
        }
        taskEnding = true;
        freeze(true);
        shell.announcer().announce(wholeSitting ? "The time for the whole exam is up. Your answers have been saved."
                : "The time for this task is up. Your answer has been saved.");
        PauseTransition wait = new PauseTransition(TIME_UP_PAUSE);
        wait.setOnFinished(e -> finishTask(EndReason.TIME_UP, wholeSitting));
        wait.play();
    }

    private void endTask(EndReason reason) {
        if (current != Screen.TASK || taskEnding) {
            return;
        }
        taskEnding = true;
        finishTask(reason, false);
    }

    private void finishTask(EndReason reason, boolean endSitting) {
        ticker.stop();
        FormSlot slot = plan.form().slots().get(taskIndex);
        sitting.endTask(slot.taskId(), reason, workspace.text(), workspace.caret(), workspace.wordCount(),
                workspace.toolUse());
        workspace.close();
        workspace = null;
        taskScreen = null;
        shell.announcer().clear();
        if (endSitting) {
            sitting.endRemainingTasks(EndReason.TIME_UP);
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

    private void afterTasks() {
        current = Screen.REVIEW;
        String post = plan.form().postQuestionnaire();
        if (post != null && !sitting.answered(post)) {
            showQuestionnaire(post, this::showReview);
        } else {
            showReview();
        }
    }

    private void showReview() {
        current = Screen.REVIEW;
        sitting.screen("review");
        List<ReviewScreen.Row> rows = new ArrayList<>();
        for (FormSlot slot : plan.form().slots()) {
            TaskSpec task = plan.manifest().task(slot.taskId()).orElseThrow();
            rows.add(new ReviewScreen.Row(task.title(), sitting.wordCount(task.id()), guidance(task.words())));
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

    private void submit() {
        current = Screen.SUBMIT;
        SubmitScreen screen = new SubmitScreen(() -> deliver(null));
        submitScreen = screen;
        shell.show(screen.root());
        screen.working();
        work(() -> sitting.submit(), this::delivered);
    }

    private SubmitScreen submitScreen;

    private void deliver(Path newFolder) {
        if (submitScreen == null) {
            return;
        }
        submitScreen.working();
        work(() -> sitting.retryDelivery(newFolder == null ? outputFolder : newFolder), this::delivered);
    }

    private void delivered(Sitting.Delivery delivery) {
        if (delivery.failure().isPresent()) {
            DeliveryFailure failure = delivery.failure().get();
            focusLine("Hand-in failed: " + failure.message());
            submitScreen.failed(failure.message());
            return;
        }
        showFinished(delivery.delivered().orElseThrow(), delivery.localCopy());
    }

    private void showFinished(Path delivered, Path localCopy) {
        current = Screen.FINISHED;
        ticker.stop();
        shell.time(null, "", false);
        FinishedScreen screen = new FinishedScreen("For the invigilator: the response package is " + delivered
                + "; a copy is kept at " + localCopy + ". Open the invigilator screen (Ctrl+Shift+F12) to exit.");
        shell.show(screen.root());
    }

    // ---- recovery ----

    private void showRecovery(UnfinishedSitting found) {
        current = Screen.RECOVERY;
        Instant now = setup.clock().now();
        long down = found.downtime(now).toMillis();
        List<String> facts = new ArrayList<>();
        facts.add("Candidate: " + found.candidateNumber() + ", form " + found.formId());
        facts.add("Task on screen: " + found.currentTask().flatMap(id -> bundle.manifest().task(id))
                .map(TaskSpec::title).orElse("none (" + found.screen() + ")"));
        Sitting.Found details = Sitting.inspect(found, bundle.manifest());
        facts.add("Time left in that task: " + (details.remainingMillis() == Long.MAX_VALUE ? "untimed"
                : TimeText.duration(details.remainingMillis())));
        facts.add("Last saved: " + CLOCK.format(found.lastActivity()) + ", " + TimeText.duration(down) + " ago");
        if (found.stage() == UnfinishedSitting.Stage.AWAITING_DELIVERY) {
            facts.add("The answers were handed in and saved on this machine, but not yet written to the output folder.");
        }
        String creditText = "_Give back the " + TimeText.duration(down) + " the machine was down";
        RecoveryScreen[] screen = new RecoveryScreen[1];
        screen[0] = new RecoveryScreen(facts, creditText, (pin, credit) -> resume(screen[0], found, pin, credit));
        shell.show(screen[0].root());
        screen[0].focus();
    }

    private void resume(RecoveryScreen screen, UnfinishedSitting found, char[] pin, boolean credit) {
        work(() -> PinHasher.matches(bundle.manifest().invigilatorPin(), pin), ok -> {
            if (!ok) {
                screen.showError("That is not this exam's invigilator PIN. Enter it again.");
                return;
            }
            try {
                sitting = Sitting.resume(data, found, bundle.manifest(), credit, setup.clock());
            } catch (IOException | RuntimeException e) {
                screen.showError("The sitting could not be resumed (" + e.getMessage() + "). The saved answers are"
                        + " still in " + found.database() + "; ask the test owner's support.");
                return;
            }
            plan = sitting.plan();
            outputFolder = sitting.outputFolder();
            seat = plan.seat();
            applyDisplay();
            if (found.stage() == UnfinishedSitting.Stage.AWAITING_DELIVERY) {
                current = Screen.SUBMIT;
                submitScreen = new SubmitScreen(() -> deliver(null));
                shell.show(submitScreen.root());
                deliver(null);
                return;
            }
            startTools(new InstructionsScreen(plan.manifest().title(), "", new PromptText(List.of()), List.of(), () -> {
            }));
            if (found.currentTask().isPresent()) {
                startNextTask();
            } else {
                showInstructions();
            }
        });
    }

    // ---- invigilator ----

    private void openInvigilator() {
        if (current == Screen.NONE || current == Screen.REFUSED || current == Screen.SETUP
                || current == Screen.RECOVERY || (pinPrompt != null && shell.covered(pinPrompt))
                || (panel != null && shell.covered(panel))) {
            return;
        }
        pinPrompt = new PinPrompt(this::checkInvigilatorPin, this::closePinPrompt);
        shell.cover(pinPrompt);
        pinPrompt.reset();
    }

    private void checkInvigilatorPin(char[] pin) {
        pinPrompt.busy();
        work(() -> PinHasher.matches(bundle.manifest().invigilatorPin(), pin), ok -> {
            if (!ok) {
                pinPrompt.wrong("That is not the invigilator PIN.");
                return;
            }
            shell.uncover(pinPrompt);
            showPanel();
        });
    }

    private void closePinPrompt() {
        shell.uncover(pinPrompt);
        refocus();
    }

    private void showPanel() {
        panel = new InvigilatorPanel(new InvigilatorPanel.Actions() {
            @Override
            public void pauseOrResume() {
                setPaused(!paused);
                updatePanel();
            }

            @Override
            public void addMinutes(int minutes) {
                if (current == Screen.TASK && sitting != null) {
                    sitting.addTime(minutes * 60L);
                    shell.announcer().announce(minutes + (minutes == 1 ? " minute was" : " minutes were")
                            + " added to this task.");
                    updateClock();
                    updatePanel();
                }
            }

            @Override
            public void endTask() {
                shell.uncover(panel);
                SittingFlow.this.endTask(EndReason.ENDED_BY_INVIGILATOR);
            }

            @Override
            public void exitSitting() {
                exitByInvigilator();
            }

            @Override
            public void close() {
                shell.uncover(panel);
                refocus();
            }
        });
        focusLines.forEach(panel::focusEvent);
        updatePanel();
        shell.cover(panel);
        panel.focus();
    }

    private void updatePanel() {
        if (panel == null) {
            return;
        }
        StringBuilder state = new StringBuilder();
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
                long left = sitting.remainingMillis();
                state.append(left == Long.MAX_VALUE ? "untimed" : TimeText.duration(left) + " left");
                state.append(". ");
            } else {
                state.append("Screen: ").append(current.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' '))
                        .append(". ");
            }
        }
        state.append(paused ? "The exam is PAUSED." : "The exam is running.");
        panel.update(state.toString(), paused, current == Screen.TASK);
    }

    private void setPaused(boolean pause) {
        if (pause == paused || sitting == null) {
            return;
        }
        paused = pause;
        if (pause) {
            sitting.pauseAll();
            freeze(true);
            shell.cover(pausedCover);
            if (panel != null && shell.covered(panel)) {
                // keep the invigilator's panel above the cover
                shell.uncover(panel);
                shell.cover(panel);
            }
            shell.announcer().announce(PausedCover.HEADING + ".");
        } else {
            sitting.resumeAll();
            shell.uncover(pausedCover);
            if (!taskEnding) {
                freeze(false);
            }
            shell.announcer().announce("The exam has resumed. Your time is running again.");
        }
    }

    private void exitByInvigilator() {
        if (sitting != null) {
            sitting.exitByInvigilator();
        }
        exitApplication();
    }

    private void refocus() {
        if (workspace != null && !paused) {
            workspace.focusEditor();
        }
    }

    // ---- focus, storage ----

    private void onFocusLost() {
        focusLine("Focus lost");
        if (sitting != null) {
            sitting.log().record(EventTypes.FOCUS_LOST, currentTaskId(), Map.of());
        }
    }

    private void onFocusReturned(long awayMillis) {
        focusLine("Focus returned after " + TimeText.duration(awayMillis));
        if (sitting != null) {
            sitting.log().record(EventTypes.FOCUS_RETURNED, currentTaskId(), Map.of("awayMillis", awayMillis));
        }
    }

    private String currentTaskId() {
        return current == Screen.TASK && taskIndex >= 0 ? plan.form().slots().get(taskIndex).taskId() : null;
    }

    private void focusLine(String what) {
        String line = CLOCK.format(setup.clock().now()) + "  " + what;
        focusLines.add(line);
        if (panel != null) {
            panel.focusEvent(line);
        }
    }

    private void storageTrouble(String message) {
        focusLine("Saving failed: " + message);
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
        return bundle.fileName();
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
        Platform.exit();
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

    /** Focus log lines, oldest first. */
    List<String> focusLines() {
        return List.copyOf(focusLines);
    }

    Screen screen() {
        return current;
    }

    /** Which parts of the screen exist (for tests naming nodes). */
    Map<String, Node> parts() {
        Map<String, Node> parts = new LinkedHashMap<>();
        parts.put("pausedCover", pausedCover);
        if (panel != null) {
            parts.put("panel", panel);
        }
        return parts;
    }

    Parent root() {
        return shell.root();
    }
}
