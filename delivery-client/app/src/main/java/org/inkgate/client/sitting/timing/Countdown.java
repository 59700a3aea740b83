package org.inkgate.client.sitting.timing;

import java.util.List;
import java.util.Objects;
import java.util.OptionalInt;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;
import org.inkgate.client.sitting.clock.SittingClock;

/**
 * Time allowed for one task (or the whole sitting), counted on the monotonic clock only while
 * it runs, so a changed system clock cannot shorten or lengthen it and a pause stops it.
 * Allowed time = base limit + the roster's extra time (a percentage of the base, QTI PNP
 * additional-testing-time) + whatever the invigilator added. Owns no thread: the caller polls.
 * Not thread-safe: use it from one thread (the UI thread's timeline).
 */
public final class Countdown {

    private final SittingClock clock;
    private final long baseMillis;
    private final int extraPercent;
    private final List<Integer> warningMinutes;
    private final Set<Integer> warned;
    private long usedMillis;
    private long addedMillis;
    private long runningSince = -1;
    private boolean expiredSignalled;

    /**
     * @param clock          the sitting clock
     * @param baseMillis     the bundle's limit, before extra time; positive
     * @param extraPercent   the roster's extra time in percent (0-400)
     * @param warningMinutes minutes before the end at which to warn
     * @param usedMillis     time already used (restored after a restart)
     * @param addedMillis    time the invigilator already added
     * @param warned         warnings already given (restored after a restart)
     */
    public Countdown(SittingClock clock, long baseMillis, int extraPercent, List<Integer> warningMinutes, long usedMillis,
            long addedMillis, Set<Integer> warned) {
        this.clock = Objects.requireNonNull(clock, "clock");
        if (baseMillis <= 0) {
            throw new IllegalArgumentException("a countdown needs a positive limit, not " + baseMillis + " ms (0 means untimed: use no countdown)");
        }
        if (extraPercent < 0 || extraPercent > 400) {
            throw new IllegalArgumentException("extra time must be 0-400 percent, not " + extraPercent);
        }
        this.baseMillis = baseMillis;
        this.extraPercent = extraPercent;
        this.warningMinutes = List.copyOf(warningMinutes);
        this.usedMillis = Math.max(0, usedMillis);
        this.addedMillis = addedMillis;
        this.warned = new TreeSet<>(warned);
    }

    /** Extra time from the roster's percentage, rounded to the millisecond. */
    public long rosterExtraMillis() {
        return Math.round(baseMillis * extraPercent / 100.0);
    }

    /** Time allowed in all: limit, roster extra time and invigilator additions. */
    public long allowedMillis() {
        return baseMillis + rosterExtraMillis() + addedMillis;
    }

    /** Time the invigilator added. */
    public long addedMillis() {
        return addedMillis;
    }

    /** Time used so far, including the current run. */
    public long usedMillis() {
        if (runningSince < 0) {
            return usedMillis;
        }
        return usedMillis + TimeUnit.NANOSECONDS.toMillis(clock.monoNanos() - runningSince);
    }

    /** Time left, never below zero. */
    public long remainingMillis() {
        return Math.max(0, allowedMillis() - usedMillis());
    }

    /** Whether time is being counted. */
    public boolean running() {
        return runningSince >= 0;
    }

    /** Starts counting (no effect when already running). */
    public void start() {
        if (runningSince < 0) {
            runningSince = clock.monoNanos();
        }
    }

    /** Stops counting and keeps the time used (no effect when stopped). */
    public void stop() {
        if (runningSince >= 0) {
            usedMillis = usedMillis();
            runningSince = -1;
        }
    }

    /**
     * Adds time (an invigilator's accommodation or a crash credit). Warnings whose point now lies
     * ahead again are re-armed, so the candidate is warned again before the new end.
     */
    public void add(long millis) {
        if (millis <= 0) {
            throw new IllegalArgumentException("time added must be positive, not " + millis + " ms");
        }
        addedMillis += millis;
        long left = remainingMillis();
        warned.removeIf(m -> left > TimeUnit.MINUTES.toMillis(m));
        if (left > 0) {
            expiredSignalled = false;
        }
    }

    /** Counts time that passed outside the clock (a crash not credited by the invigilator) as used. */
    public void charge(long millis) {
        if (millis < 0) {
            throw new IllegalArgumentException("time charged cannot be negative: " + millis + " ms");
        }
        boolean wasRunning = running();
        stop();
        usedMillis += millis;
        if (wasRunning) {
            start();
        }
    }

    /**
     * The warning that has become due since the last call, if any. When several are due at once
     * (after a restart or a long pause of polling) only the most urgent is given and the others
     * count as given.
     */
    public OptionalInt dueWarning() {
        long left = remainingMillis();
        if (left <= 0) {
            return OptionalInt.empty();
        }
        Integer due = null;
        for (int m : warningMinutes) {
            if (!warned.contains(m) && left <= TimeUnit.MINUTES.toMillis(m)) {
                warned.add(m);
                due = due == null ? m : Math.min(due, m);
            }
        }
        return due == null ? OptionalInt.empty() : OptionalInt.of(due);
    }

    /** True once, when time has run out; again only after time was added and ran out again. */
    public boolean expiredNow() {
        if (!expiredSignalled && remainingMillis() <= 0) {
            expiredSignalled = true;
            return true;
        }
        return false;
    }

    /** Whether time has run out. */
    public boolean expired() {
        return remainingMillis() <= 0;
    }

    /** Warnings given so far (to persist). */
    public Set<Integer> warned() {
        return Set.copyOf(warned);
    }
}
