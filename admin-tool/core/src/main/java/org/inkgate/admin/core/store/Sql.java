package org.inkgate.admin.core.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;

/**
 * The few JDBC steps the SQLite stores all repeat: bind positional arguments, run, read rows. The
 * SQL itself stays in each store.
 */
public final class Sql {

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

    private Sql() {
    }

    /** Sets {@code args} as the statement's parameters 1..n. */
    public static void bind(PreparedStatement ps, Object... args) throws SQLException {
        for (int i = 0; i < args.length; i++) {
            ps.setObject(i + 1, args[i]);
        }
    }

    /** Runs an INSERT, UPDATE or DELETE; returns the rows changed. */
    public static int update(Connection c, String sql, Object... args) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(sql)) {
            bind(ps, args);
            return ps.executeUpdate();
        }
    }

    /** Runs an INSERT and returns the key it generated. */
    public static long insert(Connection c, String sql, Object... args) throws SQLException {
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
    public static void each(Connection c, String sql, RowSink sink, Object... args) throws SQLException {
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
    public static <T> List<T> list(Connection c, String sql, RowMapper<T> mapper, Object... args) throws SQLException {
        List<T> out = new ArrayList<>();
        each(c, sql, rs -> out.add(mapper.map(rs)), args);
        return out;
    }
}
