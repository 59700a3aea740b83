package org.inkgate.admin.core.store.sql;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.store.StoreContent;
import org.inkgate.admin.core.store.StoreException;

/**
 * Copies a whole results store into an empty one, table by table over plain JDBC, whichever
 * databases the two are ({@link SchemaTables}: every table of the schema, referenced tables first),
 * and proves the copy: each table's content digest ({@link TableDigest}) is taken from the source
 * (in the same snapshot the rows are read in) and from the target after they are written, inside the target's one
 * transaction; only when every digest agrees is that transaction committed. A disagreement or any
 * failure rolls it back, so the target never holds half a store. The source is read in one
 * snapshot ({@link Dialect#beginSnapshot}): collects writing into it meanwhile are not half seen.
 * Key values (sitting ids, assignment ids ...) are copied as they are, and the target's key
 * generators are moved past them ({@link Dialect#resumeKeys}).
 */
public final class StoreCopier {

    /** Rows sent to the target per batch. */
    private static final int BATCH = 500;

    private StoreCopier() {
    }

    /** Copies {@code from} into {@code to}, which must be empty; the contents both hold afterwards. */
    public static StoreContent copy(CopyEnd from, CopyEnd to, StoreContent.Progress progress) throws StoreException {
        boolean committed = false;
        try {
            int version = sourceVersion(from);
            requireEmptyTarget(to, version);
            Schema.migrate(to.connection(), to.dialect(), version);
            Connection target = to.connection();
            target.setAutoCommit(false);
            from.dialect().beginSnapshot(from.connection());
            List<String> tables = SchemaTables.inCopyOrder();
            Map<String, Long> counts = counts(from.connection(), tables);
            long total = counts.values().stream().mapToLong(Long::longValue).sum();
            List<StoreContent.Table> source = new ArrayList<>();
            long done = 0;
            for (String table : tables) {
                progress.rows(done, total, table);
                StoreContent.Table t = copyTable(from, target, table, done, total, progress);
                done += t.rows();
                source.add(t);
            }
            from.connection().commit(); // ends the read snapshot
            to.dialect().resumeKeys(target);
            List<StoreContent.Table> copied = digests(target, tables);
            List<String> differ = new ArrayList<>();
            for (int i = 0; i < tables.size(); i++) {
                if (!source.get(i).equals(copied.get(i))) {
                    differ.add(tables.get(i) + " (source " + source.get(i).rows() + " rows " + shortly(source.get(i))
                            + ", copy " + copied.get(i).rows() + " rows " + shortly(copied.get(i)) + ")");
                }
            }
            if (!differ.isEmpty()) {
                throw new StoreException("the copy in " + to.name() + " does not match " + from.name() + " in "
                        + String.join(", ", differ) + "; the copy was undone, " + to.name() + " holds nothing of it."
                        + " Nothing in " + from.name() + " was changed. Report this: it is a fault of inkgate-admin");
            }
            target.commit();
            committed = true;
            return new StoreContent(version, source);
        } catch (SQLException e) {
            String words = to.plain().apply(e);
            if (words == null) {
                words = from.plain().apply(e);
            }
            throw new StoreException("copying " + from.name() + " to " + to.name() + " failed: "
                    + (words != null ? words : e.getMessage()) + ". The copy was undone; " + to.name()
                    + " holds nothing of it and " + from.name() + " was not changed", e);
        } finally {
            if (!committed) {
                rollbackQuietly(to.connection());
                to.undo().run(); // removes a file created for the copy; an existing target is left as it was
            }
            rollbackQuietly(from.connection());
        }
    }

    /** The content digests of a store, read in one snapshot (e.g. to compare a backup with its source). */
    public static StoreContent content(CopyEnd store) throws StoreException {
        int version = sourceVersion(store);
        try {
            store.dialect().beginSnapshot(store.connection());
            return new StoreContent(version, digests(store.connection(), SchemaTables.inCopyOrder()));
        } catch (SQLException e) {
            String words = store.plain().apply(e);
            throw new StoreException("reading " + store.name() + " failed: " + (words != null ? words : e.getMessage()), e);
        } finally {
            rollbackQuietly(store.connection());
        }
    }

    private static int sourceVersion(CopyEnd from) throws StoreException {
        int version;
        try {
            version = from.dialect().schemaVersion(from.connection());
        } catch (SQLException e) {
            String words = from.plain().apply(e);
            throw new StoreException("cannot read " + from.name() + ": " + (words != null ? words : e.getMessage()), e);
        }
        if (version == 0) {
            throw new StoreException("no results store in " + from.name() + " (none of its tables); name the store"
                    + " that collect wrote");
        }
        if (version != Schema.latest()) {
            throw new StoreException(from.name() + " is at schema version " + version + ", this inkgate-admin writes "
                    + Schema.latest() + (version > Schema.latest()
                            ? "; copy it with the newer inkgate-admin that wrote it"
                            : "; open it once with this version (e.g. inkgate-admin missing --store ...), which brings"
                                    + " it up to date, then copy it")
                    + ". Nothing was changed");
        }
        return version;
    }

    /** A target at version 0 (no store), or at {@code version} with no row in any table. */
    private static void requireEmptyTarget(CopyEnd to, int version) throws SQLException, StoreException {
        int found = to.dialect().schemaVersion(to.connection());
        if (found == 0) {
            return;
        }
        if (found != version) {
            throw new StoreException(to.name() + " already holds a results store at schema version " + found
                    + ", the source is at " + version + "; copy into a new file or an empty database. Nothing was"
                    + " changed");
        }
        Map<String, Long> counts = counts(to.connection(), SchemaTables.inCopyOrder());
        long rows = counts.values().stream().mapToLong(Long::longValue).sum();
        if (rows > 0) {
            String where = counts.entrySet().stream().filter(e -> e.getValue() > 0).limit(3)
                    .map(e -> e.getKey() + " " + e.getValue()).reduce((a, b) -> a + ", " + b).orElse("");
            throw new StoreException(to.name() + " is not empty (" + rows + " rows: " + where + " ...); store copy"
                    + " copies into an empty store only, so that nothing is mixed. Name a new file, or ask the"
                    + " database administrator for a new, empty database; remove the old store only once you are"
                    + " sure it is not needed. Nothing was changed");
        }
    }

    private static Map<String, Long> counts(Connection c, List<String> tables) throws SQLException {
        Map<String, Long> out = new LinkedHashMap<>();
        try (Statement s = c.createStatement()) {
            for (String t : tables) {
                try (ResultSet rs = s.executeQuery("SELECT COUNT(*) FROM " + t)) {
                    rs.next();
                    out.put(t, rs.getLong(1));
                }
            }
        }
        return out;
    }

    /**
     * Writes the table's rows in the source's insertion order ({@link Dialect#insertionOrder}); the
     * digest is then taken of the source in the digest's own order, in the same snapshot.
     */
    private static StoreContent.Table copyTable(CopyEnd from, Connection to, String table, long doneBefore,
            long total, StoreContent.Progress progress) throws SQLException {
        try (PreparedStatement read = from.connection().prepareStatement("SELECT * FROM " + table
                + from.dialect().insertionOrder(from.connection(), table))) {
            read.setFetchSize(BATCH); // PostgreSQL streams the rows inside the transaction instead of holding them all
            try (ResultSet rs = read.executeQuery()) {
                List<String> columns = TableDigest.columnNames(rs.getMetaData());
                String insert = "INSERT INTO " + table + "(" + String.join(", ", columns) + ") VALUES ("
                        + String.join(", ", java.util.Collections.nCopies(columns.size(), "?")) + ")";
                try (PreparedStatement write = to.prepareStatement(insert)) {
                    int pending = 0;
                    long rows = 0;
                    while (rs.next()) {
                        Object[] values = new Object[columns.size()];
                        for (int i = 0; i < values.length; i++) {
                            values[i] = rs.getObject(i + 1);
                        }
                        SqlSession.bind(write, values);
                        write.addBatch();
                        rows++;
                        if (++pending == BATCH) {
                            write.executeBatch();
                            pending = 0;
                            progress.rows(doneBefore + rows, total, table);
                        }
                    }
                    if (pending > 0) {
                        write.executeBatch();
                    }
                }
            }
        }
        return digest(from.connection(), table);
    }

    private static List<StoreContent.Table> digests(Connection c, List<String> tables) throws SQLException {
        List<StoreContent.Table> out = new ArrayList<>();
        for (String table : tables) {
            out.add(digest(c, table));
        }
        return out;
    }

    private static StoreContent.Table digest(Connection c, String table) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(TableDigest.orderedSelect(table, columnCount(c, table)))) {
            ps.setFetchSize(BATCH);
            try (ResultSet rs = ps.executeQuery()) {
                TableDigest digest = new TableDigest(TableDigest.columnNames(rs.getMetaData()));
                while (rs.next()) {
                    digest.add(rs);
                }
                return new StoreContent.Table(table, digest.rows(), digest.hex());
            }
        }
    }

    private static int columnCount(Connection c, String table) throws SQLException {
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT * FROM " + table + " WHERE 1 = 0")) {
            return rs.getMetaData().getColumnCount();
        }
    }

    private static String shortly(StoreContent.Table t) {
        return t.sha256().substring(0, 12);
    }

    private static void rollbackQuietly(Connection c) {
        try {
            if (!c.getAutoCommit()) {
                c.rollback();
                c.setAutoCommit(true);
            }
        } catch (SQLException ignored) {
            // the failure being reported says more; the connection is closed next
        }
    }
}
