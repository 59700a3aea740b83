package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.testutil.ForgedPackages;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * While one collect runs into a store (here: this test holds the store's collect lock, as a running
 * collect does), a second collect into the same store says another collect is running and imports
 * nothing; once the first is done, the same command imports everything.
 */
class TwoCollectsTest {

    @TempDir
    Path dir;

    @Test
    void collect_whileAnotherCollectHoldsTheStore_saysSoThenImportsAfterwards() throws Exception {
        ForgedPackages p = ForgedPackages.prepare(dir);
        Path folder = dir.resolve("packages");
        p.write(p.document("H1001", 1), folder.resolve("H1001.inkresp"));
        Path store = dir.resolve("results.db");
        Path lockFile = dir.resolve("results.db.collect-lock");

        ForgedPackages.Run second;
        try (FileChannel channel = FileChannel.open(lockFile, StandardOpenOption.CREATE, StandardOpenOption.WRITE);
                FileLock held = channel.lock()) {
            second = p.collect(folder, store);
        }
        assertEquals(InkgateAdmin.PROBLEMS, second.code(), second.out());
        assertTrue(second.out().contains("another collect is importing into " + store + " right now"), second.out());
        assertFalse(second.out().contains("SQLITE") || second.out().contains("constraint"), second.out());

        ForgedPackages.Run after = p.collect(folder, store);
        assertEquals(InkgateAdmin.ATTENTION, after.code(), after.out());
        assertTrue(after.out().contains("Imported 1,"), after.out());
        assertTrue(Files.exists(store));
    }
}
