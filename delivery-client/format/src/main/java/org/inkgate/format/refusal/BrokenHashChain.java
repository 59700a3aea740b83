package org.inkgate.format.refusal;

/** A line of an event log does not carry the SHA-256 of the line before it. */
public final class BrokenHashChain extends FormatRefusal {

    private final int line;

    public BrokenHashChain(String file, String entry, int line) {
        super(file, "the event log \"" + entry + "\" is broken at line " + line
                + ": that line does not carry the digest of the line before it, so events were changed,"
                + " removed or inserted. Keep this file as evidence and report it to the test owner.");
        this.line = line;
    }

    /** The first line (1-based) whose link is wrong. */
    public int line() {
        return line;
    }
}
