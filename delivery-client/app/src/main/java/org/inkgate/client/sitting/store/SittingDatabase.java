package org.inkgate.client.sitting.store;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import org.sqlite.SQLiteConfig;

/**
 * The local database of one sitting: its process log, text snapshots and durable state, in one
 * SQLite file. Write-ahead log with {@code synchronous=FULL}: a committed transaction survives a
 * killed process and a power cut (SQLite documentation, "PRAGMA synchronous"). The layout is in
 * docs/formats.md ("The local sitting database").
 */
public final class SittingDatabase {

    /** Increased whenever the tables change; a client refuses a database newer than it knows. */
    public static final int SCHEMA_VERSION = 2;

    /** File name suffix of sitting databases. */
    public static final String SUFFIX = ".sitting.db";

    private static final String[] SCHEMA = {
        """
        CREATE TABLE IF NOT EXISTS events (
          seq INTEGER PRIMARY KEY,
          at TEXT NOT NULL,
          mono INTEGER NOT NULL,
          type TEXT NOT NULL,
          task TEXT,
          data TEXT NOT NULL)""",
        "CREATE INDEX IF NOT EXISTS events_task ON events(task, seq)",
        """
        CREATE TABLE IF NOT EXISTS snapshots (
          task TEXT PRIMARY KEY,
          text TEXT NOT NULL,
          caret INTEGER NOT NULL,
          after_seq INTEGER NOT NULL,
          at TEXT NOT NULL)""",
        """
        CREATE TABLE IF NOT EXISTS sitting (
          id INTEGER PRIMARY KEY CHECK (id = 1),
          sitting_id TEXT NOT NULL,
          bundle_sha256 TEXT NOT NULL,
          bundle_file TEXT NOT NULL,
          exam_id TEXT NOT NULL,
          candidate TEXT NOT NULL,
          form_id TEXT NOT NULL,
          seat TEXT NOT NULL,
          output_folder TEXT,
          client_version TEXT NOT NULL,
          extra_percent INTEGER NOT NULL,
          started_at TEXT NOT NULL,
          status TEXT NOT NULL,
          screen TEXT,
          current_task TEXT,
          sitting_used_ms INTEGER NOT NULL DEFAULT 0,
          sitting_added_ms INTEGER NOT NULL DEFAULT 0,
          paused INTEGER NOT NULL DEFAULT 0,
          checkpoint_at TEXT NOT NULL,
          package_id TEXT,
          submitted_at TEXT,
          local_copy TEXT,
          delivered_to TEXT)""",
        """
        CREATE TABLE IF NOT EXISTS tasks (
          task_id TEXT PRIMARY KEY,
          ord INTEGER NOT NULL,
          condition_id TEXT NOT NULL,
          policy TEXT NOT NULL,
          started_at TEXT,
          ended_at TEXT,
          end_reason TEXT,
          used_ms INTEGER NOT NULL DEFAULT 0,
          added_ms INTEGER NOT NULL DEFAULT 0,
          warned TEXT NOT NULL DEFAULT '',
          final_text TEXT,
          word_count INTEGER,
          tool_use TEXT)""",
        """
        CREATE TABLE IF NOT EXISTS answers (
          questionnaire_id TEXT NOT NULL,
          item_id TEXT NOT NULL,
          value TEXT NOT NULL,
          PRIMARY KEY (questionnaire_id, item_id))""",
    };

    private SittingDatabase() {
    }

    /**
     * Opens (creating if needed) the database at {@code file} with the durability settings above.
     * Refuses a database written by a newer client, naming the file.
     */
    public static Connection open(Path file) throws IOException {
        try {
            Files.createDirectories(file.toAbsolutePath().getParent());
            SQLiteConfig config = new SQLiteConfig();
            config.setJournalMode(SQLiteConfig.JournalMode.WAL);
            config.setSynchronous(SQLiteConfig.SynchronousMode.FULL);
            config.setBusyTimeout(5_000);
            Connection c = DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath(), config.toProperties());
            try (Statement s = c.createStatement()) {
                int version;
                try (var rs = s.executeQuery("PRAGMA user_version")) {
                    version = rs.getInt(1);
                }
                if (version > SCHEMA_VERSION) {
                    c.close();
                    throw new IOException(file + ": this sitting database was written by a newer client (layout "
                            + version + ", this client knows " + SCHEMA_VERSION + "). Continue the sitting on the"
                            + " newer client; do not delete the file, it holds the candidate's work.");
                }
                for (String sql : SCHEMA) {
                    s.execute(sql);
                }
                if (!hasColumn(c, "sitting", "output_folder")) {
                    // layout 1 (before the set-up's output folder was remembered): the column is added, empty
                    s.execute("ALTER TABLE sitting ADD COLUMN output_folder TEXT");
                }
                s.execute("PRAGMA user_version = " + SCHEMA_VERSION);
            }
            c.setAutoCommit(false);
            c.commit();
            return c;
        } catch (SQLException e) {
            throw new IOException(file + ": cannot open the sitting database: " + e.getMessage()
                    + ". Check that the client data folder is on a local, writable disk.", e);
        }
    }

    /** Whether a table has a column (a database of an earlier layout may not). */
    public static boolean hasColumn(Connection c, String table, String column) throws SQLException {
        try (Statement s = c.createStatement(); var rs = s.executeQuery("PRAGMA table_info(" + table + ")")) {
            while (rs.next()) {
                if (column.equals(rs.getString("name"))) {
                    return true;
                }
            }
        }
        return false;
    }
}
