package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.testutil.ForgedPackages;
import org.inkgate.admin.testutil.SmallDisk;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A results store handed over on read-only media (here a real tmpfs remounted read-only, as a
 * write-protected card or a disc is; root ignores file permissions, so chmod would prove
 * nothing): the commands that only read it (missing, export) work and give what they give on
 * writable storage; collect, which writes, refuses in plain words and changes nothing. Skipped
 * where the machine does not allow mounting a tmpfs.
 */
class ReadOnlyMediaTest {

    @TempDir
    Path dir;

    @Test
    void readingCommands_storeOnReadOnlyMedia_workAndCollectRefusesClearly() throws Exception {
        ForgedPackages p = ForgedPackages.prepare(dir);
        Path packages = dir.resolve("packages");
        for (int i = 0; i < 3; i++) {
            String candidate = "H" + (1001 + i);
            p.write(p.document(candidate, i), packages.resolve(candidate + ".inkresp"));
        }
        try (SmallDisk disk = SmallDisk.mount(dir.resolve("card"), 16)) {
            Assumptions.assumeTrue(disk != null, "this machine does not allow mounting a tmpfs (needs root)");
            Path store = disk.folder().resolve("results.db");
            assertTrue(p.collect(packages, store).out().contains("Imported 3,"));
            ForgedPackages.Run missingWritable = ForgedPackages.process(dir, "missing", "--store", store.toString());
            ForgedPackages.Run exportWritable = ForgedPackages.process(dir, "export", "--store", store.toString(), "--out",
                    dir.resolve("export-writable").toString());
            assertEquals(InkgateAdmin.OK, exportWritable.code(), exportWritable.out());

            disk.readOnly();
            ForgedPackages.Run missing = ForgedPackages.process(dir, "missing", "--store", store.toString());
            assertEquals(missingWritable.code(), missing.code(), missing.out());
            assertEquals(missingWritable.out(), missing.out());

            Path exported = dir.resolve("export-read-only");
            ForgedPackages.Run export = ForgedPackages.process(dir, "export", "--store", store.toString(), "--out",
                    exported.toString());
            assertEquals(InkgateAdmin.OK, export.code(), export.out());
            try (Stream<Path> files = Files.list(exported)) {
                for (Path f : files.filter(Files::isRegularFile).toList()) {
                    assertEquals(-1L, Files.mismatch(f, dir.resolve("export-writable").resolve(f.getFileName())),
                            f.getFileName() + " differs from the export made on writable storage");
                }
            }

            ForgedPackages.Run collect = p.collect(packages, store);
            assertEquals(InkgateAdmin.PROBLEMS, collect.code(), collect.out());
            assertTrue(collect.out().contains("cannot be written: it is on read-only media"), collect.out());
            assertFalse(collect.out().contains("SQLITE") || collect.out().contains("Read-only file system")
                    || collect.out().contains("Exception"), collect.out());
        }
    }
}
