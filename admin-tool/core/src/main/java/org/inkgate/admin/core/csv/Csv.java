package org.inkgate.admin.core.csv;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;

/**
 * Comma-separated values as RFC 4180 defines them: CRLF line ends, fields with commas, quotes or
 * line breaks enclosed in double quotes, a quote inside written twice. Reading also accepts LF
 * line ends and a UTF-8 byte order mark, which spreadsheet programs write.
 */
public final class Csv {

    private Csv() {
    }

    /** One parsed record with the line its first field started on. */
    public record Row(int line, List<String> fields) {
    }

    /** Thrown for text that is not CSV: names the line and what to fix. */
    public static final class CsvSyntaxException extends Exception {
        private final int line;

        CsvSyntaxException(int line, String message) {
            super(message);
            this.line = line;
        }

        public int line() {
            return line;
        }
    }

    /**
     * A hint for a header that is one field holding semicolons: a spreadsheet set to a language
     * whose decimal mark is the comma saved the file with semicolons. Empty when the header is fine.
     */
    public static String semicolonHint(List<String> header) {
        if (header.size() == 1 && header.get(0).contains(";")) {
            return ". The file is separated by semicolons, not commas: save it again as CSV with commas as separators"
                    + " (in the spreadsheet: \"CSV (comma-separated)\", or a field delimiter of \",\").";
        }
        return "";
    }

    public static List<Row> parse(String text) throws CsvSyntaxException {
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        List<Row> rows = new ArrayList<>();
        List<String> fields = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        int line = 1;
        int rowLine = 1;
        int i = 0;
        int n = text.length();
        boolean quoted = false;
        boolean fieldStarted = false;
        while (i < n) {
            char ch = text.charAt(i);
            if (quoted) {
                if (ch == '"') {
                    if (i + 1 < n && text.charAt(i + 1) == '"') {
                        field.append('"');
                        i += 2;
                        continue;
                    }
                    quoted = false;
                    i++;
                    if (i < n && text.charAt(i) != ',' && text.charAt(i) != '\r' && text.charAt(i) != '\n') {
                        throw new CsvSyntaxException(line, "a quoted field is followed by \"" + text.charAt(i)
                                + "\"; a closing quote must be followed by a comma or the end of the line");
                    }
                    continue;
                }
                if (ch == '\n') {
                    line++;
                }
                field.append(ch);
                i++;
                continue;
            }
            switch (ch) {
                case '"' -> {
                    if (fieldStarted && field.length() > 0) {
                        throw new CsvSyntaxException(line, "a quote inside an unquoted field; enclose the whole field in"
                                + " double quotes and write each quote in it twice");
                    }
                    quoted = true;
                    fieldStarted = true;
                    i++;
                }
                case ',' -> {
                    fields.add(field.toString());
                    field.setLength(0);
                    fieldStarted = true;
                    i++;
                }
                case '\r', '\n' -> {
                    fields.add(field.toString());
                    field.setLength(0);
                    if (!(fields.size() == 1 && fields.get(0).isEmpty())) {
                        rows.add(new Row(rowLine, List.copyOf(fields)));
                    }
                    fields.clear();
                    fieldStarted = false;
                    i += (ch == '\r' && i + 1 < n && text.charAt(i + 1) == '\n') ? 2 : 1;
                    line++;
                    rowLine = line;
                }
                default -> {
                    field.append(ch);
                    fieldStarted = true;
                    i++;
                }
            }
        }
        if (quoted) {
            throw new CsvSyntaxException(rowLine, "a quoted field is never closed; add the closing double quote");
        }
        if (fieldStarted || field.length() > 0 || !fields.isEmpty()) {
            fields.add(field.toString());
            rows.add(new Row(rowLine, List.copyOf(fields)));
        }
        return rows;
    }

    /**
     * Writes one record, quoting only fields that need it, ended by CRLF (RFC 4180 section 2); through
     * a {@link SpreadsheetSafe#writer}, each cell is made spreadsheet-safe first.
     */
    public static void writeRow(Writer out, List<String> fields) throws IOException {
        boolean safe = out instanceof SpreadsheetSafe.Marked;
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                out.write(',');
            }
            out.write(escape(safe ? SpreadsheetSafe.cell(fields.get(i)) : fields.get(i)));
        }
        out.write("\r\n");
    }

    public static String escape(String value) {
        if (value == null) {
            return "";
        }
        boolean needs = value.indexOf(',') >= 0 || value.indexOf('"') >= 0 || value.indexOf('\r') >= 0
                || value.indexOf('\n') >= 0;
        return needs ? '"' + value.replace("\"", "\"\"") + '"' : value;
    }
}
