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
import java.util.stream.Stream;
import org.inkgate.admin.testutil.AdminCommand.Run;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.testutil.PostgresServer;
import org.inkgate.admin.testutil.CommandLineSitting;
import org.inkgate.admin.testutil.DemoSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code collect}, {@code missing} and {@code export} through the real command line into a database
 * on the test PostgreSQL server, logging in as a role with a password read from a password file
 * ({@code --store-password-file}): the same sitting collected into a SQLite file exports the same
 * CSV files byte for byte. A wrong password is refused in plain words without the secret.
 */
class PostgresStoreCommandTest {

    private static final Path EXAM = DemoSource.DEMO.resolve("exam-source");
    private static final Path ROSTER = DemoSource.DEMO.resolve("roster.csv");
    /** An invented password; no output may show it. */
    private static final String PASSWORD = "Invented-Cli-Pass-19";

    @TempDir
    Path dir;



    @Test
    void collectMissingExport_onAPostgresqlStore_workAsOnAStoreFile() throws Exception {
        Path bundle = CommandLineSitting.prepare(EXAM, ROSTER, 20261203, dir);
        Path keys = dir.resolve("keys");
        Path packages = dir.resolve("packages");
        CommandLineSitting.packages(keys, bundle, packages, "H1012");
        StoreLocation.Server database = PostgresServer.freshStore("cli");
        PostgresServer.passwordRole("cli_collector", PASSWORD, database.database());
        String server = "postgresql://cli_collector@localhost:" + database.port() + "/" + database.database()
                + "?sslmode=disable";
        Path passwords = Files.writeString(dir.resolve("store.pgpass"), "localhost:" + database.port() + ":"
                + database.database() + ":cli_collector:" + PASSWORD + "\n");
        String[] login = {"--store", server, "--store-password-file", passwords.toString()};
        String[] collect = {"collect", packages.toString(), "--bundle", bundle.toString(), "--keys", keys.toString(),
            "--any-installation", "--passphrase-env", CommandLineSitting.SECRET_ENV};

        Run collected = admin(concat(collect, login));
        assertTrue(collected.out().contains("Imported 11,"), collected.all());
        assertTrue(collected.out().contains("into postgresql://localhost:" + database.port() + "/" + database.database()),
                "names the store without user or parameters: " + collected.all());
        Run again = admin(concat(collect, login));
        assertTrue(again.out().contains("Imported 0,"), "a rerun imports nothing twice: " + again.all());

        Run missing = admin(concat(new String[] {"missing"}, login));
        assertEquals(InkgateAdmin.ATTENTION, missing.code(), missing.all());
        assertTrue(missing.out().contains("candidate H1012"), missing.all());

        Path fromServer = dir.resolve("export-postgresql");
        Run exported = admin(concat(new String[] {"export", "--out", fromServer.toString()}, login));
        assertEquals(InkgateAdmin.OK, exported.code(), exported.all());

        // the same packages into a SQLite file, exported the same way
        Path file = dir.resolve("results.db");
        assertTrue(admin(concat(collect, new String[] {"--store", file.toString()})).out().contains("Imported 11,"));
        Path fromFile = dir.resolve("export-sqlite");
        assertEquals(InkgateAdmin.OK, admin("export", "--store", file.toString(), "--out", fromFile.toString()).code());
        List<Path> csv = csvFiles(fromFile);
        assertEquals(csvFiles(fromFile).stream().map(p -> fromFile.relativize(p).toString()).toList(),
                csvFiles(fromServer).stream().map(p -> fromServer.relativize(p).toString()).toList());
        assertFalse(csv.isEmpty());
        for (Path p : csv) {
            assertArrayEquals(Files.readAllBytes(p), Files.readAllBytes(fromServer.resolve(fromFile.relativize(p))),
                    fromFile.relativize(p) + " is the same from both stores");
        }
        for (Run r : List.of(collected, again, missing, exported)) {
            assertFalse(r.all().contains(PASSWORD), "the password is never shown");
        }
    }

    @Test
    void collect_wrongPasswordInTheFile_isRefusedInPlainWordsWithoutTheSecret() throws Exception {
        StoreLocation.Server database = PostgresServer.freshStore("cliwrong");
        PostgresServer.passwordRole("cli_wrong", PASSWORD, database.database());
        Path passwords = Files.writeString(dir.resolve("store.pgpass"), "*:*:*:cli_wrong:Not-" + PASSWORD + "\n");
        Path bundle = CommandLineSitting.prepare(EXAM, ROSTER, 20261203, dir);
        Run r = admin("collect", dir.resolve("packages").toString(), "--bundle", bundle.toString(), "--keys",
                dir.resolve("keys").toString(), "--any-installation", "--passphrase-env", CommandLineSitting.SECRET_ENV,
                "--store", "postgresql://cli_wrong@localhost:" + database.port() + "/" + database.database(),
                "--store-password-file", passwords.toString());
        assertEquals(InkgateAdmin.PROBLEMS, r.code(), r.all());
        assertTrue(r.err().contains("the PostgreSQL server refused the login of cli_wrong"), r.all());
        assertTrue(r.err().contains("wrong password or no access"), r.all());
        assertFalse(r.all().contains(PASSWORD), "neither the wrong nor the right password is shown: " + r.all());
    }

    private static List<Path> csvFiles(Path root) throws Exception {
        try (Stream<Path> files = Files.walk(root)) {
            return files.filter(p -> p.toString().endsWith(".csv")).sorted().toList();
        }
    }

}
