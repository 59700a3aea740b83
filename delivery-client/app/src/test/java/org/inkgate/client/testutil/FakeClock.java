package org.inkgate.client.testutil;

import java.time.Duration;
import java.time.Instant;
import org.inkgate.client.sitting.clock.SittingClock;

/** A sitting clock that tests move by hand; both clocks advance together. Thread-safe. */
public final class FakeClock implements SittingClock {

    private long mono;
    private Instant wall;

    public FakeClock(Instant start) {
        this.wall = start;
        this.mono = 1_000_000_000L;
    }

    public FakeClock() {
        this(Instant.parse("2026-03-02T09:00:00Z"));
    }

    @Override
    public synchronized long monoNanos() {
        return mono;
    }

    @Override
    public synchronized Instant now() {
        return wall;
    }

    /** Moves both clocks forward. */
    public synchronized void advance(Duration d) {
        mono += d.toNanos();
        wall = wall.plus(d);
    }

    /** Moves only the wall clock (a machine that was off: the monotonic clock restarts from elsewhere). */
    public synchronized void advanceWallOnly(Duration d) {
        wall = wall.plus(d);
    }
}
