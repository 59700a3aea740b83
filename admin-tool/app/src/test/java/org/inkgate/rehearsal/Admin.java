package org.inkgate.rehearsal;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.inkgate.admin.cli.InkgateAdmin;
import picocli.CommandLine;

/**
 * The real {@code inkgate-admin} command line. A command that takes a passphrase or PIN runs as
 * the launcher runs it, in its own JVM with the secret in an environment variable (the only way
 * the command accepts one without a terminal); every other command runs in this JVM through the
 * same picocli command line the launcher's main builds.
 */
final class Admin {

    /** Output and exit code of one command. */
    record Run(int code, String out) {
    }

    private final Map<String, String> secrets;
    private final Path log;

    Admin(Map<String, String> secrets, Path log) {
        this.secrets = secrets;
        this.log = log;
    }

    Run run(String... args) throws Exception {
        boolean secret = Arrays.stream(args).anyMatch(a -> a.endsWith("-env"));
        Run run = secret ? inProcess(false, args) : inProcess(true, args);
        java.nio.file.Files.writeString(log, "$ inkgate-admin " + String.join(" ", args) + "\n" + run.out() + "[exit "
                + run.code() + "]\n\n", StandardCharsets.UTF_8, java.nio.file.StandardOpenOption.CREATE,
                java.nio.file.StandardOpenOption.APPEND);
        return run;
    }

    private Run inProcess(boolean here, String... args) throws Exception {
        if (here) {
            StringWriter out = new StringWriter();
            PrintWriter writer = new PrintWriter(out, true);
            CommandLine cl = InkgateAdmin.commandLine();
            cl.setOut(writer);
            cl.setErr(writer);
            int code = cl.execute(args);
            writer.flush();
            return new Run(code, out.toString());
        }
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "--enable-native-access=ALL-UNNAMED", "-cp", System.getProperty("java.class.path"),
                InkgateAdmin.class.getName()));
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command).redirectErrorStream(true);
        pb.environment().putAll(secrets);
        Process p = pb.start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(300, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("inkgate-admin " + String.join(" ", args) + " did not end within 300 s:\n" + out);
        }
        return new Run(p.exitValue(), out);
    }
}
