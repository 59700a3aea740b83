package org.inkgate.admin.core.collection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Kills a real import process with SIGKILL midway (Process.destroyForcibly, which the JDK
 * documents as forcible termination: SIGKILL on Unix), reruns it, and compares the store with an
 * uninterrupted import of the same packages.
 */
class KilledImportTest {

    private static final int PACKAGES = 60;
    private static final int EVENTS = 2000;

    @TempDir
    Path dir;

    private Process start(Path store, Sitting sitting, Path packages) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        return new ProcessBuilder(java, "--enable-native-access=ALL-UNNAMED", "-cp", System.getProperty("java.class.path"),
                ImportProcess.class.getName(), store.toString(), sitting.bundle().toString(), packages.toString())
                .redirectErrorStream(true).redirectOutput(dir.resolve("import-" + System.nanoTime() + ".log").toFile())
                .start();
    }

    private static long count(Path store, String table) throws Exception {
        if (!Files.exists(store)) {
            return 0;
        }
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + store);
                Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT COUNT(*) FROM " + table)) {
            return rs.getLong(1);
        } catch (java.sql.SQLException e) {
            return 0; // not created yet
        }
    }

    /** Everything imported, independent of row ids and import times. */
    private static List<String> content(Path store) throws Exception {
        List<String> out = new ArrayList<>();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + store); Statement s = c.createStatement()) {
            try (ResultSet rs = s.executeQuery("PRAGMA integrity_check")) {
                rs.next();
                out.add("integrity " + rs.getString(1));
            }
            try (ResultSet rs = s.executeQuery("PRAGMA foreign_key_check")) {
                out.add("foreign key violations " + (rs.next() ? "some" : "none"));
            }
            try (ResultSet rs = s.executeQuery("SELECT s.package_sha256, s.candidate_number, s.form_id, r.task_id,"
                    + " r.position, r.condition_id, r.text, r.word_count FROM responses r JOIN sittings s USING (sitting_id)"
                    + " ORDER BY s.package_sha256, r.position")) {
                while (rs.next()) {
                    StringBuilder row = new StringBuilder();
                    for (int i = 1; i <= 8; i++) {
                        row.append(rs.getString(i)).append('|');
                    }
                    out.add(row.toString());
                }
            }
            MessageDigest events = MessageDigest.getInstance("SHA-256");
            long n = 0;
            try (ResultSet rs = s.executeQuery("SELECT s.package_sha256, e.seq, e.at, e.mono, e.type, e.task_id, e.data_json"
                    + " FROM process_events e JOIN sittings s USING (sitting_id) ORDER BY s.package_sha256, e.seq")) {
                while (rs.next()) {
                    n++;
                    for (int i = 1; i <= 7; i++) {
                        events.update(String.valueOf(rs.getString(i)).getBytes(java.nio.charset.StandardCharsets.UTF_8));
                        events.update((byte) 0);
                    }
                }
            }
            out.add("events " + n + " " + HexFormat.of().formatHex(events.digest()));
        }
        return out;
    }

    @Test
    void importKilledMidway_rerun_equalsAnUninterruptedImport() throws Exception {
        Sitting sitting = Sitting.make(dir, PACKAGES);
        Path packages = Files.createDirectories(dir.resolve("packages"));
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        for (var r : sitting.roster()) {
            client.write(r.candidateNumber(), sitting.formOf(r.candidateNumber()), r.candidateNumber().hashCode(), EVENTS,
                    packages.resolve(r.candidateNumber() + ".inkresp"));
        }

        Path killed = dir.resolve("killed.db");
        Process first = start(killed, sitting, packages);
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (count(killed, "sittings") < 10 && first.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(20);
        }
        first.destroyForcibly();
        first.waitFor(30, TimeUnit.SECONDS);
        long atKill = count(killed, "sittings");
        assertTrue(atKill >= 10 && atKill < PACKAGES, "the kill came midway: " + atKill + " of " + PACKAGES
                + " packages were stored (exit " + first.exitValue() + ")");
        assertEquals(137, first.exitValue(), "128 + 9: ended by SIGKILL");
        // what survived the kill is whole: every stored sitting has its responses and all its events
        assertEquals(atKill * 2, count(killed, "responses"));
        assertEquals(atKill * EVENTS, count(killed, "process_events"));

        Process rerun = start(killed, sitting, packages);
        assertTrue(rerun.waitFor(300, TimeUnit.SECONDS));
        assertEquals(0, rerun.exitValue());

        Path clean = dir.resolve("clean.db");
        Process uninterrupted = start(clean, sitting, packages);
        assertTrue(uninterrupted.waitFor(300, TimeUnit.SECONDS));
        assertEquals(0, uninterrupted.exitValue());

        List<String> expected = content(clean);
        assertEquals(2 + PACKAGES * 2 + 1, expected.size());
        assertEquals("integrity ok", expected.get(0));
        assertEquals("foreign key violations none", expected.get(1));
        assertEquals(expected, content(killed));
    }
}
