package org.inkgate.admin.core.export;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.inkgate.format.io.OwnerOnly;

/**
 * The one way exports and reports reach their folder (the {@code export} and {@code analyse}
 * commands and the admin window's export and analysis steps): every file is written into a hidden
 * folder {@code .NAME.partial} first, and only {@link #publish} moves it into place, after
 * {@link Cancellation} has decided between cancel and publish. So a cancelled, failed or
 * interrupted run leaves the folder as it was and no hidden folder behind.
 *
 * <p>When the folder exists, the hidden folder is made inside it, so that every move stays on the
 * folder's own disk (a USB stick mounted as the export folder, say) and is a rename; publishing then
 * replaces each top-level entry of the staged folder whole (an exam's export folder, a report file,
 * a report's tables folder), so an earlier export's stale files never mix with the new ones, and
 * keeps the folder's other entries. When the folder does not exist yet, the hidden folder is made
 * beside it and renamed into place in one step. Ctrl+C (a shutdown hook) cancels a
 * run that has not begun publishing and removes its hidden folder; one that has begun is given time
 * to finish its renames. One run at a time per folder: a hidden folder found at the start is taken
 * as left by a killed run and removed.
 */
public final class StagedFolder implements AutoCloseable {

    /** Told just before the commit point and just after it; tests cancel there. */
    public interface Moments {
        Moments NONE = new Moments() { };

        /** All files are written; the cancel-or-publish decision comes next. */
        default void beforePublish() {
        }

        /** Publishing has been claimed: a cancel now is refused; the renames come next. */
        default void publishing() {
        }
    }

    private static final long PUBLISH_GRACE_SECONDS = 30;

    private final Path target;
    private final Path staging;
    private final Cancellation cancellation;
    private final Thread onCtrlC;
    private final CountDownLatch published = new CountDownLatch(1);

    private StagedFolder(Path target, Cancellation cancellation) {
        this.target = target;
        String hidden = "." + target.getFileName() + ".partial";
        this.staging = Files.isDirectory(target) ? target.resolve(hidden) : target.resolveSibling(hidden);
        this.cancellation = cancellation;
        this.onCtrlC = new Thread(this::interrupted, "inkgate-staged-folder-cleanup");
    }

    /** Starts a run that will publish into {@code target}: an empty hidden folder to write into. */
    public static StagedFolder open(Path target, Cancellation cancellation) throws IOException {
        Path absolute = target.toAbsolutePath().normalize();
        if (absolute.getParent() == null) {
            throw new IOException("cannot write into " + absolute + ": choose a folder inside it");
        }
        if (Files.exists(absolute) && !Files.isDirectory(absolute)) {
            throw new IOException("cannot write into " + absolute + ": it is a file, not a folder; choose a folder");
        }
        StagedFolder s = new StagedFolder(absolute, cancellation);
        OwnerOnly.folder(absolute.getParent());
        delete(s.staging); // left by a killed run
        OwnerOnly.folder(s.staging);
        Runtime.getRuntime().addShutdownHook(s.onCtrlC);
        return s;
    }

    /** The hidden folder to write into. */
    public Path folder() {
        return staging;
    }

    /** The folder the files end up in. */
    public Path target() {
        return target;
    }

    /**
     * The commit point: unless a cancel has won, moves the staged entries into place and returns
     * the target; a cancel that won throws {@link CancellationException} and nothing is moved.
     */
    public Path publish(Moments moments) throws IOException {
        moments.beforePublish();
        if (!cancellation.claimPublishing()) {
            throw new CancellationException("cancelled before the files were moved into " + target);
        }
        try {
            moments.publishing();
            if (!Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
                move(staging, target);
            } else {
                for (Path entry : entries(staging)) { // the staging folder is inside the target: same disk
                    replace(entry, target.resolve(entry.getFileName().toString()));
                }
                delete(staging); // empty now
            }
            return target;
        } finally {
            published.countDown();
        }
    }

    /** Removes the hidden folder (what is left of it after a cancel or failure); call it always (try-with-resources). */
    @Override
    public void close() throws IOException {
        try {
            Runtime.getRuntime().removeShutdownHook(onCtrlC);
        } catch (IllegalStateException shuttingDown) {
            return; // the hook runs now and cleans up
        }
        delete(staging); // gone already when published
    }

    /** The shutdown hook: cancel if still possible and clean up, else let the renames finish. */
    private void interrupted() {
        if (cancellation.cancel()) {
            deleteQuietly(staging);
            return;
        }
        try {
            published.await(PUBLISH_GRACE_SECONDS, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private static List<Path> entries(Path folder) throws IOException {
        List<Path> all = new ArrayList<>();
        try (DirectoryStream<Path> s = Files.newDirectoryStream(folder)) {
            s.forEach(all::add);
        }
        all.sort(null);
        return all;
    }

    /** {@code to} becomes {@code from}: an earlier folder is set aside first and removed after the rename. */
    private static void replace(Path from, Path to) throws IOException {
        if (!Files.isDirectory(to, LinkOption.NOFOLLOW_LINKS) && !Files.isDirectory(from, LinkOption.NOFOLLOW_LINKS)) {
            try {
                Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
            }
            return;
        }
        Path old = to.resolveSibling("." + to.getFileName() + ".replaced");
        delete(old);
        if (Files.exists(to, LinkOption.NOFOLLOW_LINKS)) {
            move(to, old);
        }
        move(from, to);
        delete(old);
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to);
        }
    }

    /** For the shutdown hook: the run's thread may still be adding a file, so a few tries. */
    private static void deleteQuietly(Path folder) {
        for (int attempt = 0; attempt < 10; attempt++) {
            try {
                delete(folder);
                return;
            } catch (IOException e) {
                try {
                    Thread.sleep(20);
                } catch (InterruptedException stop) {
                    return; // the next run removes it
                }
            }
        }
    }

    static void delete(Path folder) throws IOException {
        if (!Files.exists(folder, LinkOption.NOFOLLOW_LINKS)) {
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
