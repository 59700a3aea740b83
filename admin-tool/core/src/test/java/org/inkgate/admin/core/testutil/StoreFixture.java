package org.inkgate.admin.core.testutil;

import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import org.inkgate.admin.core.rating.BlindIds;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;

/**
 * Where a test's store is and how the test opens it: every store test opens its stores here,
 * through the same factory the programs use ({@link Stores}), never through an implementation.
 * The results store tests are parameterised over {@link #kinds()} ({@code @ParameterizedClass}), so
 * the same test bodies run against a SQLite file and against a database on the test PostgreSQL
 * server ({@link PostgresServer}, one server per test JVM, one fresh database per store).
 */
public record StoreFixture(Kind kind, StoreLocation location) {

    /** The kinds of store the tests can run against. */
    public enum Kind {
        /** A SQLite file in the test's temporary folder. */
        SQLITE,
        /** A fresh database on the test PostgreSQL server. */
        POSTGRESQL
    }

    /** Every kind, for parameterised tests ({@code @MethodSource}). */
    public static List<Kind> kinds() {
        return List.of(Kind.values());
    }

    /** A new, empty store of the given kind for a test whose temporary folder is {@code dir}. */
    public static StoreFixture create(Kind kind, Path dir) {
        return create(kind, dir, ResultsStore.DEFAULT_FILE_NAME);
    }

    /** As {@link #create(Kind, Path)}, a SQLite store taking the file name {@code name}. */
    public static StoreFixture create(Kind kind, Path dir, String name) {
        return switch (kind) {
            case SQLITE -> of(dir.resolve(name));
            case POSTGRESQL -> {
                try {
                    yield new StoreFixture(kind, PostgresServer.freshStore("results"));
                } catch (java.sql.SQLException e) {
                    throw new IllegalStateException("cannot make a database on the test PostgreSQL server: "
                            + e.getMessage(), e);
                }
            }
        };
    }

    /** Opens the store for the steps that only read it (export, missing). */
    public ResultsStore resultsForReading() throws StoreException {
        return Stores.openResultsForReading(location);
    }

    /** The SQLite store in {@code file} (made by the real collect or by a test's own builder). */
    public static StoreFixture of(Path file) {
        return new StoreFixture(Kind.SQLITE, StoreLocation.file(file));
    }

    /**
     * A plain JDBC connection to the store, for tests that write rows of their own or look behind
     * the stores' interfaces (the user {@code postgres} of the test server, trusted on loopback).
     */
    public java.sql.Connection connect() throws java.sql.SQLException {
        return switch (location) {
            case StoreLocation.File f -> java.sql.DriverManager.getConnection("jdbc:sqlite:" + f.path());
            case StoreLocation.Server s -> java.sql.DriverManager.getConnection("jdbc:postgresql://" + s.host() + ":"
                    + s.port() + "/" + s.database() + "?user=postgres");
        };
    }

    /** Opens the results store (created if new). */
    public ResultsStore results() throws StoreException {
        return Stores.openResults(location);
    }

    /** Opens rating of one exam. */
    public RatingStore rating(String examId) throws RatingException {
        return Stores.openRating(location, examId);
    }

    /** Opens rating of one exam with a fixed clock and blind ids, for tests that compare times or ids. */
    public RatingStore rating(String examId, Clock clock, BlindIds ids) throws RatingException {
        return Stores.openRating(location, examId, clock, ids);
    }
}
