package org.inkgate.admin.core.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** One test per migration: from the version before, with data in it, to the version after. */
class MigrationsTest {

    @TempDir
    Path dir;

    private static Set<String> objects(Connection c, String type) throws SQLException {
        Set<String> names = new TreeSet<>();
        try (Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT name FROM sqlite_master WHERE type='" + type + "' AND name NOT LIKE 'sqlite_%'")) {
            while (rs.next()) {
                names.add(rs.getString(1));
            }
        }
        return names;
    }

    private static String pragma(Connection c, String name) throws SQLException {
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("PRAGMA " + name)) {
            return rs.getString(1);
        }
    }

    @Test
    void migration1_emptyFile_createsTheTablesTheIssueNames_withForeignKeysAndWal() throws Exception {
        try (SqliteResultsStore store = SqliteResultsStore.open(dir.resolve("r.db"), 1)) {
            Connection c = store.connection();
            assertEquals(1, Migrations.version(c));
            assertEquals(Set.of("exams", "bundles", "tasks", "conditions", "policy_snapshots", "forms", "form_slots",
                    "candidates", "candidate_personal", "sittings", "responses", "tool_use", "process_events",
                    "questionnaire_answers", "rubric_criteria", "rubric_bands", "raters", "rating_assignments", "ratings",
                    "refusals"), objects(c, "table"));
            assertEquals("1", pragma(c, "foreign_keys"));
            assertEquals("wal", pragma(c, "journal_mode"));
            assertEquals("1", pragma(c, "synchronous"), "NORMAL is 1 (SQLite PRAGMA synchronous documentation)");
            try (Statement s = c.createStatement()) {
                SQLException e = assertThrows(SQLException.class, () -> s.execute(
                        "INSERT INTO tasks(exam_id, task_id, title, time_limit_seconds) VALUES ('nope', 't', 'x', 0)"));
                assertTrue(e.getMessage().contains("FOREIGN KEY"), e.getMessage());
            }
        }
    }

    @Test
    void migration2_storeAtVersion1WithData_keepsDataAndAddsAssignmentRunsAndViews() throws Exception {
        Path file = dir.resolve("r.db");
        try (SqliteResultsStore store = SqliteResultsStore.open(file, 1)) {
            try (Statement s = store.connection().createStatement()) {
                s.execute("INSERT INTO exams VALUES ('e1', 'Invented', 'en', 0)");
            }
            assertFalse(objects(store.connection(), "table").contains("form_assignment_runs"));
        }
        try (SqliteResultsStore store = SqliteResultsStore.open(file, 2)) {
            Connection c = store.connection();
            assertEquals(2, Migrations.version(c));
            assertTrue(objects(c, "table").contains("form_assignment_runs"));
            assertEquals(Set.of("tool_events", "response_conflicts"), objects(c, "view"));
            assertEquals(java.util.List.of("e1"), store.examIds());
            store.recordAssignmentRun("e1", 42, "latin-square");
            store.recordAssignmentRun("e1", 42, "latin-square");
        }
    }

    @Test
    void open_storeFromANewerProgram_isRefusedAndLeftAlone() throws Exception {
        Path file = dir.resolve("r.db");
        try (SqliteResultsStore store = SqliteResultsStore.open(file)) {
            try (Statement s = store.connection().createStatement()) {
                s.execute("PRAGMA user_version = 99");
            }
        }
        StoreException e = assertThrows(StoreException.class, () -> SqliteResultsStore.open(file));
        assertTrue(e.getMessage().contains("newer than this program"), e.getMessage());
        try (Connection c = java.sql.DriverManager.getConnection("jdbc:sqlite:" + file)) {
            assertEquals(99, Migrations.version(c));
        }
    }

    @Test
    void open_latest_isTheLastMigration() throws Exception {
        try (SqliteResultsStore store = SqliteResultsStore.open(dir.resolve("r.db"))) {
            assertEquals(Migrations.latest(), Migrations.version(store.connection()));
            assertEquals(2, Migrations.latest());
        }
    }
}
