package org.inkgate.admin.core.store;

import java.time.Clock;
import java.util.List;
import org.inkgate.admin.core.rating.BlindIds;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.store.postgresql.PostgresRatingStore;
import org.inkgate.admin.core.store.postgresql.PostgresResultsStore;
import org.inkgate.admin.core.store.sql.CopyEnd;
import org.inkgate.admin.core.store.sql.StoreCopier;
import org.inkgate.admin.core.store.sqlite.SqliteRatingStore;
import org.inkgate.admin.core.store.sqlite.SqliteResultsStore;

/**
 * The one door to storage: opens the stores at a {@link StoreLocation} as core interfaces. The
 * command line and the admin window open every store here and never name an implementation: each
 * kind of store (a SQLite file, a PostgreSQL server) is one case in each method.
 */
public final class Stores {

    private Stores() {
    }

    /** Opens the results store, creating it when the file does not exist yet (collect), and migrates its schema. */
    public static ResultsStore openResults(StoreLocation location) throws StoreException {
        return switch (location) {
            case StoreLocation.File f -> SqliteResultsStore.open(f.path());
            case StoreLocation.Server s -> PostgresResultsStore.open(s);
        };
    }

    /**
     * Opens the results store for a collect, which holds its collect lock. A SQLite file that does not exist yet is
     * built beside its name and named by {@link ResultsStore#keep} when the collect is done (each page written once,
     * and nothing half-built ever has the name); otherwise as {@link #openResults}.
     */
    public static ResultsStore openResultsToCollect(StoreLocation location) throws StoreException {
        return switch (location) {
            case StoreLocation.File f -> SqliteResultsStore.openToCollect(f.path());
            case StoreLocation.Server s -> PostgresResultsStore.open(s);
        };
    }

    /**
     * Opens an existing results store for the steps that only read it (missing, export, analyse),
     * also where nothing may be written (a SQLite store on read-only media).
     */
    public static ResultsStore openResultsForReading(StoreLocation location) throws StoreException {
        return switch (location) {
            case StoreLocation.File f -> SqliteResultsStore.openReadOnly(f.path());
            case StoreLocation.Server s -> PostgresResultsStore.openForReading(s);
        };
    }

    /**
     * Copies the whole store at {@code from} into the empty store at {@code to} (a new file or an
     * empty database), verified table by table by content digests; refused, with nothing left in
     * {@code to}, when the target is not empty, the schema versions differ or a digest disagrees.
     */
    public static StoreContent copy(StoreLocation from, StoreLocation to, StoreContent.Progress progress)
            throws StoreException {
        if (from.equals(to) || from instanceof StoreLocation.File f && to instanceof StoreLocation.File t
                && f.path().toAbsolutePath().normalize().equals(t.path().toAbsolutePath().normalize())) {
            throw new StoreException("the store to copy from and the store to copy into are the same (" + from
                    + "); name a new file or an empty database as the target");
        }
        CopyEnd source = copySource(from);
        try {
            CopyEnd target = copyTarget(to);
            try {
                return StoreCopier.copy(source, target, progress);
            } finally {
                close(target);
            }
        } finally {
            close(source);
        }
    }

    /** The row counts and content digests of every table of the store at {@code location}; changes nothing. */
    public static StoreContent content(StoreLocation location) throws StoreException {
        CopyEnd store = copySource(location);
        try {
            return StoreCopier.content(store);
        } finally {
            close(store);
        }
    }

    private static CopyEnd copySource(StoreLocation location) throws StoreException {
        return switch (location) {
            case StoreLocation.File f -> SqliteResultsStore.copySource(f.path());
            case StoreLocation.Server s -> PostgresResultsStore.copyEnd(s);
        };
    }

    private static CopyEnd copyTarget(StoreLocation location) throws StoreException {
        return switch (location) {
            case StoreLocation.File f -> SqliteResultsStore.copyTarget(f.path());
            case StoreLocation.Server s -> PostgresResultsStore.copyEnd(s);
        };
    }

    /** Closes a copy end's connection; the copy's outcome is decided, a failing close changes nothing of it. */
    private static void close(CopyEnd end) {
        try {
            end.connection().close();
        } catch (java.sql.SQLException ignored) {
            // see above
        }
    }

    /** Opens rating of one exam in an existing results store. */
    public static RatingStore openRating(StoreLocation location, String examId) throws RatingException {
        return switch (location) {
            case StoreLocation.File f -> SqliteRatingStore.open(f.path(), examId);
            case StoreLocation.Server s -> PostgresRatingStore.open(s, examId, Clock.systemUTC(), new BlindIds());
        };
    }

    /** As {@link #openRating(StoreLocation, String)} with a given clock and blind ids (tests, reproducible demos). */
    public static RatingStore openRating(StoreLocation location, String examId, Clock clock, BlindIds ids)
            throws RatingException {
        return switch (location) {
            case StoreLocation.File f -> SqliteRatingStore.open(f.path(), examId, clock, ids);
            case StoreLocation.Server s -> PostgresRatingStore.open(s, examId, clock, ids);
        };
    }

    /** The exams in an existing store, to choose one when it holds several. */
    public static List<String> exams(StoreLocation location) throws RatingException {
        return switch (location) {
            case StoreLocation.File f -> SqliteRatingStore.exams(f.path());
            case StoreLocation.Server s -> PostgresRatingStore.exams(s);
        };
    }

    /** Whether the store holds a rubric for the exam (rating can be opened); false when there is no store. */
    public static boolean hasRubric(StoreLocation location, String examId) throws RatingException {
        return switch (location) {
            case StoreLocation.File f -> SqliteRatingStore.hasRubric(f.path(), examId);
            case StoreLocation.Server s -> PostgresRatingStore.hasRubric(s, examId);
        };
    }
}
