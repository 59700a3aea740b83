package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** The rate command's help and refusals in-process (the walkthrough in CommandLineTest runs it for real). */
class RateCommandTest {

    @TempDir
    Path dir;

    private record Result(int code, String out, String err) {
    }

    private static Result run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cli = InkgateAdmin.commandLine();
        cli.setOut(new PrintWriter(out));
        cli.setErr(new PrintWriter(err));
        int code = cli.execute(args);
        return new Result(code, out.toString(), err.toString());
    }

    @Test
    void rateHelp_listsEveryStepTheGuideNames() {
        Result r = run("rate", "--help");
        assertEquals(0, r.code());
        for (String step : List.of("raters", "assign", "progress", "sheet", "rule", "flags", "resolve", "export")) {
            assertTrue(r.out().contains(step), step + " in: " + r.out());
        }
        Result assign = run("rate", "assign", "--help");
        assertTrue(assign.out().contains("--raters-per-response") && assign.out().contains("--allow-unlinked"));
    }

    @Test
    void groupRunBare_printsItsUsageAndSucceeds() {
        for (List<String> group : List.of(List.of("rate"), List.of("rate", "raters"), List.of("rate", "sheet"))) {
            Result r = run(group.toArray(String[]::new));
            assertEquals(0, r.code(), group.toString());
            assertTrue(r.out().startsWith("Usage: inkgate-admin " + String.join(" ", group) + " "), r.out());
        }
    }

    @Test
    void rate_noSuchStore_exitsOneSayingWhichFileToGive() {
        Result r = run("rate", "progress", "--store", dir.resolve("none.db").toString());
        assertEquals(InkgateAdmin.PROBLEMS, r.code(), r.err());
        assertTrue(r.err().contains("no results store at") && r.err().contains("give the store that collect wrote"),
                r.err());
        assertTrue(!dir.resolve("none.db").toFile().exists(), "no store is created by a refused step");
    }

    @Test
    void rate_missingRequiredOption_isAUsageError() {
        Result r = run("rate", "sheet", "import", "--store", dir.resolve("r.db").toString(), "sheet.csv");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--rater"), r.err());
    }
}
