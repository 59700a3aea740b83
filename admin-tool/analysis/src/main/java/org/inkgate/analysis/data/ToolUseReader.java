package org.inkgate.analysis.data;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads the optional tool-usage table, one row per candidate, task and tool:
 * {@code candidate,task,tool,uses,empty_queries,suggestions_accepted,suggestions_ignored}
 * (counts are whole numbers &gt;= 0; the last three may be empty, read as 0).
 */
public final class ToolUseReader {

    static final String[] COLUMNS = {"candidate", "task", "tool", "uses", "empty_queries", "suggestions_accepted",
        "suggestions_ignored"};

    private ToolUseReader() {
    }

    public static List<ToolUse> read(String file, Reader reader) throws IOException, InputRejected {
        CsvTable t = CsvTable.open(file, reader);
        List<InputProblem> problems = new ArrayList<>();
        int[] pos = Columns.require(t, problems, COLUMNS[0], COLUMNS[1], COLUMNS[2], COLUMNS[3]);
        if (!problems.isEmpty()) {
            throw new InputRejected(problems);
        }
        int[] optional = {t.column(COLUMNS[4]), t.column(COLUMNS[5]), t.column(COLUMNS[6])};
        Columns cols = new Columns();
        List<ToolUse> out = new ArrayList<>();
        CsvTable.Row row;
        while ((row = t.next()) != null) {
            if (!Columns.widthOk(t, row, problems)) {
                continue;
            }
            String c = cols.text(t, row, pos[0], "candidate", true, problems);
            String task = cols.text(t, row, pos[1], "task", true, problems);
            String tool = cols.text(t, row, pos[2], "tool", true, problems);
            long[] n = new long[4];
            n[0] = count(t, row, pos[3], COLUMNS[3], problems);
            for (int k = 0; k < 3; k++) {
                boolean present = optional[k] >= 0 && !row.cells()[optional[k]].isBlank();
                n[k + 1] = present ? count(t, row, optional[k], COLUMNS[k + 4], problems) : 0;
            }
            out.add(new ToolUse(c, task, tool, n[0], n[1], n[2], n[3]));
            Columns.stopIfFull(problems);
        }
        if (!problems.isEmpty()) {
            throw new InputRejected(problems);
        }
        return out;
    }

    private static long count(CsvTable t, CsvTable.Row row, int pos, String name, List<InputProblem> problems) {
        String v = row.cells()[pos].trim();
        try {
            long n = Long.parseLong(v);
            if (n >= 0) {
                return n;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        problems.add(new InputProblem(t.file(), row.number(), name, "'" + v + "' is not a whole number >= 0"));
        return 0;
    }
}
