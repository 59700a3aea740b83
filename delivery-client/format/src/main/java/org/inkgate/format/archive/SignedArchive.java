package org.inkgate.format.archive;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.Map;
import java.util.function.Function;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.io.PrivateTempFolder;
import org.inkgate.format.refusal.DigestMismatch;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.MissingEntry;
import org.inkgate.format.refusal.UnlistedEntry;

/**
 * The rule both of Inkgate's archives keep: besides the manifest and its signature, the
 * archive holds exactly the entries the signed manifest lists, each with the listed SHA-256.
 */
public final class SignedArchive {

    private SignedArchive() {
    }

    /**
     * Checks that archive and manifest list the same entries and extracts every listed entry into
     * {@code folder}, checking its digest as it is written.
     *
     * @param listed      entry name to expected SHA-256 (hex) and size, from the signed manifest
     * @param ownEntries  the names of the manifest and signature entries, not listed in themselves
     */
    public static void extractListed(String file, SafeZipReader zip, Map<String, ListedDigest> listed,
            java.util.Set<String> ownEntries, PrivateTempFolder folder) throws FormatRefusal, IOException {
        for (ArchiveEntry entry : zip.entries()) {
            if (!ownEntries.contains(entry.name()) && !listed.containsKey(entry.name())) {
                throw new UnlistedEntry(file, entry.name());
            }
        }
        for (Map.Entry<String, ListedDigest> e : listed.entrySet()) {
            ArchiveEntry entry = zip.entry(e.getKey()).orElseThrow(() -> new MissingEntry(file, e.getKey()));
            if (entry.size() != e.getValue().size()) {
                throw new DigestMismatch(file, entry.name());
            }
            Path target = folder.resolve(entry.name());
            Files.createDirectories(target.getParent());
            MessageDigest digest = Sha256.newDigest();
            try (OutputStream out = new java.io.BufferedOutputStream(Files.newOutputStream(target), 1 << 16)) {
                zip.copy(entry, out, digest);
            }
            if (!Hex.of(digest.digest()).equals(e.getValue().sha256())) {
                Files.delete(target);
                throw new DigestMismatch(file, entry.name());
            }
        }
    }

    /** Reads a required entry whole. */
    public static byte[] required(String file, SafeZipReader zip, String name) throws FormatRefusal, IOException {
        ArchiveEntry entry = zip.entry(name).orElseThrow(() -> new MissingEntry(file, name));
        return zip.read(entry);
    }

    /** A digest from a manifest. */
    public record ListedDigest(String sha256, long size) {
        public static <T> Map<String, ListedDigest> of(Map<String, T> entries, Function<T, ListedDigest> f) {
            Map<String, ListedDigest> out = new java.util.TreeMap<>();
            entries.forEach((k, v) -> out.put(k, f.apply(v)));
            return out;
        }
    }
}
