package org.inkgate.admin.core.store.sqlite;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.util.List;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A new store opened to collect into is built aside and named only by keep (NewStoreFile); the answers come from
 * the file system and from SQLite itself (PRAGMA journal_mode). The whole collect through the real command line:
 * NewStoreAsideTest in the admin app.
 */
class NewStoreFileTest {

    @TempDir
    Path dir;

    private static String pragma(Path store, String name) throws Exception {
        try (var c = DriverManager.getConnection("jdbc:sqlite:" + store); ResultSet rs = c.createStatement()
                .executeQuery("PRAGMA " + name)) {
            rs.next();
            return rs.getString(1);
        }
    }

    private static boolean syncing() {
        return Thread.getAllStackTraces().keySet().stream().anyMatch(t -> t.getName().equals("inkgate-sync-incomplete"));
    }

    private List<String> files() throws Exception {
        try (var s = Files.list(dir)) {
            return s.map(f -> f.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void kept_theStoreHasItsNameAndTheWriteAheadLog_andNothingElseIsLeft() throws Exception {
        Path store = dir.resolve("results.db");
        try (ResultsStore s = Stores.openResultsToCollect(StoreLocation.file(store))) {
            assertEquals(List.of("results.db.incomplete"), files());
            assertTrue(syncing(), "the side file is synced along the way");
            s.keep();
            assertEquals(List.of("results.db"), files());
            assertFalse(syncing(), "the background sync outlived the naming");
        }
        assertEquals(List.of("results.db"), files());
        assertEquals("wal", pragma(store, "journal_mode"));
        assertEquals("ok", pragma(store, "integrity_check"));
    }

    @Test
    void closedWithoutKeep_leavesNothing() throws Exception {
        Path store = dir.resolve("results.db");
        try (ResultsStore s = Stores.openResultsToCollect(StoreLocation.file(store))) {
            assertTrue(s.importedPackageFiles().isEmpty());
        }
        assertEquals(List.of(), files());
        assertFalse(syncing());
    }

    @Test
    void aLeftoverSideFile_isRemovedBeforeTheBuild() throws Exception {
        Path store = dir.resolve("results.db");
        Files.writeString(dir.resolve("results.db.incomplete"), "what a killed collect left: not a database");
        Files.writeString(dir.resolve("results.db.incomplete-journal"), "and its journal");
        try (ResultsStore s = Stores.openResultsToCollect(StoreLocation.file(store))) {
            s.keep();
        }
        assertEquals(List.of("results.db"), files());
        assertEquals("ok", pragma(store, "integrity_check"));
    }

    @Test
    void aStoreThatExists_isWrittenInPlace() throws Exception {
        Path store = dir.resolve("results.db");
        Stores.openResults(StoreLocation.file(store)).close();
        try (ResultsStore s = Stores.openResultsToCollect(StoreLocation.file(store))) {
            assertFalse(Files.exists(dir.resolve("results.db.incomplete")));
            s.keep();
        }
        assertEquals("wal", pragma(store, "journal_mode"));
    }
}
