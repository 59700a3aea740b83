package org.inkgate.packs.cli;

/** Exit codes of the pack commands (documented in docs/resource-packs.md and in --help). */
public final class ExitCodes {
    /** Done; for verify, every pack is intact. */
    public static final int OK = 0;
    /** An unexpected internal error (a bug): the message and stack trace go to standard error. */
    public static final int INTERNAL = 1;
    /** The command line is wrong (unknown option, missing argument). */
    public static final int USAGE = 2;
    /** A pack was refused: not a pack, damaged, altered, newer version or wrong kind. */
    public static final int REFUSED = 3;
    /** The source term bank has an error (the message gives file, line or row, and column). */
    public static final int BAD_SOURCE = 4;
    /** A file could not be read or written. */
    public static final int IO = 5;

    private ExitCodes() {
    }
}
