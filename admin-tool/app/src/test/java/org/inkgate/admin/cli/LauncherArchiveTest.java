package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The launcher's class-data-sharing archive: the JVM (JDK 25 checked) runs without an archive whose jars were
 * rebuilt after it, silently, and does not write a new one, so every later start lost the archive. The launcher
 * removes an archive older than any of its jars, and the JVM then writes a new one; a current archive is kept and
 * named to the JVM; collect keeps an archive of its own. The real script runs from a copy beside a stand-in build, with a stand-in {@code java}.
 */
class LauncherArchiveTest {

    @TempDir
    Path dir;

    @Test
    void anArchiveOlderThanAJar_isRemoved_andACurrentOneKept() throws Exception {
        Path app = Files.createDirectories(dir.resolve("app"));
        Path launcher = app.resolve("inkgate-admin");
        Files.copy(Path.of("inkgate-admin"), launcher);
        Files.setPosixFilePermissions(launcher, PosixFilePermissions.fromString("rwxr-xr-x"));
        Path lib = Files.createDirectories(app.resolve("target/lib"));
        Path jar = lib.resolve("inkgate-format.jar");
        Files.write(app.resolve("target/inkgate-admin.jar"), new byte[0]);
        Files.write(jar, new byte[0]);
        Path archive = app.resolve("target/inkgate-admin.jsa");
        Files.write(archive, new byte[] {1});
        Instant now = Instant.now();
        Files.setLastModifiedTime(app.resolve("target/inkgate-admin.jar"), FileTime.from(now.minusSeconds(600)));
        Files.setLastModifiedTime(jar, FileTime.from(now.minusSeconds(600)));
        Files.setLastModifiedTime(lib, FileTime.from(now.minusSeconds(600))); // a jar added or removed changes it
        Files.setLastModifiedTime(archive, FileTime.from(now.minusSeconds(300)));

        List<String> args = run(launcher);
        assertTrue(Files.exists(archive), "an archive newer than every jar is kept");
        assertTrue(args.contains("-XX:SharedArchiveFile=" + archive.toRealPath()), args.toString());

        Files.setLastModifiedTime(jar, FileTime.from(now.minusSeconds(60))); // a jar rebuilt after the archive
        args = run(launcher);
        assertTrue(Files.notExists(archive), "an archive older than a jar is removed");
        assertTrue(args.contains("-XX:+AutoCreateSharedArchive"), "the JVM writes a new one: " + args);
    }

    @Test
    void collect_keepsItsOwnArchive() throws Exception {
        Path app = Files.createDirectories(dir.resolve("app"));
        Path launcher = app.resolve("inkgate-admin");
        Files.copy(Path.of("inkgate-admin"), launcher);
        Files.setPosixFilePermissions(launcher, PosixFilePermissions.fromString("rwxr-xr-x"));
        Files.createDirectories(app.resolve("target/lib"));
        Files.write(app.resolve("target/inkgate-admin.jar"), new byte[0]);
        Path target = app.resolve("target").toRealPath();
        assertTrue(run(launcher, "collect", "--store", "s.db", "in").contains("-XX:SharedArchiveFile="
                + target.resolve("inkgate-admin-collect.jsa")));
        assertTrue(run(launcher, "export").contains("-XX:SharedArchiveFile=" + target.resolve("inkgate-admin.jsa")));
    }

    private List<String> run(Path launcher, String... commandLine) throws Exception {
        Path jdk = Files.createDirectories(dir.resolve("jdk/bin"));
        Files.writeString(dir.resolve("jdk/release"), "JAVA_VERSION=\"25.0.1\"\n");
        Path java = jdk.resolve("java");
        Files.writeString(java, "#!/bin/sh\nfor a in \"$@\"; do printf '%s\\n' \"$a\"; done\n");
        Files.setPosixFilePermissions(java, PosixFilePermissions.fromString("rwxr-xr-x"));
        ProcessBuilder pb = new ProcessBuilder(launcher.toString());
        pb.command().addAll(commandLine.length == 0 ? List.of("--version") : List.of(commandLine));
        pb.environment().put("JAVA_HOME", dir.resolve("jdk").toString());
        pb.redirectErrorStream(true);
        Process p = pb.start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(0, p.waitFor(), out);
        return out.lines().toList();
    }
}
