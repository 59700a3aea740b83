package org.inkgate.admin.core.store.sql;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;

/**
 * What one kind of database does its own way, and nothing else: the spelling of the schema's type
 * words, where the schema version is kept, and how migrators keep out of each other's way. The
 * schema ({@link Schema}) and the stores' queries ({@link SqlResultsStore}, {@link SqlRatingStore}) are written once, in SQL
 * that both SQLite and PostgreSQL read alike.
 */
public interface Dialect {

    /** The database's name, for messages. */
    String name();

    /** A statement of {@link Schema} (written in SQLite's spelling) as this database needs it. */
    String ddl(String statement);

    /** The store's schema version; 0 for a new, empty store. */
    int schemaVersion(Connection c) throws SQLException;

    /** Records the version reached, inside the migration's transaction. */
    void recordSchemaVersion(Statement s, int version) throws SQLException;

    /** Run first in each migration transaction: other migrators of the same store wait until it ends. */
    void lockSchema(Statement s) throws SQLException;

    /** Whether the store's database has the table (an empty database, a store of an older version). */
    boolean hasTable(Connection c, String table) throws SQLException;

    /**
     * An ORDER BY term giving the rows of a table keyed by text in the order they were first
     * inserted (the rubric's own order of its criteria).
     */
    String insertionOrder();

    /**
     * Run first in the transaction of an assignment run (or another step that reads a whole exam's
     * queues and then writes them): a second such run on the same exam waits until this one ends,
     * then sees what it stored, so two runs never interleave.
     */
    void lockAssignmentRuns(Statement s, String examId) throws SQLException;

    /**
     * Ends a SELECT inside a transaction so that the rows it finds stay locked against a second
     * writer of the same rows until the transaction ends; the second reads them after the first
     * committed. Empty where the database has one writer at a time anyway.
     */
    String lockRows();

    /**
     * Begins a transaction that writes ({@link SqlSession#transaction}). SQLite takes the write lock
     * at the start, so that a second writer waits for the first rather than failing; PostgreSQL
     * locks row by row as it goes ({@link #lockRows}).
     */
    default void beginWrite(Connection c) throws SQLException {
        c.setAutoCommit(false);
    }

    /**
     * Starts a read of the whole store that sees one state of it, however long it takes and whatever
     * others write meanwhile (a store copy, a store's content digests); the caller ends it with a
     * commit or rollback. SQLite: a transaction's first read fixes what it sees (write-ahead log).
     */
    default void beginSnapshot(Connection c) throws SQLException {
        c.setAutoCommit(false);
    }

    /**
     * The ORDER BY (or nothing) that reads a table's rows in the order they were written, where the
     * database keeps one, so that a copy writes them in the same order: SQLite's rubric order is its
     * insertion order (rowid). Nothing by default: the database's own scan order.
     */
    default String insertionOrder(Connection c, String table) throws SQLException {
        return "";
    }

    /**
     * After rows were written with their key values given (a store copy), moves the database's key
     * generators past them so that the next generated key is new. SQLite takes the largest key plus
     * one by itself.
     */
    default void resumeKeys(Connection c) throws SQLException {
    }
}
