package org.inkgate.admin.core.store;

import java.io.IOException;
import java.nio.file.FileSystemException;
import java.nio.file.Path;

/**
 * Plain words for the store failures a person can act on: a full disk, read-only media, a file
 * that cannot be opened. The operating system reports these as "No space left on device" (ENOSPC)
 * or "Read-only file system" (EROFS); each kind of store adds its database's own codes (SQLite:
 * {@code store.sqlite.SqliteErrors}) and words them with the messages here, so no SQL message
 * reaches a person for these.
 */
public final class StoreErrors {

    private StoreErrors() {
    }

    /** What a file-system failure anywhere in the cause chain means for the store at {@code file}, or null. */
    public static String plain(Path file, Throwable failure) {
        for (Throwable t = failure; t != null; t = t.getCause()) {
            String found = fromFileSystem(file, t);
            if (found != null) {
                return found;
            }
        }
        return null;
    }

    /** What this one failure (not its causes) means when it is the file system's, or null. */
    public static String fromFileSystem(Path file, Throwable t) {
        return switch (t) {
            case FileSystemException f -> byReason(file, f.getReason());
            case IOException io -> byReason(file, io.getMessage());
            default -> null;
        };
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

    /** The store file cannot be opened at all. */
    public static String cannotOpen(Path file) {
        return "the results store " + file + " cannot be opened: its folder is missing, not readable, or not"
                + " writable for the store's journal. Check the path and your permissions";
    }

    /** The disk failed to read or write. */
    public static String inputOutput(Path file) {
        return "the disk holding the results store " + file + " failed to read or write (an input/output error:"
                + " a removed stick, a failing disk or a dropped share). Reconnect it and run the step again";
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
