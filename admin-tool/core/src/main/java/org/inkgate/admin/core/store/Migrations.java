package org.inkgate.admin.core.store;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;

/**
 * The results store's schema, as forward migrations: migration n takes a store at version n-1 to
 * version n, inside one transaction, and records the version in {@code PRAGMA user_version}. A
 * store newer than this program is refused rather than guessed at.
 */
public final class Migrations {

    /** One step forward. */
    public record Migration(int version, String description, List<String> statements) {
    }

    static final List<Migration> ALL = List.of(
            new Migration(1, "exams, tasks, conditions, forms, policies, candidates, sittings, responses, events,"
                    + " rubric, raters, rating assignments, ratings, refusals", List.of(
                    """
                    CREATE TABLE exams (
                      exam_id TEXT PRIMARY KEY,
                      title TEXT NOT NULL,
                      language TEXT NOT NULL,
                      practice INTEGER NOT NULL CHECK (practice IN (0, 1))
                    )""",
                    """
                    CREATE TABLE bundles (
                      manifest_sha256 TEXT PRIMARY KEY,
                      exam_id TEXT NOT NULL REFERENCES exams(exam_id),
                      signer_fingerprint TEXT NOT NULL,
                      registered_at TEXT NOT NULL
                    )""",
                    """
                    CREATE TABLE tasks (
                      exam_id TEXT NOT NULL REFERENCES exams(exam_id),
                      task_id TEXT NOT NULL,
                      title TEXT NOT NULL,
                      time_limit_seconds INTEGER NOT NULL,
                      words_min INTEGER,
                      words_max INTEGER,
                      PRIMARY KEY (exam_id, task_id)
                    )""",
                    """
                    CREATE TABLE conditions (
                      exam_id TEXT NOT NULL REFERENCES exams(exam_id),
                      condition_id TEXT NOT NULL,
                      label TEXT NOT NULL,
                      PRIMARY KEY (exam_id, condition_id)
                    )""",
                    """
                    CREATE TABLE policy_snapshots (
                      policy_id INTEGER PRIMARY KEY,
                      policy_json TEXT NOT NULL UNIQUE,
                      spelling TEXT NOT NULL,
                      glossary_pack TEXT,
                      dictionary_pack TEXT,
                      insert_from_panel INTEGER NOT NULL,
                      show_word_count INTEGER NOT NULL,
                      paste TEXT NOT NULL
                    )""",
                    """
                    CREATE TABLE forms (
                      exam_id TEXT NOT NULL REFERENCES exams(exam_id),
                      form_id TEXT NOT NULL,
                      PRIMARY KEY (exam_id, form_id)
                    )""",
                    """
                    CREATE TABLE form_slots (
                      exam_id TEXT NOT NULL,
                      form_id TEXT NOT NULL,
                      position INTEGER NOT NULL,
                      task_id TEXT NOT NULL,
                      condition_id TEXT NOT NULL,
                      policy_id INTEGER NOT NULL REFERENCES policy_snapshots(policy_id),
                      PRIMARY KEY (exam_id, form_id, position),
                      FOREIGN KEY (exam_id, form_id) REFERENCES forms(exam_id, form_id),
                      FOREIGN KEY (exam_id, task_id) REFERENCES tasks(exam_id, task_id),
                      FOREIGN KEY (exam_id, condition_id) REFERENCES conditions(exam_id, condition_id)
                    )""",
                    """
                    CREATE TABLE candidates (
                      exam_id TEXT NOT NULL REFERENCES exams(exam_id),
                      candidate_number TEXT NOT NULL,
                      level TEXT,
                      first_language TEXT,
                      extra_time_percent INTEGER NOT NULL DEFAULT 0,
                      large_print INTEGER NOT NULL DEFAULT 0,
                      high_contrast INTEGER NOT NULL DEFAULT 0,
                      form_id TEXT,
                      PRIMARY KEY (exam_id, candidate_number),
                      FOREIGN KEY (exam_id, form_id) REFERENCES forms(exam_id, form_id)
                    )""",
                    """
                    CREATE TABLE candidate_personal (
                      exam_id TEXT NOT NULL,
                      candidate_number TEXT NOT NULL,
                      field TEXT NOT NULL,
                      value TEXT NOT NULL,
                      PRIMARY KEY (exam_id, candidate_number, field),
                      FOREIGN KEY (exam_id, candidate_number) REFERENCES candidates(exam_id, candidate_number)
                    )""",
                    """
                    CREATE TABLE sittings (
                      sitting_id INTEGER PRIMARY KEY,
                      package_sha256 TEXT NOT NULL UNIQUE,
                      package_id TEXT NOT NULL,
                      content_sha256 TEXT NOT NULL,
                      exam_id TEXT NOT NULL REFERENCES exams(exam_id),
                      bundle_manifest_sha256 TEXT NOT NULL REFERENCES bundles(manifest_sha256),
                      candidate_number TEXT NOT NULL,
                      form_id TEXT NOT NULL,
                      seat TEXT,
                      client_version TEXT,
                      installation_fingerprint TEXT NOT NULL,
                      started_at TEXT,
                      submitted_at TEXT,
                      source_file TEXT NOT NULL,
                      imported_at TEXT NOT NULL,
                      FOREIGN KEY (exam_id, form_id) REFERENCES forms(exam_id, form_id)
                    )""",
                    "CREATE INDEX sittings_by_candidate ON sittings(exam_id, candidate_number)",
                    "CREATE UNIQUE INDEX sittings_by_content ON sittings(package_id, content_sha256)",
                    """
                    CREATE TABLE responses (
                      sitting_id INTEGER NOT NULL REFERENCES sittings(sitting_id),
                      task_id TEXT NOT NULL,
                      position INTEGER NOT NULL,
                      condition_id TEXT NOT NULL,
                      policy_id INTEGER NOT NULL REFERENCES policy_snapshots(policy_id),
                      tools_offered TEXT NOT NULL,
                      text TEXT NOT NULL,
                      word_count INTEGER NOT NULL,
                      started_at TEXT,
                      ended_at TEXT,
                      extra_time_seconds INTEGER NOT NULL,
                      end_reason TEXT NOT NULL,
                      PRIMARY KEY (sitting_id, task_id)
                    )""",
                    """
                    CREATE TABLE tool_use (
                      sitting_id INTEGER NOT NULL,
                      task_id TEXT NOT NULL,
                      tool TEXT NOT NULL,
                      queries INTEGER NOT NULL,
                      empty_queries INTEGER NOT NULL,
                      entries_opened INTEGER NOT NULL,
                      suggestions_shown INTEGER NOT NULL,
                      suggestions_accepted INTEGER NOT NULL,
                      suggestions_ignored INTEGER NOT NULL,
                      insertions INTEGER NOT NULL,
                      PRIMARY KEY (sitting_id, task_id, tool),
                      FOREIGN KEY (sitting_id, task_id) REFERENCES responses(sitting_id, task_id)
                    )""",
                    """
                    CREATE TABLE process_events (
                      sitting_id INTEGER NOT NULL REFERENCES sittings(sitting_id),
                      seq INTEGER NOT NULL,
                      at TEXT NOT NULL,
                      mono INTEGER NOT NULL,
                      type TEXT NOT NULL,
                      task_id TEXT,
                      data_json TEXT NOT NULL,
                      PRIMARY KEY (sitting_id, seq)
                    ) WITHOUT ROWID""",
                    """
                    CREATE TABLE questionnaire_answers (
                      sitting_id INTEGER NOT NULL REFERENCES sittings(sitting_id),
                      questionnaire_id TEXT NOT NULL,
                      item_id TEXT NOT NULL,
                      value TEXT NOT NULL,
                      PRIMARY KEY (sitting_id, questionnaire_id, item_id)
                    )""",
                    """
                    CREATE TABLE rubric_criteria (
                      exam_id TEXT NOT NULL REFERENCES exams(exam_id),
                      criterion_id TEXT NOT NULL,
                      name TEXT NOT NULL,
                      min_score INTEGER NOT NULL,
                      max_score INTEGER NOT NULL CHECK (max_score >= min_score),
                      PRIMARY KEY (exam_id, criterion_id)
                    )""",
                    """
                    CREATE TABLE rubric_bands (
                      exam_id TEXT NOT NULL,
                      criterion_id TEXT NOT NULL,
                      from_score INTEGER NOT NULL,
                      to_score INTEGER NOT NULL,
                      descriptor TEXT NOT NULL,
                      PRIMARY KEY (exam_id, criterion_id, from_score),
                      FOREIGN KEY (exam_id, criterion_id) REFERENCES rubric_criteria(exam_id, criterion_id)
                    )""",
                    """
                    CREATE TABLE raters (
                      rater_id TEXT PRIMARY KEY,
                      label TEXT NOT NULL
                    )""",
                    """
                    CREATE TABLE rating_assignments (
                      assignment_id INTEGER PRIMARY KEY,
                      sitting_id INTEGER NOT NULL,
                      task_id TEXT NOT NULL,
                      rater_id TEXT NOT NULL REFERENCES raters(rater_id),
                      seed INTEGER NOT NULL,
                      created_at TEXT NOT NULL,
                      UNIQUE (sitting_id, task_id, rater_id),
                      FOREIGN KEY (sitting_id, task_id) REFERENCES responses(sitting_id, task_id)
                    )""",
                    """
                    CREATE TABLE ratings (
                      assignment_id INTEGER NOT NULL REFERENCES rating_assignments(assignment_id),
                      exam_id TEXT NOT NULL,
                      criterion_id TEXT NOT NULL,
                      score INTEGER NOT NULL,
                      rated_at TEXT NOT NULL,
                      PRIMARY KEY (assignment_id, criterion_id),
                      FOREIGN KEY (exam_id, criterion_id) REFERENCES rubric_criteria(exam_id, criterion_id)
                    )""",
                    """
                    CREATE TABLE refusals (
                      refusal_id INTEGER PRIMARY KEY,
                      file_sha256 TEXT NOT NULL,
                      source_file TEXT NOT NULL,
                      reason TEXT NOT NULL,
                      message TEXT NOT NULL,
                      first_seen_at TEXT NOT NULL,
                      UNIQUE (file_sha256, reason)
                    )""")),
            new Migration(2, "seeded form assignments recorded; tool-event view; conflicts view", List.of(
                    """
                    CREATE TABLE form_assignment_runs (
                      exam_id TEXT NOT NULL REFERENCES exams(exam_id),
                      seed INTEGER NOT NULL,
                      design TEXT NOT NULL,
                      recorded_at TEXT NOT NULL,
                      PRIMARY KEY (exam_id, seed)
                    )""",
                    """
                    CREATE VIEW tool_events AS
                      SELECT * FROM process_events
                      WHERE type LIKE 'tool.%' OR type LIKE 'suggestion.%'""",
                    """
                    CREATE VIEW response_conflicts AS
                      SELECT s.exam_id, s.candidate_number, r.task_id, COUNT(*) AS copies
                      FROM responses r JOIN sittings s ON s.sitting_id = r.sitting_id
                      GROUP BY s.exam_id, s.candidate_number, r.task_id
                      HAVING COUNT(*) > 1""")));

    private Migrations() {
    }

    /** The version this program writes and reads. */
    public static int latest() {
        return ALL.get(ALL.size() - 1).version();
    }

    public static int version(Connection c) throws SQLException {
        try (Statement s = c.createStatement(); var rs = s.executeQuery("PRAGMA user_version")) {
            return rs.getInt(1);
        }
    }

    /** Brings the store up to {@code target}, one transaction per migration. */
    public static void migrate(Connection c, int target) throws SQLException {
        int current = version(c);
        if (current > latest()) {
            throw new SQLException("the results store is at schema version " + current + ", newer than this program ("
                    + latest() + "); use a newer inkgate-admin. Nothing was changed");
        }
        boolean auto = c.getAutoCommit();
        c.setAutoCommit(false);
        try {
            for (Migration m : ALL) {
                if (m.version() <= current || m.version() > target) {
                    continue;
                }
                try (Statement s = c.createStatement()) {
                    for (String sql : m.statements()) {
                        s.execute(sql);
                    }
                    s.execute("PRAGMA user_version = " + m.version());
                    c.commit();
                } catch (SQLException e) {
                    c.rollback();
                    throw new SQLException("migration to schema version " + m.version() + " failed and was rolled back: "
                            + e.getMessage(), e);
                }
            }
        } finally {
            c.setAutoCommit(auto);
        }
    }
}
