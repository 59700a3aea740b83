package org.inkgate.admin.cli;

import static org.inkgate.admin.testutil.AdminCommand.admin;
import static org.inkgate.admin.testutil.AdminCommand.concat;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import org.inkgate.admin.testutil.AdminCommand.Run;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.testutil.PostgresServer;
import org.inkgate.admin.testutil.CommandLineSitting;
import org.inkgate.admin.testutil.DemoSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The roles the IT department guide (docs/it-department-guide.md) tells the database administrator
 * to make, run for real: an owner role creates the store's tables (the first collect), and a
 * collector role with only the GRANTs the guide lists (CONNECT, USAGE on the schema, SELECT, INSERT,
 * UPDATE, DELETE on the tables; no CREATE anywhere) then collects, reports and exports.
 */
class PostgresLeastPrivilegeTest {

    private static final Path EXAM = DemoSource.DEMO.resolve("exam-source");
    private static final Path ROSTER = DemoSource.DEMO.resolve("roster.csv");
    private static final String PASSWORD = "Invented-Least-Privilege-19";

    @TempDir
    Path dir;



    @Test
    void collectorWithTheGuidesGrantsOnly_collectsReportsAndExports() throws Exception {
        Path bundle = CommandLineSitting.prepare(EXAM, ROSTER, 20261205, dir);
        Path keys = dir.resolve("keys");
        Path first = dir.resolve("first");
        Path later = dir.resolve("later");
        CommandLineSitting.packages(keys, bundle, first, "H1012");
        CommandLineSitting.packages(keys, bundle, later, "none");
        StoreLocation.Server db = PostgresServer.freshStore("least");
        String name = db.database();
        PostgresServer.passwordRole(name + "_owner", PASSWORD, name);
        PostgresServer.passwordRole(name + "_collector", PASSWORD, name);
        String superuser = PostgresServer.shared().getJdbcUrl("postgres", name);
        try (Connection c = DriverManager.getConnection(superuser); Statement s = c.createStatement()) {
            // the guide's statements, as the database administrator runs them
            s.execute("REVOKE ALL ON DATABASE " + name + " FROM " + name + "_collector");
            s.execute("REVOKE ALL ON SCHEMA public FROM " + name + "_collector");
            s.execute("REVOKE CREATE ON SCHEMA public FROM PUBLIC");
            s.execute("GRANT CONNECT ON DATABASE " + name + " TO " + name + "_collector");
            s.execute("GRANT USAGE ON SCHEMA public TO " + name + "_collector");
        }
        Path passwords = Files.writeString(dir.resolve("pgpass"), "*:*:*:*:" + PASSWORD + "\n");
        String[] collect = {"collect", "--bundle", bundle.toString(), "--keys", keys.toString(), "--any-installation",
            "--passphrase-env", CommandLineSitting.SECRET_ENV, "--store-password-file", passwords.toString()};
        String owner = "postgresql://" + name + "_owner@localhost:" + db.port() + "/" + name;
        String collector = "postgresql://" + name + "_collector@localhost:" + db.port() + "/" + name;

        Run created = admin(concat(collect, first.toString(), "--store", owner));
        assertTrue(created.out().contains("Imported 11,"), created.out() + created.err());
        try (Connection c = DriverManager.getConnection(superuser.replace("user=postgres", "user=" + name + "_owner")
                .replace("?", "?password=" + PASSWORD + "&")); Statement s = c.createStatement()) {
            s.execute("GRANT SELECT, INSERT, UPDATE, DELETE ON ALL TABLES IN SCHEMA public TO " + name + "_collector");
        }

        Run collected = admin(concat(collect, later.toString(), "--store", collector));
        assertTrue(collected.out().contains("Imported 1,"), collected.out() + collected.err());
        Run missing = admin("missing", "--store", collector, "--store-password-file", passwords.toString());
        assertEquals(InkgateAdmin.OK, missing.code(), missing.out() + missing.err());
        Run export = admin("export", "--store", collector, "--store-password-file", passwords.toString(), "--out",
                dir.resolve("export").toString());
        assertEquals(InkgateAdmin.OK, export.code(), export.out() + export.err());
    }

}
