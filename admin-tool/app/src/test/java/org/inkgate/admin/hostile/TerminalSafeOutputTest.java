package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.testutil.ForgedPackages;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Outside strings on the terminal: a package file name and a candidate number carrying a line break
 * followed by " REFUSED" and ANSI escape sequences (ECMA-48 CSI: ESC [ ... ) cannot forge a line or
 * reach the terminal as control characters; they are shown escaped.
 */
class TerminalSafeOutputTest {

    private static final char ESC = '\u001b';

    @TempDir
    Path dir;

    @Test
    void collect_fileNameAndCandidateNumberWithLineBreaksAndEscapes_printedEscapedOnOneLine() throws Exception {
        ForgedPackages forged = ForgedPackages.prepare(dir);
        Path packages = dir.resolve("packages");
        forged.write(forged.document("H1001", 1), packages.resolve("a-honest.inkresp"));
        forged.write(forged.document("H9\n REFUSED nothing, all fine " + ESC + "[2J", 2),
                packages.resolve("b-" + ESC + "[31mred\n REFUSED forged.inkresp"));

        ForgedPackages.Run collect = forged.collect(packages, dir.resolve("results.db"));
        assertEquals(InkgateAdmin.ATTENTION, collect.code(), collect.out());
        String out = collect.out();
        assertFalse(out.indexOf(ESC) >= 0, "no escape character reaches the terminal: " + out);
        List<String> refusedLines = out.lines().filter(l -> l.strip().startsWith("REFUSED")).toList();
        assertEquals(1, refusedLines.size(), out);
        assertTrue(refusedLines.get(0).contains("b-\\u001b[31mred\\u000a REFUSED forged.inkresp (candidate-number)"), out);
        assertTrue(refusedLines.get(0).contains("H9\\u000a REFUSED nothing, all fine \\u001b[2J"), out);
    }
}
