package org.inkgate.client.sitting.store;

import java.sql.Connection;
import java.sql.SQLException;

/** A read of the sitting database, run by the writer thread after everything queued before it is committed. */
@FunctionalInterface
interface StoreQuery<T> {

    /** Reads and returns the result. */
    T run(Connection c) throws SQLException;
}
