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
 * as left by a killed run and removed, unless that run had begun publishing: then it holds a
 * {@value #PUBLISHING} note, its remaining entries are moved into place first (rolled forward), so a
 * folder of several exams is never left part new and part old once the next run starts
 * ({@link #finishedEarlierRun}).
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

        /**
         * An earlier run into the folder had been stopped while moving its files in; {@code note}
         * says which entries were moved in now (see {@link StagedFolder#finishedEarlierRun}).
         */
        default void earlierRunFinished(String note) {
        }

        /** One staged entry has been moved into the existing folder (tests stop the process here). */
        default void moved(String entry) {
        }
    }

    private static final long PUBLISH_GRACE_SECONDS = 30;

    /**
     * Written into the hidden folder at the commit point, before the first rename into an existing
     * folder: its presence says every staged file was complete and the moves had begun.
     */
    static final String PUBLISHING = ".publishing";

    /** The suffix of an earlier entry set aside while its replacement is renamed in. */
    private static final String SET_ASIDE = ".replaced";

    private final Path target;
    private final Path staging;
    private final Cancellation cancellation;
    private final Thread onCtrlC;
    private final CountDownLatch published = new CountDownLatch(1);
    private List<String> finishedEarlier = List.of();

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
        s.finishedEarlier = s.finishInterruptedPublish();
        delete(s.staging); // left by a killed run
        OwnerOnly.folder(s.staging);
        Runtime.getRuntime().addShutdownHook(s.onCtrlC);
        return s;
    }

    /**
     * The entries an earlier run had begun to move into place when it was killed, moved in now
     * before this run writes anything; empty when there was no such run. Tell the test owner: the
     * folder held a mix of that run's files and older ones until now.
     */
    public List<String> finishedEarlierRun() {
        return finishedEarlier;
    }

    /** Tells {@code moments} of a run finished at {@link #open}, in words for the test owner; nothing when there was none. */
    public void tellEarlierRun(Moments moments) {
        if (!finishedEarlier.isEmpty()) {
            moments.earlierRunFinished("NOTE: an earlier run into " + target + " was stopped while moving its files"
                    + " into place, leaving part of it new and part older; its remaining " + finishedEarlier.size()
                    + " entries (" + String.join(", ", finishedEarlier) + ") were moved in first, so that run is"
                    + " now complete there before this one replaces it.");
        }
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
                Files.writeString(staging.resolve(PUBLISHING), "moving these files into place; "
                        + "the next run into this folder finishes the moves if this one is stopped\n");
                moveEntriesIn(moments);
            }
            return target;
        } finally {
            published.countDown();
        }
    }

    /**
     * Removes the hidden folder (what is left of it after a cancel or failure); call it always
     * (try-with-resources). A publish that failed part-way keeps it, with its note, for the next
     * run to finish.
     */
    @Override
    public void close() throws IOException {
        try {
            Runtime.getRuntime().removeShutdownHook(onCtrlC);
        } catch (IllegalStateException shuttingDown) {
            return; // the hook runs now and cleans up
        }
        if (!Files.exists(staging.resolve(PUBLISHING), LinkOption.NOFOLLOW_LINKS)) {
            delete(staging); // gone already when published
        }
    }

    /** Moves every staged entry into the existing target, then removes the hidden folder and its note. */
    private void moveEntriesIn(Moments moments) throws IOException {
        for (Path entry : entries(staging)) { // the staging folder is inside the target: same disk
            String name = entry.getFileName().toString();
            replace(entry, target.resolve(name));
            moments.moved(name);
        }
        clearSetAside();
        delete(staging); // only the note is left
    }

    /** Rolls forward a run killed while moving its entries in; returns the entries it moved. */
    private List<String> finishInterruptedPublish() throws IOException {
        if (!Files.isDirectory(target) || !Files.exists(staging.resolve(PUBLISHING), LinkOption.NOFOLLOW_LINKS)) {
            return List.of();
        }
        List<String> names = new ArrayList<>();
        for (Path entry : entries(staging)) {
            names.add(entry.getFileName().toString());
        }
        moveEntriesIn(Moments.NONE);
        return List.copyOf(names);
    }

    /** Removes earlier folders set aside by {@link #replace} that a killed run left behind. */
    private void clearSetAside() throws IOException {
        try (DirectoryStream<Path> s = Files.newDirectoryStream(target, ".*" + SET_ASIDE)) {
            for (Path old : s) {
                delete(old);
            }
        }
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

    /** The staged entries, without the note. */
    private static List<Path> entries(Path folder) throws IOException {
        List<Path> all = new ArrayList<>();
        try (DirectoryStream<Path> s = Files.newDirectoryStream(folder)) {
            s.forEach(p -> {
                if (!p.getFileName().toString().equals(PUBLISHING)) {
                    all.add(p);
                }
            });
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
        Path old = to.resolveSibling("." + to.getFileName() + SET_ASIDE);
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
