package org.inkgate.packs.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The build's pack step skips a pack whose inputs did not change, and only then. */
class BuildUnlessCurrentTest {

    private static final FileTime LONG_AGO = FileTime.from(Instant.parse("2020-01-01T00:00:00Z"));

    @TempDir
    Path dir;

    private String[] glossaryArgs(Path source, Path out) {
        return new String[] {"build", "glossary", "--source", source.toString(), "--out", out.toString(), "--id",
            "stamp-test", "--pack-version", "1", "--title", "Stamp test", "--licence", "CC-BY-4.0",
            "--built-at", "2026-02-01T10:00:00Z"};
    }

    @Test
    void secondBuild_sameInputs_leavesThePackUntouched_changedSourceRebuildsIt() throws Exception {
        Path source = dir.resolve("terms.csv");
        Files.writeString(source, "entry_id,language,term\nt1,en,tide table\nt1,es,tabla de mareas\n");
        Path out = dir.resolve("g.inkpack");
        Path stamp = dir.resolve("g.inkpack.inputs-sha256");

        assertEquals(0, BuildUnlessCurrent.run(glossaryArgs(source, out)));
        assertTrue(Files.isRegularFile(stamp));
        Files.setLastModifiedTime(out, LONG_AGO);

        assertEquals(0, BuildUnlessCurrent.run(glossaryArgs(source, out)));
        assertEquals(LONG_AGO, Files.getLastModifiedTime(out), "an unchanged pack is not rewritten");

        Files.writeString(source, "entry_id,language,term\nt1,en,tide table\nt1,es,tabla de mareas\nt2,en,gangway\n");
        assertEquals(0, BuildUnlessCurrent.run(glossaryArgs(source, out)));
        assertNotEquals(LONG_AGO, Files.getLastModifiedTime(out), "a changed source is built again");
    }

    @Test
    void failedBuild_leavesNoStamp_soTheNextBuildRuns() throws Exception {
        Path source = dir.resolve("terms.csv");
        Files.writeString(source, "not,a,term bank\n");
        Path out = dir.resolve("g.inkpack");
        assertNotEquals(0, BuildUnlessCurrent.run(glossaryArgs(source, out)));
        assertFalse(Files.exists(dir.resolve("g.inkpack.inputs-sha256")));
    }
}
