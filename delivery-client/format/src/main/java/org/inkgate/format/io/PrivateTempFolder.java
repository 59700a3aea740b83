package org.inkgate.format.io;

import java.io.IOException;
import java.nio.file.FileSystems;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.nio.file.attribute.PosixFilePermissions;

/**
 * A temporary folder only its owner may read, deleted with everything in it on close. Folders
 * are made under the system property {@value #PARENT_PROPERTY} when set (e.g. an encrypted
 * volume chosen by the test centre), else under {@code java.io.tmpdir}.
 */
public final class PrivateTempFolder implements AutoCloseable {

    public static final String PARENT_PROPERTY = "inkgate.tmpdir";

    private final Path root;

    private PrivateTempFolder(Path root) {
        this.root = root;
    }

    public static PrivateTempFolder create(String prefix) throws IOException {
        Path parent = parent();
        Files.createDirectories(parent);
        if (FileSystems.getDefault().supportedFileAttributeViews().contains("posix")) {
            return new PrivateTempFolder(Files.createTempDirectory(parent, prefix,
                    PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString("rwx------"))));
        }
        return new PrivateTempFolder(Files.createTempDirectory(parent, prefix));
    }

    /** Where temporary folders are made. */
    public static Path parent() {
        String configured = System.getProperty(PARENT_PROPERTY);
        return Path.of(configured != null && !configured.isBlank() ? configured : System.getProperty("java.io.tmpdir"));
    }

    public Path root() {
        return root;
    }

    /** The path of a checked-safe entry name inside this folder. */
    public Path resolve(String safeEntryName) {
        Path path = root.resolve(safeEntryName).normalize();
        if (!path.startsWith(root)) {
            throw new IllegalArgumentException("entry \"" + safeEntryName + "\" would leave the temporary folder");
        }
        return path;
    }

    /**
     * Deletes the folder and everything in it. Carries on past a file it cannot delete (locked
     * on Windows, say) so that as much as possible goes, then reports the first failure.
     */
    @Override
    public void close() throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        IOException[] first = new IOException[1];
        Files.walkFileTree(root, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) {
                delete(file);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult visitFileFailed(Path file, IOException exc) {
                remember(exc);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path dir, IOException exc) {
                if (exc != null) {
                    remember(exc);
                }
                delete(dir);
                return FileVisitResult.CONTINUE;
            }

            private void delete(Path path) {
                try {
                    Files.delete(path);
                } catch (IOException e) {
                    remember(e);
                }
            }

            private void remember(IOException e) {
                if (first[0] == null) {
                    first[0] = e;
                } else {
                    first[0].addSuppressed(e);
                }
            }
        });
        if (first[0] != null) {
            throw first[0];
        }
    }
}
