package org.inkgate.admin.core.store.sqlite;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * How writers and long readers share one store file (sqlite.org, "BEGIN TRANSACTION", "Write-Ahead
 * Logging"): a write transaction takes the write lock when it begins, so a second writer waits for the
 * first instead of failing at once with SQLITE_BUSY; a whole-store snapshot read (store copy, store
 * digest) takes no write lock, so writers go on while it reads.
 */
class SqliteWriterQueueTest {

    @TempDir
    Path dir;

    @Test
    void twoWritersThatBothReadFirst_theSecondWaitsForTheFirst() throws Exception {
        Path file = dir.resolve("queue.db");
        try (Connection setUp = SqliteFiles.connect(file, SqliteFiles.Durability.EVERY_COMMIT);
                Statement s = setUp.createStatement()) {
            s.execute("CREATE TABLE counter(n INTEGER NOT NULL)");
            s.execute("INSERT INTO counter VALUES (0)");
        }
        CountDownLatch bothRead = new CountDownLatch(2);
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            Future<?> first = pool.submit(() -> incrementAfterReading(file, bothRead));
            Future<?> second = pool.submit(() -> incrementAfterReading(file, bothRead));
            first.get(30, TimeUnit.SECONDS); // a deferred transaction upgrading to a writer failed here as busy
            second.get(30, TimeUnit.SECONDS);
        } finally {
            pool.shutdownNow();
        }
        try (Connection c = SqliteFiles.connect(file, SqliteFiles.Durability.EVERY_COMMIT);
                ResultSet rs = c.createStatement().executeQuery("SELECT n FROM counter")) {
            rs.next();
            assertEquals(2, rs.getInt(1), "both increments kept");
        }
    }

    private static Void incrementAfterReading(Path file, CountDownLatch bothRead) throws Exception {
        try (Connection c = SqliteFiles.connect(file, SqliteFiles.Durability.EVERY_COMMIT)) {
            SqliteDialect.INSTANCE.beginWrite(c);
            int n;
            try (ResultSet rs = c.createStatement().executeQuery("SELECT n FROM counter")) {
                rs.next();
                n = rs.getInt(1);
            }
            bothRead.countDown();
            // begun IMMEDIATE, only one gets here at a time, and the other waits at its BEGIN
            bothRead.await(300, TimeUnit.MILLISECONDS);
            c.createStatement().executeUpdate("UPDATE counter SET n = " + (n + 1));
            c.commit();
        }
        return null;
    }

    @Test
    void aWriterThatCommitted_holdsTheNextWriterBackNoLonger() throws Exception {
        // the driver begins a new transaction at once after a commit, in the connection's own mode:
        // that one must take no lock, or the next writer waits for a connection that writes nothing
        Path file = dir.resolve("after-commit.db");
        try (Connection first = SqliteFiles.connect(file, SqliteFiles.Durability.EVERY_COMMIT);
                Connection second = SqliteFiles.connect(file, SqliteFiles.Durability.EVERY_COMMIT)) {
            first.createStatement().execute("CREATE TABLE rows_seen(n INTEGER NOT NULL)");
            SqliteDialect.INSTANCE.beginWrite(first);
            first.createStatement().executeUpdate("INSERT INTO rows_seen VALUES (1)");
            first.commit(); // first stays out of auto-commit, as a session does until it switches back
            long before = System.nanoTime();
            SqliteDialect.INSTANCE.beginWrite(second);
            second.createStatement().executeUpdate("INSERT INTO rows_seen VALUES (2)");
            second.commit();
            long waitedMillis = TimeUnit.NANOSECONDS.toMillis(System.nanoTime() - before);
            assertTrue(waitedMillis < 5_000, "the second writer did not wait for the first (" + waitedMillis + " ms)");
            first.setAutoCommit(true);
            assertEquals(2, count(second));
        }
    }

    @Test
    void aSnapshotReadInProgress_doesNotHoldWritersBack() throws Exception {
        Path file = dir.resolve("snapshot.db");
        try (Connection setUp = SqliteFiles.connect(file, SqliteFiles.Durability.EVERY_COMMIT);
                Statement s = setUp.createStatement()) {
            s.execute("CREATE TABLE rows_seen(n INTEGER NOT NULL)");
            s.execute("INSERT INTO rows_seen VALUES (1)");
        }
        try (Connection reader = SqliteFiles.connect(file, SqliteFiles.Durability.EVERY_COMMIT);
                Connection writer = SqliteFiles.connect(file, SqliteFiles.Durability.EVERY_COMMIT)) {
            SqliteDialect.INSTANCE.beginSnapshot(reader);
            assertEquals(1, count(reader));
            long before = System.nanoTime();
            writer.setAutoCommit(false);
            writer.createStatement().executeUpdate("INSERT INTO rows_seen VALUES (2)");
            writer.commit();
            long waitedMillis = TimeUnit.NANOSECONDS.toMillis(System.nanoTime() - before);
            assertTrue(waitedMillis < 5_000, "the writer did not wait for the reader (" + waitedMillis + " ms)");
            assertEquals(1, count(reader), "the snapshot still sees the store as it was");
            reader.commit();
            assertEquals(2, count(reader));
        }
    }

    private static int count(Connection c) throws Exception {
        try (ResultSet rs = c.createStatement().executeQuery("SELECT COUNT(*) FROM rows_seen")) {
            rs.next();
            return rs.getInt(1);
        }
    }
}
