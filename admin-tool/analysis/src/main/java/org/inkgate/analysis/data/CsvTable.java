package org.inkgate.analysis.data;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A comma-separated table as RFC 4180 writes it (quoted fields may hold commas, quotes doubled,
 * line breaks), read row by row with the header naming the columns. A byte-order mark is skipped.
 */
final class CsvTable {

    /** One data row with its 1-based row number in the file (the header is row 1). */
    record Row(long number, String[] cells) {
    }

    private final String file;
    private final List<String> header;
    private final Map<String, Integer> index = new HashMap<>();
    private final BufferedReader in;
    private long rowNumber = 1;

    private CsvTable(String file, BufferedReader in, List<String> header) {
        this.file = file;
        this.in = in;
        this.header = header;
        for (int i = 0; i < header.size(); i++) {
            index.putIfAbsent(header.get(i).trim().toLowerCase(java.util.Locale.ROOT), i);
        }
    }

    static CsvTable open(String file, Reader reader) throws IOException, InputRejected {
        BufferedReader in = reader instanceof BufferedReader b ? b : new BufferedReader(reader, 1 << 16);
        String[] head = parseRecord(in);
        if (head == null) {
            throw new InputRejected(List.of(new InputProblem(file, 1, null, "the file is empty; it needs a header row")));
        }
        if (head.length > 0 && head[0].startsWith("\uFEFF")) {
            head[0] = head[0].substring(1);
        }
        if (head.length == 1 && head[0].contains(";")) {
            // a spreadsheet set to a language whose decimal mark is the comma saves CSV with semicolons
            throw new InputRejected(List.of(new InputProblem(file, 1, null, "the file is separated by semicolons, not"
                    + " commas: save it again as CSV with commas as separators (in the spreadsheet: \"CSV"
                    + " (comma-separated)\", or a field delimiter of \",\")")));
        }
        return new CsvTable(file, in, List.of(head));
    }

    String file() {
        return file;
    }

    List<String> header() {
        return header;
    }

    /** Column position of a (case-insensitive) name, or -1. */
    int column(String name) {
        return index.getOrDefault(name, -1);
    }

    /** The next non-blank row, or null at the end. */
    Row next() throws IOException {
        while (true) {
            String[] r = parseRecord(in);
            if (r == null) {
                return null;
            }
            rowNumber++;
            if (r.length == 1 && r[0].isBlank()) {
                continue;
            }
            return new Row(rowNumber, r);
        }
    }

    private static String[] parseRecord(BufferedReader in) throws IOException {
        String line = in.readLine();
        if (line == null) {
            return null;
        }
        if (line.indexOf('"') < 0) {
            return splitPlain(line);
        }
        List<String> cells = new ArrayList<>();
        StringBuilder cell = new StringBuilder();
        boolean quoted = false;
        int i = 0;
        while (true) {
            if (i >= line.length()) {
                if (quoted) {
                    String more = in.readLine();
                    if (more == null) {
                        break; // unterminated quote: keep what we have; the row check reports it
                    }
                    cell.append('\n');
                    line = more;
                    i = 0;
                    continue;
                }
                break;
            }
            char c = line.charAt(i++);
            if (quoted) {
                if (c == '"') {
                    if (i < line.length() && line.charAt(i) == '"') {
                        cell.append('"');
                        i++;
                    } else {
                        quoted = false;
                    }
                } else {
                    cell.append(c);
                }
            } else if (c == '"') {
                quoted = true;
            } else if (c == ',') {
                cells.add(cell.toString());
                cell.setLength(0);
            } else {
                cell.append(c);
            }
        }
        cells.add(cell.toString());
        return cells.toArray(String[]::new);
    }

    private static String[] splitPlain(String line) {
        int count = 1;
        for (int i = 0; i < line.length(); i++) {
            if (line.charAt(i) == ',') {
                count++;
            }
        }
        String[] out = new String[count];
        int start = 0, k = 0;
        for (int i = 0; i <= line.length(); i++) {
            if (i == line.length() || line.charAt(i) == ',') {
                out[k++] = line.substring(start, i);
                start = i + 1;
            }
        }
        return out;
    }
}
