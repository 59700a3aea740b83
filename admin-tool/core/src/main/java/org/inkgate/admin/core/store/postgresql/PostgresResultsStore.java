package org.inkgate.admin.core.store.postgresql;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.util.Map;
import java.util.Properties;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.sql.Schema;
import org.inkgate.admin.core.store.sql.SqlResultsStore;

/**
 * The results store in a database on a PostgreSQL server, for many admin machines collecting into
 * one store. The SQL and the schema are the shared {@link SqlResultsStore}'s and {@link Schema}'s;
 * this class opens the connection. Transactions run at PostgreSQL's default isolation, READ
 * COMMITTED: each import is one transaction, and the unique keys on a package's file digest and on
 * its package id and content keep two collects from storing one package twice (docs/formats.md).
 */
public final class PostgresResultsStore extends SqlResultsStore {

    private PostgresResultsStore(Connection c, StoreLocation.Server server, Credentials login) {
        super(c, PostgresDialect.INSTANCE, failure -> PostgresErrors.plain(server, login, failure));
    }

    /** Opens the store, creating its tables in the (empty) database the first time, and migrates its schema. */
    public static PostgresResultsStore open(StoreLocation.Server server) throws StoreException {
        return open(server, System.getenv(), Schema.latest(), true);
    }

    /** Opens an existing store for the steps that only read it: a database without the store's tables is refused. */
    public static PostgresResultsStore openForReading(StoreLocation.Server server) throws StoreException {
        return open(server, System.getenv(), Schema.latest(), false);
    }

    /** As {@link #open(StoreLocation.Server)} with the environment given (tests) and to {@code version} only. */
    static PostgresResultsStore open(StoreLocation.Server server, Map<String, String> env, int version, boolean create)
            throws StoreException {
        Credentials login = Credentials.of(server, env);
        Connection c = connect(server, login);
        try {
            if (!create && PostgresDialect.INSTANCE.schemaVersion(c) == 0) {
                throw new StoreException("no results store in " + server + " (the database holds none of its tables);"
                        + " name the store that collect wrote, or run  inkgate-admin collect  first");
            }
            Schema.migrate(c, PostgresDialect.INSTANCE, version);
            return new PostgresResultsStore(c, server, login);
        } catch (SQLException e) {
            closeQuietly(c);
            throw failure(server, login, e);
        } catch (StoreException e) {
            closeQuietly(c);
            throw e;
        }
    }

    /** A database on the server as either end of a store copy, or the store a content digest is taken of. */
    public static org.inkgate.admin.core.store.sql.CopyEnd copyEnd(StoreLocation.Server server) throws StoreException {
        Credentials login = Credentials.of(server, System.getenv());
        Connection c = connect(server, login);
        return new org.inkgate.admin.core.store.sql.CopyEnd(server.toString(), c, PostgresDialect.INSTANCE,
                failure -> PostgresErrors.plain(server, login, failure), () -> { });
    }

    /** A connection as {@code login}, with the URL's TLS and time-out parameters. */
    static Connection connect(StoreLocation.Server server, Credentials login) throws StoreException {
        Properties p = new Properties();
        p.putAll(server.parameters());
        p.putIfAbsent("ApplicationName", "inkgate-admin");
        p.setProperty("user", login.user());
        if (login.password() != null) {
            p.setProperty("password", login.password());
        }
        String host = server.host().contains(":") ? "[" + server.host() + "]" : server.host();
        try {
            return DriverManager.getConnection("jdbc:postgresql://" + host + ":" + server.port() + "/"
                    + java.net.URLEncoder.encode(server.database(), java.nio.charset.StandardCharsets.UTF_8), p);
        } catch (SQLException e) {
            throw failure(server, login, e);
        }
    }

    /** In plain words when known; a refused login never with the server's message. */
    private static StoreException failure(StoreLocation.Server server, Credentials login, SQLException e) {
        String what = "cannot open the results store " + server + ": ";
        String plain = PostgresErrors.plain(server, login, e);
        if (plain != null) {
            return new StoreException(what + plain, PostgresErrors.loginRefused(e) ? null : e);
        }
        return new StoreException(what + e.getMessage(), e);
    }

    private static void closeQuietly(Connection c) {
        try {
            c.close();
        } catch (SQLException ignored) {
            // the open failed already; that error is the one to report
        }
    }
}
