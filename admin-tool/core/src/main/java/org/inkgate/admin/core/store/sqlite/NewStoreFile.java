package org.inkgate.admin.core.store.sqlite;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.inkgate.format.io.AtomicFiles;
import org.inkgate.format.io.OwnerOnly;

/**
 * A new store file built under a side name, {@code <store>.incomplete}, and given its own name only when whole
 * (issue 16: a collect into a new store writes each page once, with no write-ahead log and no sync per package).
 * Nothing half-built ever carries the store's name: a collect that is killed leaves the side file, which the next
 * collect into that store removes before it starts over; Ctrl+C (and any orderly end of the program) removes it
 * at once. Whoever builds one holds the store's collect lock, so no one else touches the side file meanwhile.
 */
final class NewStoreFile {

    private final Path store;
    private final Path side;
    private final Thread removeOnExit;
    private Thread syncing;

    private static final long SYNC_STEP = 32L << 20;

    private NewStoreFile(Path store, Path side) {
        this.store = store;
        this.side = side;
        this.removeOnExit = new Thread(this::removeQuietly, "inkgate-remove-incomplete-store");
    }

    /** The side name a new store at {@code store} is built under. */
    static Path sideOf(Path store) {
        return store.resolveSibling(store.getFileName() + ".incomplete");
    }

    /** Whether {@code store} names nothing yet (not even a link), so a collect into it builds a new store aside. */
    static boolean isNew(Path store) {
        return !Files.exists(store, java.nio.file.LinkOption.NOFOLLOW_LINKS);
    }

    /** Removes what a killed build left, then makes the empty side file, owner-only. */
    static NewStoreFile begin(Path store) throws IOException {
        NewStoreFile file = new NewStoreFile(store, sideOf(store));
        file.remove();
        OwnerOnly.file(file.side);
        Runtime.getRuntime().addShutdownHook(file.removeOnExit);
        return file;
    }

    Path side() {
        return side;
    }

    /**
     * Starts handing what is written so far to the disk in the background, each time the file has grown by some tens
     * of megabytes: the sync before the naming then has little left to write (1,000 packages, some 650 MB: about
     * 0.3 s at the end otherwise). What a background sync writes is no promise of anything; the one before the
     * naming is.
     */
    void syncAlong() {
        Thread t = new Thread(() -> {
            try (java.nio.channels.FileChannel ch = java.nio.channels.FileChannel.open(side,
                    java.nio.file.StandardOpenOption.WRITE)) {
                long synced = 0;
                while (!Thread.currentThread().isInterrupted()) {
                    long size = ch.size();
                    if (size - synced >= SYNC_STEP) {
                        ch.force(false);
                        synced = size;
                    }
                    Thread.sleep(50);
                }
            } catch (IOException | InterruptedException stopped) {
                // the build ended (or its file is gone): the naming syncs what is left
            }
        }, "inkgate-sync-incomplete");
        t.setDaemon(true);
        t.start();
        syncing = t;
    }

    /** Gives the built file, its connection closed, the store's name; synced first, so the name holds all of it. */
    void name() throws IOException {
        stopSyncing();
        AtomicFiles.moveIntoPlace(side, store);
        forgetHook();
    }

    private void stopSyncing() {
        Thread t = syncing;
        if (t != null) {
            t.interrupt();
            try {
                t.join();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }

    /** Removes the side file: the build failed or was given up; the store's name was never given. */
    void discard() throws IOException {
        stopSyncing();
        forgetHook();
        remove();
    }

    private void remove() throws IOException {
        SqliteFiles.deleteWithCompanions(side);
    }

    private void removeQuietly() {
        try {
            remove();
        } catch (IOException ignored) {
            // the program is ending; the next collect into this store removes what is left
        }
    }

    private void forgetHook() {
        try {
            Runtime.getRuntime().removeShutdownHook(removeOnExit);
        } catch (IllegalStateException ending) {
            // the program is already ending: the hook runs, removing a side file only if one is still there
        }
    }
}
