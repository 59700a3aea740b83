package org.inkgate.client.sitting;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.OptionalLong;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.sitting.store.SittingStateStore.StoredTask;
import org.inkgate.client.sitting.store.SittingStateStore.TaskTimes;
import org.inkgate.client.sitting.store.SittingStateStore.TimerCheckpoint;
import org.inkgate.client.sitting.timing.Countdown;
import org.inkgate.format.bundle.TaskSpec;

/**
 * The sitting's time: a {@link Countdown} for each timed task and one for the sitting limit, the
 * invigilator's pause, time added, the downtime of a crash, and which warnings and expiries are due.
 * It decides and counts only; {@link Sitting} logs each event and makes it durable. The sitting
 * limit counts from the start of the first task to submission, pauses excluded.
 */
final class SittingTime {

    /** Which clocks a downtime credit was given to. */
    record Credit(boolean task, boolean sitting) {
        boolean any() {
            return task || sitting;
        }
    }

    private final SittingClock clock;
    private final Map<String, Countdown> tasks = new LinkedHashMap<>();
    private final Optional<Countdown> sitting;
    private boolean sittingStarted;
    private boolean paused;
    private long pausedAtMono;
    private long lastCheckpointMono;

    /**
     * @param specs          the form's tasks, in order
     * @param stored         what a crashed process stored of each task's time (empty for a new sitting)
     * @param sittingLimit   the form's sitting limit in seconds; 0 or less for none
     */
    SittingTime(SittingClock clock, List<TaskSpec> specs, int extraPercent, Map<String, StoredTask> stored,
            int sittingLimit, long sittingUsed, long sittingAdded) {
        this.clock = clock;
        for (TaskSpec spec : specs) {
            if (spec.timeLimitSeconds() > 0) {
                Optional<StoredTask> before = Optional.ofNullable(stored.get(spec.id()));
                tasks.put(spec.id(), new Countdown(clock, TimeUnit.SECONDS.toMillis(spec.timeLimitSeconds()), extraPercent,
                        spec.warningMinutes(), before.map(StoredTask::usedMillis).orElse(0L),
                        before.map(StoredTask::addedMillis).orElse(0L), before.map(StoredTask::warned).orElse(Set.of())));
            }
        }
        this.sitting = sittingLimit <= 0 ? Optional.empty()
                : Optional.of(new Countdown(clock, TimeUnit.SECONDS.toMillis(sittingLimit), extraPercent, List.of(),
                        sittingUsed, sittingAdded, Set.of()));
        this.lastCheckpointMono = clock.monoNanos();
    }

    /** The task's countdown; empty for an untimed task. */
    Optional<Countdown> task(String taskId) {
        return Optional.ofNullable(tasks.get(taskId));
    }

    Optional<Duration> sittingRemaining() {
        return sitting.map(cd -> Duration.ofMillis(cd.remainingMillis()));
    }

    boolean paused() {
        return paused;
    }

    /** After a restart: the pause and the sitting clock as the crashed process left them. */
    void restore(boolean wasPaused, boolean anyTaskStarted) {
        paused = wasPaused;
        pausedAtMono = clock.monoNanos();
        sittingStarted = anyTaskStarted;
    }

    /** A task begins or is re-entered: its time and the sitting's run. */
    void startTask(String taskId) {
        task(taskId).ifPresent(Countdown::start);
        sitting.ifPresent(Countdown::start);
        sittingStarted = true;
    }

    /** The task ended: its time stops (the sitting's runs on between tasks). */
    void stopTask(String taskId) {
        task(taskId).ifPresent(Countdown::stop);
    }

    /** The hand-in: the sitting's time stops for good. */
    void stopSitting() {
        sitting.ifPresent(Countdown::stop);
    }

    /** Stops all time; false when already paused. */
    boolean pause(Optional<String> runningTask) {
        if (paused) {
            return false;
        }
        runningTask.flatMap(this::task).ifPresent(Countdown::stop);
        sitting.ifPresent(Countdown::stop);
        paused = true;
        pausedAtMono = clock.monoNanos();
        return true;
    }

    /** Ends the pause and runs the time again; how long it lasted, or empty when not paused. */
    OptionalLong resume(Optional<String> runningTask, boolean submitted) {
        if (!paused) {
            return OptionalLong.empty();
        }
        paused = false;
        long pausedMillis = TimeUnit.NANOSECONDS.toMillis(clock.monoNanos() - pausedAtMono);
        runningTask.flatMap(this::task).ifPresent(Countdown::start);
        if (sittingStarted && !submitted) {
            sitting.ifPresent(Countdown::start);
        }
        return OptionalLong.of(pausedMillis);
    }

    /** Adds time to {@code taskId} (when there is one) and to the sitting limit. */
    void add(Optional<String> taskId, long millis) {
        taskId.flatMap(this::task).ifPresent(cd -> cd.add(millis));
        sitting.ifPresent(cd -> cd.add(millis));
    }

    /**
     * After a restart: the time the machine was down counts as used by whatever clock was running,
     * then {@code creditMillis} of it is given back to those clocks.
     *
     * @param runningTask the task that was in progress when the machine went down, if any
     */
    Credit chargeDowntime(Optional<String> runningTask, boolean submitted, long downMillis, long creditMillis) {
        Optional<Countdown> running = paused || submitted ? Optional.empty() : runningTask.flatMap(this::task);
        boolean taskRan = !paused && !submitted && runningTask.isPresent();
        boolean sittingRan = !paused && !submitted && sittingStarted;
        running.ifPresent(cd -> cd.charge(downMillis));
        if (sittingRan) {
            sitting.ifPresent(cd -> cd.charge(downMillis));
        }
        Credit credit = new Credit(taskRan && creditMillis > 0, sittingRan && creditMillis > 0);
        if (credit.task()) {
            running.ifPresent(cd -> cd.add(creditMillis));
        }
        if (credit.sitting()) {
            sitting.ifPresent(cd -> cd.add(creditMillis));
        }
        return credit;
    }

    /**
     * The warnings and expiries that became due since the last call, in the order they are to be
     * logged: the task's warning, the task's expiry, the sitting's expiry.
     */
    List<SittingSignal> due(Optional<String> runningTask, boolean submitted) {
        List<SittingSignal> signals = new ArrayList<>();
        if (submitted || paused) {
            return signals;
        }
        if (runningTask.isPresent() && tasks.containsKey(runningTask.get())) {
            String id = runningTask.get();
            Countdown cd = tasks.get(id);
            OptionalInt warning = cd.dueWarning();
            if (warning.isPresent()) {
                signals.add(new SittingSignal.TimeWarning(id, warning.getAsInt()));
            }
            if (cd.expiredNow()) {
                signals.add(new SittingSignal.TaskTimeUp(id));
            }
        }
        if (sitting.isPresent() && sittingStarted && sitting.get().expiredNow()) {
            signals.add(new SittingSignal.SittingTimeUp());
        }
        return signals;
    }

    /** Whether {@link Sitting#CHECKPOINT_MILLIS} passed since the last checkpoint. */
    boolean checkpointDue() {
        return clock.monoNanos() - lastCheckpointMono >= TimeUnit.MILLISECONDS.toNanos(Sitting.CHECKPOINT_MILLIS);
    }

    /** Every clock as it stands now, to be stored; the next checkpoint is due a period from now. */
    TimerCheckpoint checkpoint(Instant now) {
        lastCheckpointMono = clock.monoNanos();
        List<TaskTimes> taskTimes = new ArrayList<>();
        tasks.forEach((id, cd) -> taskTimes.add(new TaskTimes(id, cd.usedMillis(), cd.addedMillis(), cd.warned())));
        return new TimerCheckpoint(now, sitting.map(Countdown::usedMillis).orElse(0L),
                sitting.map(Countdown::addedMillis).orElse(0L), paused, taskTimes);
    }
}
