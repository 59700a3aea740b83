package org.inkgate.admin.core.qti;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;
import org.inkgate.format.archive.ArchiveLimits;
import org.inkgate.format.archive.EntryNames;
import org.inkgate.format.archive.ForeignZipReader;
import org.inkgate.format.refusal.FormatRefusal;

/**
 * The files of a package to import, by path inside it: from a ZIP, whichever program wrote it (read
 * with the format module's {@link ForeignZipReader}: names checked against zip slip, sizes and
 * compression ratios limited before anything is unpacked, CRC-32 checked), from an unpacked folder (regular files only, no links followed, the same
 * name rules and limits), or one XML file. Nothing is written.
 */
public final class PackageFiles {

    /** Limits for packages from outside: far above any essay exam, far below what could exhaust memory. */
    static final ArchiveLimits LIMITS = new ArchiveLimits(256L << 20, 5_000, 64L << 20, 256L << 20,
            ArchiveLimits.DEFAULT_MAX_RATIO);

    private final String source;
    private final Map<String, byte[]> files;

    private PackageFiles(String source, Map<String, byte[]> files) {
        this.source = source;
        this.files = files;
    }

    /** Thrown when the package cannot be read at all; the message says what and how to fix it. */
    public static final class PackageRefusal extends Exception {
        public PackageRefusal(String message) {
            super(message);
        }

        public PackageRefusal(String message, Throwable cause) {
            super(message, cause);
        }
    }

    public static PackageFiles open(Path path) throws PackageRefusal, IOException {
        String name = path.getFileName() == null ? path.toString() : path.getFileName().toString();
        if (Files.isDirectory(path)) {
            return folder(path);
        }
        if (!Files.isRegularFile(path)) {
            throw new PackageRefusal(path + " does not exist; give a QTI package (.zip), an unpacked package folder or"
                    + " one item or test (.xml)");
        }
        String lower = name.toLowerCase(Locale.ROOT);
        if (lower.endsWith(".xml")) {
            if (Files.size(path) > LIMITS.maxEntryBytes()) {
                throw new PackageRefusal(path + " is larger than " + (LIMITS.maxEntryBytes() >> 20) + " MiB");
            }
            Map<String, byte[]> one = new LinkedHashMap<>();
            one.put(name, Files.readAllBytes(path));
            return new PackageFiles(name, one);
        }
        try (ForeignZipReader zip = ForeignZipReader.open(path, LIMITS)) {
            Map<String, byte[]> all = new LinkedHashMap<>();
            for (var e : zip.entries()) {
                all.put(e.name(), zip.read(e));
            }
            return new PackageFiles(name, all);
        } catch (FormatRefusal e) {
            throw new PackageRefusal(name + " cannot be read safely as a ZIP: " + e.getMessage(), e);
        }
    }

    private static PackageFiles folder(Path root) throws PackageRefusal, IOException {
        Map<String, byte[]> all = new LinkedHashMap<>();
        long total = 0;
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : (Iterable<Path>) walk::iterator) {
                if (Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS)) {
                    continue;
                }
                String name = root.relativize(p).toString().replace(p.getFileSystem().getSeparator(), "/");
                if (!Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)) {
                    throw new PackageRefusal(root + ": " + name + " is a link or special file; copy the package without links");
                }
                String problem = EntryNames.problem(name);
                if (problem != null) {
                    throw new PackageRefusal(root + ": file name " + name + " is refused (" + problem + ")");
                }
                long size = Files.size(p);
                total += size;
                if (all.size() >= LIMITS.maxEntries() || size > LIMITS.maxEntryBytes() || total > LIMITS.maxTotalBytes()) {
                    throw new PackageRefusal(root + " holds more than a package may (" + LIMITS.maxEntries() + " files, "
                            + (LIMITS.maxEntryBytes() >> 20) + " MiB each, " + (LIMITS.maxTotalBytes() >> 20) + " MiB in all)");
                }
                all.put(name, Files.readAllBytes(p));
            }
        }
        return new PackageFiles(root.toString(), all);
    }

    public String source() {
        return source;
    }

    public Map<String, byte[]> files() {
        return files;
    }

    public Optional<byte[]> file(String path) {
        return Optional.ofNullable(files.get(path));
    }

    /**
     * A reference ({@code href}) from the document at {@code from} resolved to a path inside the
     * package, or empty when it is absolute, a URL, or climbs out of the package.
     */
    public static Optional<String> resolve(String from, String href) {
        if (href == null || href.isEmpty() || href.contains(":") || href.startsWith("/") || href.contains("\\")) {
            return Optional.empty();
        }
        String base = from.contains("/") ? from.substring(0, from.lastIndexOf('/') + 1) : "";
        String path = java.net.URLDecoder.decode((base + href).replace("+", "%2B"), java.nio.charset.StandardCharsets.UTF_8);
        java.util.Deque<String> parts = new java.util.ArrayDeque<>();
        for (String part : path.split("/")) {
            if (part.isEmpty() || part.equals(".")) {
                continue;
            }
            if (part.equals("..")) {
                if (parts.isEmpty()) {
                    return Optional.empty();
                }
                parts.removeLast();
            } else {
                parts.addLast(part);
            }
        }
        String out = String.join("/", parts);
        return out.isEmpty() || EntryNames.problem(out) != null ? Optional.empty() : Optional.of(out);
    }
}
