package org.inkgate.admin.core.testutil;

import io.zonky.test.db.postgres.embedded.EmbeddedPostgres;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import org.inkgate.admin.core.store.StoreLocation;

/**
 * A PostgreSQL server of a test's own, apart from the shared one ({@link PostgresServer}), that the
 * test may stop and start again on the same port and data: for faults such as a server lost in the
 * middle of a collect. Its data stay in a folder of the test's; closing it stops the server.
 */
public final class StoppableServer implements AutoCloseable {

    private final Path data;
    private final int port;
    private EmbeddedPostgres running;

    private StoppableServer(Path data, int port) {
        this.data = data;
        this.port = port;
    }

    /** A new server with its data in a new folder (readable by the server's user when the tests run as root). */
    public static StoppableServer start() throws IOException {
        Path data = Files.createTempDirectory("inkgate-stoppable-pg");
        Files.setPosixFilePermissions(data, PosixFilePermissions.fromString("rwxr-xr-x"));
        int port;
        try (var socket = new java.net.ServerSocket(0)) {
            port = socket.getLocalPort();
        }
        StoppableServer server = new StoppableServer(data.resolve("cluster"), port);
        server.startAgain();
        return server;
    }

    /** Starts the server (again) on the same port and data. */
    public synchronized void startAgain() throws IOException {
        EmbeddedPostgres.Builder builder = EmbeddedPostgres.builder().setDataDirectory(data).setCleanDataDirectory(false)
                .setPort(port);
        if (ServerUserBinaries.runningAsRoot()) {
            builder.setPgBinaryResolver(new ServerUserBinaries());
        }
        running = builder.start();
    }

    /** Stops the server: every connection to it is cut. */
    public synchronized void stop() throws IOException {
        if (running != null) {
            running.close();
            running = null;
        }
    }

    /** A new, empty database as a store location (user postgres, trust on loopback). */
    public StoreLocation.Server freshStore(String name) throws SQLException {
        try (Connection c = running.getPostgresDatabase().getConnection(); Statement s = c.createStatement()) {
            s.execute("CREATE DATABASE " + name);
        }
        return new StoreLocation.Server("localhost", port, name, "postgres", java.util.Map.of(), null);
    }

    /** A superuser connection to {@code database}. */
    public Connection connect(String database) throws SQLException {
        return java.sql.DriverManager.getConnection(running.getJdbcUrl("postgres", database));
    }

    public int port() {
        return port;
    }

    @Override
    public void close() throws IOException {
        stop();
    }
}
