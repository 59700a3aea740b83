package org.inkgate.admin.testutil;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.stream.Stream;
import org.inkgate.admin.cli.InkgateAdmin;
import picocli.CommandLine;

/** Runs the real inkgate-admin command line in the test's JVM and keeps what it printed. */
public final class AdminCommand {

    private AdminCommand() {
    }

    /** What one command did: its exit code and its standard output and error. */
    public record Run(int code, String out, String err) {
        public String all() {
            return out + err;
        }
    }

    /** {@code inkgate-admin args...}, as typed, with its output captured. */
    public static Run admin(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = InkgateAdmin.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    /** {@code first} followed by {@code more}: a command and the options several commands share. */
    public static String[] concat(String[] first, String... more) {
        return Stream.concat(Stream.of(first), Stream.of(more)).toArray(String[]::new);
    }
}
