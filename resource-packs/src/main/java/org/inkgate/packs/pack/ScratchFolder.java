package org.inkgate.packs.pack;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** A private temporary folder deleted with everything in it on close; builders stage pack contents here. */
public final class ScratchFolder implements AutoCloseable {
    private final Path path;

    private ScratchFolder(Path path) {
        this.path = path;
    }

    /** Creates a new folder under {@code parent} (created if missing). */
    public static ScratchFolder create(Path parent, String prefix) throws IOException {
        Files.createDirectories(parent);
        return new ScratchFolder(Files.createTempDirectory(parent, prefix));
    }

    /** The folder. */
    public Path path() {
        return path;
    }

    /** The working folder for temporary files: the {@code inkgate.tmpdir} property, else {@code java.io.tmpdir}. */
    public static Path defaultParent() {
        String dir = System.getProperty("inkgate.tmpdir");
        return Path.of(dir != null && !dir.isBlank() ? dir : System.getProperty("java.io.tmpdir"));
    }

    @Override
    public void close() {
        OpenedPack.deleteTree(path);
    }
}
