package org.inkgate.rehearsal;

import java.time.Duration;
import java.time.Instant;
import java.util.concurrent.atomic.AtomicLong;
import org.inkgate.client.sitting.clock.SittingClock;

/**
 * The sitting clock of a scripted candidate: it moves only when the script says time passes, so
 * every event's time, and so every interval the analysis measures, is known in advance. It starts
 * at the machine's clocks, so that events of a killed client (real clocks) come before the events
 * of its recovery (this clock) on both the wall and the monotonic clock.
 */
final class ScriptedClock implements SittingClock {

    private final long monoStart = System.nanoTime();
    private final Instant wallStart = Instant.now();
    private final AtomicLong elapsed = new AtomicLong();

    @Override
    public long monoNanos() {
        return monoStart + elapsed.get();
    }

    @Override
    public Instant now() {
        return wallStart.plusNanos(elapsed.get());
    }

    void advanceMillis(long millis) {
        elapsed.addAndGet(Duration.ofMillis(millis).toNanos());
    }

    /** Milliseconds since the clock was made (the script's time line). */
    long millis() {
        return elapsed.get() / 1_000_000L;
    }
}
