package org.inkgate.admin.core.store.sql;

import java.sql.SQLException;
import java.util.Set;

/**
 * Whether a failure means "another connection holds the database; try again", for the dialects
 * Inkgate stores in. A transaction that failed so was rolled back whole and may simply be rerun.
 */
public final class Busy {

    /**
     * SQLite result codes SQLITE_BUSY (5) and SQLITE_LOCKED (6); the driver may report an extended
     * code whose low byte is the primary one, e.g. SQLITE_BUSY_SNAPSHOT = 517, which the busy
     * timeout does not wait out (SQLite docs, "Result and Error Codes").
     */
    private static final Set<Integer> SQLITE_PRIMARY = Set.of(5, 6);

    /**
     * SQLSTATE 40001 serialization_failure and 40P01 deadlock_detected: PostgreSQL asks the client
     * to retry the transaction (PostgreSQL docs, Appendix A "Error Codes" and 13.2 "Transaction Isolation").
     */
    private static final Set<String> RETRY_STATES = Set.of("40001", "40P01");

    private Busy() {
    }

    public static boolean is(SQLException e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof SQLException s && (isRetryState(s.getSQLState()) || isSqliteBusy(s))) {
                return true;
            }
        }
        return false;
    }

    private static boolean isRetryState(String sqlState) {
        return sqlState != null && RETRY_STATES.contains(sqlState); // Set.of refuses to look up null
    }

    private static boolean isSqliteBusy(SQLException s) {
        // sqlite-jdbc reports the result code as the vendor code; other drivers' codes are not SQLite's
        return s.getClass().getName().startsWith("org.sqlite.") && SQLITE_PRIMARY.contains(s.getErrorCode() & 0xff);
    }
}
