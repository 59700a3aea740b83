package org.inkgate.format.archive;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.security.MessageDigest;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.function.Function;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.io.PrivateTempFolder;
import org.inkgate.format.refusal.BadSignature;
import org.inkgate.format.refusal.DigestMismatch;
import org.inkgate.format.refusal.DuplicateEntry;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.MissingEntry;
import org.inkgate.format.refusal.SizeLimitExceeded;
import org.inkgate.format.refusal.UnlistedEntry;

/**
 * The rules both of Inkgate's archives keep: a small manifest, its 64-byte signature, and
 * exactly the entries the signed manifest lists, each with the listed SHA-256. Everything read
 * before the signature is checked is bounded by small fixed sizes, whatever the archive limits.
 */
public final class SignedArchive {

    /** Manifests and envelopes are a few kilobytes; anything near this is not one of ours. */
    public static final int MAX_MANIFEST_BYTES = 4 << 20;

    private SignedArchive() {
    }

    /** Reads a required manifest-like entry, refusing it from its header if it is too large to be one. */
    public static byte[] manifest(String file, SafeZipReader zip, String name) throws FormatRefusal, IOException {
        ArchiveEntry entry = zip.entry(name).orElseThrow(() -> new MissingEntry(file, name));
        if (entry.size() > MAX_MANIFEST_BYTES) {
            throw new SizeLimitExceeded(file, "entry \"" + name + "\" (" + entry.size() + " bytes)", MAX_MANIFEST_BYTES);
        }
        return zip.read(entry);
    }

    /** Reads a detached Ed25519 signature: present and exactly 64 bytes, checked from the header. */
    public static byte[] signature(String file, SafeZipReader zip, String name) throws FormatRefusal, IOException {
        ArchiveEntry entry = zip.entry(name).orElseThrow(() -> new BadSignature(file,
                "the file carries no signature (" + name + " is missing)"));
        if (entry.size() != Ed25519.SIGNATURE_BYTES) {
            throw new BadSignature(file, name + " holds " + entry.size() + " bytes, not a " + Ed25519.SIGNATURE_BYTES
                    + "-byte signature");
        }
        return zip.read(entry);
    }

    /**
     * Checks that archive and manifest list the same entries and extracts every listed entry into
     * {@code folder}, checking its digest as it is written.
     *
     * @param listed      entry name to expected SHA-256 (hex) and size, from the signed manifest
     * @param ownEntries  the names of the manifest and signature entries, not listed in themselves
     */
    public static void extractListed(String file, SafeZipReader zip, Map<String, ListedDigest> listed,
            Set<String> ownEntries, PrivateTempFolder folder) throws FormatRefusal, IOException {
        checkSameEntries(file, zip, listed, ownEntries);
        for (Map.Entry<String, ListedDigest> e : listed.entrySet()) {
            ArchiveEntry entry = zip.entry(e.getKey()).orElseThrow();
            Path target = folder.resolve(entry.name());
            Files.createDirectories(target.getParent());
            MessageDigest digest = Sha256.newDigest();
            // CREATE_NEW: a name that the file system folds onto an earlier one is caught, not overwritten
            try (OutputStream out = new java.io.BufferedOutputStream(
                    Files.newOutputStream(target, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE), 1 << 16)) {
                zip.copy(entry, out, digest);
            } catch (FileAlreadyExistsException clash) {
                throw new DuplicateEntry(file, entry.name(), "is the same file as another entry on this file system");
            }
            if (!Hex.of(digest.digest()).equals(e.getValue().sha256())) {
                Files.delete(target);
                throw new DigestMismatch(file, entry.name());
            }
        }
    }

    /** As {@link #extractListed}, but into memory: for content that should never touch the disk. */
    public static Map<String, byte[]> readListed(String file, SafeZipReader zip, Map<String, ListedDigest> listed,
            Set<String> ownEntries) throws FormatRefusal, IOException {
        checkSameEntries(file, zip, listed, ownEntries);
        Map<String, byte[]> out = new TreeMap<>();
        for (Map.Entry<String, ListedDigest> e : listed.entrySet()) {
            ArchiveEntry entry = zip.entry(e.getKey()).orElseThrow();
            MessageDigest digest = Sha256.newDigest();
            EntryBytes bytes = new EntryBytes(entry.size());
            zip.copy(entry, bytes, digest);
            if (!Hex.of(digest.digest()).equals(e.getValue().sha256())) {
                throw new DigestMismatch(file, entry.name());
            }
            out.put(entry.name(), bytes.bytes());
        }
        return out;
    }

    private static void checkSameEntries(String file, SafeZipReader zip, Map<String, ListedDigest> listed,
            Set<String> ownEntries) throws FormatRefusal {
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
        }
    }

    /** A digest from a manifest. */
    public record ListedDigest(String sha256, long size) {
        public static <T> Map<String, ListedDigest> of(Map<String, T> entries, Function<T, ListedDigest> f) {
            Map<String, ListedDigest> out = new TreeMap<>();
            entries.forEach((k, v) -> out.put(k, f.apply(v)));
            return out;
        }
    }
}
