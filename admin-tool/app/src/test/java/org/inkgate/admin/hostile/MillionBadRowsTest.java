package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.testutil.ForgedPackages;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A roster of a million bad rows is refused with a bounded list that says reading stopped. */
class MillionBadRowsTest {

    @TempDir
    Path dir;

    @Test
    void roster_millionBadRows_stopsEarlyWithABoundedList() throws Exception {
        Path roster = dir.resolve("roster.csv");
        try (BufferedWriter w = Files.newBufferedWriter(roster)) {
            w.write("candidate_number,level\n");
            for (int i = 0; i < 1_000_000; i++) {
                w.write("not a number " + i + ",B1\n");
            }
        }
        ForgedPackages.Run run = ForgedPackages.here("roster", roster.toString());
        assertEquals(InkgateAdmin.PROBLEMS, run.code());
        long lines = run.out().lines().count();
        assertTrue(lines <= 110, lines + " lines printed");
        assertTrue(run.out().contains("roster.csv:102: stopped reading after 100 problems"), run.out().substring(0, 500));
    }
}
