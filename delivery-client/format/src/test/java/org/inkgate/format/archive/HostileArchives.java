package org.inkgate.format.archive;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

/** Builds archives no Inkgate writer would: unsafe names, duplicates, bombs. Tests only. */
public final class HostileArchives {

    private HostileArchives() {
    }

    /** Writes entries in order; names are not checked, so they may repeat or be unsafe. */
    public static void writeRaw(Path out, Map.Entry<String, byte[]>... entries) throws IOException {
        try (OutputStream stream = Files.newOutputStream(out); CanonicalZipWriter zip = new CanonicalZipWriter(stream)) {
            for (Map.Entry<String, byte[]> e : entries) {
                zip.addUnchecked(e.getKey(), e.getValue());
            }
        }
    }

    /** Writes a normal archive in which one entry is deflated whatever its ratio. */
    public static void writeWithDeflated(Path out, Map<String, byte[]> stored, String deflatedName, byte[] deflated)
            throws IOException {
        try (OutputStream stream = Files.newOutputStream(out); CanonicalZipWriter zip = new CanonicalZipWriter(stream)) {
            for (Map.Entry<String, byte[]> e : stored.entrySet()) {
                zip.addStored(e.getKey(), e.getValue());
            }
            zip.addDeflatedUnchecked(deflatedName, deflated);
        }
    }

    /** Rewrites an archive with one entry's content replaced (everything else kept in order). */
    public static void replaceEntry(Path in, Path out, String name, byte[] content) throws Exception {
        try (SafeZipReader reader = SafeZipReader.open(in, ArchiveLimits.defaults());
                OutputStream stream = Files.newOutputStream(out);
                CanonicalZipWriter zip = new CanonicalZipWriter(stream)) {
            for (ArchiveEntry entry : reader.entries()) {
                byte[] data = entry.name().equals(name) ? content : reader.read(entry);
                zip.addUnchecked(entry.name(), data);
            }
        }
    }

    /** Rewrites an archive with extra entries appended or one entry dropped. */
    public static void rewrite(Path in, Path out, String drop, Map<String, byte[]> add) throws Exception {
        try (SafeZipReader reader = SafeZipReader.open(in, ArchiveLimits.defaults());
                OutputStream stream = Files.newOutputStream(out);
                CanonicalZipWriter zip = new CanonicalZipWriter(stream)) {
            for (ArchiveEntry entry : reader.entries()) {
                if (!entry.name().equals(drop)) {
                    zip.addUnchecked(entry.name(), reader.read(entry));
                }
            }
            for (Map.Entry<String, byte[]> e : add.entrySet()) {
                zip.addUnchecked(e.getKey(), e.getValue());
            }
        }
    }
}
