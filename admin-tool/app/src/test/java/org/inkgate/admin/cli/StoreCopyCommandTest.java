package org.inkgate.admin.cli;

import static org.inkgate.admin.testutil.AdminCommand.admin;
import static org.inkgate.admin.testutil.AdminCommand.concat;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.inkgate.admin.testutil.AdminCommand.Run;
import org.inkgate.admin.core.store.StoreContent;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.core.testutil.PostgresServer;
import org.inkgate.admin.testutil.CommandLineSitting;
import org.inkgate.admin.testutil.DemoSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code store copy} through the real command line: a store collected and rated with the real
 * commands (raters, a seeded assignment, sheets with invented scores, a rule, an adjudication) goes
 * SQLite to PostgreSQL to SQLite; every table's digest is the same in all three, and missing,
 * export and rate export print and write the same bytes from the copy as from the original. The
 * copy on the server takes new packages after it (its key sequences were moved past the copied keys).
 * A non-empty target, a store of another schema version and the same store twice are refused, with
 * nothing written.
 */
class StoreCopyCommandTest {

    private static final Path EXAM = DemoSource.DEMO.resolve("exam-source");
    private static final Path ROSTER = DemoSource.DEMO.resolve("roster.csv");

    @TempDir
    Path dir;



    @Test
    void copy_ratedStore_sqliteToPostgresqlAndBack_keepsEveryTableAndEveryOutput() throws Exception {
        Path bundle = CommandLineSitting.prepare(EXAM, ROSTER, 20261203, dir);
        Path keys = dir.resolve("keys");
        Path packages = dir.resolve("packages");
        CommandLineSitting.packages(keys, bundle, packages, "H1012");
        Path original = dir.resolve("results.db");
        String[] collect = {"collect", packages.toString(), "--bundle", bundle.toString(), "--keys", keys.toString(),
            "--any-installation", "--passphrase-env", CommandLineSitting.SECRET_ENV, "--roster", ROSTER.toString(),
            "--exam", EXAM.toString()};
        assertTrue(admin(concat(collect, "--store", original.toString())).out().contains("Imported 11,"));
        rate(original.toString());

        StoreLocation.Server database = PostgresServer.freshStore("copy");
        String server = "postgresql://postgres@localhost:" + database.port() + "/" + database.database()
                + "?sslmode=disable";
        Run there = admin("store", "copy", "--from", original.toString(), "--to", server);
        assertEquals(InkgateAdmin.OK, there.code(), there.all());
        assertTrue(there.out().contains("Every table's digest in the copy equals the source's"), there.out());
        assertTrue(there.out().matches("(?s).*\\n  rating_submissions +[1-9]\\d* +[0-9a-f]{64}\\n.*"),
                "per-table rows and digest: " + there.out());
        Path back = dir.resolve("back/results.db");
        Run home = admin("store", "copy", "--from", server, "--to", back.toString());
        assertEquals(InkgateAdmin.OK, home.code(), home.all());

        StoreContent before = Stores.content(StoreLocation.file(original));
        assertEquals(before, Stores.content(StoreLocation.parse(server)), "the server copy has the same digests");
        assertEquals(before, Stores.content(StoreLocation.file(back)), "the copy of the copy has the same digests");
        for (String table : List.of("sittings", "event_logs", "raters", "rating_assignments", "ratings",
                "rating_submissions", "rating_flags", "final_scores", "candidate_personal", "rubric_criteria")) {
            assertTrue(before.tables().stream().anyMatch(t -> t.name().equals(table) && t.rows() > 0),
                    table + " has rows, so the comparison covers it: " + before);
        }
        Run digest = admin("store", "digest", "--store", back.toString());
        assertEquals(InkgateAdmin.OK, digest.code(), digest.all());
        for (StoreContent.Table t : before.tables()) {
            assertTrue(digest.out().contains(t.sha256()), t.name() + " in " + digest.out());
        }

        // the same reports and files from the original and from the copy of the copy
        assertEquals(admin("missing", "--store", original.toString()).out(),
                admin("missing", "--store", back.toString()).out());
        assertEquals(admin("rate", "progress", "--store", original.toString()).out(),
                admin("rate", "progress", "--store", back.toString()).out());
        for (String[] step : List.of(new String[] {"export"}, new String[] {"rate", "export"})) {
            Path a = dir.resolve("out-original-" + step.length);
            Path b = dir.resolve("out-copy-" + step.length);
            assertEquals(InkgateAdmin.OK, admin(concat(step, "--store", original.toString(), "--out", a.toString())).code());
            assertEquals(InkgateAdmin.OK, admin(concat(step, "--store", back.toString(), "--out", b.toString())).code());
            List<Path> files = files(a);
            assertFalse(files.isEmpty());
            assertEquals(files.stream().map(p -> a.relativize(p).toString()).toList(),
                    files(b).stream().map(p -> b.relativize(p).toString()).toList());
            for (Path p : files) {
                assertArrayEquals(Files.readAllBytes(p), Files.readAllBytes(b.resolve(a.relativize(p))),
                        a.relativize(p) + " is the same from the copy");
            }
        }

        // new keys on the server copy come after the copied ones: the left-out candidate's package goes in
        Path late = dir.resolve("late");
        CommandLineSitting.packages(keys, bundle, late, "none");
        Run more = admin(concat(collect, "--store", server));
        assertTrue(more.out().contains("Imported 0, already imported (same file) 11"), more.all());
        Run lateOne = admin("collect", late.resolve("H1012.inkresp").toString(), "--bundle", bundle.toString(),
                "--keys", keys.toString(), "--any-installation", "--passphrase-env", CommandLineSitting.SECRET_ENV,
                "--store", server);
        assertTrue(lateOne.out().contains("Imported 1,"), "a new sitting id after the copied ones: " + lateOne.all());
    }

    @Test
    void copy_intoANonEmptyStore_orFromAnotherVersion_isRefusedAndWritesNothing() throws Exception {
        Path bundle = CommandLineSitting.prepare(EXAM, ROSTER, 20261204, dir);
        Path keys = dir.resolve("keys");
        Path packages = dir.resolve("packages");
        CommandLineSitting.packages(keys, bundle, packages, "H1012");
        Path store = dir.resolve("results.db");
        assertTrue(admin("collect", packages.toString(), "--bundle", bundle.toString(), "--keys", keys.toString(),
                "--any-installation", "--passphrase-env", CommandLineSitting.SECRET_ENV, "--store", store.toString())
                .out().contains("Imported 11,"));
        StoreLocation.Server database = PostgresServer.freshStore("copyfull");
        String server = "postgresql://postgres@localhost:" + database.port() + "/" + database.database();
        assertEquals(InkgateAdmin.OK, admin("store", "copy", "--from", store.toString(), "--to", server).code());

        Run full = admin("store", "copy", "--from", store.toString(), "--to", server);
        assertEquals(InkgateAdmin.PROBLEMS, full.code(), full.all());
        assertTrue(full.err().contains("is not empty") && full.err().contains("Name a new file, or ask the database"
                + " administrator for a new, empty database"), full.err());
        Path other = dir.resolve("other.db");
        Files.copy(store, other);
        byte[] untouched = Files.readAllBytes(other);
        Run intoFile = admin("store", "copy", "--from", server, "--to", other.toString());
        assertEquals(InkgateAdmin.PROBLEMS, intoFile.code(), intoFile.all());
        assertTrue(intoFile.err().contains("is not empty"), intoFile.err());
        assertArrayEquals(untouched, Files.readAllBytes(other), "the refused target is as it was");

        Run same = admin("store", "copy", "--from", store.toString(), "--to", dir.resolve(".").resolve("results.db")
                .toString());
        assertEquals(InkgateAdmin.PROBLEMS, same.code(), same.all());
        assertTrue(same.err().contains("are the same"), same.err());

        int latest = org.inkgate.admin.core.store.sql.Schema.latest();
        try (var c = java.sql.DriverManager.getConnection("jdbc:sqlite:" + other); var s = c.createStatement()) {
            s.execute("PRAGMA user_version = " + (latest + 1));
        }
        Path target = dir.resolve("never.db");
        Run newer = admin("store", "copy", "--from", other.toString(), "--to", target.toString());
        assertEquals(InkgateAdmin.PROBLEMS, newer.code(), newer.all());
        assertTrue(newer.err().contains("is at schema version " + (latest + 1) + ", this inkgate-admin writes " + latest),
                newer.err());
        assertFalse(Files.exists(target), "no file is left behind by a refused copy");

        Run none = admin("store", "copy", "--from", dir.resolve("none.db").toString(), "--to", target.toString());
        assertEquals(InkgateAdmin.PROBLEMS, none.code(), none.all());
        assertTrue(none.err().contains("no results store at"), none.err());
        assertFalse(Files.exists(target));
    }

    /** Three invented raters, a seeded assignment, invented scores, a rule and an adjudication, all by the real commands. */
    private void rate(String store) throws Exception {
        for (String r : List.of("R01", "R02", "R03")) {
            assertEquals(0, admin("rate", "raters", "add", r, "--label", "Invented rater " + r, "--store", store).code());
        }
        Run assign = admin("rate", "assign", "--store", store, "--seed", "20261203");
        assertEquals(0, assign.code(), assign.all());
        Map<String, Integer> harshness = Map.of("R01", 3, "R02", 5, "R03", 8);
        for (String r : harshness.keySet()) {
            Path sheet = dir.resolve("sheets/" + r + ".csv");
            assertEquals(0, admin("rate", "sheet", "export", "--rater", r, "--out", sheet.toString(), "--store", store)
                    .code());
            Files.writeString(sheet, fill(Files.readString(sheet), harshness.get(r)));
            Run imported = admin("rate", "sheet", "import", "--rater", r, sheet.toString(), "--store", store);
            assertEquals(0, imported.code(), imported.all());
        }
        assertEquals(0, admin("rate", "rule", "--criterion-gap", "1", "--store", store).code());
        Run flags = admin("rate", "flags", "--store", store);
        assertEquals(InkgateAdmin.ATTENTION, flags.code(), flags.all());
        for (String r : harshness.keySet()) {
            Path sheet = dir.resolve("sheets/" + r + "-adjudication.csv");
            Run exported = admin("rate", "sheet", "export", "--rater", r, "--out", sheet.toString(), "--store", store);
            if (exported.code() == 0 && Files.readString(sheet).split("\r\n").length > 1) {
                Files.writeString(sheet, fill(Files.readString(sheet), 5));
                assertEquals(0, admin("rate", "sheet", "import", "--rater", r, sheet.toString(), "--store", store).code());
            }
        }
    }

    /** Every empty score cell of a rating sheet filled with {@code score} (invented scores, not check values). */
    private static String fill(String sheet, int score) {
        StringBuilder out = new StringBuilder();
        String[] lines = sheet.split("\r\n");
        out.append(lines[0]).append("\r\n");
        for (String line : java.util.Arrays.asList(lines).subList(1, lines.length)) {
            String[] f = line.split(",", -1);
            if (f[2].isEmpty()) {
                f[2] = String.valueOf(score);
                f[3] = String.valueOf(score);
            }
            out.append(String.join(",", f)).append("\r\n");
        }
        return out.toString();
    }

    private static List<Path> files(Path root) throws Exception {
        try (Stream<Path> files = Files.walk(root)) {
            return files.filter(Files::isRegularFile).sorted().toList();
        }
    }

}
