package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;

/**
 * The real {@code inkgate-admin} script copied beside a stand-in build (an empty jar and lib folder) and run with
 * a stand-in {@code java} of JDK 25 that prints the arguments it was given, one per line: what the launcher hands
 * the JVM, without starting one.
 */
final class StandInLauncher {

    final Path app;
    private final Path launcher;
    private final Path jdk;

    StandInLauncher(Path dir) throws IOException {
        app = Files.createDirectories(dir.resolve("app"));
        launcher = app.resolve("inkgate-admin");
        Files.copy(Path.of("inkgate-admin"), launcher, StandardCopyOption.REPLACE_EXISTING);
        Files.setPosixFilePermissions(launcher, PosixFilePermissions.fromString("rwxr-xr-x"));
        Files.createDirectories(app.resolve("target/lib"));
        Files.write(app.resolve("target/inkgate-admin.jar"), new byte[0]);
        jdk = dir.resolve("jdk");
        Path java = Files.createDirectories(jdk.resolve("bin")).resolve("java");
        Files.writeString(jdk.resolve("release"), "JAVA_VERSION=\"25.0.1\"\n");
        Files.writeString(java, "#!/bin/sh\nfor a in \"$@\"; do printf '%s\\n' \"$a\"; done\n");
        Files.setPosixFilePermissions(java, PosixFilePermissions.fromString("rwxr-xr-x"));
    }

    /** The arguments the launcher gives the JVM for this command line. */
    List<String> run(String... commandLine) throws IOException, InterruptedException {
        ProcessBuilder pb = new ProcessBuilder();
        pb.command().add(launcher.toString());
        pb.command().addAll(List.of(commandLine));
        pb.environment().put("JAVA_HOME", jdk.toString());
        pb.redirectErrorStream(true);
        Process p = pb.start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(0, p.waitFor(), out);
        return out.lines().toList();
    }
}
