package org.inkgate.admin.core.store.sqlite;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import org.inkgate.admin.core.store.sql.Dialect;
import org.sqlite.SQLiteConfig;
import org.sqlite.SQLiteConnection;

/**
 * SQLite: the schema's statements run as written, the version lives in {@code PRAGMA user_version}
 * (so an older inkgate-admin still sees a newer store and refuses it). One store file has one
 * writer at a time, and collect's lock beside the file keeps a second collect out, so the
 * migration needs no lock of its own.
 */
public final class SqliteDialect implements Dialect {

    public static final SqliteDialect INSTANCE = new SqliteDialect();

    private SqliteDialect() {
    }

    @Override
    public String name() {
        return "SQLite";
    }

    @Override
    public String ddl(String statement) {
        return statement;
    }

    @Override
    public int schemaVersion(Connection c) throws SQLException {
        try (Statement s = c.createStatement(); var rs = s.executeQuery("PRAGMA user_version")) {
            return rs.getInt(1);
        }
    }

    @Override
    public void recordSchemaVersion(Statement s, int version) throws SQLException {
        s.execute("PRAGMA user_version = " + version);
    }

    /** rowid, SQLite's insertion order, except in a WITHOUT ROWID table (kept in key order). */
    @Override
    public String insertionOrder(Connection c, String table) throws SQLException {
        try (var ps = c.prepareStatement("SELECT sql FROM sqlite_master WHERE type = 'table' AND name = ?")) {
            ps.setString(1, table);
            try (var rs = ps.executeQuery()) {
                boolean withoutRowid = rs.next() && rs.getString(1).toUpperCase(java.util.Locale.ROOT)
                        .contains("WITHOUT ROWID");
                return withoutRowid ? "" : " ORDER BY rowid";
            }
        }
    }

    @Override
    public void lockSchema(Statement s) {
        // the file's single writer serialises migrations (see the class comment)
    }

    /** sqlite_master is SQLite's catalogue (sqlite.org, "The Schema Table"). */
    @Override
    public boolean hasTable(Connection c, String table) throws SQLException {
        try (var ps = c.prepareStatement("SELECT 1 FROM sqlite_master WHERE type='table' AND name=?")) {
            ps.setString(1, table);
            try (var rs = ps.executeQuery()) {
                return rs.next();
            }
        }
    }

    /**
     * BEGIN IMMEDIATE: the write lock is taken at the start. Two deferred transactions that both
     * read and then write fail at once with SQLITE_BUSY, which the busy timeout does not wait out
     * (sqlite.org, "BEGIN TRANSACTION" and "Result and Error Codes"); begun immediate, the second
     * waits for the first. Only this begin is immediate: the driver opens a new transaction after
     * each commit and rollback with the connection's mode, and that one must stay deferred, which
     * takes no lock, or a commit could wait for, and fail on, another writer after its work was kept.
     */
    @Override
    public void beginWrite(Connection c) throws SQLException {
        SQLiteConnection sqlite = c.unwrap(SQLiteConnection.class);
        var config = sqlite.getConnectionConfig();
        SQLiteConfig.TransactionMode usual = config.getTransactionMode();
        config.setTransactionMode(SQLiteConfig.TransactionMode.IMMEDIATE);
        try {
            c.setAutoCommit(false);
        } finally {
            config.setTransactionMode(usual);
        }
    }

    /** The rowid: SQLite numbers the rows of a table with a text key in the order they were inserted. */
    @Override
    public String insertionOrder() {
        return "rowid";
    }

    /**
     * Nothing to take: a SQLite file has one writer at a time, and a run that read the queues
     * before another run wrote them fails its commit as busy (SQLITE_BUSY_SNAPSHOT in write-ahead
     * mode) and is planned again from the new state ({@link org.inkgate.admin.core.store.sql.Busy}).
     */
    @Override
    public void lockAssignmentRuns(Statement s, String examId) {
        // see above
    }

    /** Nothing: a SQLite file has one writer at a time (and SQLite has no SELECT ... FOR UPDATE). */
    @Override
    public String lockRows() {
        return "";
    }
}
