package org.inkgate.admin.core.store;

import java.io.IOException;
import java.nio.file.FileSystemException;
import java.nio.file.Path;
import java.sql.SQLException;
import org.sqlite.SQLiteErrorCode;

/**
 * Plain words for the store failures a person can act on: a full disk, read-only media, a file
 * that cannot be opened. SQLite reports these as result codes (sqlite.org, "Result and Error
 * Codes": SQLITE_FULL 13, SQLITE_READONLY 8, SQLITE_CANTOPEN 14, SQLITE_PERM 3, SQLITE_IOERR 10);
 * the operating system as "No space left on device" (ENOSPC) or "Read-only file system" (EROFS).
 * Every store message passes through here, so no SQL message reaches a person for these.
 */
public final class StoreErrors {

    private StoreErrors() {
    }

    /** What the failure means for the store at {@code file}, or null when it is none of the known kinds. */
    public static String plain(Path file, Throwable failure) {
        for (Throwable t = failure; t != null; t = t.getCause()) {
            String found = switch (t) {
                case org.sqlite.SQLiteException s -> byCode(file, s.getResultCode().code & 0xFF);
                case SQLException s -> byCode(file, s.getErrorCode() & 0xFF);
                case FileSystemException f -> byReason(file, f.getReason());
                case IOException io -> byReason(file, io.getMessage());
                default -> null;
            };
            if (found != null) {
                return found;
            }
        }
        return null;
    }

    /** The disk holding the store is full. */
    public static String diskFull(Path file) {
        return "the disk holding the results store " + file + " is full. Free space on that disk (or name a store on"
                + " another disk with --store) and run the step again";
    }

    /** The store or its folder cannot be written. */
    public static String readOnly(Path file) {
        return "the results store " + file + " cannot be written: it is on read-only media (a locked card or disc, a"
                + " read-only share) or its file or folder is not writable for you. Steps that only read (missing,"
                + " export, analyse --store) work there; to collect, copy the store to writable storage";
    }

    private static String byCode(Path file, int primary) {
        if (primary == SQLiteErrorCode.SQLITE_FULL.code) {
            return diskFull(file);
        }
        if (primary == SQLiteErrorCode.SQLITE_READONLY.code || primary == SQLiteErrorCode.SQLITE_PERM.code) {
            return readOnly(file);
        }
        if (primary == SQLiteErrorCode.SQLITE_CANTOPEN.code) {
            return "the results store " + file + " cannot be opened: its folder is missing, not readable, or not"
                    + " writable for the store's journal. Check the path and your permissions";
        }
        if (primary == SQLiteErrorCode.SQLITE_IOERR.code) {
            return "the disk holding the results store " + file + " failed to read or write (an input/output error:"
                    + " a removed stick, a failing disk or a dropped share). Reconnect it and run the step again";
        }
        return null;
    }

    private static String byReason(Path file, String reason) {
        if (reason == null) {
            return null;
        }
        if (reason.contains("No space left on device") || reason.contains("not enough space")
                || reason.contains("Disk quota exceeded")) {
            return diskFull(file);
        }
        if (reason.contains("Read-only file system") || reason.contains("Permission denied")
                || reason.contains("Access is denied")) {
            return readOnly(file);
        }
        return null;
    }
}
