package org.inkgate.client.sitting.submit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class InstallationKeyTest {

    @TempDir
    Path dir;

    @Test
    void loadOrCreate_twice_sameKeyOwnerOnlyFile() throws Exception {
        ClientDataFolder folder = new ClientDataFolder(dir);
        InstallationKey first = InstallationKey.loadOrCreate(folder);
        InstallationKey again = InstallationKey.loadOrCreate(folder);
        assertEquals(first.fingerprint(), again.fingerprint());
        Path file = folder.installation().resolve(InstallationKey.FILE_NAME);
        assertEquals("rw-------", PosixFilePermissions.toString(Files.getPosixFilePermissions(file)));
        assertEquals("rwx------", PosixFilePermissions.toString(Files.getPosixFilePermissions(folder.installation())));
        assertTrue(first.fingerprint().matches("([0-9a-f]{4}-){7}[0-9a-f]{4}"), "docs/formats.md, Trust: eight groups of four");
    }

    @Test
    void loadOrCreate_damagedKeyFile_isRefusedWithWhatToDo() throws Exception {
        ClientDataFolder folder = new ClientDataFolder(dir).create();
        Files.writeString(folder.installation().resolve(InstallationKey.FILE_NAME), "abcd\n");
        var e = assertThrows(java.io.IOException.class, () -> InstallationKey.loadOrCreate(folder));
        assertTrue(e.getMessage().contains("2 bytes") && e.getMessage().contains("enrol"), e.getMessage());
    }
}
