package org.inkgate.admin.core.store.postgresql;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DatabaseMetaData;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.core.store.sql.Schema;
import org.inkgate.admin.core.testutil.PostgresServer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What only a server store has to get right, over the test PostgreSQL server: a store of a newer
 * schema is refused, a refused login is reported without the secret, several programs opening a
 * new store at once create it once, and the schema is the SQLite one, table by table and column
 * by column. (Everything a store answers is tested on both kinds by the parameterised store tests.)
 */
class PostgresResultsStoreTest {

    /** An invented password; the tests check it never appears in a message. */
    private static final String PASSWORD = "Invented-Pass-19";

    @TempDir
    Path dir;

    private static String jdbc(StoreLocation.Server s) {
        return "jdbc:postgresql://localhost:" + s.port() + "/" + s.database() + "?user=postgres";
    }

    @Test
    void open_storeOfANewerSchemaVersion_isRefusedAndLeftUnchanged() throws Exception {
        StoreLocation.Server server = PostgresServer.freshStore("newer");
        Stores.openResults(server).close();
        try (Connection c = DriverManager.getConnection(jdbc(server)); Statement s = c.createStatement()) {
            s.execute("UPDATE " + PostgresDialect.VERSION_TABLE + " SET version = 99");
        }
        StoreException e = assertThrows(StoreException.class, () -> Stores.openResults(server));
        assertTrue(e.getMessage().contains("schema version 99, newer than this program (" + Schema.latest() + ")"),
                e.getMessage());
        assertTrue(e.getMessage().contains("use a newer inkgate-admin"), e.getMessage());
        assertThrows(StoreException.class, () -> Stores.openResultsForReading(server));
        try (Connection c = DriverManager.getConnection(jdbc(server)); Statement s = c.createStatement();
                var rs = s.executeQuery("SELECT version FROM " + PostgresDialect.VERSION_TABLE)) {
            rs.next();
            assertEquals(99, rs.getInt(1), "nothing was changed");
        }
    }

    @Test
    void migration10_storeAtVersion9WithEvents_keepsEveryValueInTheView() throws Exception {
        StoreLocation.Server server = PostgresServer.freshStore("events9");
        PostgresResultsStore.open(server, Map.of(), 9, true).close();
        String awkward = "{\"text\":\"say \\\"hi\\\" \\\\ tab\\t \u00e9 \ud83d\ude00\"}";
        List<List<Object>> rows = List.of(
                java.util.Arrays.asList(2L, "2026-06-15T09:00:01Z", 1_000_000_000L, "text.insert", "t1", awkward),
                java.util.Arrays.asList(1L, "2026-06-15T09:00:00.123456789Z", 0L, "sitting.start", null, "{}"),
                java.util.Arrays.asList(3L, "2026-06-15T09:00:02Z", Long.MAX_VALUE, "tool.open", "t1", "{\"tool\":\"x\"}"));
        try (Connection c = DriverManager.getConnection(jdbc(server)); Statement s = c.createStatement()) {
            s.execute("INSERT INTO exams VALUES ('e1', 'Invented', 'en', 0)");
            s.execute("INSERT INTO bundles VALUES ('b', 'e1', 'fp', 't')");
            s.execute("INSERT INTO forms VALUES ('e1', 'F')");
            s.execute("INSERT INTO sittings(sitting_id, package_sha256, package_id, content_sha256, exam_id,"
                    + " bundle_manifest_sha256, candidate_number, form_id, installation_fingerprint, source_file,"
                    + " imported_at) VALUES (1, 'p', 'P', 'c', 'e1', 'b', 'C1', 'F', 'i', 'f', 't')");
            try (var p = c.prepareStatement("INSERT INTO process_events(sitting_id, seq, at, mono, type, task_id,"
                    + " data_json) VALUES (1,?,?,?,?,?,?)")) {
                for (List<Object> r : rows) {
                    for (int i = 0; i < r.size(); i++) {
                        p.setObject(i + 1, r.get(i));
                    }
                    p.execute();
                }
            }
        }
        PostgresResultsStore.open(server, Map.of(), 10, true).close();
        List<List<Object>> viewed = new ArrayList<>();
        try (Connection c = DriverManager.getConnection(jdbc(server)); Statement s = c.createStatement();
                var rs = s.executeQuery("SELECT sitting_id, seq, at, mono, type, task_id, data_json FROM process_events"
                        + " ORDER BY seq")) {
            while (rs.next()) {
                assertEquals(1, rs.getLong(1));
                viewed.add(java.util.Arrays.asList(rs.getLong(2), rs.getString(3), rs.getLong(4), rs.getString(5),
                        rs.getString(6), rs.getString(7)));
            }
        }
        assertEquals(List.of(rows.get(1), rows.get(0), rows.get(2)), viewed);
    }

    @Test
    void openForReading_databaseWithoutTheStore_isRefusedAndNothingIsCreated() throws Exception {
        StoreLocation.Server server = PostgresServer.freshStore("empty");
        StoreException e = assertThrows(StoreException.class, () -> Stores.openResultsForReading(server));
        assertTrue(e.getMessage().contains("no results store in " + server), e.getMessage());
        try (Connection c = DriverManager.getConnection(jdbc(server));
                var tables = c.getMetaData().getTables(null, "public", "%", new String[] {"TABLE"})) {
            assertFalse(tables.next(), "no table was created");
        }
    }

    @Test
    void open_wrongPassword_isRefusedInPlainWordsWithoutTheSecret_rightPasswordOpens() throws Exception {
        StoreLocation.Server server = PostgresServer.freshStore("login");
        PostgresServer.passwordRole("collector_19", PASSWORD, server.database());
        StoreLocation.Server asCollector = new StoreLocation.Server(server.host(), server.port(), server.database(),
                "collector_19", Map.of(), null);
        Path wrong = Files.writeString(dir.resolve("wrong.pgpass"), "localhost:*:*:collector_19:Not-" + PASSWORD + "\n");

        StoreException e = assertThrows(StoreException.class, () -> Stores.openResults(asCollector.withPasswordFile(wrong)));
        assertTrue(e.getMessage().contains("refused the login of collector_19 to " + server), e.getMessage());
        assertTrue(e.getMessage().contains("wrong password or no access"), e.getMessage());
        assertTrue(e.getMessage().contains("the password file " + wrong), "says where the password came from: "
                + e.getMessage());
        assertFalse(e.getMessage().contains(PASSWORD), "the secret is not echoed: " + e.getMessage());
        assertNull(e.getCause(), "the driver's own message is not kept either");

        StoreException none = assertThrows(StoreException.class, () -> PostgresResultsStore.open(asCollector, Map.of(),
                Schema.latest(), true));
        assertTrue(none.getMessage().contains("no password was given: set PGPASSWORD"), none.getMessage());

        StoreException fromEnv = assertThrows(StoreException.class, () -> PostgresResultsStore.open(asCollector,
                Map.of("PGPASSWORD", "Not-" + PASSWORD), Schema.latest(), true));
        assertTrue(fromEnv.getMessage().contains("the password came from PGPASSWORD"), fromEnv.getMessage());
        assertFalse(fromEnv.getMessage().contains(PASSWORD), fromEnv.getMessage());

        Path right = Files.writeString(dir.resolve("right.pgpass"), "# host:port:database:user:password\n"
                + "elsewhere:*:*:*:other\n*:" + server.port() + ":" + server.database() + ":collector_19:" + PASSWORD + "\n");
        try (ResultsStore store = Stores.openResults(asCollector.withPasswordFile(right))) {
            assertEquals(List.of(), store.examIds(), "a new store, its tables made by the role");
        }
        try (ResultsStore store = PostgresResultsStore.open(asCollector, Map.of("PGPASSWORD", PASSWORD), Schema.latest(),
                false)) {
            assertEquals(0L, store.counts().get("sittings"));
        }
    }

    @Test
    void open_severalProgramsAtOnceOnANewStore_createItOnce() throws Exception {
        StoreLocation.Server server = PostgresServer.freshStore("together");
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<Map<String, Long>>> opened = new ArrayList<>();
            for (int i = 0; i < 4; i++) {
                Callable<Map<String, Long>> open = () -> {
                    try (ResultsStore store = Stores.openResults(server)) {
                        return store.counts();
                    }
                };
                opened.add(pool.submit(open));
            }
            for (Future<Map<String, Long>> f : opened) {
                assertEquals(0L, f.get().get("exams"));
            }
        } finally {
            pool.shutdown();
        }
        try (Connection c = DriverManager.getConnection(jdbc(server)); Statement s = c.createStatement();
                var rs = s.executeQuery("SELECT COUNT(*), MAX(version) FROM " + PostgresDialect.VERSION_TABLE)) {
            rs.next();
            assertEquals(1, rs.getInt(1));
            assertEquals(Schema.latest(), rs.getInt(2));
        }
    }

    /** The two dialects' schemas, read back through JDBC metadata: the same tables, columns, nullability and keys. */
    @Test
    void schema_postgresqlAndSqlite_haveTheSameTablesColumnsAndKeys() throws Exception {
        StoreLocation.Server server = PostgresServer.freshStore("same");
        Stores.openResults(server).close();
        Path file = dir.resolve("results.db");
        Stores.openResults(StoreLocation.file(file)).close();
        Map<String, String> sqlite;
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file)) {
            sqlite = shape(c.getMetaData(), null);
        }
        Map<String, String> postgres;
        try (Connection c = DriverManager.getConnection(jdbc(server))) {
            postgres = shape(c.getMetaData(), "public");
        }
        postgres.remove(PostgresDialect.VERSION_TABLE); // SQLite keeps the version in PRAGMA user_version
        assertEquals(sqlite.keySet(), postgres.keySet());
        sqlite.forEach((table, columns) -> assertEquals(columns, postgres.get(table), table));
    }

    /**
     * Per table: its columns with nullability, then its primary key columns. A key column counts as
     * NOT NULL in both: SQLite lets a key that is not an INTEGER PRIMARY KEY hold NULL (sqlite.org,
     * CREATE TABLE, "a long-standing coding oversight"), PostgreSQL never; the store never writes one.
     */
    private static Map<String, String> shape(DatabaseMetaData meta, String schema) throws Exception {
        Map<String, String> out = new TreeMap<>();
        List<String> tables = new ArrayList<>();
        try (var rs = meta.getTables(null, schema, "%", new String[] {"TABLE"})) {
            while (rs.next()) {
                tables.add(rs.getString("TABLE_NAME"));
            }
        }
        for (String table : tables) {
            TreeSet<String> key = new TreeSet<>();
            try (var rs = meta.getPrimaryKeys(null, schema, table)) {
                while (rs.next()) {
                    key.add(rs.getString("COLUMN_NAME"));
                }
            }
            TreeSet<String> columns = new TreeSet<>();
            try (var rs = meta.getColumns(null, schema, table, "%")) {
                while (rs.next()) {
                    columns.add(rs.getString("COLUMN_NAME") + (rs.getInt("NULLABLE") == DatabaseMetaData.columnNoNulls
                            || key.contains(rs.getString("COLUMN_NAME")) ? " not null" : ""));
                }
            }
            out.put(table, columns + " key " + key);
        }
        return out;
    }
}
