package org.inkgate.admin.core.export;

import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicReference;

/**
 * The one decision between "cancelled" and "published" for a run that writes into a
 * {@link StagedFolder}: whichever comes first wins, and the other is refused. A cancel that wins
 * means nothing of the run is ever moved into place; once publishing has begun a cancel is
 * refused ({@link #cancel()} returns false), so the caller can tell the test owner the files are
 * in place instead of claiming they were not. Safe to use from any thread (the window's Cancel
 * button, a Ctrl+C shutdown hook, the worker).
 */
public final class Cancellation {

    private enum State { RUNNING, CANCELLED, PUBLISHING }

    private final AtomicReference<State> state = new AtomicReference<>(State.RUNNING);

    /**
     * Asks the run to stop. True when nothing of it will be published (also when it was cancelled
     * before); false when publishing had already begun: the run finishes and its files are in place.
     */
    public boolean cancel() {
        state.compareAndSet(State.RUNNING, State.CANCELLED);
        return state.get() == State.CANCELLED;
    }

    /** True once a cancel has won. */
    public boolean cancelled() {
        return state.get() == State.CANCELLED;
    }

    /** Throws {@link CancellationException} when a cancel has won; the run calls it between its parts. */
    public void stopIfCancelled(String before) {
        if (cancelled()) {
            throw new CancellationException("cancelled before " + before);
        }
    }

    /** The commit point: true when this run may now publish (and no cancel can win any more). */
    boolean claimPublishing() {
        return state.compareAndSet(State.RUNNING, State.PUBLISHING);
    }
}
