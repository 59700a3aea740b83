package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.inkgate.admin.gui.rating.RatedStore;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Issue 15 §3, the qualification set through the real {@code rate qualification} and {@code rate
 * sheet} commands over a store made by the real collect ({@link RatedStore}, three invented raters):
 * a rater's sheet holds only the set until the set is passed, a rater outside the limits waits for
 * the test owner (exit code 3) and is admitted with who and why.
 */
class QualificationSetCommandTest {

    private static final List<String> RATERS = List.of("R01", "R02", "R03");

    @TempDir
    Path dir;

    private record Result(int code, String out, String err) {
    }

    private static Result run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cli = InkgateAdmin.commandLine();
        cli.setOut(new PrintWriter(out, true));
        cli.setErr(new PrintWriter(err, true));
        return new Result(cli.execute(args), out.toString(), err.toString());
    }

    @Test
    void sheetHoldsOnlyTheSet_untilPassed_andAnOutsideRaterWaitsForTheTestOwner() throws Exception {
        RatedStore rated = RatedStore.make(dir, RATERS);
        String db = rated.file().toString();
        Result live = run("rate", "sheet", "export", "--rater", "R01", "--out", dir.resolve("R01-live.csv").toString(),
                "--store", db);
        assertEquals(0, live.code(), live.err());
        int liveRows = lines(dir.resolve("R01-live.csv")).size() - 1;

        assertEquals(0, run("rate", "qualification", "mark", "--candidate", "H1001", "--task", "ferry-complaint",
                "--agreed", "task-fulfilment=6,language-control=5", "--source", "invented meeting", "--store", db).code());
        assertEquals(0, run("rate", "qualification", "mark", "--candidate", "H1002", "--task", "market-square",
                "--agreed", "task-fulfilment=4,language-control=4", "--source", "invented meeting", "--store", db).code());
        Result give = run("rate", "qualification", "give", "--store", db);
        assertTrue(give.out().startsWith("6 qualification item(s) given"), give.out());
        Result badRule = run("rate", "qualification", "rule", "--min-adjacent", "1.5", "--store", db);
        assertEquals(InkgateAdmin.PROBLEMS, badRule.code());
        assertTrue(badRule.err().contains("share between 0 and 1"), badRule.err());
        assertEquals(0, run("rate", "qualification", "rule", "--min-adjacent", "1", "--max-mean-difference", "0.5",
                "--store", db).code());

        Path sheet = dir.resolve("R01.csv");
        assertEquals(0, run("rate", "sheet", "export", "--rater", "R01", "--out", sheet.toString(), "--store", db).code());
        List<String> rows = lines(sheet);
        assertEquals(3, rows.size(), "header and the two qualification scripts only: " + rows);
        String id = rows.get(1).split(",")[0];
        assertTrue(Files.readString(sheet.resolveSibling("R01-scripts").resolve(id + ".txt"))
                .contains("A qualification script"));
        Files.writeString(sheet, fill(rows, 0), StandardCharsets.UTF_8);
        Result in = run("rate", "sheet", "import", "--rater", "R01", sheet.toString(), "--store", db);
        assertEquals(0, in.code(), in.out() + in.err());
        Result status = run("rate", "qualification", "status", "--store", db);
        assertEquals(0, status.code(), status.out());
        assertTrue(status.out().contains("R01") && status.out().contains("passed: live rating open"), status.out());
        assertEquals(0, run("rate", "sheet", "export", "--rater", "R01", "--out", sheet.toString(), "--store", db).code());
        assertEquals(2 + liveRows, lines(sheet).size() - 1, "passed: the set, then the live queue");

        Path sheet2 = dir.resolve("R02.csv");
        assertEquals(0, run("rate", "sheet", "export", "--rater", "R02", "--out", sheet2.toString(), "--store", db).code());
        Files.writeString(sheet2, fill(lines(sheet2), 3), StandardCharsets.UTF_8);
        assertEquals(0, run("rate", "sheet", "import", "--rater", "R02", sheet2.toString(), "--store", db).code());
        Result waiting = run("rate", "qualification", "status", "--store", db);
        assertEquals(InkgateAdmin.ATTENTION, waiting.code(), waiting.out());
        assertTrue(waiting.out().contains("not passed: live rating closed (adjacent agreement 0.00 below 1.00"),
                waiting.out());
        assertEquals(0, run("rate", "qualification", "admit", "--rater", "R02", "--by", "Invented test owner",
                "--reason", "retrained", "--store", db).code());
        Result after = run("rate", "qualification", "status", "--store", db);
        assertEquals(0, after.code(), after.out());
        assertTrue(after.out().contains("admitted by the test owner: live rating open by Invented test owner: retrained"),
                after.out());
    }

    /** The sheet with each row scored at its script's agreed scores plus {@code off} (agreed per task above). */
    private static String fill(List<String> rows, int off) {
        List<String> out = new ArrayList<>(List.of(rows.get(0)));
        for (String row : rows.subList(1, rows.size())) {
            String[] f = row.split(",", -1);
            boolean ferry = f[1].equals("ferry-complaint");
            out.add(f[0] + "," + f[1] + "," + ((ferry ? 6 : 4) + off) + "," + ((ferry ? 5 : 4) + off) + ",");
        }
        return String.join("\r\n", out) + "\r\n";
    }

    private static List<String> lines(Path file) throws Exception {
        return Files.readAllLines(file, StandardCharsets.UTF_8).stream().filter(l -> !l.isBlank()).toList();
    }
}
