package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.testutil.ForgedPackages;
import org.inkgate.admin.testutil.SmallDisk;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A results store on a disk that fills up during collect: the real command line, a real 16 MiB
 * tmpfs filled by a filler file to all but 192 KiB (SQLite and the JVM meet the kernel's own
 * ENOSPC; nothing is injected). Collect says in plain words that the disk is full, with no SQL
 * message; what was imported before stays whole and readable; after space is freed the same
 * collect imports the rest. Skipped where the machine does not allow mounting a tmpfs.
 */
class FullDiskTest {

    @TempDir
    Path dir;

    @Test
    void collect_diskFillsUp_saysSoInPlainWordsAndLosesNothing() throws Exception {
        ForgedPackages p = ForgedPackages.prepare(dir);
        try (SmallDisk disk = SmallDisk.mount(dir.resolve("small-disk"), 16)) {
            Assumptions.assumeTrue(disk != null, "this machine does not allow mounting a tmpfs (needs root)");
            Path store = disk.folder().resolve("results.db");
            Path first = dir.resolve("first");
            Path rest = dir.resolve("rest");
            for (int i = 0; i < 2; i++) {
                String candidate = "H" + (1001 + i);
                p.write(p.document(candidate, i), first.resolve(candidate + ".inkresp"));
            }
            for (int i = 2; i < 24; i++) {
                String candidate = "H" + (1001 + i);
                p.write(p.document(candidate, i), rest.resolve(candidate + ".inkresp"));
            }
            ForgedPackages.Run before = p.collect(first, store);
            assertTrue(before.out().contains("Imported 2,"), before.out());
            ForgedPackages.Run missingBefore = ForgedPackages.process(dir, "missing", "--store", store.toString());

            Path filler = disk.fill(192 * 1024);
            ForgedPackages.Run full = p.collect(rest, store);
            assertEquals(InkgateAdmin.PROBLEMS, full.code(), full.out());
            assertTrue(full.out().contains("is full. Free space on that disk"), full.out());
            assertTrue(full.out().contains("Packages imported before this are kept"), full.out());
            assertFalse(full.out().contains("SQLITE") || full.out().contains("SQL error")
                    || full.out().contains("Exception"), full.out());

            Files.delete(filler);
            assertWholeSittingsOnly(store);
            ForgedPackages.Run missingAfter = ForgedPackages.process(dir, "missing", "--store", store.toString());
            assertEquals(missingBefore.code(), missingAfter.code(), missingAfter.out());
            ForgedPackages.Run again = p.collect(rest, store);
            assertTrue(again.code() == InkgateAdmin.OK || again.code() == InkgateAdmin.ATTENTION, again.out());
            int imported = Integer.parseInt(again.out().replaceAll("(?s).*Imported (\\d+),.*", "$1"));
            int already = Integer.parseInt(again.out().replaceAll("(?s).*already imported \\(same file\\) (\\d+),.*", "$1"));
            assertEquals(22, imported + already, again.out());
            assertWholeSittingsOnly(store);
            assertTrue(imported > 0, "the disk filled before any of the rest was imported, so the test shows nothing: "
                    + full.out());
        }
    }

    /**
     * A new store is built aside and named only when whole (NewStoreAsideTest): the disk filling while its schema is
     * written, or halfway through the packages, leaves no store and says so, and the same collect imports all later.
     */
    @Test
    void collectIntoANewStore_diskFillsUp_leavesNoStoreAndSaysSo() throws Exception {
        ForgedPackages p = ForgedPackages.prepare(dir);
        Path packages = dir.resolve("packages");
        for (int i = 0; i < 24; i++) {
            String candidate = "H" + (1001 + i);
            p.write(p.document(candidate, i), packages.resolve(candidate + ".inkresp"));
        }
        // the room a new store takes empty and with all 24 (on the ordinary disk): the disk below fills between
        Path empty = Files.createDirectories(dir.resolve("no-packages"));
        p.collect(empty, dir.resolve("empty.db"));
        p.collect(packages, dir.resolve("whole.db"));
        long halfway = (Files.size(dir.resolve("empty.db")) + Files.size(dir.resolve("whole.db"))) / 2;
        try (SmallDisk disk = SmallDisk.mount(dir.resolve("small-disk"), 16)) {
            Assumptions.assumeTrue(disk != null, "this machine does not allow mounting a tmpfs (needs root)");
            Path store = disk.folder().resolve("results.db");
            for (long room : new long[] {64 * 1024, halfway}) {
                Path filler = disk.fill(room);
                ForgedPackages.Run full = p.collect(packages, store);
                String at = "with " + room + " bytes free: " + full.out();
                assertEquals(InkgateAdmin.PROBLEMS, full.code(), at);
                assertTrue(full.out().contains("is full. Free space on that disk"), at);
                assertTrue(full.out().contains("No store was made"), at);
                assertFalse(full.out().contains("kept in the store") || full.out().contains("SQLITE")
                        || full.out().contains("Exception"), at);
                assertTrue(room < halfway || full.out().contains("Collecting 24 package files"), at);
                try (var left = Files.list(disk.folder())) {
                    assertEquals(List.of(filler.getFileName().toString(), "results.db.collect-lock"),
                            left.map(f -> f.getFileName().toString()).sorted().toList(), "a half-built store was left");
                }
                Files.delete(filler);
            }
            ForgedPackages.Run again = p.collect(packages, store);
            assertTrue(again.out().contains("Imported 24,"), again.out());
            assertWholeSittingsOnly(store);
        }
    }

    /** Every stored sitting has its responses and its process log: no package was stored in part. */
    static void assertWholeSittingsOnly(Path store) throws Exception {
        try (var c = java.sql.DriverManager.getConnection("jdbc:sqlite:" + store);
                var s = c.createStatement();
                var rs = s.executeQuery("SELECT count(*) FROM sittings s WHERE NOT EXISTS (SELECT 1 FROM responses r"
                        + " WHERE r.sitting_id = s.sitting_id) OR NOT EXISTS (SELECT 1 FROM process_events e"
                        + " WHERE e.sitting_id = s.sitting_id)")) {
            assertEquals(0, rs.getInt(1), "sittings stored in part");
        }
    }
}
