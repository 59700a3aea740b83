package org.inkgate.admin.core.store.sqlite;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import org.sqlite.SQLiteConfig;
import org.sqlite.SQLiteOpenMode;

/**
 * Reading a store where nothing may be written. A store in WAL mode needs its -shm file even to
 * read, and SQLite cannot create one on read-only media; opened as immutable (sqlite.org, "URI
 * filenames", {@code immutable=1}) it reads the database file alone. That is only right when no
 * write-ahead log holds commits not yet in the file: such a store is refused with what to do.
 */
final class ReadOnlyStore {

    private ReadOnlyStore() {
    }

    /** True when the store file and its folder can both be written, so the normal open works. */
    static boolean writable(Path file) {
        Path folder = file.toAbsolutePath().getParent();
        return Files.isWritable(file) && folder != null && Files.isWritable(folder);
    }

    /** A read-only connection to the store on read-only media, refused with what to do when it cannot be read right. */
    static Connection connect(Path file) throws SQLException {
        Path wal = file.resolveSibling(file.getFileName() + "-wal");
        try {
            if (Files.exists(wal) && Files.size(wal) > 0) {
                throw new SQLException("the results store " + file + " is on read-only media with a write-ahead log beside"
                        + " it (" + wal.getFileName() + ") holding changes not yet merged into the store, which cannot be"
                        + " merged there. Copy the store together with its -wal file to writable storage and run the step"
                        + " on the copy");
            }
        } catch (java.io.IOException e) {
            throw new SQLException("cannot read " + wal + ": " + e.getMessage(), e);
        }
        SQLiteConfig config = new SQLiteConfig();
        config.setReadOnly(true);
        config.setOpenMode(SQLiteOpenMode.OPEN_URI);
        Connection c = DriverManager.getConnection("jdbc:sqlite:file:" + file.toAbsolutePath().toUri().getRawPath()
                + "?immutable=1", config.toProperties());
        try {
            int version = Migrations.version(c);
            if (version != Migrations.latest()) {
                throw new SQLException("the results store " + file + " is at schema version " + version + " and this program"
                        + " reads version " + Migrations.latest() + (version < Migrations.latest()
                                ? "; it would upgrade the store, which read-only media does not allow. Copy the store to"
                                        + " writable storage and run the step on the copy"
                                : "; use a newer inkgate-admin"));
            }
            return c;
        } catch (SQLException e) {
            c.close();
            throw e;
        }
    }
}
