package org.inkgate.admin.core.export;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;

/**
 * An export folder that appears whole or not at all. The files are written into a hidden sibling
 * ({@code .EXAM.partial}); only when all are written does it replace the folder, by renames in the
 * same parent. A run stopped on the way (Ctrl+C, a full disk, an error) leaves the earlier export
 * as it was: a shutdown hook removes the hidden folder on Ctrl+C, and the next export removes any
 * left by a killed process.
 */
final class WholeFolder implements AutoCloseable {

    private final Path target;
    private final Path partial;
    private final Thread cleanup;
    private boolean done;

    private WholeFolder(Path target) {
        this.target = target;
        this.partial = target.resolveSibling("." + target.getFileName() + ".partial");
        this.cleanup = new Thread(() -> deleteQuietly(partial), "inkgate-export-cleanup");
    }

    /** Starts an export into {@code target}: returns the hidden folder to write into, empty. */
    static WholeFolder start(Path target) throws IOException {
        WholeFolder w = new WholeFolder(target);
        delete(w.partial); // left by a killed export
        org.inkgate.format.io.OwnerOnly.folder(w.partial);
        Runtime.getRuntime().addShutdownHook(w.cleanup);
        return w;
    }

    Path folder() {
        return partial;
    }

    /** Puts the written folder in place of the earlier export (if any). */
    Path finish() throws IOException {
        Path old = target.resolveSibling("." + target.getFileName() + ".replaced");
        delete(old);
        if (Files.exists(target)) {
            move(target, old);
        }
        move(partial, target);
        delete(old);
        done = true;
        return target;
    }

    @Override
    public void close() throws IOException {
        try {
            Runtime.getRuntime().removeShutdownHook(cleanup);
        } catch (IllegalStateException shuttingDown) {
            return; // the hook runs now
        }
        if (!done) {
            delete(partial);
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to);
        }
    }

    /** For the shutdown hook: the export thread may still be adding a file, so a few tries. */
    private static void deleteQuietly(Path folder) {
        for (int attempt = 0; attempt < 10; attempt++) {
            try {
                delete(folder);
                return;
            } catch (IOException e) {
                try {
                    Thread.sleep(20);
                } catch (InterruptedException stop) {
                    return; // the next export removes it
                }
            }
        }
    }

    static void delete(Path folder) throws IOException {
        if (!Files.exists(folder, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        Files.walkFileTree(folder, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                Files.delete(file);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path dir, IOException e) throws IOException {
                Files.delete(dir);
                return FileVisitResult.CONTINUE;
            }
        });
    }
}
