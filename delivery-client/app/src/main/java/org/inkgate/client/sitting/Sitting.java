package org.inkgate.client.sitting;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import java.util.UUID;
import java.util.stream.Collectors;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.sitting.recovery.TextRecovery;
import org.inkgate.client.sitting.recovery.UnfinishedSitting;
import org.inkgate.client.sitting.replay.ReplayException;
import org.inkgate.client.sitting.replay.ReplayMismatch;
import org.inkgate.client.sitting.replay.TextReplay;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.store.SittingDatabase;
import org.inkgate.client.sitting.store.SittingScreen;
import org.inkgate.client.sitting.store.SittingStateStore;
import org.inkgate.client.sitting.store.SittingStateStore.PlannedTask;
import org.inkgate.client.sitting.store.SittingStateStore.SittingSetup;
import org.inkgate.client.sitting.store.SittingStateStore.StoredResponses;
import org.inkgate.client.sitting.store.SittingStateStore.StoredSitting;
import org.inkgate.client.sitting.store.SittingStateStore.StoredTask;
import org.inkgate.client.sitting.store.SittingStateStore.TaskLog;
import org.inkgate.client.sitting.store.SittingStateStore.TaskOutcome;
import org.inkgate.client.sitting.store.SittingStateStore.TaskTimes;
import org.inkgate.client.sitting.store.SittingStateStore.TimerCheckpoint;
import org.inkgate.client.sitting.store.SittingStatus;
import org.inkgate.client.sitting.store.SqliteProcessLog;
import org.inkgate.client.sitting.submit.InstallationKey;
import org.inkgate.client.sitting.submit.PackageDelivery;
import org.inkgate.client.sitting.submit.SubmissionResult;
import org.inkgate.client.sitting.timing.Countdown;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.QuestionItem;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.json.Json;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.QuestionnaireAnswers;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.response.TaskResponse.EndReason;
import org.inkgate.format.response.ToolUse;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.Tool;

/**
 * One candidate's sitting: the operations the sitting flow needs (enter and end tasks, answer
 * questionnaires, pause, add time, submit), each recorded in the process log and kept durable in
 * the sitting's database, so that {@link #resume} can carry on after a crash. Time is counted by
 * {@link Countdown}s on the monotonic clock; the UI drives them by calling {@link #poll()} from a
 * timeline (a few times a second) and acting on the {@link SittingSignal}s it returns.
 *
 * <p>Not thread-safe: call every method from one thread (the JavaFX application thread). Only
 * the process log's own writer thread touches the disk, except {@link #submit} and
 * {@link #retryDelivery}, which write the package and should run off the UI thread.
 */
public final class Sitting implements AutoCloseable {

    /** Timer state is written at least this often while time runs, so a restart loses at most this much. */
    public static final long CHECKPOINT_MILLIS = 1_000;

    private static final DateTimeFormatter FILE_TIME = DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss").withZone(ZoneOffset.UTC);

    /** What the sitting knows about one task of the form. */
    private static final class TaskRecord {
        final int order;
        final FormSlot slot;
        final TaskSpec spec;
        Instant startedAt;
        Instant endedAt;
        EndReason endReason;

        TaskRecord(int order, FormSlot slot, TaskSpec spec) {
            this.order = order;
            this.slot = slot;
            this.spec = spec;
        }
    }

    private final String sittingId;
    private final SittingPlan plan;
    private final ClientDataFolder folder;
    private final SittingClock clock;
    private final SqliteProcessLog log;
    private final SittingStateStore store;
    private final Instant startedAt;
    private final Map<String, TaskRecord> tasks = new LinkedHashMap<>();
    private final SittingTime time;
    private String currentTask;
    private SittingScreen screen;
    private String reportedProblem;
    private final HandIn handIn;
    private boolean submitted;
    private boolean closed;
    private boolean endRecorded;

    private Sitting(String sittingId, SittingPlan plan, ClientDataFolder folder, SittingClock clock, SqliteProcessLog log,
            Instant startedAt, Map<String, StoredTask> stored, long sittingUsed, long sittingAdded) {
        this.sittingId = sittingId;
        this.plan = plan;
        this.folder = folder;
        this.clock = clock;
        this.log = log;
        this.store = new SittingStateStore(log);
        this.handIn = new HandIn(plan, folder, store, log);
        this.startedAt = startedAt;
        List<FormSlot> slots = plan.form().slots();
        for (int i = 0; i < slots.size(); i++) {
            FormSlot slot = slots.get(i);
            TaskSpec spec = plan.manifest().task(slot.taskId()).orElseThrow(
                    () -> new IllegalArgumentException("form " + plan.formId() + " names task " + slot.taskId()
                            + " that the bundle does not define"));
            tasks.put(spec.id(), new TaskRecord(i, slot, spec));
        }
        this.time = new SittingTime(clock, tasks.values().stream().map(t -> t.spec).toList(), plan.extraTimePercent(), stored,
                plan.form().sittingLimitSeconds(), sittingUsed, sittingAdded);
    }

    // -- starting and resuming --

    /** Starts a new sitting whose output folder is not known here (tests, tools): see the four-argument form. */
    public static Sitting begin(SittingPlan plan, ClientDataFolder folder, SittingClock clock) throws IOException {
        return begin(plan, folder, clock, null);
    }

    /**
     * Starts a new sitting: creates its database in the client data folder, remembers the output
     * folder the invigilator chose at set-up (so recovery proposes it again) and logs {@code sitting.start}.
     */
    public static Sitting begin(SittingPlan plan, ClientDataFolder folder, SittingClock clock, Path outputFolder)
            throws IOException {
        folder.create();
        String id = UUID.randomUUID().toString();
        Instant now = clock.now();
        Path file = folder.sittings().resolve(FILE_TIME.format(now) + "-" + safe(plan.candidateNumber()) + "-" + id
                + SittingDatabase.SUFFIX);
        SqliteProcessLog log = SqliteProcessLog.open(file, clock);
        Sitting s = new Sitting(id, plan, folder, clock, log, now, Map.of(), 0, 0);
        s.screen = SittingScreen.START;
        s.store.createSitting(new SittingSetup(id, plan.manifestSha256(), plan.bundleFile(), plan.manifest().examId(),
                plan.candidateNumber(), plan.formId(), plan.seat(), plan.extraTimePercent(), now, plan.clientVersion(),
                Optional.ofNullable(outputFolder)), s.tasks.values().stream()
                .map(t -> new PlannedTask(t.spec.id(), t.order, t.slot.conditionId(), policyJson(t.slot.policy()))).toList());
        log.record(EventType.SITTING_START, null, Map.of("bundle", plan.manifestSha256(), "form", plan.formId(),
                "candidate", plan.candidateNumber()));
        log.flush();
        return s;
    }

    /**
     * Carries on an unfinished sitting after a restart, once the invigilator has given the PIN.
     * The time the machine was down ({@link UnfinishedSitting#downtime}) counts as used unless the
     * invigilator credits it: {@code credited} (0 up to the downtime) is given back and logged,
     * with the downtime, in {@code sitting.resume}.
     *
     * @param manifest       the bundle's manifest, opened again and verified
     * @param manifestSha256 its digest, which must be the one the sitting began with
     */
    public static Sitting resume(UnfinishedSitting found, BundleManifest manifest, String manifestSha256, Duration credited,
            ClientDataFolder folder, SittingClock clock) throws IOException {
        if (!found.bundleSha256().equals(manifestSha256)) {
            throw new IllegalArgumentException("this is not the bundle the sitting began with (manifest SHA-256 "
                    + manifestSha256 + ", the sitting used " + found.bundleSha256() + "); open the bundle " + found.bundleFile());
        }
        SqliteProcessLog log = SqliteProcessLog.open(found.database(), clock);
        try {
            StoredSitting stored = new SittingStateStore(log).loadSitting();
            Sitting s = restore(stored, found, manifest, folder, clock, log);
            s.creditDowntime(found.downtime(clock.now()), credited);
            return s;
        } catch (IOException | RuntimeException e) {
            log.close();
            throw e;
        }
    }

    private static Sitting restore(StoredSitting stored, UnfinishedSitting found, BundleManifest manifest, ClientDataFolder folder,
            SittingClock clock, SqliteProcessLog log) {
        var entry = manifest.roster().stream().filter(r -> r.candidateNumber().equals(found.candidateNumber())).findFirst();
        SittingPlan plan = new SittingPlan(manifest, found.bundleSha256(), found.bundleFile(), found.candidateNumber(),
                stored.seat(), found.formId(), stored.extraPercent(), entry.map(r -> r.largePrint()).orElse(false),
                entry.map(r -> r.highContrast()).orElse(false), stored.clientVersion());
        Sitting s = new Sitting(found.sittingId(), plan, folder, clock, log, stored.startedAt(), stored.tasks(),
                stored.sittingUsedMillis(), stored.sittingAddedMillis());
        s.screen = stored.screen();
        s.currentTask = stored.currentTask().orElse(null);
        s.handIn.restore(stored.packageId().orElse(null), stored.localCopy().orElse(null));
        s.submitted = stored.status() != SittingStatus.IN_PROGRESS;
        for (StoredTask st : stored.tasks().values()) {
            TaskRecord t = s.tasks.get(st.taskId());
            if (t != null) {
                t.startedAt = st.startedAt().orElse(null);
                t.endedAt = st.endedAt().orElse(null);
                t.endReason = st.endReason().orElse(null);
            }
        }
        s.time.restore(stored.paused(), s.tasks.values().stream().anyMatch(t -> t.startedAt != null));
        return s;
    }

    private void creditDowntime(Duration down, Duration credited) {
        long downMs = down.toMillis();
        long creditMs = Math.max(0, Math.min(downMs, Objects.requireNonNullElse(credited, Duration.ZERO).toMillis()));
        Optional<String> wasRunning = Optional.ofNullable(currentTask)
                .filter(id -> tasks.get(id).startedAt != null && tasks.get(id).endedAt == null);
        SittingTime.Credit credit = time.chargeDowntime(wasRunning, submitted, downMs, creditMs);
        log.record(EventType.SITTING_RESUME, null, Map.of("downSeconds", downMs / 1000.0, "creditedSeconds", creditMs / 1000.0,
                "by", "invigilator"));
        if (credit.any()) {
            log.record(EventType.TIME_ADDED, credit.task() ? currentTask : null,
                    Map.of("seconds", creditMs / 1000.0, "reason", "crash-credit"));
        }
        checkpoint();
    }

    // -- what the flow reads --

    /** The sitting's id (also in its database file name). */
    public String id() {
        return sittingId;
    }

    /** Bundle, candidate, form and accommodations. */
    public SittingPlan plan() {
        return plan;
    }

    /** The process log for the task workspaces. */
    public SqliteProcessLog log() {
        return log;
    }

    /** Wall-clock start of the sitting. */
    public Instant startedAt() {
        return startedAt;
    }

    /** The form's slots in the order sat. */
    public List<FormSlot> slots() {
        return plan.form().slots();
    }

    /** Where every task stands, in form order. */
    public List<TaskProgress> progress() {
        return tasks.values().stream().map(t -> new TaskProgress(t.spec.id(), Optional.ofNullable(t.startedAt),
                Optional.ofNullable(t.endedAt), Optional.ofNullable(t.endReason))).toList();
    }

    /** The first task that has not ended, in form order; empty when all have ended. */
    public Optional<String> nextTask() {
        return tasks.values().stream().filter(t -> t.endedAt == null).map(t -> t.spec.id()).findFirst();
    }

    /** The task on screen, if any. */
    public Optional<String> currentTask() {
        return Optional.ofNullable(currentTask);
    }

    /** The screen last shown ({@link #showScreen}). */
    public SittingScreen screen() {
        return screen;
    }

    /** Whether the invigilator has paused the sitting. */
    public boolean paused() {
        return time.paused();
    }

    /** Whether the response package has been written (delivered or awaiting delivery). */
    public boolean submitted() {
        return submitted;
    }

    /** Time left in a task; empty for an untimed task. */
    public Optional<Duration> remaining(String taskId) {
        record(taskId);
        return time.task(taskId).map(cd -> Duration.ofMillis(cd.remainingMillis()));
    }

    /** Time allowed in a task (limit, roster extra time, additions); empty for an untimed task. */
    public Optional<Duration> allowed(String taskId) {
        record(taskId);
        return time.task(taskId).map(cd -> Duration.ofMillis(cd.allowedMillis()));
    }

    /**
     * Time left in the whole sitting; empty when the form sets no sitting limit. The sitting limit
     * counts from the start of the first task to submission (questionnaires and the time between
     * tasks included, pauses excluded), with the roster's extra time and the invigilator's
     * additions applied as to task limits.
     */
    public Optional<Duration> sittingRemaining() {
        return time.sittingRemaining();
    }

    // -- what the flow does --

    /** Logs that a screen of the flow is shown ({@code nav.screen}) and remembers it for recovery. */
    public void showScreen(SittingScreen shown) {
        requireOpen();
        screen = Objects.requireNonNull(shown, "shown");
        log.record(EventType.NAV_SCREEN, currentTask, Map.of("screen", shown.wireName()));
        store.saveScreen(shown);
    }

    /** Logs that the invigilator closed the client without a hand-in; the screen to resume on stays as it was. */
    public void exitedByInvigilator() {
        requireOpen();
        log.record(EventType.NAV_SCREEN, currentTask, Map.of("screen", SittingScreen.EXIT_BY_INVIGILATOR.wireName()));
    }

    /**
     * Begins the next task, or re-enters the current one after a restart: logs {@code task.start}
     * with the policy and the tools offered, starts its time, and returns the text to start from
     * (recovered from snapshot and log after a restart).
     *
     * @throws IllegalStateException when the task has ended, an earlier task has not, or the sitting is paused
     */
    public TaskStart enterTask(String taskId) throws IOException {
        requireOpen();
        TaskRecord t = record(taskId);
        if (t.endedAt != null) {
            throw new IllegalStateException("task " + taskId + " has already ended (" + t.endReason + ")");
        }
        String earlier = nextTask().orElseThrow();
        if (!earlier.equals(taskId)) {
            throw new IllegalStateException("task " + earlier + " comes before " + taskId + " in form " + plan.formId()
                    + " and has not ended");
        }
        if (time.paused()) {
            throw new IllegalStateException("the sitting is paused; resume it before entering a task");
        }
        boolean resumed = t.startedAt != null;
        // read before this process logs anything for the task: what the crashed process logged
        TaskLog logged = resumed ? store.taskLog(taskId) : new TaskLog(Optional.empty(), List.of());
        TextRecovery.Recovered recovered = resumed ? TextRecovery.recover(taskId, logged)
                : new TextRecovery.Recovered("", 0, 0, 0, Optional.empty(), Optional.empty());
        List<ProcessEvent> loggedBefore = logged.events();
        Instant now = clock.now();
        if (!resumed) {
            t.startedAt = now;
            store.markTaskStarted(taskId, now);
        }
        currentTask = taskId;
        store.saveCurrentTask(taskId);
        ResourcePolicy policy = t.slot.policy();
        log.record(EventType.TASK_START, taskId, Map.of("policy", policyJson(policy), "tools", toolNames(policy.offeredTools()),
                "resumed", resumed, "condition", t.slot.conditionId()));
        if (!resumed) {
            time.task(taskId).filter(cd -> cd.rosterExtraMillis() > 0).ifPresent(cd -> log.record(EventType.TIME_ADDED, taskId,
                    Map.of("seconds", cd.rosterExtraMillis() / 1000.0, "reason", "roster")));
        }
        recovered.problem().ifPresent(p -> log.record(EventType.TASK_REPLAY_PROBLEM, taskId, Map.of("problem", p)));
        time.startTask(taskId);
        checkpoint();
        return new TaskStart(t.slot, t.spec, recovered.text(), recovered.caret(), resumed, recovered.mismatch(), loggedBefore);
    }

    /**
     * Ends the current task: stops its time, logs {@code task.end} and stores the final text,
     * word count and tool use (only for tools the policy offered) for the response.
     */
    public void endTask(String taskId, EndReason reason, String finalText, int wordCount, Map<Tool, ToolUse> toolUse) {
        requireOpen();
        TaskRecord t = record(taskId);
        if (!taskId.equals(currentTask) || t.endedAt != null) {
            throw new IllegalStateException("task " + taskId + " is not the task in progress");
        }
        Objects.requireNonNull(reason, "reason");
        Objects.requireNonNull(finalText, "finalText");
        time.stopTask(taskId);
        Instant now = clock.now();
        t.endedAt = now;
        t.endReason = reason;
        Set<Tool> offered = t.slot.policy().offeredTools();
        Map<Tool, ToolUse> use = new EnumMap<>(Tool.class);
        Objects.requireNonNullElse(toolUse, Map.<Tool, ToolUse>of()).forEach((tool, u) -> {
            if (offered.contains(tool)) {
                use.put(tool, u);
            }
        });
        log.snapshot(taskId, finalText, finalText.length());
        log.record(EventType.TASK_END, taskId, Map.of("reason", reasonName(reason), "words", wordCount));
        store.saveTaskEnd(taskId, now, reason, finalText, wordCount, use, time.task(taskId).map(Countdown::usedMillis).orElse(0L));
        currentTask = null;
    }

    /**
     * Ends every task not yet begun, with empty text (the sitting's time ran out, or the
     * invigilator ended the sitting); they appear in the response with that reason.
     */
    public void endUnstartedTasks(EndReason reason) {
        requireOpen();
        Instant now = clock.now();
        for (TaskRecord t : tasks.values()) {
            if (t.startedAt == null && t.endedAt == null) {
                t.endedAt = now;
                t.endReason = reason;
                String id = t.spec.id();
                log.record(EventType.TASK_END, id, Map.of("reason", reasonName(reason), "words", 0, "begun", false));
                store.saveUnstartedTaskEnd(id, now, reason);
            }
        }
    }

    /**
     * Records a questionnaire answer (replacing an earlier one to the same item): a Likert point
     * (1-based, as text) or free text.
     *
     * @throws IllegalArgumentException when the questionnaire is not this form's, the item is not
     *                                  in it, or a Likert answer is not one of its points
     */
    public void answer(String questionnaireId, String itemId, String value) {
        requireOpen();
        if (!questionnaireId.equals(plan.form().preQuestionnaire()) && !questionnaireId.equals(plan.form().postQuestionnaire())) {
            throw new IllegalArgumentException("questionnaire " + questionnaireId + " is not asked in form " + plan.formId());
        }
        QuestionnaireSpec q = plan.manifest().questionnaire(questionnaireId).orElseThrow(
                () -> new IllegalArgumentException("questionnaire " + questionnaireId + " is not in the bundle"));
        QuestionItem item = q.items().stream().filter(i -> i.id().equals(itemId)).findFirst().orElseThrow(
                () -> new IllegalArgumentException("questionnaire " + questionnaireId + " has no item " + itemId));
        Objects.requireNonNull(value, "value");
        if (isLikert(item)) {
            int points = item.labels().size();
            boolean ok;
            try {
                int v = Integer.parseInt(value);
                ok = v >= 1 && v <= points;
            } catch (NumberFormatException e) {
                ok = false;
            }
            if (!ok) {
                throw new IllegalArgumentException("item " + itemId + " of " + questionnaireId + " takes a point from 1 to " + points
                        + ", not \"" + value + "\"");
            }
        }
        store.saveAnswer(questionnaireId, itemId, value);
    }

    /** Pauses the sitting (the invigilator's emergency pause): time stops, {@code pause.start} is logged. */
    public void pauseAll() {
        requireOpen();
        if (time.pause(running())) {
            log.record(EventType.PAUSE_START, currentTask, Map.of("scope", "all"));
            checkpoint();
        }
    }

    /** Ends the pause: time runs again, {@code pause.end} is logged with how long it lasted. */
    public void resumeAll() {
        requireOpen();
        OptionalLong pausedMillis = time.resume(running(), submitted);
        if (pausedMillis.isPresent()) {
            log.record(EventType.PAUSE_END, currentTask, Map.of("pausedMillis", pausedMillis.getAsLong()));
            checkpoint();
        }
    }

    /**
     * Adds time for this candidate (an invigilator's accommodation): to the task in progress, or
     * the next one when none is, and to the sitting limit when the form sets one. Logged as
     * {@code time.added} with reason "invigilator".
     */
    public void addTime(Duration added) {
        requireOpen();
        long ms = added.toMillis();
        if (ms <= 0) {
            throw new IllegalArgumentException("time added must be positive, not " + added);
        }
        String target = currentTask != null ? currentTask : nextTask().orElse(null);
        time.add(Optional.ofNullable(target), ms);
        log.record(EventType.TIME_ADDED, target, Map.of("seconds", ms / 1000.0, "reason", "invigilator"));
        checkpoint();
    }

    /**
     * Advances the timers: logs and returns warnings and expiries that became due since the last
     * call, and reports trouble writing the log. Call it from a timeline a few times a second.
     */
    public List<SittingSignal> poll() {
        List<SittingSignal> signals = new ArrayList<>();
        Optional<String> problem = log.problem();
        if (problem.isPresent() && !problem.get().equals(reportedProblem)) {
            reportedProblem = problem.get();
            signals.add(new SittingSignal.StorageTrouble(reportedProblem));
        } else if (problem.isEmpty() && reportedProblem != null) {
            reportedProblem = null;
            signals.add(new SittingSignal.StorageRecovered());
        }
        if (submitted || time.paused()) {
            return signals;
        }
        for (SittingSignal due : time.due(running(), submitted)) {
            switch (due) {
                case SittingSignal.TimeWarning w -> log.record(EventType.TIMER_WARNING, w.taskId(),
                        Map.of("minutesLeft", w.minutesLeft()));
                case SittingSignal.TaskTimeUp up -> log.record(EventType.TIMER_EXPIRED, up.taskId(), Map.of("scope", "task"));
                case SittingSignal.SittingTimeUp up -> log.record(EventType.TIMER_EXPIRED, null, Map.of("scope", "sitting"));
                default -> throw new IllegalStateException("not a timer signal: " + due);
            }
            signals.add(due);
        }
        if (time.checkpointDue()) {
            checkpoint();
        }
        return signals;
    }

    /**
     * Checks every ended task's stored final text against a replay of its log from the start;
     * empty when all agree. A disagreement means the log misses a change: the stored text is
     * what is submitted, and the test owner should be told.
     */
    public List<ReplayMismatch> verifyReplay() throws IOException {
        List<ProcessEvent> events = log.events();
        Map<String, String> finals = store.finalTexts();
        List<ReplayMismatch> mismatches = new ArrayList<>();
        for (Map.Entry<String, String> f : finals.entrySet()) {
            try {
                TextReplay.compare(f.getKey(), f.getValue(), TextReplay.replay(f.getKey(), events).text()).ifPresent(mismatches::add);
            } catch (ReplayException e) {
                mismatches.add(ReplayMismatch.unreplayable(f.getKey(), f.getValue().length(), e));
            }
        }
        return mismatches;
    }

    // -- submission --

    /**
     * Final submission: logs {@code sitting.end}, builds the response package (signed with the
     * installation key, encrypted to the test owner), writes the local copy in the client data
     * folder first, then delivers it to {@code outputFolder}. A delivery that fails is reported in
     * the result and can be retried with {@link #retryDelivery}; the package is never lost.
     * Writes files: call it off the UI thread.
     *
     * @throws IllegalStateException when a task has not ended
     * @throws IOException           when even the local copy cannot be written (the database still holds everything)
     */
    public SubmissionResult submit(Path outputFolder, InstallationKey key) throws IOException {
        requireOpen();
        Optional<String> open = nextTask();
        if (open.isPresent()) {
            throw new IllegalStateException("task " + open.get() + " has not ended; end it (or end the unstarted tasks) first");
        }
        handIn.packageId(); // drawn and saved before the sitting ends: a retry writes the same package
        time.stopSitting();
        if (!endRecorded) {
            // a retry after the local copy failed does not end the sitting twice
            log.record(EventType.SITTING_END, null, Map.of("reason", "submitted"));
            endRecorded = true;
        }
        checkpoint();
        Instant submittedAt = clock.now();
        List<ProcessEvent> events = log.events();
        ResponseDocument document = responseDocument(store.responses(), submittedAt);
        byte[] bytes = handIn.writeLocalCopy(document, events, key, submittedAt);
        submitted = true;
        return handIn.deliver(bytes, outputFolder);
    }

    /** Delivers the saved package again (after a failure, or to a second folder). */
    public SubmissionResult retryDelivery(Path outputFolder) throws IOException {
        requireOpen();
        return handIn.retry(outputFolder);
    }

    /** The local copy of the response package, once submitted. */
    public Optional<Path> localCopy() {
        return handIn.localCopy();
    }

    /** Replaces the file-system access of deliveries (tests stand in a full or read-only disk). */
    public void useDelivery(PackageDelivery replacement) {
        handIn.useDelivery(replacement);
    }

    private ResponseDocument responseDocument(StoredResponses stored, Instant submittedAt) {
        List<TaskResponse> responses = new ArrayList<>();
        for (TaskOutcome o : stored.tasks()) {
            TaskRecord t = tasks.get(o.taskId());
            long extraMs = time.task(t.spec.id()).map(cd -> cd.rosterExtraMillis() + cd.addedMillis()).orElse(o.addedMillis());
            responses.add(new TaskResponse(t.spec.id(), t.slot.conditionId(), o.finalText(), o.wordCount(),
                    o.startedAt().orElse(null), o.endedAt().orElse(null), extraMs / 1000, t.slot.policy(),
                    t.slot.policy().offeredTools(), o.toolUse(), o.endReason()));
        }
        Map<String, Map<String, String>> answers = stored.answers();
        List<QuestionnaireAnswers> questionnaires = answers.entrySet().stream()
                .map(e -> new QuestionnaireAnswers(e.getKey(), e.getValue())).toList();
        return new ResponseDocument(ResponseDocument.FORMAT, ResponseDocument.SCHEMA_VERSION, handIn.packageId(),
                plan.manifest().examId(),
                plan.manifestSha256(), plan.candidateNumber(), plan.seat(), plan.formId(), plan.clientVersion(), startedAt,
                submittedAt, responses, questionnaires);
    }

    /** Writes the timer state and closes the database; the sitting stays resumable until submitted. */
    @Override
    public void close() throws IOException {
        if (closed) {
            return;
        }
        checkpoint();
        closed = true;
        log.close();
    }

    // -- helpers --

    private void checkpoint() {
        store.saveTimers(time.checkpoint(clock.now()));
    }

    /** The task in progress: the current one until it ends. */
    private Optional<String> running() {
        return currentTask == null || tasks.get(currentTask).endedAt != null ? Optional.empty() : Optional.of(currentTask);
    }

    private TaskRecord record(String taskId) {
        TaskRecord t = tasks.get(taskId);
        if (t == null) {
            throw new IllegalArgumentException("task \"" + taskId + "\" is not in form " + plan.formId());
        }
        return t;
    }

    private void requireOpen() {
        if (closed) {
            throw new IllegalStateException("the sitting " + sittingId + " is closed");
        }
    }

    private static boolean isLikert(QuestionItem item) {
        return item.kind() == QuestionItem.Kind.LIKERT;
    }

    static String policyJson(ResourcePolicy policy) {
        return new String(Json.writeLine(policy), java.nio.charset.StandardCharsets.UTF_8);
    }

    static String toolNames(Set<Tool> tools) {
        return tools.stream().sorted().map(t -> t.name().toLowerCase(Locale.ROOT)).collect(Collectors.joining(","));
    }

    /** The reason as response.json spells it. */
    static String reasonName(EndReason reason) {
        return switch (reason) {
            case SUBMITTED -> "submitted";
            case TIME_UP -> "time-up";
            case ENDED_BY_INVIGILATOR -> "ended-by-invigilator";
        };
    }

    /** A name part for files: characters other than {@code A-Z a-z 0-9 . _ -} become {@code _}. */
    static String safe(String s) {
        String cleaned = s.replaceAll("[^A-Za-z0-9._-]", "_");
        return cleaned.isEmpty() ? "_" : cleaned;
    }

}
