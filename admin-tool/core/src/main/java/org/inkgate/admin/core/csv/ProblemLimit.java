package org.inkgate.admin.core.csv;

/**
 * How many problems a table reader lists before it stops reading: a sheet of a million bad rows
 * (a wrong file, a broken export) gives a screenful that shows the pattern, not a million lines
 * and the memory they take. The readers of the analysis stop at a similar bound.
 */
public final class ProblemLimit {

    /** Problems listed before reading stops. */
    public static final int MAX = 100;

    /** The message of the last problem listed when reading stopped early. */
    public static final String STOPPED = "stopped reading after " + MAX + " problems; the rows below were not"
            + " checked. Fix these (they often share one cause) and run again";

    private ProblemLimit() {
    }
}
