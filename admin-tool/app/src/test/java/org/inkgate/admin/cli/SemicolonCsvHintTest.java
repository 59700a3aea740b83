package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * A CSV file saved with semicolons (what spreadsheets write in languages whose decimal mark is
 * the comma) is refused with a hint to save it comma-separated, by both CSV readers: the roster's
 * (admin core) and the analysis tables' (analysis module), through the real command line.
 */
class SemicolonCsvHintTest {

    @TempDir
    Path dir;

    private String run(int expected, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = InkgateAdmin.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        assertEquals(expected, cl.execute(args), out + "\n" + err);
        return out + "\n" + err;
    }

    @Test
    void roster_separatedBySemicolons_isRefusedWithTheHint() throws Exception {
        Path roster = Files.writeString(dir.resolve("roster.csv"), "candidate_number;level\nH1001;B1\nH1002;B2\n");
        String text = run(InkgateAdmin.PROBLEMS, "roster", roster.toString());
        assertTrue(text.contains("separated by semicolons"), text);
        assertTrue(text.contains("commas as separators"), text);
    }

    @Test
    void analyseRatings_separatedBySemicolons_isRefusedWithTheHint() throws Exception {
        Path ratings = Files.writeString(dir.resolve("ratings.csv"),
                "candidate;level;form;task;condition;rater;criterion;score\nT1;;;t1;plain;J1;overall;3\n");
        String text = run(AnalyseCommand.INPUT_REFUSED, "analyse", "--ratings", ratings.toString(), "--out",
                dir.resolve("report").toString());
        assertTrue(text.contains("separated by semicolons"), text);
        assertTrue(text.contains("ratings.csv, row 1"), text);
    }
}
