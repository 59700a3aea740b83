package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
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
        StandInLauncher launcher = new StandInLauncher(dir);
        Path lib = launcher.app.resolve("target/lib");
        Path jar = Files.write(lib.resolve("inkgate-format.jar"), new byte[0]);
        Path archive = Files.write(launcher.app.resolve("target/inkgate-admin.jsa"), new byte[] {1});
        Instant now = Instant.now();
        Files.setLastModifiedTime(launcher.app.resolve("target/inkgate-admin.jar"), FileTime.from(now.minusSeconds(600)));
        Files.setLastModifiedTime(jar, FileTime.from(now.minusSeconds(600)));
        Files.setLastModifiedTime(lib, FileTime.from(now.minusSeconds(600))); // a jar added or removed changes it
        Files.setLastModifiedTime(archive, FileTime.from(now.minusSeconds(300)));

        List<String> args = launcher.run("--version");
        assertTrue(Files.exists(archive), "an archive newer than every jar is kept");
        assertTrue(args.contains("-XX:SharedArchiveFile=" + archive.toRealPath()), args.toString());

        Files.setLastModifiedTime(jar, FileTime.from(now.minusSeconds(60))); // a jar rebuilt after the archive
        args = launcher.run("--version");
        assertTrue(Files.notExists(archive), "an archive older than a jar is removed");
        assertTrue(args.contains("-XX:+AutoCreateSharedArchive"), "the JVM writes a new one: " + args);
    }

    @Test
    void collect_keepsItsOwnArchive() throws Exception {
        StandInLauncher launcher = new StandInLauncher(dir);
        Path target = launcher.app.resolve("target").toRealPath();
        assertTrue(launcher.run("collect", "--store", "s.db", "in").contains("-XX:SharedArchiveFile="
                + target.resolve("inkgate-admin-collect.jsa")));
        assertTrue(launcher.run("export").contains("-XX:SharedArchiveFile=" + target.resolve("inkgate-admin.jsa")));
    }
}
