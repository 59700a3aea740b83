package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.testutil.ForgedPackages;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A collect refused before any package is read leaves no store behind: the owner key unlocks while the bundles are
 * read and checked, and the store is opened only when both are good. A wrong passphrase or a damaged bundle is
 * reported, and the store named on the command line is not created (before, a refused bundle left an empty one).
 */
class CollectRefusedBeforeStoreTest {

    @TempDir
    Path dir;

    @Test
    void aWrongPassphrase_orADamagedBundle_leavesNoStore() throws Exception {
        ForgedPackages p = ForgedPackages.prepare(dir);
        Path folder = dir.resolve("packages");
        p.write(p.document("H1001", 1), folder.resolve("honest.inkresp"));

        Path store = dir.resolve("wrong-passphrase.db");
        ForgedPackages.Run wrong = ForgedPackages.process(dir, Map.of("WRONG_PASSPHRASE", "not the passphrase at all"),
                "collect", folder.toString(), "--store", store.toString(), "--bundle", p.bundle().toString(), "--keys",
                p.keys().toString(), "--any-installation", "--passphrase-env", "WRONG_PASSPHRASE");
        assertEquals(InkgateAdmin.PROBLEMS, wrong.code(), wrong.out());
        assertTrue(wrong.out().contains("Nothing was changed"), wrong.out());
        assertFalse(Files.exists(store), "a store was made: " + wrong.out());

        Path damaged = dir.resolve("damaged.inkexam");
        byte[] bytes = Files.readAllBytes(p.bundle());
        bytes[bytes.length / 2] ^= 0x5a;
        Files.write(damaged, bytes);
        store = dir.resolve("damaged-bundle.db");
        ForgedPackages.Run refused = ForgedPackages.process(dir, "collect", folder.toString(), "--store", store.toString(),
                "--bundle", damaged.toString(), "--keys", p.keys().toString(), "--any-installation", "--passphrase-env",
                ForgedPackages.PASSPHRASE_ENV);
        assertEquals(InkgateAdmin.PROBLEMS, refused.code(), refused.out());
        assertTrue(refused.out().contains("is refused"), refused.out());
        assertFalse(Files.exists(store), "a store was made: " + refused.out());

        store = dir.resolve("good.db");
        ForgedPackages.Run good = p.collect(folder, store);
        assertTrue(good.out().contains("Imported 1,"), good.out());
    }
}
