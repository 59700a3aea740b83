package org.inkgate.client.sitting.ui;

import java.time.Duration;
import java.time.Instant;
import java.util.concurrent.atomic.AtomicLong;
import org.inkgate.client.sitting.clock.SittingClock;

/** A sitting clock that a test moves by hand; both clocks move together. */
public final class ManualClock implements SittingClock {

    private final AtomicLong nanos = new AtomicLong(1_000_000_000L);
    private final Instant start = Instant.parse("2026-03-02T09:00:00Z");

    @Override
    public long monoNanos() {
        return nanos.get();
    }

    @Override
    public Instant now() {
        return start.plusNanos(nanos.get() - 1_000_000_000L);
    }

    /** Moves both clocks forward. */
    public void advance(Duration by) {
        nanos.addAndGet(by.toNanos());
    }
}
