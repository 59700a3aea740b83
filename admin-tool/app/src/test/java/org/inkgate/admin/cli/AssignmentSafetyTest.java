package org.inkgate.admin.cli;

import static org.inkgate.admin.testutil.AdminCommand.admin;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.inkgate.admin.testutil.AdminCommand.Run;
import org.inkgate.admin.testutil.CommandLineSitting;
import org.inkgate.admin.testutil.DemoSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 15 §1: {@code forms --out} never replaces an existing assignment table without
 * {@code --replace}, and {@code collect} refuses an assignment table other than the one the bundle
 * was built from, before anything enters the store.
 */
class AssignmentSafetyTest {

    private static final Path EXAM = DemoSource.DEMO.resolve("exam-source");
    private static final Path ROSTER = DemoSource.DEMO.resolve("roster.csv");

    @TempDir
    Path dir;

    /** Exit code, standard output and error of one run of the real command line. */


    @Test
    void forms_outExists_refusedWithItsSeedUnlessReplace() throws Exception {
        Path table = dir.resolve("assignment.csv");
        Run first = admin("forms", EXAM.toString(), "--roster", ROSTER.toString(), "--seed", "111", "--out", table.toString());
        assertEquals(0, first.code(), first.err());
        byte[] before = Files.readAllBytes(table);

        Run again = admin("forms", EXAM.toString(), "--roster", ROSTER.toString(), "--seed", "222", "--out", table.toString());
        assertEquals(InkgateAdmin.PROBLEMS, again.code(), again.out());
        assertTrue(again.err().contains("already exists (seed 111, 12 candidates)"), again.err());
        assertTrue(again.err().contains("--replace"), again.err());
        assertArrayEquals(before, Files.readAllBytes(table), "the table the bundle may have been built from is kept");

        // the same seed and roster write the same bytes: nothing to choose
        assertEquals(0, admin("forms", EXAM.toString(), "--roster", ROSTER.toString(), "--seed", "111", "--out",
                table.toString()).code());

        Run replaced = admin("forms", EXAM.toString(), "--roster", ROSTER.toString(), "--seed", "222", "--out",
                table.toString(), "--replace");
        assertEquals(0, replaced.code(), replaced.err());
        assertTrue(Files.readString(table).lines().skip(1).allMatch(l -> l.endsWith(",222")));
    }

    @Test
    void collect_assignmentNotTheBundles_refusedAndNothingCollected() throws Exception {
        String passEnv = CommandLineSitting.SECRET_ENV;
        Path bundle = CommandLineSitting.prepare(EXAM, ROSTER, 20261202, dir);
        Path keys = dir.resolve("keys");
        Path built = dir.resolve("assignment.csv");
        Path other = dir.resolve("other.csv");
        assertEquals(0, admin("forms", EXAM.toString(), "--roster", ROSTER.toString(), "--seed", "5", "--out",
                other.toString()).code());
        Path packages = dir.resolve("packages");
        CommandLineSitting.packages(keys, bundle, packages, "H1012");
        Path store = dir.resolve("results.db");

        Run wrong = admin("collect", packages.toString(), "--store", store.toString(), "--bundle", bundle.toString(),
                "--keys", keys.toString(), "--any-installation", "--assignment", other.toString(),
                "--passphrase-env", passEnv);
        assertEquals(InkgateAdmin.PROBLEMS, wrong.code(), wrong.out() + wrong.err());
        assertTrue(wrong.err().contains("is not the one the bundle of"), wrong.err());
        assertTrue(wrong.err().matches("(?s).*candidate H10\\d\\d sits form F0\\d in the bundle but F0\\d in this table.*"),
                wrong.err());
        assertFalse(wrong.out().contains("Imported"), wrong.out());
        assertFalse(Files.exists(store) && Files.size(store) > 0 && hasSittings(store), "nothing collected");

        Run right = admin("collect", packages.toString(), "--store", store.toString(), "--bundle", bundle.toString(),
                "--keys", keys.toString(), "--any-installation", "--assignment", built.toString(),
                "--passphrase-env", passEnv);
        assertTrue(right.out().contains("Imported 11,"), right.out() + right.err());
    }

    private static boolean hasSittings(Path store) throws Exception {
        try (var c = java.sql.DriverManager.getConnection("jdbc:sqlite:" + store); var st = c.createStatement();
                var rs = st.executeQuery("SELECT count(*) FROM sqlite_master WHERE name = 'sittings'")) {
            if (!rs.next() || rs.getInt(1) == 0) {
                return false;
            }
        }
        try (var c = java.sql.DriverManager.getConnection("jdbc:sqlite:" + store); var st = c.createStatement();
                var rs = st.executeQuery("SELECT count(*) FROM sittings")) {
            return rs.next() && rs.getInt(1) > 0;
        }
    }
}
