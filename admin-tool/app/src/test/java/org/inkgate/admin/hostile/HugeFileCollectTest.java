package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.testutil.ForgedPackages;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A file of 2 GiB and more in the collection folder (sparse here: it takes no disk space) is
 * refused by its size, with the reason, and the package beside it is imported.
 */
class HugeFileCollectTest {

    @TempDir
    Path dir;

    @Test
    void collect_fileOfTwoGibibytes_isRefusedBySizeAndTheRestImported() throws Exception {
        ForgedPackages packages = ForgedPackages.prepare(dir);
        Path folder = dir.resolve("packages");
        packages.write(packages.document("H1001", 1), folder.resolve("H1001.inkresp"));
        Path huge = folder.resolve("huge.inkresp");
        try (RandomAccessFile f = new RandomAccessFile(huge.toFile(), "rw")) {
            f.setLength((2L << 30) + 1); // one byte past 2 GiB: more than any Java array holds
        }

        ForgedPackages.Run collect = packages.collect(folder, dir.resolve("results.db"));
        assertEquals(InkgateAdmin.ATTENTION, collect.code(), collect.out());
        assertTrue(collect.out().contains("Imported 1,"), collect.out());
        assertTrue(collect.out().contains("REFUSED " + huge + " (too-large)"), collect.out());
        assertTrue(collect.out().contains("2147483649 bytes, over the limit"), collect.out());
        assertFalse(collect.out().contains("OutOfMemoryError"), collect.out());
    }
}
