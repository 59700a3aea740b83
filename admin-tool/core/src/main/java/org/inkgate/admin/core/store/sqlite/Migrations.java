package org.inkgate.admin.core.store.sqlite;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.List;
import org.inkgate.admin.core.store.sql.Schema;

/**
 * The shared schema ({@link Schema}) on a SQLite store: the version in {@code PRAGMA user_version}
 * ({@link SqliteDialect}), the statements as written there.
 */
public final class Migrations {

    static final List<Schema.Migration> ALL = Schema.ALL;

    private Migrations() {
    }

    /** The version this program writes and reads. */
    public static int latest() {
        return Schema.latest();
    }

    public static int version(Connection c) throws SQLException {
        return SqliteDialect.INSTANCE.schemaVersion(c);
    }

    /** Brings the store up to {@code target}, one transaction per migration. */
    public static void migrate(Connection c, int target) throws SQLException {
        Schema.migrate(c, SqliteDialect.INSTANCE, target);
    }
}
