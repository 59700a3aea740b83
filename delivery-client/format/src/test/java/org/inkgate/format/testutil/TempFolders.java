package org.inkgate.format.testutil;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.inkgate.format.io.PrivateTempFolder;

/** Counts the readers' private temporary folders, to prove a refused file leaves none behind. */
public final class TempFolders {

    private TempFolders() {
    }

    /**
     * Surefire points inkgate.tmpdir at the module's target folder, so other processes cannot
     * disturb the count; before the first reader runs the folder may not exist yet.
     */
    public static long count() throws IOException {
        Path parent = PrivateTempFolder.parent();
        if (!Files.isDirectory(parent)) {
            return 0;
        }
        try (Stream<Path> s = Files.list(parent)) {
            return s.filter(p -> p.getFileName().toString().startsWith("inkgate-")).count();
        }
    }
}
