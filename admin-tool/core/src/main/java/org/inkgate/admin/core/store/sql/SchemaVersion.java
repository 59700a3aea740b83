package org.inkgate.admin.core.store.sql;

import java.sql.SQLException;

/** The schema version check every store dialect makes before it touches a store. */
public final class SchemaVersion {

    private SchemaVersion() {
    }

    /** Refuses a store written by a newer program: its tables may mean something this one cannot know. */
    public static void refuseNewer(int found, int supported) throws SQLException {
        if (found > supported) {
            throw new SQLException("the results store is at schema version " + found + ", newer than this program ("
                    + supported + "); use a newer inkgate-admin. Nothing was changed");
        }
    }
}
