package org.inkgate.admin.core.store.sql;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;

/**
 * What one kind of database does its own way, and nothing else: the spelling of the schema's type
 * words, where the schema version is kept, and how migrators keep out of each other's way. The
 * schema ({@link Schema}) and the stores' queries ({@link SqlResultsStore}) are written once, in SQL
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

    /**
     * Starts a read of the whole store that sees one state of it, however long it takes and whatever
     * others write meanwhile (a store copy, a store's content digests); the caller ends it with a
     * commit or rollback. SQLite: a transaction's first read fixes what it sees (write-ahead log).
     */
    default void beginSnapshot(Connection c) throws SQLException {
        c.setAutoCommit(false);
    }

    /**
     * After rows were written with their key values given (a store copy), moves the database's key
     * generators past them so that the next generated key is new. SQLite takes the largest key plus
     * one by itself.
     */
    /**
     * The ORDER BY (or nothing) that reads a table's rows in the order they were written, where the
     * database keeps one, so that a copy writes them in the same order: SQLite's rubric order is its
     * insertion order (rowid). Nothing by default: the database's own scan order.
     */
    default String insertionOrder(Connection c, String table) throws SQLException {
        return "";
    }

    default void resumeKeys(Connection c) throws SQLException {
    }
}
