package org.inkgate.admin.core.store.sqlite;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.sql.SqlResultsStore;

/**
 * The results store in one SQLite file: foreign keys on, write-ahead log, synchronous NORMAL, so
 * that a committed import survives a killed process and an interrupted one leaves no trace. The
 * SQL is the shared {@link SqlResultsStore}'s; this class opens the file.
 */
public final class SqliteResultsStore extends SqlResultsStore {

    /** Where a new store is being built, or null when this store is its file. */
    private final NewStoreFile aside;
    private boolean kept;

    private SqliteResultsStore(Connection c, Path file, NewStoreFile aside) {
        // a full disk, read-only media and the like in plain words, naming the store the user named
        super(c, SqliteDialect.INSTANCE, failure -> SqliteErrors.plain(file, failure));
        this.aside = aside;
    }

    private SqliteResultsStore(Connection c, Path file) {
        this(c, file, null);
    }

    /**
     * Opens the store for a collect holding its lock: an existing file as {@link #open}; a new one is built beside
     * its name ({@link NewStoreFile}) and named by {@link #keep}.
     */
    public static SqliteResultsStore openToCollect(Path file) throws StoreException {
        if (!NewStoreFile.isNew(file)) {
            return open(file);
        }
        NewStoreFile aside = null;
        Connection c = null;
        try {
            aside = NewStoreFile.begin(file);
            c = SqliteFiles.connect(aside.side(), SqliteFiles.Durability.BUILT_ASIDE);
            Migrations.migrate(c, Migrations.latest());
            aside.syncAlong();
            return new SqliteResultsStore(c, file, aside);
        } catch (SQLException | java.io.IOException e) {
            SqliteFiles.closeQuietly(c);
            discardQuietly(aside);
            throw failure("cannot make the results store " + file, file, e);
        }
    }

    /** A new store built aside: switched to the write-ahead log (as every store in use is), closed, synced, named. */
    @Override
    public void keep() throws StoreException {
        if (aside == null || kept) {
            return;
        }
        try (java.sql.Statement s = connection().createStatement();
                java.sql.ResultSet mode = s.executeQuery("PRAGMA journal_mode = WAL")) {
            // SQLite answers with the mode it is in, the old one when it could not switch (sqlite.org, PRAGMA journal_mode)
            String now = mode.next() ? mode.getString(1) : "(none)";
            if (!"wal".equalsIgnoreCase(now)) {
                throw new SQLException("the new store stayed in journal mode " + now + " instead of the write-ahead log");
            }
        } catch (SQLException e) {
            throw failure("cannot finish the new results store " + aside.side(), aside.side(), e);
        }
        super.close();
        try {
            aside.name();
            kept = true;
        } catch (java.io.IOException e) {
            throw failure("cannot give the new results store its name", aside.side(), e);
        }
    }

    /** Closes the store; a new store built aside and not kept is removed. */
    @Override
    public void close() throws StoreException {
        StoreException closing = null;
        try {
            super.close();
        } catch (StoreException e) {
            closing = e;
        }
        if (aside != null && !kept) {
            try {
                aside.discard();
            } catch (java.io.IOException e) {
                StoreException removing = failure("cannot remove the unfinished store " + aside.side()
                        + " (no store was made; remove it by hand)", aside.side(), e);
                if (closing == null) {
                    throw removing;
                }
                closing.addSuppressed(removing);
            }
        }
        if (closing != null) {
            throw closing;
        }
    }

    private static void discardQuietly(NewStoreFile aside) {
        if (aside != null) {
            try {
                aside.discard();
            } catch (java.io.IOException ignored) {
                // the failure to open is the one to report; the next collect removes the side file
            }
        }
    }

    /** Opens (creating if needed) the store and brings its schema to the latest version. */
    public static SqliteResultsStore open(Path file) throws StoreException {
        return open(file, Migrations.latest());
    }

    /** Opens the store migrated to {@code version} only: for migration tests. */
    static SqliteResultsStore open(Path file, int version) throws StoreException {
        Connection c = null;
        try {
            // created owner-only before SQLite opens it, so its -wal and -shm files are too
            org.inkgate.format.io.OwnerOnly.file(file);
            c = SqliteFiles.connect(file, SqliteFiles.Durability.AFTER_CRASH);
            Migrations.migrate(c, version);
            return new SqliteResultsStore(c, file);
        } catch (SQLException | java.io.IOException e) {
            SqliteFiles.closeQuietly(c);
            throw failure("cannot open the results store " + file, file, e);
        }
    }

    /**
     * Opens an existing store for reading only, also on read-only media (a write-protected card,
     * a disc, a read-only share), where {@link #open} would fail creating its journal files: for
     * the steps that only read (missing, export, analyse). On writable storage it is {@link #open}.
     */
    public static SqliteResultsStore openReadOnly(Path file) throws StoreException {
        if (!java.nio.file.Files.isRegularFile(file)) {
            throw new StoreException("no results store at " + file + "; name the store that collect wrote");
        }
        if (ReadOnlyStore.writable(file)) {
            return open(file);
        }
        try {
            Connection c = ReadOnlyStore.connect(file);
            return new SqliteResultsStore(c, file);
        } catch (SQLException e) {
            throw failure("cannot open the results store " + file, file, e);
        }
    }

    /**
     * An existing store file as the source of a store copy or a content digest; changed in nothing.
     */
    public static org.inkgate.admin.core.store.sql.CopyEnd copySource(Path file) throws StoreException {
        if (!java.nio.file.Files.isRegularFile(file)) {
            throw new StoreException("no results store at " + file + "; name the store that collect wrote");
        }
        try {
            Connection c = SqliteFiles.connectForReading(file);
            return new org.inkgate.admin.core.store.sql.CopyEnd(file.toString(), c, SqliteDialect.INSTANCE,
                    failure -> SqliteErrors.plain(file, failure), () -> { });
        } catch (SQLException e) {
            throw failure("cannot open the results store " + file, file, e);
        }
    }

    /**
     * A store file as the target of a store copy, created owner-only when it does not exist; when a
     * copy into a file created here is refused, the file is removed again.
     */
    public static org.inkgate.admin.core.store.sql.CopyEnd copyTarget(Path file) throws StoreException {
        boolean created = !java.nio.file.Files.exists(file);
        Connection c = null;
        try {
            org.inkgate.format.io.OwnerOnly.file(file);
            // the copy is one commit, so syncing it costs nothing, and a backup should survive a power cut
            c = SqliteFiles.connect(file, SqliteFiles.Durability.EVERY_COMMIT);
            Connection opened = c;
            return new org.inkgate.admin.core.store.sql.CopyEnd(file.toString(), c, SqliteDialect.INSTANCE,
                    failure -> SqliteErrors.plain(file, failure), () -> {
                        if (created) {
                            SqliteFiles.closeQuietly(opened);
                            try {
                                SqliteFiles.deleteWithCompanions(file);
                            } catch (java.io.IOException ignored) {
                                // the refusal is reported; a leftover empty file holds no data
                            }
                        }
                    });
        } catch (SQLException | java.io.IOException e) {
            SqliteFiles.closeQuietly(c);
            throw failure("cannot open the store file " + file + " to copy into", file, e);
        }
    }

    /** The failure in plain words when it is a full disk, read-only media and the like; else as SQLite says. */
    private static StoreException failure(String what, Path file, Exception e) {
        String plain = SqliteErrors.plain(file, e);
        return new StoreException(what + ": " + (plain != null ? plain : e.getMessage()), e);
    }

    @Override
    protected Connection connection() {
        return super.connection();
    }
}
