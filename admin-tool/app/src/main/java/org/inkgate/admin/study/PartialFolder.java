package org.inkgate.admin.study;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;
import java.util.stream.Stream;
import org.inkgate.format.io.OwnerOnly;

/**
 * Writes a folder's files into a hidden sibling first and moves them in only when all are written,
 * so a cancelled or failed run never leaves a report that mixes old and new files or stops halfway.
 * The analysis report and the window's export both write through it.
 */
public final class PartialFolder {

    /** Writes the files into the folder it is given. */
    public interface Contents {
        void writeInto(Path folder) throws IOException;
    }

    private PartialFolder() {
    }

    /**
     * Writes {@code contents} into a hidden sibling of {@code out} and moves its files into
     * {@code out} once all are written and {@code cancelled} is still false; the sibling is always removed.
     */
    public static void write(Path out, Contents contents, BooleanSupplier cancelled) throws IOException {
        Path target = out.toAbsolutePath().normalize();
        Path parent = target.getParent();
        OwnerOnly.folder(parent);
        Path partial = Files.createTempDirectory(parent, "." + target.getFileName() + ".partial-");
        OwnerOnly.restrict(partial);
        try {
            contents.writeInto(partial);
            if (cancelled.getAsBoolean()) {
                throw new CancellationException("cancelled before the report was moved into place");
            }
            if (!Files.exists(target)) {
                move(partial, target);
                return;
            }
            // an existing folder keeps its other files (and its sharing); the report's own files are replaced
            List<Path> files;
            try (Stream<Path> s = Files.walk(partial)) {
                files = s.filter(Files::isRegularFile).toList();
            }
            for (Path f : files) {
                Path to = target.resolve(partial.relativize(f).toString());
                Files.createDirectories(to.getParent());
                move(f, to);
            }
        } finally {
            deleteTree(partial);
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    private static void deleteTree(Path dir) throws IOException {
        if (!Files.exists(dir)) {
            return;
        }
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }
}
