package org.inkgate.admin.core.store.sqlite;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
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
        AFTER_CRASH,
        /**
         * A new store built under a side name and named only when whole ({@link NewStoreFile}): the rollback
         * journal in memory, so a refused package still rolls back, and no syncs while it is built; it is synced
         * once, switched to the write-ahead log and named. Each page is written once instead of once to the log
         * and again to the database. A killed process leaves only the side file, which no one opens as a store.
         */
        BUILT_ASIDE
    }

    /**
     * The page size of a new store: 16 KiB instead of SQLite's 4 KiB. A results store is mostly event logs of
     * some hundreds of kilobytes each, and SQLite moves such values page by page; with 16 KiB pages a collect of
     * 1,000 packages spent about half the CPU on storing them (docs/benchmarks.md, issue 16). SQLite's own
     * advice, from memory: "Internal Versus External BLOBs" on sqlite.org found 8 or 16 KiB pages fastest for
     * large values.
     */
    static final int PAGE_BYTES = 16 * 1024;

    private SqliteFiles() {
    }

    /**
     * A connection with foreign keys on, a 10 s busy timeout and the given durability: the write-ahead log, or
     * for a store built aside the rollback journal in memory.
     */
    static Connection connect(Path file, Durability durability) throws SQLException {
        SQLiteConfig config = new SQLiteConfig();
        config.enforceForeignKeys(true);
        switch (durability) {
            case EVERY_COMMIT -> config.setSynchronous(SQLiteConfig.SynchronousMode.FULL);
            case AFTER_CRASH -> {
                config.setSynchronous(SQLiteConfig.SynchronousMode.NORMAL);
                config.setCacheSize(-65536);
            }
            case BUILT_ASIDE -> {
                config.setSynchronous(SQLiteConfig.SynchronousMode.OFF);
                config.setCacheSize(-65536);
            }
        }
        config.setBusyTimeout(10_000);
        Connection c = DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath(), config.toProperties());
        try (Statement s = c.createStatement()) {
            // the page size first: switching to the write-ahead log writes a new file's header, with the pages
            // it has then (the driver's own settings switch the log first); a store made before keeps its pages
            s.execute("PRAGMA page_size = " + PAGE_BYTES);
            s.execute(durability == Durability.BUILT_ASIDE ? "PRAGMA journal_mode = MEMORY" : "PRAGMA journal_mode = WAL");
        } catch (SQLException e) {
            closeQuietly(c);
            throw e;
        }
        return c;
    }

    /**
     * A plain connection for a quick look (the exams in a store, whether it holds a rubric),
     * changing nothing; on read-only media the store is read as it is ({@link ReadOnlyStore}).
     */
    static Connection connectForReading(Path file) throws SQLException {
        return ReadOnlyStore.writable(file) ? DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath())
                : ReadOnlyStore.connect(file);
    }

    /** Deletes a store file and the journal, log and index files SQLite keeps beside it, where there are any. */
    static void deleteWithCompanions(Path file) throws java.io.IOException {
        for (String suffix : new String[] {"", "-wal", "-shm", "-journal"}) {
            java.nio.file.Files.deleteIfExists(Path.of(file + suffix));
        }
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
