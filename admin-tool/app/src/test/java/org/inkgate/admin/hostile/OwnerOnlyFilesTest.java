package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.sql.DriverManager;
import java.util.List;
import java.util.stream.Stream;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.testutil.ForgedPackages;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The results store (with its -wal and -shm files), an export and an analysis report hold decrypted
 * texts and candidates' fields: made by the real command line, each is readable by its owner only
 * (0600 files, 0700 folders: POSIX.1, chmod; the owner-only rule in docs/test-owner-guide.md).
 */
class OwnerOnlyFilesTest {

    @TempDir
    Path dir;

    private static String mode(Path p) throws Exception {
        return PosixFilePermissions.toString(Files.getPosixFilePermissions(p));
    }

    @Test
    void storeExportAndReport_madeByTheCommandLine_areOwnerOnly() throws Exception {
        assumeTrue(FileSystems.getDefault().supportedFileAttributeViews().contains("posix"), "POSIX file system");
        ForgedPackages setup = ForgedPackages.prepare(dir);
        Path packages = dir.resolve("packages");
        setup.write(setup.document("H1001", 1), packages.resolve("H1001.inkresp"));

        Path store = dir.resolve("new-folder/results.db");
        ForgedPackages.Run collect = setup.collect(packages, store);
        assertEquals(InkgateAdmin.ATTENTION, collect.code(), collect.out());
        assertEquals("rwx------", mode(store.getParent()), "a folder collect made for the store");
        assertEquals("rw-------", mode(store));
        // SQLite gives its -wal and -shm files the database file's mode (os_unix.c, findCreateFileMode)
        try (var c = DriverManager.getConnection("jdbc:sqlite:" + store); var st = c.createStatement()) {
            st.execute("PRAGMA journal_mode=WAL");
            st.execute("CREATE TABLE IF NOT EXISTS probe(x)");
            st.execute("INSERT INTO probe VALUES (1)");
            for (String sidecar : List.of("-wal", "-shm")) {
                Path s = store.resolveSibling("results.db" + sidecar);
                assertTrue(Files.exists(s), sidecar);
                assertEquals("rw-------", mode(s), sidecar);
            }
        }

        Path out = dir.resolve("exports/june");
        ForgedPackages.Run export = ForgedPackages.here("export", "--store", store.toString(), "--out", out.toString());
        assertEquals(0, export.code(), export.out());
        assertOwnerOnly(out);

        Path ratings = dir.resolve("ratings.csv");
        // Shrout and Fleiss (1979), Table 2: six targets, four judges (public worked example; the values do not matter here)
        int[][] t = {{9, 2, 5, 8}, {6, 1, 3, 2}, {8, 4, 6, 8}, {7, 1, 2, 6}, {10, 5, 6, 9}, {6, 2, 4, 7}};
        StringBuilder csv = new StringBuilder("candidate,level,form,task,condition,rater,criterion,score\n");
        for (int i = 0; i < 6; i++) {
            for (int j = 0; j < 4; j++) {
                csv.append("T").append(i + 1).append(",,,t1,plain,J").append(j + 1).append(",overall,").append(t[i][j])
                        .append('\n');
            }
        }
        Files.writeString(ratings, csv);
        Path report = dir.resolve("reports/june");
        ForgedPackages.Run analyse = ForgedPackages.here("analyse", "--ratings", ratings.toString(), "--out",
                report.toString());
        assertEquals(0, analyse.code(), analyse.out());
        assertOwnerOnly(report);
    }

    private static void assertOwnerOnly(Path root) throws Exception {
        try (Stream<Path> walk = Files.walk(root)) {
            List<Path> all = walk.toList();
            assertTrue(all.size() > 3, "files written under " + root + ": " + all);
            for (Path p : all) {
                assertEquals(Files.isDirectory(p) ? "rwx------" : "rw-------", mode(p), p.toString());
            }
        }
    }
}
