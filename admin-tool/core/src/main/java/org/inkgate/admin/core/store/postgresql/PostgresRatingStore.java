package org.inkgate.admin.core.store.postgresql;

import java.sql.Connection;
import java.sql.SQLException;
import java.time.Clock;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.rating.BlindIds;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.sql.Schema;
import org.inkgate.admin.core.store.sql.SqlRatingStore;
import org.inkgate.admin.core.store.sql.SqlSession;

/**
 * The rating store of one exam in a results store on a PostgreSQL server: the shared
 * {@link SqlRatingStore} on a connection of its own. Each rater's desk opens its own, so many raters
 * rate at once; transactions run at READ COMMITTED, and the steps that must not interleave take
 * locks (a submission its response's row, an assignment run the exam's advisory lock; see
 * {@link PostgresDialect} and docs/formats.md, "Isolation and locking"). A committed rating is on
 * the server's disk when the call returns (synchronous_commit on, PostgreSQL's default).
 */
public final class PostgresRatingStore extends SqlRatingStore {

    private PostgresRatingStore(Connection c, StoreLocation.Server server, Credentials login, String examId,
            Clock clock, BlindIds ids) throws RatingException, SQLException {
        super(c, new SqlSession.Errors<>(RatingException.class, RatingException::new,
                failure -> PostgresErrors.plain(server, login, failure)), PostgresDialect.INSTANCE, server.toString(),
                examId, clock, ids);
    }

    /** Opens rating of {@code examId} in the results store on the server (migrating its schema if older). */
    public static PostgresRatingStore open(StoreLocation.Server server, String examId, Clock clock, BlindIds ids)
            throws RatingException {
        return open(server, System.getenv(), examId, clock, ids);
    }

    static PostgresRatingStore open(StoreLocation.Server server, Map<String, String> env, String examId, Clock clock,
            BlindIds ids) throws RatingException {
        Credentials login = credentials(server, env);
        Connection c = connectToStore(server, login);
        try {
            Schema.migrate(c, PostgresDialect.INSTANCE, Schema.latest());
            return new PostgresRatingStore(c, server, login, examId, clock, ids);
        } catch (SQLException e) {
            closeQuietly(c);
            throw failure("cannot open the results store " + server + " for rating", server, login, e);
        } catch (RatingException e) {
            closeQuietly(c);
            throw e;
        }
    }

    /** The exams in the store on the server, to choose one when it holds several. */
    public static List<String> exams(StoreLocation.Server server) throws RatingException {
        Credentials login = credentials(server, System.getenv());
        try (Connection c = connectToStore(server, login)) {
            return SqlRatingStore.exams(c);
        } catch (SQLException e) {
            throw failure("cannot read the results store " + server, server, login, e);
        }
    }

    /** Whether the store on the server holds a rubric for the exam; false when the database holds no store. */
    public static boolean hasRubric(StoreLocation.Server server, String examId) throws RatingException {
        Credentials login = credentials(server, System.getenv());
        Connection c;
        try {
            c = PostgresResultsStore.connect(server, login);
        } catch (StoreException e) {
            throw new RatingException(e.getMessage(), e);
        }
        try (c) {
            return SqlRatingStore.hasRubric(c, PostgresDialect.INSTANCE, examId);
        } catch (SQLException e) {
            throw failure("cannot read the results store " + server, server, login, e);
        }
    }

    private static Credentials credentials(StoreLocation.Server server, Map<String, String> env) throws RatingException {
        try {
            return Credentials.of(server, env);
        } catch (StoreException e) {
            throw new RatingException(e.getMessage(), e);
        }
    }

    /** A connection to a database that holds a results store; an empty database is refused with what to do. */
    private static Connection connectToStore(StoreLocation.Server server, Credentials login) throws RatingException {
        Connection c;
        try {
            c = PostgresResultsStore.connect(server, login);
        } catch (StoreException e) {
            throw new RatingException(e.getMessage(), e);
        }
        try {
            if (PostgresDialect.INSTANCE.schemaVersion(c) == 0) {
                closeQuietly(c);
                throw new RatingException("no results store in " + server + " (the database holds none of its"
                        + " tables); give the store that collect wrote, or run  inkgate-admin collect  first");
            }
            return c;
        } catch (SQLException e) {
            closeQuietly(c);
            throw failure("cannot read the results store " + server, server, login, e);
        }
    }

    /** In plain words when known; a refused login never with the server's message. */
    private static RatingException failure(String what, StoreLocation.Server server, Credentials login,
            SQLException e) {
        String plain = PostgresErrors.plain(server, login, e);
        if (plain != null) {
            return new RatingException(what + ": " + plain, PostgresErrors.loginRefused(e) ? null : e);
        }
        return new RatingException(what + ": " + e.getMessage(), e);
    }

    private static void closeQuietly(Connection c) {
        try {
            c.close();
        } catch (SQLException ignored) {
            // the open failed already; that error is the one to report
        }
    }
}
