package org.inkgate.admin.core.collection;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.format.io.OwnerOnly;

/**
 * One collect at a time per results store: an operating-system lock on {@code <store>.collect-lock},
 * held for the whole run. A second collect into the same store is told another is running instead
 * of racing it into a constraint error. The lock goes with the process (even a killed one); the
 * small file stays beside the store and is reused.
 */
final class CollectLock implements AutoCloseable {

    private final FileChannel channel;
    private final FileLock lock;

    private CollectLock(FileChannel channel, FileLock lock) {
        this.channel = channel;
        this.lock = lock;
    }

    static Path lockFile(Path store) {
        return store.resolveSibling(store.getFileName() + ".collect-lock");
    }

    /** Takes the store's collect lock, or refuses saying another collect holds it. */
    static CollectLock acquire(Path store) throws IOException, StoreException {
        Path file = lockFile(store);
        FileChannel channel;
        try {
            OwnerOnly.file(file);
            channel = FileChannel.open(file, StandardOpenOption.WRITE);
        } catch (IOException e) {
            // the lock file is the first thing collect writes: read-only media or a full disk shows here
            String plain = org.inkgate.admin.core.store.StoreErrors.plain(store, e);
            if (plain == null) {
                throw e;
            }
            throw new StoreException(plain + ". Nothing was imported", e);
        }
        FileLock lock;
        try {
            lock = channel.tryLock();
        } catch (OverlappingFileLockException e) {
            lock = null; // held by this very process (two collects from one admin window)
        }
        if (lock == null) {
            channel.close();
            throw new StoreException("another collect is importing into " + store + " right now (it holds " + file
                    + "). Wait for it to finish, then run this collect again: it imports only what the other did not."
                    + " Nothing was imported by this one");
        }
        return new CollectLock(channel, lock);
    }

    @Override
    public void close() throws IOException {
        try {
            lock.release();
        } finally {
            channel.close();
        }
    }
}
