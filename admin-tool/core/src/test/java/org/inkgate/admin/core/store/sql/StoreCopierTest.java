package org.inkgate.admin.core.store.sql;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;
import org.inkgate.admin.core.store.StoreContent;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.sqlite.SqliteResultsStore;
import org.inkgate.admin.core.testutil.PostgresServer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The content digest's definition (docs/formats.md, "Store content digests") checked against a
 * digest computed outside the project, and the copy's refusal when a digest disagrees.
 */
class StoreCopierTest {

    /**
     * SHA-256 of the canonical text of the two-row table below, written by hand from the definition
     * and hashed with GNU coreutils' sha256sum (Debian), not by this code:
     * {@code printf 'exam_id,score,note\nN;N;T0:;\nT1:a;R3ff8000000000000;T6:h\xc3\xa9\x0alo;\n' | sha256sum}.
     * 1.5 is 0x3ff8000000000000 in IEEE 754 binary64; "hé\nlo" is 6 bytes in UTF-8.
     */
    private static final String BY_HAND = "1e8bb2c9ddbdf609e6f24826bafa1c97b58b4743a4c21862e4529ccb02f6d09a";

    @TempDir
    Path dir;

    @Test
    void tableDigest_sameOnSqliteAndPostgresql_asComputedByHand() throws Exception {
        try (Connection sqlite = DriverManager.getConnection("jdbc:sqlite:" + dir.resolve("d.db"))) {
            assertEquals(BY_HAND, digestOfSample(sqlite, "CREATE TABLE t (exam_id TEXT, score REAL, note TEXT)"));
        }
        try (Connection pg = DriverManager.getConnection(PostgresServer.freshDatabase("digest"))) {
            assertEquals(BY_HAND, digestOfSample(pg, "CREATE TABLE t (exam_id TEXT COLLATE \"C\", score DOUBLE PRECISION,"
                    + " note TEXT COLLATE \"C\")"));
        }
    }

    private static String digestOfSample(Connection c, String create) throws SQLException {
        try (Statement s = c.createStatement()) {
            s.execute(create);
            s.execute("INSERT INTO t VALUES ('a', 1.5, 'h\u00e9\nlo')"); // written first, sorted last
            s.execute("INSERT INTO t VALUES (NULL, NULL, '')");
            try (ResultSet rs = s.executeQuery(TableDigest.orderedSelect("t", 3))) {
                TableDigest d = new TableDigest(TableDigest.columnNames(rs.getMetaData()));
                while (rs.next()) {
                    d.add(rs);
                }
                assertEquals(2, d.rows());
                return d.hex();
            }
        }
    }

    @Test
    void schemaTables_everyTableOnce_referencedTablesFirst() {
        List<String> order = SchemaTables.inCopyOrder();
        assertEquals(order.size(), order.stream().distinct().count());
        for (String[] pair : new String[][] {{"exams", "sittings"}, {"sittings", "responses"}, {"rating_runs",
            "rating_assignments"}, {"rating_submissions", "ratings"}, {"qualification_scripts", "qualification_items"}}) {
            assertTrue(order.indexOf(pair[0]) >= 0 && order.indexOf(pair[0]) < order.indexOf(pair[1]),
                    pair[0] + " before " + pair[1] + ": " + order);
        }
        assertFalse(order.contains("tool_events"), "views are not copied");
    }

    /** A target whose rows change between writing and checking: the copy is refused and its new file removed. */
    @Test
    void copy_digestDisagrees_refusedAndTheNewTargetRemoved() throws Exception {
        Path source = dir.resolve("source.db");
        SqliteResultsStore.open(source).close();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + source); Statement s = c.createStatement()) {
            s.execute("INSERT INTO raters(rater_id, label) VALUES ('R01', 'Invented rater')");
        }
        Path target = dir.resolve("copy.db");
        CopyEnd from = SqliteResultsStore.copySource(source);
        CopyEnd honest = SqliteResultsStore.copyTarget(target);
        Dialect sqlite = honest.dialect();
        Dialect tampering = (Dialect) java.lang.reflect.Proxy.newProxyInstance(Dialect.class.getClassLoader(),
                new Class<?>[] {Dialect.class}, (proxy, method, args) -> {
                    if (method.getName().equals("resumeKeys")) {
                        try (Statement s = ((Connection) args[0]).createStatement()) {
                            s.execute("UPDATE raters SET label = 'changed on the way'");
                        }
                        return null;
                    }
                    return method.invoke(sqlite, args);
                });
        CopyEnd to = new CopyEnd(honest.name(), honest.connection(), tampering, honest.plain(), honest.undo());
        StoreException e = assertThrows(StoreException.class, () -> StoreCopier.copy(from, to, StoreContent.Progress.NONE));
        assertTrue(e.getMessage().contains("does not match") && e.getMessage().contains("raters (source 1 rows"),
                e.getMessage());
        assertFalse(Files.exists(target), "the file made for the copy is removed");
        from.connection().close();
        to.connection().close();
    }
}
