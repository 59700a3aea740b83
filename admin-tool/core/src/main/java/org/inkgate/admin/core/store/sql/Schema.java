package org.inkgate.admin.core.store.sql;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;

/**
 * The results store's schema, in one place for every dialect: forward migrations, where migration
 * n takes a store at version n-1 to version n inside one transaction. The statements are written in
 * SQLite's spelling (word for word what the SQLite stores were created with); each {@link Dialect}
 * rewrites the few type words its database spells otherwise ({@link Dialect#ddl}) and keeps the
 * version number its own way. A store newer than this program is refused rather than guessed at.
 */
public final class Schema {

    /** One step forward. */
    public record Migration(int version, String description, List<String> statements) {
    }

    public static final List<Migration> ALL = List.of(
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
                      HAVING COUNT(*) > 1""")),
            new Migration(3, "blind double rating: rater capacity, assignment runs, blind ids and queues, drafts,"
                    + " submission history, discrepancy rules, flags, resolution entries, final scores", List.of(
                    "ALTER TABLE raters ADD COLUMN capacity INTEGER CHECK (capacity IS NULL OR capacity >= 0)",
                    """
                    CREATE TABLE rating_runs (
                      run_id INTEGER PRIMARY KEY,
                      exam_id TEXT NOT NULL REFERENCES exams(exam_id),
                      seed INTEGER NOT NULL,
                      raters_per_response INTEGER NOT NULL CHECK (raters_per_response BETWEEN 1 AND 3),
                      raters TEXT NOT NULL,
                      responses INTEGER NOT NULL,
                      linked INTEGER NOT NULL CHECK (linked IN (0, 1)),
                      rater_groups TEXT NOT NULL,
                      created_at TEXT NOT NULL
                    )""",
                    "ALTER TABLE rating_assignments ADD COLUMN run_id INTEGER REFERENCES rating_runs(run_id)",
                    "ALTER TABLE rating_assignments ADD COLUMN blind_id TEXT",
                    "ALTER TABLE rating_assignments ADD COLUMN kind TEXT NOT NULL DEFAULT 'rating'"
                            + " CHECK (kind IN ('rating', 'adjudication'))",
                    "ALTER TABLE rating_assignments ADD COLUMN queue_position INTEGER",
                    "CREATE UNIQUE INDEX rating_assignments_by_blind_id ON rating_assignments(blind_id)",
                    "CREATE INDEX rating_assignments_by_rater ON rating_assignments(rater_id, queue_position)",
                    """
                    CREATE TABLE rating_drafts (
                      assignment_id INTEGER PRIMARY KEY REFERENCES rating_assignments(assignment_id),
                      scores_json TEXT NOT NULL,
                      comment TEXT NOT NULL,
                      saved_at TEXT NOT NULL
                    )""",
                    """
                    CREATE TABLE rating_submissions (
                      submission_id INTEGER PRIMARY KEY,
                      assignment_id INTEGER NOT NULL REFERENCES rating_assignments(assignment_id),
                      rater_id TEXT NOT NULL REFERENCES raters(rater_id),
                      scores_json TEXT NOT NULL,
                      comment TEXT NOT NULL,
                      submitted_at TEXT NOT NULL,
                      via TEXT NOT NULL
                    )""",
                    "CREATE INDEX rating_submissions_by_assignment ON rating_submissions(assignment_id, submission_id)",
                    "ALTER TABLE ratings ADD COLUMN submission_id INTEGER REFERENCES rating_submissions(submission_id)",
                    """
                    CREATE TABLE discrepancy_rules (
                      rule_id INTEGER PRIMARY KEY,
                      exam_id TEXT NOT NULL REFERENCES exams(exam_id),
                      max_criterion_band_gap INTEGER CHECK (max_criterion_band_gap IS NULL OR max_criterion_band_gap >= 0),
                      max_total_gap INTEGER CHECK (max_total_gap IS NULL OR max_total_gap >= 0),
                      adjudicated_score TEXT NOT NULL CHECK (adjudicated_score IN ('closest-pair-mean', 'adjudicator')),
                      set_at TEXT NOT NULL,
                      CHECK (max_criterion_band_gap IS NOT NULL OR max_total_gap IS NOT NULL)
                    )""",
                    """
                    CREATE TABLE rating_flags (
                      flag_id INTEGER PRIMARY KEY,
                      sitting_id INTEGER NOT NULL,
                      task_id TEXT NOT NULL,
                      rule_id INTEGER NOT NULL REFERENCES discrepancy_rules(rule_id),
                      reason TEXT NOT NULL,
                      flagged_at TEXT NOT NULL,
                      UNIQUE (sitting_id, task_id),
                      FOREIGN KEY (sitting_id, task_id) REFERENCES responses(sitting_id, task_id)
                    )""",
                    """
                    CREATE TABLE resolution_entries (
                      flag_id INTEGER NOT NULL REFERENCES rating_flags(flag_id),
                      criterion_id TEXT NOT NULL,
                      score INTEGER NOT NULL,
                      resolved_by TEXT NOT NULL,
                      comment TEXT NOT NULL,
                      resolved_at TEXT NOT NULL,
                      PRIMARY KEY (flag_id, criterion_id)
                    )""",
                    """
                    CREATE TABLE final_scores (
                      sitting_id INTEGER NOT NULL,
                      task_id TEXT NOT NULL,
                      criterion_id TEXT NOT NULL,
                      score REAL NOT NULL,
                      method TEXT NOT NULL,
                      rule_id INTEGER REFERENCES discrepancy_rules(rule_id),
                      basis TEXT NOT NULL,
                      decided_at TEXT NOT NULL,
                      PRIMARY KEY (sitting_id, task_id, criterion_id),
                      FOREIGN KEY (sitting_id, task_id) REFERENCES responses(sitting_id, task_id)
                    )""")),
            new Migration(4, "questionnaire definitions (items with kind and scale) and the questionnaires each form asks",
                    List.of(
                    """
                    CREATE TABLE questionnaire_items (
                      exam_id TEXT NOT NULL REFERENCES exams(exam_id),
                      questionnaire_id TEXT NOT NULL,
                      position INTEGER NOT NULL,
                      item_id TEXT NOT NULL,
                      kind TEXT NOT NULL,
                      text TEXT NOT NULL,
                      labels_json TEXT NOT NULL,
                      PRIMARY KEY (exam_id, questionnaire_id, item_id),
                      UNIQUE (exam_id, questionnaire_id, position)
                    )""",
                    """
                    CREATE TABLE form_questionnaires (
                      exam_id TEXT NOT NULL,
                      form_id TEXT NOT NULL,
                      timing TEXT NOT NULL CHECK (timing IN ('before', 'after')),
                      questionnaire_id TEXT NOT NULL,
                      PRIMARY KEY (exam_id, form_id, timing),
                      FOREIGN KEY (exam_id, form_id) REFERENCES forms(exam_id, form_id)
                    )""")),
            new Migration(5, "referrals: scripts a rater hands to the test owner, with reason, note and decision", List.of(
                    """
                    CREATE TABLE referrals (
                      referral_id INTEGER PRIMARY KEY,
                      assignment_id INTEGER NOT NULL REFERENCES rating_assignments(assignment_id),
                      rater_id TEXT NOT NULL REFERENCES raters(rater_id),
                      reason TEXT NOT NULL
                        CHECK (reason IN ('identity-revealed', 'unallowed-help', 'off-task', 'other')),
                      note TEXT NOT NULL CHECK (length(trim(note)) > 0),
                      referred_at TEXT NOT NULL,
                      decision TEXT,
                      decided_by TEXT,
                      decided_at TEXT,
                      CHECK ((decision IS NULL) = (decided_by IS NULL))
                    )""",
                    "CREATE INDEX referrals_by_assignment ON referrals(assignment_id)")),
            new Migration(6, "control scripts: responses with agreed scores mixed unannounced into raters' queues",
                    List.of(
                    """
                    CREATE TABLE control_scripts (
                      sitting_id INTEGER NOT NULL,
                      task_id TEXT NOT NULL,
                      agreed_scores_json TEXT NOT NULL,
                      source TEXT NOT NULL,
                      marked_at TEXT NOT NULL,
                      PRIMARY KEY (sitting_id, task_id),
                      FOREIGN KEY (sitting_id, task_id) REFERENCES responses(sitting_id, task_id)
                    )""",
                    """
                    CREATE TABLE control_assignments (
                      assignment_id INTEGER PRIMARY KEY REFERENCES rating_assignments(assignment_id),
                      sitting_id INTEGER NOT NULL,
                      task_id TEXT NOT NULL,
                      FOREIGN KEY (sitting_id, task_id) REFERENCES control_scripts(sitting_id, task_id)
                    )""")),
            new Migration(7, "task prompts, shown to raters beside the script",
                    List.of("ALTER TABLE tasks ADD COLUMN prompt TEXT")),
            new Migration(8, "the study design the exam's bundle declares (crossover, latin-square, parallel)",
                    List.of("ALTER TABLE exams ADD COLUMN design TEXT")),
            new Migration(9, "qualification set: scripts with agreed scores a rater passes before live rating opens",
                    List.of(
                    """
                    CREATE TABLE qualification_scripts (
                      sitting_id INTEGER NOT NULL,
                      task_id TEXT NOT NULL,
                      agreed_scores_json TEXT NOT NULL,
                      source TEXT NOT NULL,
                      marked_at TEXT NOT NULL,
                      PRIMARY KEY (sitting_id, task_id),
                      FOREIGN KEY (sitting_id, task_id) REFERENCES responses(sitting_id, task_id)
                    )""",
                    """
                    CREATE TABLE qualification_items (
                      item_id INTEGER PRIMARY KEY,
                      sitting_id INTEGER NOT NULL,
                      task_id TEXT NOT NULL,
                      rater_id TEXT NOT NULL REFERENCES raters(rater_id),
                      blind_id TEXT NOT NULL UNIQUE,
                      position INTEGER NOT NULL,
                      given_at TEXT NOT NULL,
                      UNIQUE (sitting_id, task_id, rater_id),
                      FOREIGN KEY (sitting_id, task_id) REFERENCES qualification_scripts(sitting_id, task_id)
                    )""",
                    """
                    CREATE TABLE qualification_ratings (
                      rating_id INTEGER PRIMARY KEY,
                      item_id INTEGER NOT NULL REFERENCES qualification_items(item_id),
                      scores_json TEXT NOT NULL,
                      comment TEXT NOT NULL,
                      submitted_at TEXT NOT NULL,
                      via TEXT NOT NULL
                    )""",
                    "CREATE INDEX qualification_ratings_by_item ON qualification_ratings(item_id)",
                    """
                    CREATE TABLE qualification_drafts (
                      item_id INTEGER PRIMARY KEY REFERENCES qualification_items(item_id),
                      scores_json TEXT NOT NULL,
                      comment TEXT NOT NULL,
                      saved_at TEXT NOT NULL
                    )""",
                    """
                    CREATE TABLE qualification_rules (
                      exam_id TEXT PRIMARY KEY REFERENCES exams(exam_id),
                      min_exact REAL CHECK (min_exact IS NULL OR min_exact BETWEEN 0 AND 1),
                      min_adjacent REAL CHECK (min_adjacent IS NULL OR min_adjacent BETWEEN 0 AND 1),
                      max_mean_difference REAL CHECK (max_mean_difference IS NULL OR max_mean_difference >= 0),
                      set_at TEXT NOT NULL
                    )""",
                    """
                    CREATE TABLE qualification_admissions (
                      exam_id TEXT NOT NULL REFERENCES exams(exam_id),
                      rater_id TEXT NOT NULL REFERENCES raters(rater_id),
                      admitted_by TEXT NOT NULL,
                      reason TEXT NOT NULL,
                      admitted_at TEXT NOT NULL,
                      PRIMARY KEY (exam_id, rater_id)
                    )""")),
            new Migration(10, "process events kept as one log per sitting (event_logs); process_events becomes a view"
                    + " over the logs with the same columns and values", List.of(
                    // the layout of each event's array is org.inkgate.admin.core.store.EventLog's
                    """
                    CREATE TABLE event_logs (
                      sitting_id INTEGER PRIMARY KEY REFERENCES sittings(sitting_id),
                      event_count INTEGER NOT NULL CHECK (event_count >= 0),
                      events TEXT NOT NULL
                    )""",
                    """
                    INSERT INTO event_logs(sitting_id, event_count, events)
                      SELECT sitting_id, COUNT(*),
                        json_group_array(json_array(seq, at, mono, type, task_id, data_json) ORDER BY seq)
                      FROM process_events GROUP BY sitting_id""",
                    "DROP VIEW tool_events",
                    "DROP TABLE process_events",
                    """
                    CREATE VIEW process_events AS
                      SELECT l.sitting_id AS sitting_id, CAST(e.value ->> 0 AS INTEGER) AS seq, e.value ->> 1 AS at,
                        CAST(e.value ->> 2 AS INTEGER) AS mono, e.value ->> 3 AS type, e.value ->> 4 AS task_id,
                        e.value ->> 5 AS data_json
                      FROM event_logs l, json_each(l.events) AS e""",
                    """
                    CREATE VIEW tool_events AS
                      SELECT * FROM process_events
                      WHERE type LIKE 'tool.%' OR type LIKE 'suggestion.%'""")));


    private static void apply(Connection c, Statement s, Dialect dialect, Migration m) throws SQLException {
        try {
            for (String sql : m.statements()) {
                s.execute(dialect.ddl(sql));
            }
            dialect.recordSchemaVersion(s, m.version());
            c.commit();
        } catch (SQLException e) {
            SQLException failed = new SQLException("migration to schema version " + m.version() + " failed and was"
                    + " rolled back: " + e.getMessage(), e);
            try {
                c.rollback();
            } catch (SQLException notOpen) {
                failed.addSuppressed(notOpen); // SQLite rolled back by itself (a full disk), see restore
            }
            throw failed;
        }
    }

    private Schema() {
    }

    /** The version this program writes and reads. */
    public static int latest() {
        return ALL.get(ALL.size() - 1).version();
    }

    /**
     * Brings the store up to {@code target}, one transaction per migration. Each transaction first
     * takes the dialect's schema lock and reads the version again under it, so two programs opening
     * a new server store at once migrate it once: the second finds the work done.
     */
    public static void migrate(Connection c, Dialect dialect, int target) throws SQLException {
        SchemaVersion.refuseNewer(dialect.schemaVersion(c), latest());
        boolean auto = c.getAutoCommit();
        c.setAutoCommit(false);
        SQLException failed = null;
        try {
            for (Migration m : ALL) {
                if (m.version() > target) {
                    break;
                }
                try (Statement s = c.createStatement()) {
                    dialect.lockSchema(s);
                    int current = dialect.schemaVersion(c);
                    if (current > latest() || m.version() <= current) {
                        c.commit(); // nothing written: ends the transaction and frees the lock
                        SchemaVersion.refuseNewer(current, latest()); // a newer program migrated meanwhile
                        continue;
                    }
                    apply(c, s, dialect, m);
                }
            }
        } catch (SQLException e) {
            failed = e;
            throw e;
        } finally {
            restore(c, auto, failed);
        }
    }

    /**
     * Puts the connection's auto-commit back. After a failed migration that may fail too (SQLite ends a transaction
     * on a full disk by itself, and then has none to commit): the migration's failure is the one to report, the
     * disk full in its causes, not "no transaction is active".
     */
    private static void restore(Connection c, boolean auto, SQLException failed) throws SQLException {
        try {
            c.setAutoCommit(auto);
        } catch (SQLException e) {
            if (failed == null) {
                throw e;
            }
            failed.addSuppressed(e);
        }
    }
}
