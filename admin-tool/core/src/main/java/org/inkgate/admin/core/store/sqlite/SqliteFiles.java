package org.inkgate.admin.core.store.sqlite;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import org.sqlite.SQLiteConfig;

/** Connections to a store file, with the settings each kind of work needs. */
final class SqliteFiles {

    /** When a commit is on disk. */
    enum Durability {
        /**
         * Synchronous FULL: each commit is synced before the call returns (SQLite docs, PRAGMA
         * synchronous, "FULL"). For raters' work, which cannot be re-imported from a file.
         */
        EVERY_COMMIT,
        /**
         * Synchronous NORMAL in WAL mode: a killed process never corrupts the store or keeps half a
         * transaction (SQLite docs, "WAL mode" and PRAGMA synchronous); only a power cut may lose the
         * last few commits, and a rerun of collect imports those packages again from their files.
         * FULL costs an fsync per package, which the 1,000-package benchmark cannot afford.
         */
        AFTER_CRASH
    }

    private SqliteFiles() {
    }

    /** A connection with foreign keys on, write-ahead log, a 10 s busy timeout and the given durability. */
    static Connection connect(Path file, Durability durability) throws SQLException {
        SQLiteConfig config = new SQLiteConfig();
        config.enforceForeignKeys(true);
        config.setJournalMode(SQLiteConfig.JournalMode.WAL);
        if (durability == Durability.EVERY_COMMIT) {
            config.setSynchronous(SQLiteConfig.SynchronousMode.FULL);
        } else {
            config.setSynchronous(SQLiteConfig.SynchronousMode.NORMAL);
            config.setCacheSize(-65536);
        }
        config.setBusyTimeout(10_000);
        return DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath(), config.toProperties());
    }

    /**
     * A plain connection for a quick look (the exams in a store, whether it holds a rubric),
     * changing nothing; on read-only media the store is read as it is ({@link ReadOnlyStore}).
     */
    static Connection connectForReading(Path file) throws SQLException {
        return ReadOnlyStore.writable(file) ? DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath())
                : ReadOnlyStore.connect(file);
    }

    static void closeQuietly(Connection c) {
        if (c != null) {
            try {
                c.close();
            } catch (SQLException ignored) {
                // the open failed already; that error is the one to report
            }
        }
    }
}
