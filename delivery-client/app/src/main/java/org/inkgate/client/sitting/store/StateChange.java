package org.inkgate.client.sitting.store;

import java.sql.Connection;
import java.sql.SQLException;

/**
 * A change to the sitting's durable state, applied by the log's writer thread in the same
 * transaction order as the events recorded before it, so state and log never disagree.
 */
@FunctionalInterface
interface StateChange {

    /** Applies the change; the writer commits it with its batch. */
    void apply(Connection c) throws SQLException;
}
