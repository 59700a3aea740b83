package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
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
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.testutil.ForgedPackages;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A collect into a store file that does not exist yet builds it beside its name, in {@code <store>.incomplete},
 * and gives it the name only when the whole collect is done (issue 16: a fresh store written once, not once to the
 * write-ahead log and again to the database). So nothing half-built ever has the store's name: a killed collect
 * leaves no store (the next one removes the leftover and starts over), a Ctrl+C leaves nothing at all. The store
 * made that way is the one a collect into an existing store makes. The real command line in its own JVM; POSIX
 * only (signals).
 */
class NewStoreAsideTest {

    // enough that collect (one reading thread) is still at work when the side file has grown
    private static final int PACKAGES = 360;

    @TempDir
    static Path shared;

    static ForgedPackages p;
    static Path folder;

    @TempDir
    Path dir;

    @BeforeAll
    static void packages() throws Exception {
        p = ForgedPackages.prepare(shared);
        folder = shared.resolve("packages");
        for (int i = 0; i < PACKAGES; i++) {
            String candidate = "H" + (1001 + i);
            p.write(p.document(candidate, i), folder.resolve(candidate + ".inkresp"));
        }
    }

    private static Path aside(Path store) {
        return store.resolveSibling(store.getFileName() + ".incomplete");
    }

    @Test
    void aNewStore_getsItsNameOnlyWhenWhole_andHoldsWhatACollectIntoAnExistingStoreMakes() throws Exception {
        Path store = dir.resolve("new.db");
        Process collect = ForgedPackages.start(dir.resolve("collect.out"), p.collectArguments(folder, store, "--threads", "1"));
        boolean sawAside = false;
        boolean sawBoth = false;
        while (collect.isAlive()) {
            // the name first: it appears only as the side file goes (one rename), so seeing both means two files
            boolean named = Files.exists(store);
            boolean building = Files.exists(aside(store));
            sawAside |= building && !named;
            sawBoth |= named && building;
            Thread.sleep(1);
        }
        String out = Files.readString(dir.resolve("collect.out"));
        assertTrue(collect.exitValue() == InkgateAdmin.OK || collect.exitValue() == InkgateAdmin.ATTENTION, out);
        assertTrue(out.contains("Imported " + PACKAGES + ","), out);
        assertTrue(sawAside, "the new store was never seen being built aside in " + aside(store));
        assertFalse(sawBoth, "the store had its name while its side file still existed");
        assertTrue(Files.exists(store) && !Files.exists(aside(store)), out);
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + store); Statement s = c.createStatement()) {
            assertEquals("wal", one(s, "PRAGMA journal_mode"), "a store in use takes the write-ahead log");
            assertEquals("16384", one(s, "PRAGMA page_size"));
            assertEquals("ok", one(s, "PRAGMA integrity_check"));
        }
        if (Files.getFileStore(store).supportsFileAttributeView("posix")) {
            assertEquals("rw-------", java.nio.file.attribute.PosixFilePermissions.toString(
                    Files.getPosixFilePermissions(store)));
        }

        // the same packages into a store that exists (made by a collect of one of them) end as the same store
        Path existing = dir.resolve("existing.db");
        Path one = Files.createDirectories(dir.resolve("one"));
        Files.copy(folder.resolve("H1001.inkresp"), one.resolve("H1001.inkresp"));
        assertTrue(p.collect(one, existing).out().contains("Imported 1,"));
        ForgedPackages.Run rest = p.collect(folder, existing);
        assertTrue(rest.out().contains("Imported " + (PACKAGES - 1) + ","), rest.out());
        assertEquals(content(existing), content(store));
        var counts = Stores.content(StoreLocation.file(existing)).tables().stream().map(t -> t.name() + " " + t.rows()).toList();
        assertEquals(counts, Stores.content(StoreLocation.file(store)).tables().stream().map(t -> t.name() + " " + t.rows())
                .toList());
    }

    @Test
    void killedWhileBuilding_leavesNoStore_andTheNextCollectStartsOver() throws Exception {
        Path store = dir.resolve("killed.db");
        Process collect = ForgedPackages.start(dir.resolve("collect.out"), p.collectArguments(folder, store, "--threads", "1"));
        waitForGrowth(aside(store), collect);
        collect.destroyForcibly();
        assertTrue(collect.waitFor(60, TimeUnit.SECONDS));
        assertEquals(137, collect.exitValue(), "128 + 9: ended by SIGKILL while building; "
                + Files.readString(dir.resolve("collect.out")));
        assertFalse(Files.exists(store), "a killed collect gave a half-built store its name");

        ForgedPackages.Run again = p.collect(folder, store);
        assertTrue(again.out().contains("Imported " + PACKAGES + ","), again.out());
        assertFalse(Files.exists(aside(store)), "the leftover side file was kept");
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + store); Statement s = c.createStatement()) {
            assertEquals("ok", one(s, "PRAGMA integrity_check"));
            assertEquals(String.valueOf(PACKAGES), one(s, "SELECT count(*) FROM sittings"));
        }
    }

    @Test
    void ctrlCWhileBuilding_leavesNothing() throws Exception {
        Assumptions.assumeTrue(Files.isExecutable(Path.of("/bin/kill")), "needs POSIX kill");
        Path store = dir.resolve("stopped.db");
        Process collect = ForgedPackages.start(dir.resolve("collect.out"), p.collectArguments(folder, store, "--threads", "1"));
        waitForGrowth(aside(store), collect);
        new ProcessBuilder("/bin/kill", "-INT", Long.toString(collect.pid())).start().waitFor();
        assertTrue(collect.waitFor(60, TimeUnit.SECONDS), "the process did not end after Ctrl+C");
        String out = Files.readString(dir.resolve("collect.out"));
        assertFalse(Files.exists(store), "a collect stopped by Ctrl+C gave a half-built store its name: " + out);
        assertFalse(Files.exists(aside(store)), "a collect stopped by Ctrl+C left its side file: " + out);
        try (var left = Files.list(dir)) {
            assertEquals(List.of("collect.out", "stopped.db.collect-lock"),
                    left.map(f -> f.getFileName().toString()).sorted().toList());
        }
    }

    /** Waits until the side file holds some packages (several commits) while the collect still runs. */
    private static void waitForGrowth(Path aside, Process collect) throws Exception {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (collect.isAlive() && System.nanoTime() < end) {
            if (Files.exists(aside) && Files.size(aside) > 256 * 1024) {
                return;
            }
            Thread.sleep(2);
        }
        throw new AssertionError("no side file " + aside + " grew while the collect ran (alive: " + collect.isAlive() + ")");
    }

    private static String one(Statement s, String sql) throws Exception {
        try (ResultSet rs = s.executeQuery(sql)) {
            rs.next();
            return rs.getString(1);
        }
    }

    /** The responses and the process logs, independent of row ids and import times. */
    private static List<String> content(Path store) throws Exception {
        List<String> out = new ArrayList<>();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + store); Statement s = c.createStatement()) {
            try (ResultSet rs = s.executeQuery("SELECT s.package_sha256, s.candidate_number, r.task_id, r.text, r.word_count"
                    + " FROM responses r JOIN sittings s USING (sitting_id) ORDER BY s.package_sha256, r.position")) {
                while (rs.next()) {
                    out.add(rs.getString(1) + "|" + rs.getString(2) + "|" + rs.getString(3) + "|" + rs.getString(4) + "|"
                            + rs.getString(5));
                }
            }
            MessageDigest events = MessageDigest.getInstance("SHA-256");
            long n = 0;
            try (ResultSet rs = s.executeQuery("SELECT s.package_sha256, e.seq, e.at, e.mono, e.type, e.task_id, e.data_json"
                    + " FROM process_events e JOIN sittings s USING (sitting_id) ORDER BY s.package_sha256, e.seq")) {
                while (rs.next()) {
                    n++;
                    for (int i = 1; i <= 7; i++) {
                        events.update(String.valueOf(rs.getString(i)).getBytes(StandardCharsets.UTF_8));
                        events.update((byte) 0);
                    }
                }
            }
            out.add("events " + n + " " + HexFormat.of().formatHex(events.digest()));
        }
        return out;
    }
}
