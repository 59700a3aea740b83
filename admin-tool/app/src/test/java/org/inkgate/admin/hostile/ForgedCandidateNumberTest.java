package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.testutil.ForgedPackages;
import org.inkgate.format.response.ResponseDocument;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A forged package (written with only the owner's public key, signed by an installation nobody
 * enrolled) whose candidate number climbs out of the export folder: {@code collect
 * --any-installation} refuses it under the roster's rule for candidate numbers and imports the
 * honest package beside it; {@code export} then writes only inside its folder.
 */
class ForgedCandidateNumberTest {

    @TempDir
    Path dir;

    @Test
    void collect_candidateNumberThatClimbsOutOfTheFolder_isRefusedAndExportStaysInside() throws Exception {
        ForgedPackages forged = ForgedPackages.prepare(dir);
        Path packages = dir.resolve("packages");
        forged.write(forged.document("H1001", 1), packages.resolve("a-honest.inkresp"));
        ResponseDocument climbing = forged.document("../../somewhere/file", 2);
        forged.write(climbing, packages.resolve("b-forged.inkresp"));

        Path store = dir.resolve("work/results.db");
        Files.createDirectories(store.getParent());
        ForgedPackages.Run collect = forged.collect(packages, store);
        assertEquals(InkgateAdmin.ATTENTION, collect.code(), collect.out());
        assertTrue(collect.out().contains("Imported 1,"), collect.out());
        assertTrue(collect.out().contains("b-forged.inkresp (candidate-number)"), collect.out());
        assertTrue(collect.out().contains("1-32 letters, digits, '-' or '_'"), collect.out());

        Path out = dir.resolve("work/export/inner");
        ForgedPackages.Run export = ForgedPackages.here("export", "--store", store.toString(), "--out", out.toString());
        assertEquals(0, export.code(), export.out());
        assertFalse(Files.exists(dir.resolve("work/somewhere")), "nothing written outside the export folder");
        assertFalse(Files.exists(dir.resolve("work/export/somewhere")), "nothing written outside the export folder");
        try (Stream<Path> files = Files.walk(dir.resolve("work"))) {
            List<Path> outside = files.filter(Files::isRegularFile)
                    .filter(p -> !p.startsWith(out) && !p.getFileName().toString().startsWith("results.db")).toList();
            assertEquals(List.of(), outside, "files written outside " + out);
        }
        try (Stream<Path> qti = Files.list(out.resolve(forged.manifest().examId()).resolve("qti-results"))) {
            assertEquals(List.of("H1001.xml"), qti.map(p -> p.getFileName().toString()).toList());
        }
    }
}
