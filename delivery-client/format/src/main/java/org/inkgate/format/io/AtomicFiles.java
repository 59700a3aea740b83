package org.inkgate.format.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Writes a file so that its final name only ever holds complete content: write beside it,
 * force to disk, then rename. A crash leaves at most a stray temporary file.
 */
public final class AtomicFiles {

    /** The body that writes the content. */
    @FunctionalInterface
    public interface Body {
        void writeTo(OutputStream out) throws IOException;
    }

    private AtomicFiles() {
    }

    public static void write(Path target, Body body) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        Files.createDirectories(folder);
        Path temp = Files.createTempFile(folder, "." + absolute.getFileName() + ".", ".part");
        try {
            try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING);
                    OutputStream out = new java.io.BufferedOutputStream(java.nio.channels.Channels.newOutputStream(channel), 1 << 16)) {
                body.writeTo(new NonClosing(out));
                out.flush();
                channel.force(true);
            }
            rename(temp, absolute, StandardCopyOption.REPLACE_EXISTING);
            forceFolder(folder);
        } finally {
            Files.deleteIfExists(temp);
        }
    }

    /**
     * Gives {@code written}, a complete file, the name {@code target}: forced to disk, renamed in one step, the
     * folder forced, so the name never holds less than the whole file, even after a power cut. Refuses, changing
     * nothing, when {@code target} exists (checked just before the rename: the caller keeps others from making it
     * meanwhile, as collect's lock does).
     */
    public static void moveIntoPlace(Path written, Path target) throws IOException {
        try (FileChannel channel = FileChannel.open(written, StandardOpenOption.WRITE)) {
            channel.force(true);
        }
        Path absolute = target.toAbsolutePath();
        if (Files.exists(absolute, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
            throw new java.nio.file.FileAlreadyExistsException(absolute.toString(), written.toString(),
                    "it appeared while its content was being written beside it; nothing was replaced");
        }
        rename(written, absolute);
        forceFolder(absolute.getParent());
    }

    /** One atomic rename where the file system has one, else a plain move. */
    private static void rename(Path from, Path to, java.nio.file.CopyOption... options) throws IOException {
        java.nio.file.CopyOption[] atomic = java.util.Arrays.copyOf(options, options.length + 1);
        atomic[options.length] = StandardCopyOption.ATOMIC_MOVE;
        try {
            Files.move(from, to, atomic);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, options);
        }
    }

    /**
     * On POSIX systems a rename is durable only once the folder itself is flushed; without it a
     * power cut can lose the new name. Windows cannot open a folder this way: there the rename
     * is left to the file system's own journal.
     */
    private static void forceFolder(Path folder) {
        try (FileChannel dir = FileChannel.open(folder, StandardOpenOption.READ)) {
            dir.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // not supported for folders on this platform
        }
    }

    /** Lets the body close its own stream wrappers without closing the channel before force(). */
    private static final class NonClosing extends java.io.FilterOutputStream {
        NonClosing(OutputStream out) {
            super(out);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
        }

        @Override
        public void close() throws IOException {
            out.flush();
        }
    }
}
