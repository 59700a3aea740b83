package org.inkgate.client.sitting.store;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;

class ClientDataFolderTest {

    @Test
    void locate_propertySet_overridesEverything() {
        assertEquals(Path.of("/srv/exam/data").toAbsolutePath(), ClientDataFolder.locate(
                Map.of(ClientDataFolder.PROPERTY, "/srv/exam/data", "os.name", "Linux", "user.home", "/home/c"), Map.of()).root());
    }

    @Test
    void locate_linux_followsTheXdgBaseDirectorySpecification() {
        // XDG Base Directory Specification 0.8: $XDG_DATA_HOME, default $HOME/.local/share
        assertEquals(Path.of("/home/c/.local/share/inkgate/client"),
                ClientDataFolder.locate(Map.of("os.name", "Linux", "user.home", "/home/c"), Map.of()).root());
        assertEquals(Path.of("/data/inkgate/client"),
                ClientDataFolder.locate(Map.of("os.name", "Linux", "user.home", "/home/c"), Map.of("XDG_DATA_HOME", "/data")).root());
    }

    @Test
    void locate_macos_usesApplicationSupport() {
        assertEquals(Path.of("/Users/c/Library/Application Support/Inkgate/client"),
                ClientDataFolder.locate(Map.of("os.name", "Mac OS X", "user.home", "/Users/c"), Map.of()).root());
    }
}
