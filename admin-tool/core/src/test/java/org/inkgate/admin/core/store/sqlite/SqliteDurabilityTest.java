package org.inkgate.admin.core.store.sqlite;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.util.List;
import org.inkgate.admin.core.rating.InventedStore;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The SQLite stores' connection settings: what a killed process or a power cut can cost. */
class SqliteDurabilityTest {

    @TempDir
    Path dir;

    @Test
    void ratingStore_connection_isWriteAheadLogWithSynchronousFull() throws Exception {
        Path db = InventedStore.make(dir, 2, List.of("t1"));
        try (SqliteRatingStore s = SqliteRatingStore.open(db, InventedStore.EXAM)) {
            // a kill alone does not need FULL (the OS keeps what was written); a power cut does
            assertEquals(2, pragma(s.connection(), "synchronous"), "FULL is 2 (SQLite documentation, PRAGMA synchronous)");
            assertEquals("wal", pragmaText(s.connection(), "journal_mode"));
        }
    }

    @Test
    void resultsStore_connection_isWriteAheadLogWithSynchronousNormal() throws Exception {
        try (SqliteResultsStore s = SqliteResultsStore.open(dir.resolve("r.db"))) {
            assertEquals(1, pragma(s.connection(), "synchronous"), "NORMAL is 1 (SQLite documentation, PRAGMA synchronous)");
            assertEquals("wal", pragmaText(s.connection(), "journal_mode"));
        }
    }

    @Test
    void newResultsStore_has16KiBPages_andAStoreMadeWith4KiBKeepsThem() throws Exception {
        try (SqliteResultsStore s = SqliteResultsStore.open(dir.resolve("new.db"))) {
            assertEquals(16_384, pragma(s.connection(), "page_size"));
            assertEquals("wal", pragmaText(s.connection(), "journal_mode"));
        }
        Path old = dir.resolve("old.db");
        try (Connection c = java.sql.DriverManager.getConnection("jdbc:sqlite:" + old); var st = c.createStatement()) {
            st.execute("CREATE TABLE made_before(x)"); // SQLite's default pages (4,096 bytes since 3.12.0)
        }
        try (SqliteResultsStore s = SqliteResultsStore.open(old)) {
            assertEquals(4_096, pragma(s.connection(), "page_size"));
            assertEquals("wal", pragmaText(s.connection(), "journal_mode"));
        }
    }

    private static int pragma(Connection c, String name) throws SQLException {
        try (var st = c.createStatement(); var rs = st.executeQuery("PRAGMA " + name)) {
            return rs.getInt(1);
        }
    }

    private static String pragmaText(Connection c, String name) throws SQLException {
        try (var st = c.createStatement(); var rs = st.executeQuery("PRAGMA " + name)) {
            return rs.getString(1);
        }
    }
}
