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
}
