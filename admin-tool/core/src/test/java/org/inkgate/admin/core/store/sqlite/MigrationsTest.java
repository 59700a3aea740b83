package org.inkgate.admin.core.store.sqlite;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.store.StoreException;
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
    void migration3_storeAtVersion2WithAnOldRating_keepsItAndAddsRatingTables() throws Exception {
        Path file = dir.resolve("r.db");
        try (SqliteResultsStore store = SqliteResultsStore.open(file, 2)) {
            try (Statement s = store.connection().createStatement()) {
                s.execute("INSERT INTO exams VALUES ('e1', 'Invented', 'en', 0)");
                s.execute("INSERT INTO bundles VALUES ('b', 'e1', 'fp', 't')");
                s.execute("INSERT INTO policy_snapshots(policy_id, policy_json, spelling, insert_from_panel, show_word_count,"
                        + " paste) VALUES (1, '{}', 'off', 0, 0, 'allow')");
                s.execute("INSERT INTO forms VALUES ('e1', 'F')");
                s.execute("INSERT INTO sittings(sitting_id, package_sha256, package_id, content_sha256, exam_id,"
                        + " bundle_manifest_sha256, candidate_number, form_id, installation_fingerprint, source_file,"
                        + " imported_at) VALUES (1, 'p', 'P', 'c', 'e1', 'b', 'C1', 'F', 'i', 'f', 't')");
                s.execute("INSERT INTO responses(sitting_id, task_id, position, condition_id, policy_id, tools_offered, text,"
                        + " word_count, extra_time_seconds, end_reason) VALUES (1, 't1', 0, 'w', 1, '', 'x', 1, 0, 'done')");
                s.execute("INSERT INTO raters VALUES ('R1', 'Invented')");
                s.execute("INSERT INTO rating_assignments(assignment_id, sitting_id, task_id, rater_id, seed, created_at)"
                        + " VALUES (1, 1, 't1', 'R1', 7, 't')");
            }
        }
        try (SqliteResultsStore store = SqliteResultsStore.open(file, 3)) {
            Connection c = store.connection();
            assertEquals(3, Migrations.version(c));
            assertTrue(objects(c, "table").containsAll(Set.of("rating_runs", "rating_drafts", "rating_submissions",
                    "discrepancy_rules", "rating_flags", "resolution_entries", "final_scores")));
            try (Statement s = c.createStatement();
                    ResultSet rs = s.executeQuery("SELECT kind, blind_id, capacity FROM rating_assignments JOIN raters"
                            + " USING (rater_id)")) {
                assertTrue(rs.next());
                assertEquals("rating", rs.getString(1), "an earlier assignment is a first rating");
                assertEquals(null, rs.getString(2));
                assertEquals(null, rs.getObject(3), "no capacity: no limit");
                SQLException both = assertThrows(SQLException.class, () -> s.execute("INSERT INTO discrepancy_rules(exam_id,"
                        + " adjudicated_score, set_at) VALUES ('e1', 'adjudicator', 't')"));
                assertTrue(both.getMessage().contains("CHECK"), both.getMessage());
                s.execute("INSERT INTO raters VALUES ('R2', 'Invented', NULL), ('R3', 'Invented', 5)");
                s.execute("INSERT INTO rating_assignments(sitting_id, task_id, rater_id, seed, created_at, blind_id)"
                        + " VALUES (1, 't1', 'R2', 7, 't', 'AAAA-AAAA')");
                SQLException twice = assertThrows(SQLException.class, () -> s.execute("INSERT INTO rating_assignments("
                        + "sitting_id, task_id, rater_id, seed, created_at, blind_id) VALUES (1, 't1', 'R3', 7, 't', 'AAAA-AAAA')"));
                assertTrue(twice.getMessage().contains("UNIQUE"), "blind ids are unique: " + twice.getMessage());
            }
        }
    }

    @Test
    void migration4_storeAtVersion3WithAnAnswer_keepsItAndListsItWithoutADefinition() throws Exception {
        Path file = dir.resolve("r.db");
        try (SqliteResultsStore store = SqliteResultsStore.open(file, 3)) {
            try (Statement s = store.connection().createStatement()) {
                s.execute("INSERT INTO exams VALUES ('e1', 'Invented', 'en', 0)");
                s.execute("INSERT INTO bundles VALUES ('b', 'e1', 'fp', 't')");
                s.execute("INSERT INTO forms VALUES ('e1', 'F')");
                s.execute("INSERT INTO sittings(sitting_id, package_sha256, package_id, content_sha256, exam_id,"
                        + " bundle_manifest_sha256, candidate_number, form_id, installation_fingerprint, source_file,"
                        + " imported_at) VALUES (1, 'p', 'P', 'c', 'e1', 'b', 'C1', 'F', 'i', 'f', 't')");
                s.execute("INSERT INTO questionnaire_answers VALUES (1, 'after', 'q1', '2')");
            }
            assertFalse(objects(store.connection(), "table").contains("questionnaire_items"));
        }
        try (SqliteResultsStore store = SqliteResultsStore.open(file, 4)) {
            Connection c = store.connection();
            assertEquals(4, Migrations.version(c));
            assertTrue(objects(c, "table").contains("questionnaire_items"));
            java.util.List<Rows.QuestionnaireAnswer> rows = new java.util.ArrayList<>();
            store.forEachQuestionnaireAnswer("e1", rows::add);
            assertEquals(1, rows.size(), "an answer stored before its item was registered is still listed");
            Rows.QuestionnaireAnswer a = rows.get(0);
            assertEquals("q1", a.itemId());
            assertEquals("2", a.value());
            assertEquals(null, a.kind(), "no definition: the kind is not guessed");
        }
    }

    @Test
    void migration5_storeAtVersion4WithARating_keepsItAndTakesReferralsWithTheirChecks() throws Exception {
        Path file = dir.resolve("r.db");
        try (SqliteResultsStore store = SqliteResultsStore.open(file, 4)) {
            try (Statement s = store.connection().createStatement()) {
                s.execute("INSERT INTO exams VALUES ('e1', 'Invented', 'en', 0)");
                s.execute("INSERT INTO bundles VALUES ('b', 'e1', 'fp', 't')");
                s.execute("INSERT INTO forms VALUES ('e1', 'F')");
                s.execute("INSERT INTO policy_snapshots(policy_id, policy_json, spelling, insert_from_panel, show_word_count,"
                        + " paste) VALUES (1, '{}', 'off', 0, 0, 'allow')");
                s.execute("INSERT INTO sittings(sitting_id, package_sha256, package_id, content_sha256, exam_id,"
                        + " bundle_manifest_sha256, candidate_number, form_id, installation_fingerprint, source_file,"
                        + " imported_at) VALUES (1, 'p', 'P', 'c', 'e1', 'b', 'C1', 'F', 'i', 'f', 't')");
                s.execute("INSERT INTO responses(sitting_id, task_id, position, condition_id, policy_id, tools_offered, text,"
                        + " word_count, extra_time_seconds, end_reason) VALUES (1, 't1', 0, 'w', 1, '', 'x', 1, 0, 'done')");
                s.execute("INSERT INTO raters(rater_id, label) VALUES ('R1', 'R1')");
                s.execute("INSERT INTO rating_assignments(assignment_id, sitting_id, task_id, rater_id, seed, created_at,"
                        + " blind_id) VALUES (7, 1, 't1', 'R1', 1, 't', 'AAAA-AAAA')");
            }
            assertFalse(objects(store.connection(), "table").contains("referrals"));
        }
        try (SqliteResultsStore store = SqliteResultsStore.open(file, 5)) {
            Connection c = store.connection();
            assertEquals(5, Migrations.version(c));
            assertTrue(objects(c, "table").contains("referrals"));
            try (Statement s = c.createStatement()) {
                try (ResultSet rs = s.executeQuery("SELECT blind_id FROM rating_assignments WHERE assignment_id = 7")) {
                    assertEquals("AAAA-AAAA", rs.getString(1), "the assignment survives the migration");
                }
                s.execute("INSERT INTO referrals(assignment_id, rater_id, reason, note, referred_at)"
                        + " VALUES (7, 'R1', 'off-task', 'writes about something else', 't')");
                SQLException reason = assertThrows(SQLException.class, () -> s.execute("INSERT INTO referrals(assignment_id,"
                        + " rater_id, reason, note, referred_at) VALUES (7, 'R1', 'dislike', 'x', 't')"));
                assertTrue(reason.getMessage().contains("CHECK"), reason.getMessage());
                SQLException note = assertThrows(SQLException.class, () -> s.execute("INSERT INTO referrals(assignment_id,"
                        + " rater_id, reason, note, referred_at) VALUES (7, 'R1', 'other', '  ', 't')"));
                assertTrue(note.getMessage().contains("CHECK"), note.getMessage());
                SQLException dangling = assertThrows(SQLException.class, () -> s.execute("INSERT INTO referrals("
                        + "assignment_id, rater_id, reason, note, referred_at) VALUES (99, 'R1', 'other', 'x', 't')"));
                assertTrue(dangling.getMessage().contains("FOREIGN KEY"), dangling.getMessage());
            }
        }
    }

    @Test
    void migration6_storeAtVersion5WithAReferral_keepsItAndTakesControlScriptsOfExistingResponsesOnly() throws Exception {
        Path file = dir.resolve("r.db");
        migration5_storeAtVersion4WithARating_keepsItAndTakesReferralsWithTheirChecks();
        try (SqliteResultsStore store = SqliteResultsStore.open(file, 5)) {
            assertFalse(objects(store.connection(), "table").contains("control_scripts"));
        }
        try (SqliteResultsStore store = SqliteResultsStore.open(file, 6)) {
            Connection c = store.connection();
            assertEquals(6, Migrations.version(c));
            assertTrue(objects(c, "table").containsAll(Set.of("control_scripts", "control_assignments")));
            try (Statement s = c.createStatement()) {
                try (ResultSet rs = s.executeQuery("SELECT COUNT(*) FROM referrals")) {
                    assertEquals(1, rs.getInt(1), "the referral survives the migration");
                }
                s.execute("INSERT INTO control_scripts VALUES (1, 't1', '{}', 'invented meeting', 't')");
                s.execute("INSERT INTO control_assignments VALUES (7, 1, 't1')");
                SQLException dangling = assertThrows(SQLException.class, () -> s.execute(
                        "INSERT INTO control_scripts VALUES (1, 'no-such-task', '{}', 'x', 't')"));
                assertTrue(dangling.getMessage().contains("FOREIGN KEY"), dangling.getMessage());
            }
        }
    }

    @Test
    void migration7_storeAtVersion6WithATask_keepsItAndTakesItsPrompt() throws Exception {
        Path file = dir.resolve("r.db");
        migration6_storeAtVersion5WithAReferral_keepsItAndTakesControlScriptsOfExistingResponsesOnly();
        try (SqliteResultsStore store = SqliteResultsStore.open(file, 6)) {
            try (Statement s = store.connection().createStatement()) {
                s.execute("INSERT INTO tasks(exam_id, task_id, title, time_limit_seconds) VALUES ('e1', 't1', 'T', 60)");
            }
        }
        try (SqliteResultsStore store = SqliteResultsStore.open(file, 7)) {
            store.registerPrompts("e1", java.util.Map.of("t1", "Write about the invented harbour."));
            try (Statement s = store.connection().createStatement();
                    ResultSet rs = s.executeQuery("SELECT title, prompt FROM tasks WHERE task_id = 't1'")) {
                assertEquals("T", rs.getString(1), "the task survives the migration");
                assertEquals("Write about the invented harbour.", rs.getString(2));
            }
        }
    }

    @Test
    void migration10_storeAtVersion9WithEvents_keepsEveryValueInTheViewAndCountsThem() throws Exception {
        Path file = dir.resolve("r.db");
        migration6_storeAtVersion5WithAReferral_keepsItAndTakesControlScriptsOfExistingResponsesOnly();
        String awkward = "{\"text\":\"say \\\"hi\\\" \\\\ tab\\t \u00e9 \ud83d\ude00\"}";
        List<List<Object>> rows = List.of(
                Arrays.asList(2L, "2026-06-15T09:00:01Z", 1_000_000_000L, "text.insert", "t1", awkward),
                Arrays.asList(1L, "2026-06-15T09:00:00.123456789Z", 0L, "sitting.start", null, "{}"),
                Arrays.asList(3L, "2026-06-15T09:00:02Z", Long.MAX_VALUE, "tool.open", "t1", "{\"tool\":\"glossary\"}"));
        try (SqliteResultsStore store = SqliteResultsStore.open(file, 9)) {
            try (java.sql.PreparedStatement p = store.connection().prepareStatement(
                    "INSERT INTO process_events(sitting_id, seq, at, mono, type, task_id, data_json) VALUES (1,?,?,?,?,?,?)")) {
                for (List<Object> r : rows) {
                    for (int i = 0; i < r.size(); i++) {
                        p.setObject(i + 1, r.get(i));
                    }
                    p.execute();
                }
            }
        }
        try (SqliteResultsStore store = SqliteResultsStore.open(file, 10)) {
            Connection c = store.connection();
            assertTrue(objects(c, "table").contains("event_logs"));
            assertFalse(objects(c, "table").contains("process_events"));
            assertEquals(Set.of("process_events", "tool_events", "response_conflicts"), objects(c, "view"));
            List<List<Object>> viewed = new java.util.ArrayList<>();
            try (Statement s = c.createStatement();
                    ResultSet rs = s.executeQuery("SELECT sitting_id, seq, at, mono, type, task_id, data_json"
                            + " FROM process_events")) {
                while (rs.next()) {
                    assertEquals(1, rs.getLong(1));
                    viewed.add(Arrays.asList(rs.getLong(2), rs.getString(3), rs.getLong(4), rs.getString(5), rs.getString(6),
                            rs.getString(7)));
                }
            }
            assertEquals(List.of(rows.get(1), rows.get(0), rows.get(2)), viewed, "every value kept, in seq order");
            assertEquals(3L, store.counts().get("process_events"));
            try (Statement s = c.createStatement();
                    ResultSet rs = s.executeQuery("SELECT type FROM tool_events")) {
                assertTrue(rs.next());
                assertEquals("tool.open", rs.getString(1));
                assertFalse(rs.next());
            }
        }
    }

    @Test
    void eventLogChangedByAnotherProgram_isReportedWithItsCandidate_notAsAStackTrace() throws Exception {
        Path file = dir.resolve("r.db");
        migration6_storeAtVersion5WithAReferral_keepsItAndTakesControlScriptsOfExistingResponsesOnly();
        try (SqliteResultsStore store = SqliteResultsStore.open(file)) {
            try (Statement s = store.connection().createStatement()) {
                s.execute("INSERT INTO event_logs(sitting_id, event_count, events) VALUES (1, 1, '[[1,\"2026-06-15T09:00:00Z\"')");
            }
            StoreException e = assertThrows(StoreException.class, () -> store.forEachEvent("e1", event -> { }));
            assertTrue(e.getMessage().contains("the stored events of candidate C1 (package P) cannot be read"), e.getMessage());
            assertTrue(e.getMessage().contains("changed by another program"), e.getMessage());
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
            assertEquals(10, Migrations.latest(), "10: event logs");
        }
    }
}
