package org.inkgate.admin.core.store.sql;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.concurrent.atomic.AtomicInteger;
import org.inkgate.admin.core.store.StoreException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sqlite.SQLiteConfig;

/** The shared transaction layer over a real SQLite file held by a second connection. */
class SqlSessionTest {

    private static final SqlSession.Errors<StoreException> ERRORS = new SqlSession.Errors<>(StoreException.class,
            StoreException::new);

    @TempDir
    Path dir;

    /** A connection that does not wait when the file is locked, so SQLite answers SQLITE_BUSY at once. */
    private Connection impatient(Path file) throws SQLException {
        SQLiteConfig config = new SQLiteConfig();
        config.setJournalMode(SQLiteConfig.JournalMode.WAL);
        config.setBusyTimeout(0);
        return DriverManager.getConnection("jdbc:sqlite:" + file, config.toProperties());
    }

    private Path table() throws SQLException {
        Path file = dir.resolve("t.db");
        try (Connection c = impatient(file); Statement s = c.createStatement()) {
            s.execute("CREATE TABLE t (n INTEGER)");
        }
        return file;
    }

    @Test
    void transaction_whileAnotherWriterHoldsTheFile_isRetriedAndStoredOnce() throws Exception {
        Path file = table();
        AtomicInteger attempts = new AtomicInteger();
        try (Connection other = impatient(file); Statement hold = other.createStatement();
                SqlSession<StoreException> session = new SqlSession<>(impatient(file), ERRORS)) {
            hold.execute("BEGIN IMMEDIATE");
            hold.execute("INSERT INTO t VALUES (1)");
            session.transaction("adding a row", () -> {
                // the other writer finishes only once the first attempt has met its lock: no timing to race
                if (attempts.incrementAndGet() == 2) {
                    hold.execute("COMMIT");
                }
                return session.update("INSERT INTO t VALUES (2)");
            });
            assertTrue(attempts.get() >= 2, "the first attempt met the other writer's lock: " + attempts.get());
            assertEquals(2, session.count("SELECT COUNT(*) FROM t"), "both rows, the retried one once");
        }
    }

    @Test
    void transaction_busyEveryTime_givesUpAfterTheLastAttemptAndSaysNothingWasStored() throws Exception {
        Path file = table();
        AtomicInteger attempts = new AtomicInteger();
        try (Connection other = impatient(file); Statement hold = other.createStatement();
                SqlSession<StoreException> session = new SqlSession<>(impatient(file), ERRORS)) {
            hold.execute("BEGIN IMMEDIATE");
            StoreException e = assertThrows(StoreException.class, () -> session.transaction("adding a row", () -> {
                attempts.incrementAndGet();
                return session.update("INSERT INTO t VALUES (2)");
            }));
            hold.execute("ROLLBACK");
            assertEquals(SqlSession.ATTEMPTS, attempts.get());
            assertTrue(e.getMessage().startsWith("adding a row failed; nothing of it was stored"), e.getMessage());
            assertEquals(0, session.count("SELECT COUNT(*) FROM t"));
        }
    }

    @Test
    void transaction_otherFailure_isNotRetriedAndRollsBack() throws Exception {
        Path file = table();
        AtomicInteger attempts = new AtomicInteger();
        AtomicInteger rollbacks = new AtomicInteger();
        try (SqlSession<StoreException> session = new SqlSession<>(impatient(file), ERRORS, rollbacks::incrementAndGet)) {
            assertThrows(StoreException.class, () -> session.transaction("adding rows", () -> {
                attempts.incrementAndGet();
                session.update("INSERT INTO t VALUES (1)");
                return session.update("INSERT INTO no_such_table VALUES (1)");
            }));
            assertEquals(1, attempts.get());
            assertEquals(1, rollbacks.get());
            assertEquals(0, session.count("SELECT COUNT(*) FROM t"), "the first row was rolled back too");
        }
    }

    @Test
    void transaction_storesOwnRefusal_reachesTheCallerAsItself() throws Exception {
        Path file = table();
        StoreException refusal = new StoreException("no such exam; check the exam id");
        try (SqlSession<StoreException> session = new SqlSession<>(impatient(file), ERRORS)) {
            StoreException e = assertThrows(StoreException.class, () -> session.transaction("checking", () -> {
                session.update("INSERT INTO t VALUES (1)");
                throw SqlSession.refusal(refusal);
            }));
            assertSame(refusal, e);
            assertEquals(0, session.count("SELECT COUNT(*) FROM t"));
        }
    }
}
