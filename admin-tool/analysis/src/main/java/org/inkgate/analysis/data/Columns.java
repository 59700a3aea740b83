package org.inkgate.analysis.data;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Shared checks of the readers: required columns, cells, numbers; strings shared to save memory. */
final class Columns {

    static final int MAX_PROBLEMS = 200;
    private final Map<String, String> pool = new HashMap<>();
    // neighbouring rows mostly repeat a column's value (same candidate, task, condition): reuse it
    private final String[] last = new String[256];

    /** Positions of required columns; missing ones added to problems. */
    static int[] require(CsvTable t, List<InputProblem> problems, String... names) {
        int[] pos = new int[names.length];
        for (int i = 0; i < names.length; i++) {
            pos[i] = t.column(names[i]);
            if (pos[i] < 0) {
                problems.add(new InputProblem(t.file(), 1, names[i], "required column '" + names[i]
                        + "' is missing from the header (found: " + String.join(",", t.header()) + ")"));
            }
        }
        return pos;
    }

    String text(CsvTable t, CsvTable.Row row, int pos, String name, boolean required, List<InputProblem> problems) {
        String v = pos < 0 || pos >= row.cells().length ? "" : row.cells()[pos].trim();
        if (required && v.isEmpty()) {
            problems.add(new InputProblem(t.file(), row.number(), name, "empty; every row needs a " + name));
        }
        String previous = pos >= 0 && pos < last.length ? last[pos] : null;
        if (v.equals(previous)) {
            return previous;
        }
        String pooled = pool.computeIfAbsent(v, k -> k);
        if (pos >= 0 && pos < last.length) {
            last[pos] = pooled;
        }
        return pooled;
    }

    static double number(CsvTable t, CsvTable.Row row, int pos, String name, List<InputProblem> problems) {
        String v = pos < 0 || pos >= row.cells().length ? "" : row.cells()[pos].trim();
        int small = smallInteger(v);
        if (small >= 0) {
            return small; // the usual rating: a few digits, no sign or point; parsed without Double.parseDouble
        }
        try {
            double d = Double.parseDouble(v);
            if (!Double.isFinite(d)) {
                throw new NumberFormatException();
            }
            return d;
        } catch (NumberFormatException e) {
            problems.add(new InputProblem(t.file(), row.number(), name, "'" + v
                    + "' is not a number; write a plain number with a dot for decimals (e.g. 3 or 2.5)"));
            return Double.NaN;
        }
    }

    /** The value of 1-4 plain digits, else -1. */
    private static int smallInteger(String v) {
        int n = v.length();
        if (n == 0 || n > 4) {
            return -1;
        }
        int x = 0;
        for (int i = 0; i < n; i++) {
            char c = v.charAt(i);
            if (c < '0' || c > '9') {
                return -1;
            }
            x = x * 10 + (c - '0');
        }
        return x;
    }

    static boolean widthOk(CsvTable t, CsvTable.Row row, List<InputProblem> problems) {
        if (row.cells().length != t.header().size()) {
            problems.add(new InputProblem(t.file(), row.number(), null, "has " + row.cells().length
                    + " cells but the header has " + t.header().size() + "; check commas and quotes"));
            return false;
        }
        return true;
    }

    static void stopIfFull(List<InputProblem> problems) throws InputRejected {
        if (problems.size() >= MAX_PROBLEMS) {
            throw new InputRejected(new ArrayList<>(problems));
        }
    }
}
