package org.inkgate.admin.core.store.sql;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.BiFunction;
import java.util.function.Function;

/**
 * The one transaction and SQL layer every store shares: one JDBC connection, transactions that
 * are retried when the database is busy, reads, and typed row mapping. The SQL itself stays in
 * each store; this class is dialect-neutral (SQLite and PostgreSQL), so only the busy
 * test ({@link Busy}) knows both.
 *
 * <p>A store's own refusal inside a transaction travels as an {@link SQLException} whose cause is
 * the store's exception type ({@link #refusal}); it rolls the transaction back and reaches the
 * caller as itself, not as a database failure.
 *
 * @param <E> the exception the store's callers see (e.g. a results or rating store exception)
 */
public final class SqlSession<E extends Exception> implements AutoCloseable {

    /** Work done on the connection. */
    @FunctionalInterface
    public interface Work<T> {
        T run() throws SQLException;
    }

    /** Turns the current row into a value. */
    @FunctionalInterface
    public interface RowMapper<T> {
        T map(ResultSet rs) throws SQLException;
    }

    /** Takes the current row. */
    @FunctionalInterface
    public interface RowSink {
        void accept(ResultSet rs) throws SQLException;
    }

    /**
     * How a store's exception is made from a message and a database failure, and its type.
     * {@code plain} puts a failure a person can act on (a full disk, read-only media) in plain words,
     * or gives null to report the driver's own message.
     */
    public record Errors<E extends Exception>(Class<E> type, BiFunction<String, SQLException, E> make,
            Function<Throwable, String> plain) {

        public Errors(Class<E> type, BiFunction<String, SQLException, E> make) {
            this(type, make, failure -> null);
        }

        /** The store's exception: {@code what}, then the failure in plain words or as the driver says. */
        E of(String what, SQLException e) {
            String words = plain.apply(e);
            return make.apply(what + ": " + (words != null ? words : e.getMessage()), e);
        }
    }

    /** Attempts of a transaction that finds the database busy before its failure is reported. */
    static final int ATTEMPTS = 4;

    private final Connection c;
    private final Begin begin;
    private final Errors<E> errors;
    private final Runnable onRollback;

    /** How a write transaction begins on this session's connection. */
    private interface Begin {
        void on(Connection c) throws SQLException;
    }

    /**
     * @param dialect    begins the write transactions ({@link Dialect#beginWrite})
     * @param onRollback run after every rollback, e.g. to forget ids cached inside the transaction
     */
    public SqlSession(Connection c, Dialect dialect, Errors<E> errors, Runnable onRollback) {
        this(c, dialect::beginWrite, errors, onRollback);
    }

    public SqlSession(Connection c, Dialect dialect, Errors<E> errors) {
        this(c, dialect::beginWrite, errors, () -> { });
    }

    /** A session whose transactions begin as the driver begins them (reads, tests of the session itself). */
    public SqlSession(Connection c, Errors<E> errors, Runnable onRollback) {
        this(c, connection -> connection.setAutoCommit(false), errors, onRollback);
    }

    public SqlSession(Connection c, Errors<E> errors) {
        this(c, errors, () -> { });
    }

    private SqlSession(Connection c, Begin begin, Errors<E> errors, Runnable onRollback) {
        this.c = c;
        this.begin = begin;
        this.errors = errors;
        this.onRollback = onRollback;
    }

    /** The connection, for the store implementation that owns this session (and its tests). */
    public Connection connection() {
        return c;
    }

    /** An {@link SQLException} that carries a store's refusal out of a transaction, which it rolls back. */
    public static SQLException refusal(Exception refusal) {
        return new SQLException(refusal.getMessage(), refusal);
    }

    /**
     * Runs {@code work} in one transaction: all of it is kept, or none. When the database is busy
     * (another writer, see {@link Busy}) the whole work is rolled back and run again, a few times
     * with a growing pause, so the work must compute everything it writes inside itself.
     */
    public <T> T transaction(String what, Work<T> work) throws E {
        for (int attempt = 1; ; attempt++) {
            try {
                return once(work);
            } catch (SQLException e) {
                if (errors.type().isInstance(e.getCause())) {
                    throw errors.type().cast(e.getCause());
                }
                if (attempt < ATTEMPTS && Busy.is(e)) {
                    pause(attempt);
                    continue;
                }
                throw errors.of(what + " failed; nothing of it was stored", e);
            }
        }
    }

    private <T> T once(Work<T> work) throws SQLException {
        begin.on(c);
        boolean failed = false;
        try {
            T result = work.run();
            c.commit();
            return result;
        } catch (SQLException | RuntimeException e) {
            failed = true;
            try {
                c.rollback();
            } catch (SQLException alreadyRolledBack) {
                // SQLite rolls back by itself on a full disk or an I/O error (sqlite.org, "Response To
                // Errors Within A Transaction"); its "no transaction is active" must not hide the cause
                e.addSuppressed(alreadyRolledBack);
            }
            onRollback.run();
            throw e;
        } finally {
            try {
                c.setAutoCommit(true); // the driver commits here if it still thinks a transaction is open
            } catch (SQLException noTransaction) {
                if (!failed) {
                    throw noTransaction;
                } // after a failure the database may have ended the transaction itself: the cause is already thrown
            }
        }
    }

    private static void pause(int attempt) {
        try {
            Thread.sleep(50L * attempt);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    /** Runs a read outside a transaction. */
    public <T> T read(String what, Work<T> work) throws E {
        try {
            return work.run();
        } catch (SQLException e) {
            if (errors.type().isInstance(e.getCause())) {
                throw errors.type().cast(e.getCause());
            }
            throw errors.of(what + " failed", e);
        }
    }

    /** Sets {@code args} as the statement's parameters 1..n. */
    public static void bind(PreparedStatement ps, Object... args) throws SQLException {
        for (int i = 0; i < args.length; i++) {
            ps.setObject(i + 1, args[i]);
        }
    }

    /** Runs an INSERT, UPDATE or DELETE; returns the rows changed. */
    public int update(String sql, Object... args) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(sql)) {
            bind(ps, args);
            return ps.executeUpdate();
        }
    }

    /** Runs an INSERT and returns the key it generated (JDBC generated keys: SQLite and PostgreSQL both give them). */
    public long insert(String sql, Object... args) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(sql, Statement.RETURN_GENERATED_KEYS)) {
            bind(ps, args);
            ps.executeUpdate();
            try (ResultSet keys = ps.getGeneratedKeys()) {
                keys.next();
                return keys.getLong(1);
            }
        }
    }

    /** Hands every row of a query to {@code sink}. */
    public void each(String sql, RowSink sink, Object... args) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(sql)) {
            bind(ps, args);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    sink.accept(rs);
                }
            }
        }
    }

    /** Every row of a query, mapped. */
    public <T> List<T> list(String sql, RowMapper<T> mapper, Object... args) throws SQLException {
        List<T> out = new ArrayList<>();
        each(sql, rs -> out.add(mapper.map(rs)), args);
        return out;
    }

    /** The first row of a query, mapped, if there is one. */
    public <T> Optional<T> first(String sql, RowMapper<T> mapper, Object... args) throws SQLException {
        return list(sql, mapper, args).stream().findFirst();
    }

    /** Whether a query finds any row. */
    public boolean exists(String sql, Object... args) throws SQLException {
        return !list(sql, rs -> 1, args).isEmpty();
    }

    /** The integer in the first column of the first row (a COUNT). */
    public int count(String sql, Object... args) throws SQLException {
        return list(sql, rs -> rs.getInt(1), args).get(0);
    }

    /** A nullable integer column. */
    public static Integer intOrNull(ResultSet rs, int column) throws SQLException {
        int v = rs.getInt(column);
        return rs.wasNull() ? null : v;
    }

    @Override
    public void close() throws E {
        try {
            c.close();
        } catch (SQLException e) {
            throw errors.make().apply("closing the results store failed: " + e.getMessage(), e);
        }
    }
}
