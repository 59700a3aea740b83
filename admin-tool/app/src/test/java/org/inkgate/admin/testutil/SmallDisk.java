package org.inkgate.admin.testutil;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * A real small file system for full-disk and read-only-media tests: a tmpfs of a few megabytes
 * mounted on a folder, which can be filled to the last byte or remounted read-only, so SQLite and
 * the JVM meet the operating system's own ENOSPC and EROFS. Mounting needs root (CAP_SYS_ADMIN);
 * {@link #mount} returns null where that is not allowed and the test is skipped, saying so.
 */
public final class SmallDisk implements AutoCloseable {

    private final Path folder;

    private SmallDisk(Path folder) {
        this.folder = folder;
    }

    /** A tmpfs of {@code megabytes} on {@code folder} (created), or null when this machine does not allow it. */
    public static SmallDisk mount(Path folder, int megabytes) throws IOException, InterruptedException {
        Files.createDirectories(folder);
        if (!System.getProperty("os.name").startsWith("Linux")
                || run("mount", "-t", "tmpfs", "-o", "size=" + megabytes + "m,mode=0700", "tmpfs", folder.toString()) != 0) {
            return null;
        }
        return new SmallDisk(folder);
    }

    public Path folder() {
        return folder;
    }

    /** Writes a filler file until the disk refuses, then frees {@code leaveBytes} of it again. */
    public Path fill(long leaveBytes) throws IOException {
        Path filler = folder.resolve("filler.bin");
        byte[] block = new byte[4096];
        try (var out = Files.newOutputStream(filler)) {
            while (true) {
                out.write(block);
            }
        } catch (IOException full) {
            // ENOSPC: the disk is full now
        }
        try (var ch = java.nio.channels.FileChannel.open(filler, java.nio.file.StandardOpenOption.WRITE)) {
            ch.truncate(Math.max(0, ch.size() - leaveBytes));
        }
        return filler;
    }

    /** Remounts the disk read-only (as a write-protected card or a disc is). */
    public void readOnly() throws IOException, InterruptedException {
        if (run("mount", "-o", "remount,ro", folder.toString()) != 0) {
            throw new IllegalStateException("could not remount " + folder + " read-only");
        }
    }

    @Override
    public void close() throws IOException, InterruptedException {
        run("umount", "-l", folder.toString());
    }

    private static int run(String... command) throws IOException, InterruptedException {
        Process p = new ProcessBuilder(List.of(command)).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(30, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            return -1;
        }
        if (p.exitValue() != 0) {
            System.err.println(String.join(" ", command) + ": " + out.strip());
        }
        return p.exitValue();
    }
}
