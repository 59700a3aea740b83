package org.inkgate.admin.cli;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.PrintWriter;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.packs.cli.ProgressReporter;

/**
 * What the command line prints, made safe for a terminal. Values from outside (file names, candidate
 * numbers, ids and messages built from packages, bundles and sheets) go through {@link #value}, which
 * shows every control character, line break included, as {@code \}{@code uXXXX}, so a crafted value can
 * neither start a line of its own (a forged "REFUSED ...") nor send escape sequences. As a second
 * guard, every command's output and error writers ({@link #guard}) pass only tab and line ends
 * through and escape any other control character, whatever printed it.
 */
final class TerminalText {

    private TerminalText() {
    }

    /** One outside value on one line: controls, line breaks, and bidirectional overrides escaped. */
    static String value(Object value) {
        return value == null ? "(none)" : FormatRefusal.printable(String.valueOf(value));
    }

    /**
     * A guarded writer that hands the progress counter the writer it guards: the counter must send a
     * bare carriage return to redraw its line, which the guard would escape, and escapes every other
     * control character itself ({@link ProgressReporter}).
     */
    private static final class Guarded extends PrintWriter implements ProgressReporter.GuardedWriter {
        private final PrintWriter raw;

        Guarded(java.io.Writer filter, PrintWriter raw) {
            super(filter, true);
            this.raw = raw;
        }

        @Override
        public PrintWriter unguarded() {
            return raw;
        }
    }

    /** A writer that escapes every control character but tab and line ends before they reach {@code out}. */
    static PrintWriter guard(PrintWriter out) {
        return new Guarded(new FilterWriter(out) {
            @Override
            public void write(int c) throws IOException {
                write(String.valueOf((char) c), 0, 1);
            }

            @Override
            public void write(char[] cbuf, int off, int len) throws IOException {
                write(new String(cbuf, off, len), 0, len);
            }

            @Override
            public void write(String s, int off, int len) throws IOException {
                StringBuilder b = new StringBuilder(len);
                for (int i = off; i < off + len; i++) {
                    char c = s.charAt(i);
                    boolean lineEnd = c == '\n' || (c == '\r' && i + 1 < off + len && s.charAt(i + 1) == '\n');
                    if (c == '\t' || lineEnd || !(c < 0x20 || (c >= 0x7f && c <= 0x9f))) {
                        b.append(c);
                    } else {
                        b.append(String.format("\\u%04x", (int) c));
                    }
                }
                out.write(b.toString());
            }
        }, out);
    }
}
