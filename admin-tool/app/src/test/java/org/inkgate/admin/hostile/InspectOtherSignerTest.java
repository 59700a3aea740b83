package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.testutil.ForgedPackages;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code inspect --keys} of a bundle another owner signed says so and exits non-zero, so scripts notice. */
class InspectOtherSignerTest {

    @TempDir
    Path dir;

    @Test
    void inspect_bundleSignedByAnotherKey_exitsWithProblems() throws Exception {
        ForgedPackages owner = ForgedPackages.prepare(dir);
        ForgedPackages.Run mine = ForgedPackages.here("inspect", owner.bundle().toString(), "--keys", owner.keys().toString());
        assertEquals(InkgateAdmin.OK, mine.code(), mine.out());

        Path other = dir.resolve("other-keys");
        assertEquals(0, ForgedPackages.process(dir, "keys", "init", "--keys", other.toString(), "--passphrase-env",
                ForgedPackages.PASSPHRASE_ENV).code());
        ForgedPackages.Run theirs = ForgedPackages.here("inspect", owner.bundle().toString(), "--keys", other.toString());
        assertEquals(InkgateAdmin.PROBLEMS, theirs.code(), theirs.out());
        assertTrue(theirs.out().contains("DOES NOT match your signing key"), theirs.out());
    }
}
