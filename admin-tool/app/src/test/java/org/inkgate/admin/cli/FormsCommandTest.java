package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.admin.testutil.AdminCommand;
import org.inkgate.admin.testutil.DemoSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code forms --roster} through the real command: the achieved order and condition counts are
 * printed per level and over all levels, and agree with the table the command writes (counted here
 * from the file, with the demo's four forms as the command prints them).
 */
class FormsCommandTest {

    private static final Path EXAM = DemoSource.DEMO.resolve("exam-source");

    @TempDir
    Path dir;

    private static String forms(String... args) {
        AdminCommand.Run r = AdminCommand.admin(args);
        assertEquals(0, r.code(), r.out() + "\n" + r.err());
        return r.out();
    }

    /** The case: 12 demo candidates, 6 per level: 6 write each task first (it was 8 and 4). */
    @Test
    void forms_demoRoster_sixAndSixWriteEachTaskFirst_printedAndInTheTable() throws Exception {
        Path table = dir.resolve("assignment.csv");
        String out = forms("forms", EXAM.toString(), "--roster", DemoSource.DEMO.resolve("roster.csv").toString(),
                "--seed", "20261202", "--out", table.toString());
        Map<String, Integer> first = firstTaskFromTable(out, table, null);
        assertEquals(Map.of("ferry-complaint", 6, "market-square", 6), first, out);
        assertEquals(List.of(6, 6), row(out, "first task", "all levels"), out);
        assertEquals(List.of(6, 6), row(out, "first condition", "all levels"), out);
        for (String level : List.of("B1", "B2")) {
            List<Integer> printed = row(out, "first task", level);
            assertEquals(new ArrayList<>(firstTaskFromTable(out, table, level).values()), printed, level);
            printed.forEach(n -> assertTrue(Math.abs(n - 3) <= 1, level + ": " + printed));
            assertTrue(out.contains(level + "   ferry-complaint:  with-resources=3  without-resources=3   market-square:"
                    + "  with-resources=3  without-resources=3"), out);
        }
        assertTrue(out.contains("task x condition 0"), out);
        assertTrue(Files.readString(table).lines().skip(1).allMatch(l -> l.endsWith(",20261202")));
    }

    /** Levels of 5, 7 and 3 on the demo's 4 forms: every printed count within 1 of even. */
    @Test
    void forms_levelsOf5_7_3_everyCountWithinOneOfEven() throws Exception {
        StringBuilder csv = new StringBuilder("candidate_number,level\n");
        int[] sizes = {5, 7, 3};
        for (int l = 0; l < sizes.length; l++) {
            for (int i = 0; i < sizes[l]; i++) {
                csv.append(String.format("X%d%02d,L%d%n", l, i, l));
            }
        }
        Path roster = dir.resolve("roster.csv");
        Files.writeString(roster, csv, StandardCharsets.UTF_8);
        Path table = dir.resolve("assignment.csv");
        String out = forms("forms", EXAM.toString(), "--roster", roster.toString(), "--seed", "7", "--out",
                table.toString());
        for (int l = 0; l <= sizes.length; l++) {
            String group = l < sizes.length ? "L" + l : "all levels";
            double even = (l < sizes.length ? sizes[l] : 15) / 2.0;
            for (String margin : List.of("first task", "first condition")) {
                List<Integer> counts = row(out, margin, group);
                assertEquals(2, counts.size(), out);
                counts.forEach(n -> assertTrue(Math.abs(n - even) <= 1, group + " " + margin + ": " + counts + "\n" + out));
            }
            if (l < sizes.length) {
                assertEquals(new ArrayList<>(firstTaskFromTable(out, table, group).values()), row(out, "first task", group));
            }
        }
        assertEquals(15, Files.readString(table).lines().count() - 1);
    }

    /** The numbers of one row of a printed table ("first task" or "first condition"), by group name. */
    private static List<Integer> row(String out, String table, String group) {
        List<String> lines = out.lines().toList();
        int start = -1;
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).strip().startsWith(table + " (")) {
                start = i;
                break;
            }
        }
        assertTrue(start >= 0, table + " missing:\n" + out);
        for (int i = start + 2; i < lines.size() && !lines.get(i).strip().endsWith(":"); i++) {
            String line = lines.get(i).strip();
            if (line.startsWith(group + " ") && line.substring(group.length()).strip().matches("[0-9 ]+")) {
                return Arrays.stream(line.substring(group.length()).strip().split(" +")).map(Integer::valueOf).toList();
            }
        }
        throw new AssertionError(group + " missing in " + table + ":\n" + out);
    }

    /**
     * Counts the first task per candidate from the written table and the forms the command printed
     * ("  F01:  task [condition]  task [condition]"), so the printed counts are checked against the file.
     */
    private static Map<String, Integer> firstTaskFromTable(String out, Path table, String level) throws Exception {
        Map<String, String> firstOfForm = new TreeMap<>();
        out.lines().map(String::strip).filter(l -> l.matches("F\\d\\d:.*"))
                .forEach(l -> firstOfForm.put(l.substring(0, 3), l.substring(4).strip().split(" ")[0]));
        Map<String, Integer> counts = new TreeMap<>();
        firstOfForm.values().forEach(t -> counts.put(t, 0));
        Files.readString(table).lines().skip(1).map(l -> l.split(","))
                .filter(f -> level == null || f[1].equals(level))
                .forEach(f -> counts.merge(firstOfForm.get(f[2]), 1, Integer::sum));
        return counts;
    }
}
