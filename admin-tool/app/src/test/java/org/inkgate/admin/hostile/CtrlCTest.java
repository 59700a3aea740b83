package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.testutil.ForgedPackages;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Ctrl+C during collect and export: the real admin command line in its own JVM gets a real
 * SIGINT (kill -INT, what the terminal sends) while it works. Collect into a store that exists leaves it
 * with whole sittings only, and the same collect afterwards imports exactly the rest; export leaves the
 * export folder as it was before the run (or complete), with no half-written files and no hidden
 * working folder. POSIX only.
 */
class CtrlCTest {

    // enough that collect (one reading thread) is still at work when Ctrl+C comes 0.3 s after it begins
    private static final int PACKAGES = 480;

    @TempDir
    Path dir;

    @Test
    void collectAndExport_interruptedByCtrlC_leaveNothingHalfWritten() throws Exception {
        Assumptions.assumeTrue(Files.isExecutable(Path.of("/bin/kill")), "needs POSIX kill");
        ForgedPackages p = ForgedPackages.prepare(dir);
        Path folder = dir.resolve("packages");
        for (int i = 0; i < PACKAGES; i++) {
            String candidate = "H" + (1001 + i);
            p.write(p.document(candidate, i), folder.resolve(candidate + ".inkresp"));
        }
        Path store = dir.resolve("results.db");
        // into a store that exists (a new one is built aside and named only when whole: NewStoreAsideTest), holding
        // one of the packages already
        Path starter = Files.createDirectories(dir.resolve("first"));
        Files.copy(folder.resolve("H1001.inkresp"), starter.resolve("H1001.inkresp"));
        assertTrue(p.collect(starter, store).out().contains("Imported 1,"));

        Process collect = start("collect", folder.toString(), "--store", store.toString(), "--bundle", p.bundle().toString(),
                "--keys", p.keys().toString(), "--any-installation", "--passphrase-env", ForgedPackages.PASSPHRASE_ENV,
                "--threads", "1");
        Path log = dir.resolve("collect.out");
        // the Ctrl+C comes from a small shell started now, 0.3 s after collect says it begins: sent from this
        // JVM after polling the store, it came too late in CI (a busy test JVM; collect is fast) and collect had ended
        Process ctrlC = new ProcessBuilder("/bin/sh", "-c",
                "while ! grep -q 'Collecting ' \"$0\" 2>/dev/null; do sleep 0.01; done; sleep 0.3; kill -INT \"$1\"",
                dir.resolve("collect.out").toString(), Long.toString(collect.pid())).start();
        assertTrue(ctrlC.waitFor(120, TimeUnit.SECONDS), "collect never said it began");
        assertTrue(collect.waitFor(60, TimeUnit.SECONDS), "the process did not end after Ctrl+C");
        int exit = collect.exitValue();
        int kept = sittings(store);
        assertTrue(kept < PACKAGES, "collect finished before Ctrl+C (exit " + exit + "); nothing was shown");
        FullDiskTest.assertWholeSittingsOnly(store);
        ForgedPackages.Run rest = p.collect(folder, store);
        assertTrue(rest.out().contains("Imported " + (PACKAGES - kept) + ","), kept + " kept; " + rest.out());
        assertEquals(PACKAGES, sittings(store));

        Path out = dir.resolve("export");
        ForgedPackages.Run first = ForgedPackages.process(dir, "export", "--store", store.toString(), "--out", out.toString());
        assertEquals(InkgateAdmin.OK, first.code(), first.out());
        Map<String, String> before = contents(out);
        java.nio.file.attribute.FileTime started = java.nio.file.attribute.FileTime.from(java.time.Instant.now());
        Thread.sleep(20); // file times on some file systems are coarse
        Process export = start("export", "--store", store.toString(), "--out", out.toString());
        // the export writes into StagedFolder's hidden .export.partial (inside the existing folder) until its commit point
        waitFor(() -> writtenSince(out, started), export);
        interrupt(export);
        Map<String, String> after = contents(out);
        List<String> changed = new ArrayList<>(before.keySet());
        changed.addAll(after.keySet());
        changed.removeIf(f -> java.util.Objects.equals(before.get(f), after.get(f)));
        assertEquals(List.of(), changed.stream().distinct().toList(), "files changed or half-written by the interrupted export");
        try (Stream<Path> s = Files.list(out)) {
            assertEquals(List.of(), s.filter(f -> f.getFileName().toString().startsWith(".")).toList(),
                    "working folders left in " + out);
        }
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(List.of(), s.filter(f -> f.getFileName().toString().endsWith(".partial")).toList(),
                    "working folders left beside " + out);
        }
    }

    private Process start(String... args) throws Exception {
        return ForgedPackages.start(dir.resolve(args[0] + ".out"), args);
    }

    private interface Check {
        boolean ok() throws Exception;
    }

    private static void waitFor(Check check, Process p) throws Exception {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (System.nanoTime() < end && p.isAlive()) {
            try {
                if (check.ok()) {
                    return;
                }
            } catch (java.io.IOException | java.io.UncheckedIOException | java.sql.SQLException notYet) {
                // the file or store is not there yet
            }
            Thread.sleep(2);
        }
    }

    /** SIGINT, as Ctrl+C in a terminal sends it; returns the exit code. */
    private static int interrupt(Process p) throws Exception {
        new ProcessBuilder("/bin/kill", "-INT", Long.toString(p.pid())).start().waitFor();
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "the process did not end after Ctrl+C");
        return p.exitValue();
    }

    private static int sittings(Path store) throws Exception {
        if (!Files.exists(store)) {
            return 0;
        }
        try (var c = java.sql.DriverManager.getConnection("jdbc:sqlite:" + store);
                var rs = c.createStatement().executeQuery("SELECT count(*) FROM sittings")) {
            return rs.getInt(1);
        }
    }

    /** True once the running export has written a file anywhere under {@code out} (hidden folders too). */
    private static boolean writtenSince(Path out, java.nio.file.attribute.FileTime started) throws Exception {
        if (!Files.exists(out)) {
            return false;
        }
        try (Stream<Path> s = Files.walk(out)) {
            return s.anyMatch(f -> {
                try {
                    return Files.isRegularFile(f) && Files.getLastModifiedTime(f).compareTo(started) > 0;
                } catch (java.io.IOException gone) {
                    return false;
                }
            });
        }
    }

    /** Every file under {@code root} (hidden working folders included) with its SHA-256. */
    private static Map<String, String> contents(Path root) throws Exception {
        Map<String, String> out = new TreeMap<>();
        try (Stream<Path> s = Files.walk(root)) {
            for (Path f : s.filter(Files::isRegularFile).toList()) {
                byte[] hash = MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(f));
                out.put(root.relativize(f).toString().replace('\\', '/'), HexFormat.of().formatHex(hash));
            }
        }
        return out;
    }
}
