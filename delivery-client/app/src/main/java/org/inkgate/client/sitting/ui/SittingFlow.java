package org.inkgate.client.sitting.ui;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.Consumer;
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
import org.inkgate.client.processlog.ProcessLog;
import org.inkgate.client.sitting.SittingPlan;
import org.inkgate.client.sitting.TaskStart;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.sitting.course.CourseView;
import org.inkgate.client.sitting.course.ExamAtSeat;
import org.inkgate.client.sitting.course.FlowScreen;
import org.inkgate.client.sitting.course.HandedIn;
import org.inkgate.client.sitting.course.ReviewLine;
import org.inkgate.client.sitting.course.SittingCourse;
import org.inkgate.client.sitting.course.TaskAnswer;
import org.inkgate.client.sitting.course.TypedKeys;
import org.inkgate.client.sitting.open.SittingLoad;
import org.inkgate.client.sitting.recovery.RecoveryScan;
import org.inkgate.client.sitting.recovery.UnfinishedSitting;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.submit.EnrolmentExport;
import org.inkgate.client.sitting.submit.InstallationKey;
import org.inkgate.client.sitting.timing.TimeText;
import org.inkgate.client.sitting.tools.BundleToolSupply;
import org.inkgate.client.sitting.ui.lock.StageLock;
import org.inkgate.client.sitting.ui.overlay.InvigilatorPanel;
import org.inkgate.client.sitting.ui.parts.Parts;
import org.inkgate.client.sitting.ui.screen.FinishedScreen;
import org.inkgate.client.sitting.ui.screen.InstructionsScreen;
import org.inkgate.client.sitting.ui.screen.QuestionnaireScreen;
import org.inkgate.client.sitting.ui.screen.RecoveryScreen;
import org.inkgate.client.sitting.ui.screen.ReviewScreen;
import org.inkgate.client.sitting.ui.screen.SetupScreen;
import org.inkgate.client.sitting.ui.screen.SignInScreen;
import org.inkgate.client.sitting.ui.screen.SubmitScreen;
import org.inkgate.client.sitting.ui.screen.TaskScreen;
import org.inkgate.client.task.DisplaySettings;
import org.inkgate.client.task.TaskContext;
import org.inkgate.client.task.TaskWorkspace;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.PinHasher;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.packs.broker.TaskTools;

/**
 * The live sitting's window: the invigilator's set-up and recovery screens, and the candidate's
 * screens as the sitting's course ({@link SittingCourse}, which decides which screen follows
 * which, time up, pause, recovery, hand-in and next candidate) asks for them; the invigilator's
 * overlay behind the PIN; the lock; the timers' heartbeat. It renders and forwards people's
 * actions; it decides nothing about the sitting.
 */
public final class SittingFlow {

    /** Opens the invigilator's PIN prompt during the sitting. */
    public static final KeyCombination INVIGILATOR_KEYS =
            new KeyCodeCombination(KeyCode.F12, KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN);
    /** How often the timers are read; the display shows whole seconds. */
    static final Duration TICK = Duration.millis(200);
    /** How long "time is up" stays on screen before the next task. */
    static final Duration TIME_UP_PAUSE = Duration.seconds(4);

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
    private BundleToolSupply tools;
    /** The sitting's decisions; null until the bundle is open and the data folder usable. */
    private SittingCourse course;
    /** The screen shown while there is no course (the refusal). */
    private FlowScreen withoutCourse = FlowScreen.NONE;
    private DisplaySettings display = DisplaySettings.standard();
    private InstructionsScreen instructionsScreen;
    private SubmitScreen submitScreen;
    private InvigilatorDesk desk;

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
        withoutCourse = FlowScreen.REFUSED;
        course = null;
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
                    if (course != null) {
                        course.focusLost();
                    }
                }

                @Override
                public void focusReturned(long awayMillis) {
                    if (course != null) {
                        course.focusReturned(awayMillis);
                    }
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
        tools = new BundleToolSupply(opened);
        course = new SittingCourse(new ExamAtSeat(m, opened.manifestSha256(), bundleFile(), clientVersion()), data,
                setup.clock(), tools, new Screens(), Platform::runLater, background);
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
        course.showing(FlowScreen.SETUP);
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
            course.seatReady(input.outputFolder(), input.seat(), input.formId());
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

    // ---- recovery ----

    private void showRecovery(UnfinishedSitting found) {
        course.recoveryFound(found);
        java.time.Duration down = found.downtime(setup.clock().now());
        RecoveryScreen[] screen = new RecoveryScreen[1];
        // the folder chosen at set-up (the room's stick), remembered in the sitting's database
        screen[0] = new RecoveryScreen(InvigilatorFacts.recovery(found, down, bundle.manifest()),
                "_Give back the " + TimeText.duration(down.toMillis()) + " the machine was down",
                found.outputFolder().orElse(data.root().resolve("outbox")),
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
            course.resume(found, down, input.credit(), input.outputFolder()).ifPresent(screen::showError);
        });
    }

    // ---- the heartbeat ----

    private void tick() {
        if (course == null) {
            return;
        }
        course.tick();
        updateClock();
        desk.refresh();
    }

    private void updateClock() {
        if (course == null || course.screen() != FlowScreen.TASK || !course.candidateSitting()) {
            shell.time(null, "", false);
            return;
        }
        Optional<java.time.Duration> left = course.timeLeft();
        if (left.isEmpty()) {
            shell.time("Untimed", "This task is untimed", false);
        } else {
            long ms = left.get().toMillis();
            shell.time(TimeText.clock(ms), TimeText.spoken(ms), ms < 5 * 60_000);
        }
    }

    /**
     * Puts the caret in the new task's editor and hands it the keys typed on the way in. The
     * editor takes focus only once its skin is laid out, which can take a few pulses (more in
     * large print, on a busy machine); until then the scene gives focus to the first button it
     * finds. So the request is repeated each 30 ms until focus is inside the workspace (at most
     * five seconds), and never after the task has changed, the exam is paused or the invigilator's
     * screen is open; keys typed meanwhile are kept ({@link TypeAhead}) and delivered in order.
     */
    private void focusEditorOnceShown(ShownTask shown) {
        Timeline retry = new Timeline();
        retry.getKeyFrames().add(new KeyFrame(Duration.millis(30), e -> {
            if (!onScreen(shown)) {
                retry.stop(); // a later task took over, with its own keys and retry
                return;
            }
            if (course.paused() || desk.showing()) {
                typeAhead.drop();
                retry.stop();
                return;
            }
            if (focusInside(shown.workspace().view())) {
                typeAhead.deliverTo(scene.getFocusOwner());
                retry.stop();
                return;
            }
            shown.workspace().focusEditor();
        }));
        retry.setCycleCount(167);
        typeAhead.awaitFocusIn(shown.workspace().view());
        retry.setOnFinished(e -> {
            if (onScreen(shown)) {
                typeAhead.drop(); // focus never reached the editor: keys typed now go where focus is
            }
        });
        shown.workspace().focusEditor();
        retry.play();
    }

    private boolean onScreen(ShownTask shown) {
        return course != null && course.page().orElse(null) == shown;
    }

    private boolean focusInside(Node container) {
        for (Node n = scene.getFocusOwner(); n != null; n = n.getParent()) {
            if (n == container) {
                return true;
            }
        }
        return false;
    }

    /** The screens the course asks for. */
    private final class Screens implements CourseView {

        @Override
        public void candidateIn(SittingPlan plan) {
            display = SittingTheme.of(plan.manifest().roster().stream()
                    .filter(r -> r.candidateNumber().equals(plan.candidateNumber())).findFirst().orElse(null));
            SittingTheme.apply(shell.root(), display);
            shell.who("Candidate " + plan.candidateNumber());
            // the timeline runs from sign-in to the end: it drives the timers and reports saving trouble on every screen
            ticker.play();
        }

        @Override
        public void candidateOut() {
            submitScreen = null;
            display = DisplaySettings.standard();
            SittingTheme.apply(shell.root(), display);
            shell.who("");
            desk.clear();
        }

        @Override
        public void showSignIn() {
            BundleManifest m = bundle.manifest();
            String hint = m.roster().isEmpty() ? "Type the number on your admission details."
                    : "Type the number on your admission details, exactly as it is printed.";
            SignInScreen[] screen = new SignInScreen[1];
            screen[0] = new SignInScreen(m.title(), hint, number -> course.signIn(number).ifPresent(screen[0]::showError));
            shell.show(screen[0].root());
            screen[0].focus();
        }

        @Override
        public void showInstructions(SittingPlan plan) {
            BundleManifest m = plan.manifest();
            PromptText instructions = m.instructionsFile() == null ? new PromptText(List.of())
                    : PromptText.parse(readText(m.instructionsFile()));
            List<String> lines = new ArrayList<>();
            for (FormSlot slot : plan.form().slots()) {
                TaskSpec task = m.task(slot.taskId()).orElseThrow();
                lines.add(task.title() + " (" + timeText(task, plan.extraTimePercent()) + "; "
                        + String.join(", ", TaskWording.tools(slot.policy())).toLowerCase(Locale.ROOT) + ")");
            }
            instructionsScreen = new InstructionsScreen(m.title(), "Candidate " + plan.candidateNumber() + ", form "
                    + plan.formId(), instructions, lines, course::instructionsRead);
            shell.show(instructionsScreen.root());
            instructionsScreen.focus();
        }

        @Override
        public void toolsStatus(String text) {
            if (instructionsScreen != null && course.screen() == FlowScreen.INSTRUCTIONS) {
                instructionsScreen.toolsStatus(text);
            }
        }

        @Override
        public void showQuestionnaire(QuestionnaireSpec questionnaire) {
            QuestionnaireScreen screen = new QuestionnaireScreen(questionnaire, course::questionnaireAnswered);
            shell.show(screen.root());
            screen.focus();
        }

        @Override
        public void showPreparingTask() {
            shell.show(Parts.card("preparingTask", Parts.heading("Preparing the task..."),
                    Parts.quiet("The writing tools are still getting ready. This takes a few seconds.")));
        }

        @Override
        public TaskPage showTask(int index, int taskCount, TaskStart start, TaskTools taskTools, ProcessLog log) {
            TaskContext context = new TaskContext(start.task(), readText(start.task().promptFile()), taskTools, log,
                    start.text(), start.caret(), display, start.loggedBefore());
            TaskWorkspace workspace = setup.workspaces().create(context);
            TaskScreen screen = new TaskScreen("Task " + (index + 1) + " of " + taskCount + ": " + start.task().title(),
                    workspace.view(), course::finishTaskAsked);
            shell.show(screen.root());
            ticker.play();
            return new ShownTask(workspace, screen);
        }

        @Override
        public void focusAnswer(TaskPage page) {
            focusEditorOnceShown((ShownTask) page);
        }

        @Override
        public void showReview(List<ReviewLine> lines) {
            ReviewScreen screen = new ReviewScreen(lines.stream()
                    .map(l -> new ReviewScreen.Row(l.title(), l.words(), l.guidance())).toList(), course::handIn);
            shell.show(screen.root());
            screen.focus();
        }

        @Override
        public void showSubmitting() {
            if (submitScreen == null) {
                submitScreen = new SubmitScreen(course::retryDelivery);
                shell.show(submitScreen.root());
            }
            submitScreen.working();
        }

        @Override
        public void showDeliveryFailed(String message) {
            if (submitScreen == null) {
                showSubmitting();
            }
            submitScreen.failed(message);
        }

        @Override
        public void showFinished(HandedIn handedIn) {
            ticker.stop();
            shell.time(null, "", false);
            FinishedScreen screen = new FinishedScreen("For the invigilator: the response package is "
                    + handedIn.delivered() + "; a copy is kept at " + handedIn.localCopy() + ". Open the invigilator"
                    + " screen (Ctrl+Shift+F12) for the next candidate or to exit.");
            shell.show(screen.root());
        }

        @Override
        public void showResumed(String who, String where) {
            shell.show(Parts.card("resumedScreen", Parts.heading("The sitting is ready to continue"),
                    Parts.text(who), Parts.text(where), Parts.primary("continueButton", "_Continue",
                            course::continueRecovered)));
        }

        @Override
        public void afterTimeUpMessage(Runnable then) {
            PauseTransition wait = new PauseTransition(TIME_UP_PAUSE);
            wait.setOnFinished(e -> then.run());
            wait.play();
        }

        @Override
        public void announce(String text) {
            shell.announcer().announce(text);
        }

        @Override
        public void clearAnnouncement() {
            shell.announcer().clear();
        }

        @Override
        public void eventNote(String text) {
            desk.eventNote(text);
        }

        @Override
        public void focusNote(String text) {
            desk.focusNote(text);
        }

        @Override
        public void coverPaused(boolean covered) {
            desk.coverPaused(covered);
        }

        @Override
        public void keys(TypedKeys what) {
            switch (what) {
                case HOLD_FOR_NEXT_TASK -> typeAhead.hold();
                case DROP -> typeAhead.drop();
            }
        }

        @Override
        public void clockChanged() {
            updateClock();
        }
    }

    // ---- invigilator ----

    private void openInvigilator() {
        FlowScreen now = screen();
        if (now == FlowScreen.NONE || now == FlowScreen.REFUSED || now == FlowScreen.SETUP
                || now == FlowScreen.RECOVERY) {
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
                return InvigilatorFacts.state(course);
            }

            @Override
            public boolean paused() {
                return course != null && course.paused();
            }

            @Override
            public InvigilatorPanel.Moment moment() {
                return InvigilatorFacts.moment(course);
            }

            @Override
            public void setPaused(boolean pause) {
                course.setPaused(pause);
            }

            @Override
            public void addMinutes(int minutes) {
                course.addMinutes(minutes);
            }

            @Override
            public void endTask() {
                course.endTaskByInvigilator();
            }

            @Override
            public void nextCandidate() {
                course.nextCandidate();
            }

            @Override
            public void exit() {
                if (course != null) {
                    course.exitByInvigilator();
                }
                exitApplication();
            }

            @Override
            public void backToCandidate() {
                if (course != null && !course.paused()) {
                    course.page().ifPresent(CourseView.TaskPage::focusEditor);
                }
            }

            @Override
            public <T> void work(Supplier<T> job, Consumer<T> then) {
                SittingFlow.this.work(job, then);
            }
        };
    }

    // ---- helpers ----

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

    /** Runs slow work (PIN hashing, disk) off the JavaFX thread and hands the result back to it. */
    private <T> void work(Supplier<T> job, Consumer<T> then) {
        CompletableFuture.supplyAsync(job, background).whenComplete((result, failure) -> Platform.runLater(() -> {
            if (failure != null) {
                shell.announcer().announce("Something went wrong: " + SittingCourse.rootMessage(failure));
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
        if (course != null) {
            course.closeQuietly();
        } else if (tools != null) {
            tools.close();
        }
        try {
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
        return tools != null && tools.started();
    }

    /** Lines the invigilator screen's focus list shows, oldest first. */
    List<String> focusLines() {
        return desk.focusLines();
    }

    FlowScreen screen() {
        return course == null ? withoutCourse : course.screen();
    }

    Parent root() {
        return shell.root();
    }
}
