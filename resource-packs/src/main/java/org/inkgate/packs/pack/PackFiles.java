package org.inkgate.packs.pack;

import com.fasterxml.jackson.core.JacksonException;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.Enumeration;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import java.util.zip.ZipEntry;
import java.util.zip.ZipException;
import java.util.zip.ZipFile;
import java.util.zip.ZipOutputStream;

/**
 * Writing, reading and verifying {@code .inkpack} files: a zip whose first entry is
 * {@code manifest.json} and whose other entries are exactly the files the manifest lists.
 *
 * <p>The stable API for other modules is {@link #readManifest(Path)} and {@link #verify(Path)}.
 */
public final class PackFiles {
    /** Most entries a pack may hold. */
    static final int MAX_ENTRIES = 4096;
    /** Largest manifest read (bytes). */
    static final int MAX_MANIFEST_BYTES = 4 * 1024 * 1024;
    /** Largest single content file (bytes); the WordNet index is about a tenth of this. */
    static final long MAX_ENTRY_BYTES = 1L << 30;
    /** Largest total of content files (bytes). */
    static final long MAX_TOTAL_BYTES = 2L << 30;
    /**
     * Most a deflated entry may expand (unpacked size over packed size): the common practice of
     * zip readers facing untrusted input, and the limit every Inkgate archive reader applies
     * ({@code org.inkgate.format.archive.ArchiveLimits} takes it from here). Real packs stay far
     * below: the WordNet index expands about 1.25 times, the demo glossary under 2.
     */
    public static final long MAX_COMPRESSION_RATIO = 100;
    /** Fixed entry time so the same content gives the same zip bytes. */
    private static final long ENTRY_TIME = 1_767_225_600_000L; // 2026-01-01T00:00:00Z

    private PackFiles() {
    }

    /**
     * Reads and checks the manifest of a pack without hashing its contents: field rules, and the
     * zip holds exactly the files listed. Use {@link #verify} before trusting the contents.
     */
    public static PackManifest readManifest(Path pack) throws PackRefusal {
        try (ZipFile zip = openZip(pack)) {
            return readManifest(zip, pack.toString());
        } catch (IOException e) {
            throw new PackRefusal(PackRefusal.Reason.NOT_A_PACK, pack + ": cannot be read (" + e.getMessage() + ")", e);
        }
    }

    /** Reads the manifest and checks every content file against its size and SHA-256; returns the manifest. */
    public static PackManifest verify(Path pack) throws PackRefusal {
        try (ZipFile zip = openZip(pack)) {
            PackManifest manifest = readManifest(zip, pack.toString());
            for (PackFileEntry f : manifest.files()) {
                try (InputStream in = zip.getInputStream(zip.getEntry(f.path()))) {
                    copyChecked(in, OutputStream.nullOutputStream(), f, pack.toString());
                }
            }
            return manifest;
        } catch (ZipException e) {
            throw new PackRefusal(PackRefusal.Reason.CONTENT_MISMATCH, pack + ": a zip entry is damaged (" + e.getMessage() + ")", e);
        } catch (IOException e) {
            throw new PackRefusal(PackRefusal.Reason.NOT_A_PACK, pack + ": cannot be read (" + e.getMessage() + ")", e);
        }
    }

    /**
     * Verifies a pack while extracting it into a new private folder under {@code parent}, and
     * returns the folder with the manifest. Only the extracted, checked copy is used afterwards,
     * so a pack changed on disk after opening cannot change what the tool reads. On refusal
     * nothing is left behind.
     */
    public static OpenedPack open(Path pack, Path parent) throws PackRefusal {
        Path folder;
        try {
            Files.createDirectories(parent);
            folder = Files.createTempDirectory(parent, "inkpack-");
        } catch (IOException e) {
            throw new PackRefusal(PackRefusal.Reason.NOT_A_PACK, "cannot create a working folder under " + parent
                    + " to open " + pack + " (" + e.getMessage() + "); check free space and permissions", e);
        }
        try (ZipFile zip = openZip(pack)) {
            PackManifest manifest = readManifest(zip, pack.toString());
            for (PackFileEntry f : manifest.files()) {
                Path target = folder.resolve(f.path()).normalize();
                if (!target.startsWith(folder)) {
                    throw new PackRefusal(PackRefusal.Reason.UNSAFE_ENTRY, pack + ": entry " + f.path() + " leaves the pack folder");
                }
                Files.createDirectories(target.getParent());
                try (InputStream in = zip.getInputStream(zip.getEntry(f.path()));
                     OutputStream out = Files.newOutputStream(target, StandardOpenOption.CREATE_NEW)) {
                    copyChecked(in, out, f, pack.toString());
                }
                target.toFile().setReadOnly();
            }
            return new OpenedPack(manifest, folder);
        } catch (PackRefusal e) {
            OpenedPack.deleteTree(folder);
            throw e;
        } catch (ZipException e) {
            OpenedPack.deleteTree(folder);
            throw new PackRefusal(PackRefusal.Reason.CONTENT_MISMATCH, pack + ": a zip entry is damaged (" + e.getMessage() + ")", e);
        } catch (IOException e) {
            OpenedPack.deleteTree(folder);
            throw new PackRefusal(PackRefusal.Reason.NOT_A_PACK, pack + ": cannot be read (" + e.getMessage() + ")", e);
        }
    }

    /**
     * Writes a pack from every regular file under {@code contentDir}: hashes them, checks the
     * manifest rules, writes the zip to a temporary file beside {@code target}, forces it to
     * disk and renames it into place, so a failed build leaves no half-written pack.
     */
    public static PackManifest write(Path target, PackDraft draft, Path contentDir) throws IOException, PackRefusal {
        List<Path> paths;
        try (Stream<Path> walk = Files.walk(contentDir)) {
            paths = walk.filter(Files::isRegularFile).sorted().toList();
        }
        List<PackFileEntry> files = new ArrayList<>();
        for (Path p : paths) {
            String name = contentDir.relativize(p).toString().replace('\\', '/');
            MessageDigest md = PackDigests.sha256();
            long size = 0;
            try (InputStream in = Files.newInputStream(p)) {
                byte[] buf = new byte[1 << 16];
                for (int n; (n = in.read(buf)) > 0; ) {
                    md.update(buf, 0, n);
                    size += n;
                }
            }
            files.add(new PackFileEntry(name, size, HexFormat.of().formatHex(md.digest())));
        }
        files.sort((a, b) -> a.path().compareTo(b.path()));
        PackManifest manifest = new PackManifest(PackManifest.FORMAT, PackManifest.CURRENT_VERSION, draft.id(), draft.kind(),
                draft.version(), draft.title(), draft.languages(), draft.licence(), draft.attribution(), draft.entryCount(),
                draft.builtAt(), PackDigests.contentDigest(files), files);
        ManifestRules.check(manifest, "pack to be written to " + target);

        Path dir = target.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path temp = Files.createTempFile(dir, ".inkpack-", ".part");
        try {
            try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING);
                 ZipOutputStream zip = new ZipOutputStream(java.nio.channels.Channels.newOutputStream(channel))) {
                putEntry(zip, ManifestRules.MANIFEST_ENTRY);
                zip.write(PackJson.MAPPER.writeValueAsBytes(manifest));
                zip.closeEntry();
                for (PackFileEntry f : files) {
                    putEntry(zip, f.path());
                    Files.copy(contentDir.resolve(f.path()), zip);
                    zip.closeEntry();
                }
                zip.finish();
                zip.flush();
                channel.force(true);
            }
            if (Files.getFileStore(temp).supportsFileAttributeView("posix")) {
                // a temporary file is private to its owner; a pack is for others to read
                Files.setPosixFilePermissions(temp, java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--"));
            }
            try {
                Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temp);
        }
        return manifest;
    }

    private static void putEntry(ZipOutputStream zip, String name) throws IOException {
        ZipEntry e = new ZipEntry(name);
        e.setTime(ENTRY_TIME);
        zip.putNextEntry(e);
    }

    private static ZipFile openZip(Path pack) throws PackRefusal {
        if (!Files.isRegularFile(pack)) {
            throw new PackRefusal(PackRefusal.Reason.NOT_A_PACK, pack + ": no such file; give the path of an .inkpack file");
        }
        try {
            return new ZipFile(pack.toFile());
        } catch (IOException e) {
            throw new PackRefusal(PackRefusal.Reason.NOT_A_PACK, pack + ": is not a zip file, so not an .inkpack ("
                    + e.getMessage() + ")", e);
        }
    }

    private static PackManifest readManifest(ZipFile zip, String where) throws PackRefusal, IOException {
        Map<String, ZipEntry> entries = new HashMap<>();
        int count = 0;
        for (Enumeration<? extends ZipEntry> en = zip.entries(); en.hasMoreElements(); ) {
            ZipEntry e = en.nextElement();
            if (++count > MAX_ENTRIES) {
                throw new PackRefusal(PackRefusal.Reason.TOO_LARGE, where + ": more than " + MAX_ENTRIES + " entries");
            }
            if (!e.getName().equals(ManifestRules.MANIFEST_ENTRY)) {
                ManifestRules.checkEntryName(where, e.getName());
            }
            if (entries.put(e.getName(), e) != null) {
                throw new PackRefusal(PackRefusal.Reason.UNSAFE_ENTRY, where + ": entry " + e.getName() + " appears twice");
            }
        }
        ZipEntry manifestEntry = entries.get(ManifestRules.MANIFEST_ENTRY);
        if (manifestEntry == null) {
            throw new PackRefusal(PackRefusal.Reason.BAD_MANIFEST, where + ": has no manifest.json, so it is not an .inkpack");
        }
        byte[] bytes;
        try (InputStream in = zip.getInputStream(manifestEntry)) {
            bytes = in.readNBytes(MAX_MANIFEST_BYTES + 1);
        }
        if (bytes.length > MAX_MANIFEST_BYTES) {
            throw new PackRefusal(PackRefusal.Reason.TOO_LARGE, where + ": manifest.json is larger than " + MAX_MANIFEST_BYTES + " bytes");
        }
        PackManifest manifest;
        try {
            manifest = PackJson.MAPPER.readValue(bytes, PackManifest.class);
        } catch (JacksonException e) {
            String loc = e.getLocation() == null ? "" : " at line " + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr();
            throw new PackRefusal(PackRefusal.Reason.BAD_MANIFEST, where + ": manifest.json is not a valid pack manifest" + loc
                    + ": " + e.getOriginalMessage(), e);
        }
        ManifestRules.check(manifest, where);
        long total = 0;
        for (PackFileEntry f : manifest.files()) {
            if (!entries.containsKey(f.path())) {
                throw new PackRefusal(PackRefusal.Reason.CONTENT_MISMATCH, where + ": manifest lists " + f.path() + " but the pack lacks it");
            }
            if (f.size() > MAX_ENTRY_BYTES) {
                throw new PackRefusal(PackRefusal.Reason.TOO_LARGE, where + ": " + f.path() + " is larger than " + MAX_ENTRY_BYTES + " bytes");
            }
            checkRatio(entries.get(f.path()), f.size(), where);
            total += f.size();
        }
        if (total > MAX_TOTAL_BYTES) {
            throw new PackRefusal(PackRefusal.Reason.TOO_LARGE, where + ": contents total more than " + MAX_TOTAL_BYTES + " bytes");
        }
        if (entries.size() != manifest.files().size() + 1) {
            List<String> extra = entries.keySet().stream()
                    .filter(n -> !n.equals(ManifestRules.MANIFEST_ENTRY))
                    .filter(n -> manifest.files().stream().noneMatch(f -> f.path().equals(n)))
                    .sorted().toList();
            throw new PackRefusal(PackRefusal.Reason.CONTENT_MISMATCH, where + ": holds files the manifest does not list: " + extra);
        }
        return manifest;
    }

    /**
     * Refuses a deflated entry that would expand more than {@link #MAX_COMPRESSION_RATIO} times,
     * before anything is unpacked; the larger of the manifest's and the zip's unpacked size counts.
     */
    private static void checkRatio(ZipEntry e, long declaredSize, String where) throws PackRefusal {
        long size = Math.max(declaredSize, e.getSize());
        if (e.getMethod() != ZipEntry.DEFLATED || size <= 0) {
            return;
        }
        long packed = e.getCompressedSize();
        if (packed <= 0 || size > packed * MAX_COMPRESSION_RATIO) {
            throw new PackRefusal(PackRefusal.Reason.TOO_LARGE, where + ": " + e.getName() + " would expand from "
                    + Math.max(packed, 0) + " to " + size + " bytes, more than " + MAX_COMPRESSION_RATIO + " times (the"
                    + " mark of a decompression bomb; no pack Inkgate builds comes near). Build the pack again with"
                    + " inkgate-admin pack build, or ask its maker for an intact copy");
        }
    }

    /** Copies at most the declared size and checks size and SHA-256; never trusts the zip's own size fields. */
    private static void copyChecked(InputStream in, OutputStream out, PackFileEntry f, String where) throws IOException, PackRefusal {
        MessageDigest md = PackDigests.sha256();
        byte[] buf = new byte[1 << 16];
        long read = 0;
        for (int n; (n = in.read(buf)) > 0; ) {
            read += n;
            if (read > f.size()) {
                throw new PackRefusal(PackRefusal.Reason.CONTENT_MISMATCH, where + ": " + f.path()
                        + " is longer than the " + f.size() + " bytes the manifest declares; the pack was altered or damaged");
            }
            md.update(buf, 0, n);
            out.write(buf, 0, n);
        }
        if (read != f.size()) {
            throw new PackRefusal(PackRefusal.Reason.CONTENT_MISMATCH, where + ": " + f.path() + " has " + read
                    + " bytes, the manifest declares " + f.size() + "; the pack was altered or damaged");
        }
        String actual = HexFormat.of().formatHex(md.digest());
        if (!actual.equals(f.sha256())) {
            throw new PackRefusal(PackRefusal.Reason.CONTENT_MISMATCH, where + ": " + f.path() + " has SHA-256 " + actual
                    + ", the manifest says " + f.sha256() + "; the pack was altered or damaged: rebuild it or get a fresh copy");
        }
    }
}
