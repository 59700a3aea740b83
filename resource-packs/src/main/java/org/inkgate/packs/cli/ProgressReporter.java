package org.inkgate.packs.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The one progress counter of both command lines' long operations (collect, export, analyse, pack
 * build, bundle with packs): "collect: 412/1000 packages (41 %)", or "pack build: 52000 dictionary
 * entries" when the total is not known beforehand, redrawn in place on standard error with a
 * carriage return, at most ten times a second (a new stage note at once). Shown only when standard error is a terminal
 * ({@link #standardErrorIsTerminal()}); in a script, a pipe or a log file it prints nothing, so
 * what a command prints stays the same line by line. {@link #clear()} wipes the line before other
 * output; {@link #close()} wipes it at the end.
 *
 * <p>It lives here, beside the other plumbing both launchers share, because {@code pack build} is in
 * this (the lowest) module; the services report through their own listeners and the commands turn
 * those into steps of one reporter, so there is one drawing rule.
 */
public final class ProgressReporter implements AutoCloseable {

    /**
     * System property that overrides the terminal check: {@code always} or {@code never}
     * ({@code -Dinkgate.progress=always} to see the counter through {@code tee}; tests use it).
     */
    public static final String OVERRIDE_PROPERTY = "inkgate.progress";

    private static final long REDRAW_NANOS = 100_000_000L;

    private final PrintWriter err;
    private final boolean shown;
    private final String label;
    private final String unit;
    private long total;
    private long done;
    private String note = "";
    private long lastDraw;
    private int drawnWidth;

    /**
     * A reporter with the terminal decision made by the caller ({@code terminal}); {@code total}
     * of 0 or less means "not known": a plain counter. {@code unit} names what is counted
     * ("packages"), or is empty.
     */
    public ProgressReporter(PrintWriter err, boolean terminal, String label, String unit, long total) {
        this.err = err;
        this.shown = terminal;
        this.label = label;
        this.unit = unit;
        this.total = total;
    }

    /**
     * A command's error writer that escapes control characters (the admin tool's guard against
     * forged lines) and can hand over the writer it guards: the counter needs its bare carriage
     * return, and escapes everything else itself ({@link #line()}).
     */
    public interface GuardedWriter {
        PrintWriter unguarded();
    }

    /**
     * On {@code err} (or the writer it guards, see {@link GuardedWriter}) when standard error is a
     * terminal ({@link #standardErrorIsTerminal()}), otherwise silent.
     */
    public static ProgressReporter onStandardError(PrintWriter err, String label, String unit, long total) {
        PrintWriter target = err instanceof GuardedWriter g ? g.unguarded() : err;
        return new ProgressReporter(target, standardErrorIsTerminal(), label, unit, total);
    }

    /**
     * Whether standard error goes to a terminal. Java has no direct test for one stream, so: a
     * console must be attached (standard input and output are a terminal), and on Linux
     * {@code /proc/self/fd/2} must name a terminal device too, so that {@code 2>log.txt} stays
     * silent. {@link #OVERRIDE_PROPERTY} decides instead when it is set.
     */
    public static boolean standardErrorIsTerminal() {
        String override = System.getProperty(OVERRIDE_PROPERTY, "");
        if (override.equals("always")) {
            return true;
        }
        if (override.equals("never") || System.console() == null) {
            return false;
        }
        Path fd2 = Path.of("/proc/self/fd/2");
        if (!Files.isSymbolicLink(fd2)) {
            return true; // not Linux: the console is the best evidence there is
        }
        try {
            String target = Files.readSymbolicLink(fd2).toString();
            return target.startsWith("/dev/pts/") || target.startsWith("/dev/tty");
        } catch (java.io.IOException | UnsupportedOperationException | SecurityException e) {
            return false; // unknown: quiet is the safe side
        }
    }

    /** Whether this reporter draws anything. */
    public boolean shown() {
        return shown;
    }

    /** One more item done. */
    public void step() {
        stepTo(done + 1, note);
    }

    /** {@code done} items done so far, with a short note on what is in hand (may be empty). */
    public void stepTo(long done, String note) {
        String next = note == null ? "" : note;
        boolean newStage = !next.equals(this.note); // stages are few and each is news: drawn at once
        this.done = done;
        this.note = next;
        long now = System.nanoTime();
        if (shown && (done == total || newStage || lastDraw == 0 || now - lastDraw >= REDRAW_NANOS)) {
            lastDraw = now;
            draw(line());
        }
    }

    /** Changes the total (a later stage learns it); the next step draws it. */
    public void total(long total) {
        this.total = total;
    }

    String line() {
        StringBuilder s = new StringBuilder(label).append(": ").append(done);
        if (total > 0) {
            s.append('/').append(total);
        }
        if (!unit.isEmpty()) {
            s.append(' ').append(unit);
        }
        if (total > 0) {
            s.append(" (").append(100L * Math.min(done, total) / total).append(" %)");
        }
        if (!note.isEmpty()) {
            s.append(' ').append(note);
        }
        // the counter is drawn past the command line's control-character guard: nothing in it may move the cursor
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c < 0x20 || (c >= 0x7f && c <= 0x9f)) {
                s.setCharAt(i, '?');
            }
        }
        return s.toString();
    }

    private void draw(String line) {
        err.print("\r" + line + " ".repeat(Math.max(0, drawnWidth - line.length())));
        err.flush();
        drawnWidth = line.length();
    }

    /** Wipes the counter so that a message can be printed on a clean line; the next step redraws it. */
    public void clear() {
        if (shown && drawnWidth > 0) {
            err.print("\r" + " ".repeat(drawnWidth) + "\r");
            err.flush();
            drawnWidth = 0;
            lastDraw = 0;
        }
    }

    /** Wipes the counter for good: the command's own summary follows on a clean line. */
    @Override
    public void close() {
        clear();
    }
}
