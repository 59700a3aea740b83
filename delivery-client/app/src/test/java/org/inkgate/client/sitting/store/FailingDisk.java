package org.inkgate.client.sitting.store;

import java.util.function.BooleanSupplier;

/**
 * Test stand-in for a disk that refuses writes: a state change that fails while {@code broken}
 * holds, as SQLite does when the disk answers with an I/O error (SQLITE_IOERR). It lives in the
 * store package because only the store reaches the log's writer connection.
 */
public final class FailingDisk {

    private FailingDisk() {
    }

    /** Queues a write on the log that fails, and is retried by the writer, until {@code broken} turns false. */
    public static void refuseWritesWhile(SqliteProcessLog log, BooleanSupplier broken) {
        log.persist(c -> {
            if (broken.getAsBoolean()) {
                throw new java.sql.SQLException("disk I/O error (simulated)");
            }
        });
    }
}
