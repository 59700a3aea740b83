package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import org.inkgate.admin.gui.rating.RatedStore;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * {@code inkgate-admin rate desk}: checks the store before any window opens. The store is made
 * from the invented demo exam (12 candidates in src/demo/roster.csv, two tasks each, so 24
 * responses; two raters per response over three raters gives 48 ratings, 16 per rater).
 */
class DeskCommandTest {

    @TempDir
    Path dir;
    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        CommandLine cl = InkgateAdmin.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        return cl.execute(args);
    }

    @Test
    void desk_noWindow_listsEveryRatersQueue() throws Exception {
        RatedStore rated = RatedStore.make(dir, List.of("rater-a", "rater-b", "rater-c"));
        int code = run("rate", "desk", "--store", rated.file().toString(), "--no-window");
        assertEquals(InkgateAdmin.OK, code, err.toString());
        for (String rater : List.of("rater-a", "rater-b", "rater-c")) {
            // 48 ratings over three raters, balanced within one (the rule): 16 each
            assertTrue(out.toString().contains("  " + rater + ": 16 in the queue, 0 rated, 16 remaining, 0 flagged"),
                    out.toString());
        }
    }

    @Test
    void desk_missingStore_refusedWithExitCode1AndNoWindow() {
        Path missing = dir.resolve("no-such.db");
        int code = run("rate", "desk", "--store", missing.toString());
        assertEquals(InkgateAdmin.PROBLEMS, code);
        assertTrue(err.toString().contains("no results store at " + missing), err.toString());
        assertTrue(err.toString().contains("No window was opened."), err.toString());
    }

    @Test
    void desk_help_namesTheNoPasswordRule() {
        assertEquals(InkgateAdmin.OK, run("rate", "desk", "--help"));
        assertTrue(out.toString().contains("There is no"), out.toString());
        assertTrue(out.toString().contains("--store"), out.toString());
    }
}
