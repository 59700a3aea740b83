package org.inkgate.admin.core.store.sql;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;

/**
 * The content digest of one table, the same whichever database holds it (docs/formats.md, "Store
 * content digests"): SHA-256 over the column names, then every row in the order of
 * {@link #orderedSelect}, each value rendered by its kind, not by how a database or driver prints it:
 *
 * <pre>
 *   header  = column names joined by "," then "\n"
 *   NULL    = "N;"
 *   integer = "I" decimal digits (with "-" when negative) ";"
 *   real    = "R" the 16 lower-case hex digits of its IEEE 754 binary64 bits ";"
 *   text    = "T" its length in UTF-8 bytes ":" its UTF-8 bytes ";"
 *   bytes   = "B" its length ":" the bytes in lower-case hex ";"
 *   row     = its values in column order, then "\n"
 * </pre>
 *
 * Text is length-prefixed, so no text, whatever characters it holds, can look like the end of a
 * value or a row.
 */
public final class TableDigest {

    private final MessageDigest sha;
    private final int columns;
    private long rows;

    /** A digest of rows with these columns, the header already taken in. */
    public TableDigest(List<String> columnNames) {
        try {
            this.sha = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java has SHA-256", e);
        }
        this.columns = columnNames.size();
        sha.update((String.join(",", columnNames) + "\n").getBytes(StandardCharsets.UTF_8));
    }

    /** The column names of a result, as the digest's header and the copy's insert name them (lower case). */
    public static List<String> columnNames(ResultSetMetaData meta) throws SQLException {
        List<String> names = new ArrayList<>();
        for (int i = 1; i <= meta.getColumnCount(); i++) {
            names.add(meta.getColumnName(i).toLowerCase(java.util.Locale.ROOT));
        }
        return names;
    }

    /**
     * Every row of {@code table}, sorted by every column in turn, NULL first: both databases compare
     * text byte by byte (SQLite's BINARY collation; PostgreSQL's COLLATE "C", which the store's
     * text columns have), so the order is the same in both.
     */
    public static String orderedSelect(String table, int columnCount) {
        StringBuilder sql = new StringBuilder("SELECT * FROM ").append(table).append(" ORDER BY ");
        for (int i = 1; i <= columnCount; i++) {
            sql.append(i == 1 ? "" : ", ").append(i).append(" NULLS FIRST");
        }
        return sql.toString();
    }

    /** Takes in the current row; returns its values as read, for a copy to write. */
    public Object[] add(ResultSet rs) throws SQLException {
        Object[] values = new Object[columns];
        StringBuilder row = new StringBuilder();
        for (int i = 0; i < columns; i++) {
            values[i] = rs.getObject(i + 1);
            render(values[i], row);
        }
        row.append('\n');
        sha.update(row.toString().getBytes(StandardCharsets.UTF_8));
        rows++;
        return values;
    }

    /** Renders one value by its kind (the class comment's rules). */
    static void render(Object v, StringBuilder out) {
        switch (v) {
            case null -> out.append("N;");
            case Long l -> out.append('I').append(l).append(';');
            case Integer n -> out.append('I').append(n).append(';');
            case Short n -> out.append('I').append(n).append(';');
            case Double d -> out.append('R').append(HexFormat.of().toHexDigits(Double.doubleToLongBits(d))).append(';');
            case Float f -> out.append('R').append(HexFormat.of().toHexDigits(Double.doubleToLongBits(f))).append(';');
            case String s -> out.append('T').append(s.getBytes(StandardCharsets.UTF_8).length).append(':').append(s)
                    .append(';');
            case byte[] b -> out.append('B').append(b.length).append(':').append(HexFormat.of().formatHex(b)).append(';');
            default -> throw new IllegalArgumentException("a store value of an unexpected kind: " + v.getClass().getName());
        }
    }

    public long rows() {
        return rows;
    }

    /** The digest in lower-case hex. */
    public String hex() {
        return HexFormat.of().formatHex(sha.digest());
    }
}
