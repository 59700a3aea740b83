package org.inkgate.client.sitting.replay;

/** A text event that does not fit the text it should apply to. */
public final class ReplayException extends Exception {

    private final long seq;

    public ReplayException(long seq, String reason) {
        super("process log event " + seq + " cannot be replayed: " + reason);
        this.seq = seq;
    }

    /** The sequence number of the event that does not fit. */
    public long seq() {
        return seq;
    }
}
