package org.inkgate.client.sitting.clock;

import java.time.Instant;

/**
 * The two clocks of a sitting: the monotonic one that measures time allowed and intervals (a
 * changed system clock cannot distort it), and the wall clock that dates events for people.
 * Tests use a fake that they move by hand.
 */
public interface SittingClock {

    /** Monotonic time in nanoseconds; only differences mean anything. */
    long monoNanos();

    /** Wall-clock time, for dating events and responses. */
    Instant now();

    /** The machine's clocks. */
    static SittingClock system() {
        return new SittingClock() {
            @Override
            public long monoNanos() {
                return System.nanoTime();
            }

            @Override
            public Instant now() {
                return Instant.now();
            }
        };
    }
}
