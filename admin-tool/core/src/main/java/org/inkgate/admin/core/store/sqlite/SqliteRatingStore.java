package org.inkgate.admin.core.store.sqlite;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.time.Clock;
import java.util.List;
import org.inkgate.admin.core.rating.BlindIds;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.store.sql.SqlRatingStore;

/**
 * The rating store of one exam in a SQLite results store file: the shared {@link SqlRatingStore}
 * on a connection of its own that uses the client's storage discipline (write-ahead log,
 * synchronous FULL): a draft or rating is on disk when a call returns, so a crash or power cut
 * loses nothing a rater saved. On read-only media the store opens for reading only.
 */
public final class SqliteRatingStore extends SqlRatingStore {

    private SqliteRatingStore(Connection c, Path file, String examId, Clock clock, BlindIds ids)
            throws RatingException, SQLException {
        super(c, SqliteDialect.INSTANCE, file.toString(), examId, clock, ids);
    }

    /** Opens rating of {@code examId} in an existing results store (migrating its schema if older). */
    public static SqliteRatingStore open(Path file, String examId) throws RatingException {
        return open(file, examId, Clock.systemUTC(), new BlindIds());
    }

    /** As {@link #open(Path, String)} with a given clock and blind id source (tests, reproducible demos). */
    public static SqliteRatingStore open(Path file, String examId, Clock clock, BlindIds ids) throws RatingException {
        requireFile(file);
        Connection c = null;
        try {
            if (ReadOnlyStore.writable(file)) {
                c = SqliteFiles.connect(file, SqliteFiles.Durability.EVERY_COMMIT);
                Migrations.migrate(c, Migrations.latest());
            } else {
                // read-only media: export and analyse read the ratings; any write is refused by SQLite
                c = ReadOnlyStore.connect(file);
            }
            return new SqliteRatingStore(c, file, examId, clock, ids);
        } catch (SQLException e) {
            SqliteFiles.closeQuietly(c);
            throw new RatingException("cannot open the results store " + file + " for rating: " + e.getMessage(), e);
        } catch (RatingException e) {
            SqliteFiles.closeQuietly(c);
            throw e;
        }
    }

    private static void requireFile(Path file) throws RatingException {
        if (!Files.isRegularFile(file)) {
            throw new RatingException("no results store at " + file + "; give the store that collect wrote");
        }
    }

    /** The exams in a store, to choose one when the store holds several. */
    public static List<String> exams(Path file) throws RatingException {
        requireFile(file);
        try (Connection c = SqliteFiles.connectForReading(file)) {
            return SqlRatingStore.exams(c);
        } catch (SQLException e) {
            throw new RatingException("cannot read the results store " + file + ": " + e.getMessage(), e);
        }
    }

    /** Whether the store holds a rubric for the exam, the precondition of {@link #open}; false when there is no store. */
    public static boolean hasRubric(Path file, String examId) throws RatingException {
        if (!Files.isRegularFile(file)) {
            return false;
        }
        try (Connection c = SqliteFiles.connectForReading(file)) {
            return SqlRatingStore.hasRubric(c, SqliteDialect.INSTANCE, examId);
        } catch (SQLException e) {
            throw new RatingException("cannot read the results store " + file + ": " + e.getMessage(), e);
        }
    }

    /** For tests of the connection's settings. */
    @Override
    protected Connection connection() {
        return super.connection();
    }
}
