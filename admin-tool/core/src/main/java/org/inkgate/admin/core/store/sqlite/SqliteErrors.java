package org.inkgate.admin.core.store.sqlite;

import java.nio.file.Path;
import java.sql.SQLException;
import org.inkgate.admin.core.store.StoreErrors;
import org.sqlite.SQLiteErrorCode;

/**
 * SQLite's result codes for the failures a person can act on (sqlite.org, "Result and Error Codes":
 * SQLITE_FULL 13, SQLITE_READONLY 8, SQLITE_CANTOPEN 14, SQLITE_PERM 3, SQLITE_IOERR 10), in the
 * plain words of {@link StoreErrors}; file-system failures in the same cause chain are worded there.
 */
final class SqliteErrors {

    private SqliteErrors() {
    }

    /** What the failure means for the store at {@code file}, or null when it is none of the known kinds. */
    static String plain(Path file, Throwable failure) {
        for (Throwable t = failure; t != null; t = t.getCause()) {
            String found = switch (t) {
                case org.sqlite.SQLiteException s -> byCode(file, s.getResultCode().code & 0xFF);
                case SQLException s -> byCode(file, s.getErrorCode() & 0xFF);
                default -> StoreErrors.fromFileSystem(file, t);
            };
            if (found != null) {
                return found;
            }
        }
        return null;
    }

    private static String byCode(Path file, int primary) {
        if (primary == SQLiteErrorCode.SQLITE_FULL.code) {
            return StoreErrors.diskFull(file);
        }
        if (primary == SQLiteErrorCode.SQLITE_READONLY.code || primary == SQLiteErrorCode.SQLITE_PERM.code) {
            return StoreErrors.readOnly(file);
        }
        if (primary == SQLiteErrorCode.SQLITE_CANTOPEN.code) {
            return StoreErrors.cannotOpen(file);
        }
        if (primary == SQLiteErrorCode.SQLITE_IOERR.code) {
            return StoreErrors.inputOutput(file);
        }
        return null;
    }
}
