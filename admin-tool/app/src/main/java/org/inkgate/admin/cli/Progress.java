package org.inkgate.admin.cli;

import java.io.PrintWriter;

/**
 * A counter on standard error for long steps ("collect: 412/1000 packages"), redrawn in place with
 * a carriage return, at most ten times a second. Only when standard error is a terminal
 * ({@link System#console()} present): in a script, a pipe or a log file it prints nothing, so
 * output stays the same line by line. {@link #clear()} wipes the line before other output.
 */
final class Progress {

    private static final long REDRAW_NANOS = 100_000_000L;

    private final PrintWriter err;
    private final boolean shown;
    private final String label;
    private final int total;
    private int done;
    private long lastDraw;
    private int drawnWidth;

    Progress(PrintWriter err, boolean terminal, String label, int total) {
        this.err = err;
        this.shown = terminal && total > 0;
        this.label = label;
        this.total = total;
    }

    /** On standard error when the program runs in a terminal, otherwise silent. */
    static Progress onTerminal(PrintWriter err, String label, int total) {
        return new Progress(err, System.console() != null, label, total);
    }

    /** One more item done. */
    void step() {
        done++;
        long now = System.nanoTime();
        if (shown && (done == total || now - lastDraw >= REDRAW_NANOS)) {
            lastDraw = now;
            String line = label + ": " + done + "/" + total + " (" + (100L * done / total) + " %)";
            err.print("\r" + line + " ".repeat(Math.max(0, drawnWidth - line.length())));
            err.flush();
            drawnWidth = line.length();
        }
    }

    /** Wipes the counter so that a message can be printed on a clean line; the next step redraws it. */
    void clear() {
        if (shown && drawnWidth > 0) {
            err.print("\r" + " ".repeat(drawnWidth) + "\r");
            err.flush();
            drawnWidth = 0;
            lastDraw = 0;
        }
    }
}
