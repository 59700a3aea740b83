package org.inkgate.format.archive;

import static org.inkgate.format.archive.ZipLayout.CENTRAL_HEADER_BYTES;
import static org.inkgate.format.archive.ZipLayout.CENTRAL_SIGNATURE;
import static org.inkgate.format.archive.ZipLayout.END_RECORD_BYTES;
import static org.inkgate.format.archive.ZipLayout.END_SIGNATURE;
import static org.inkgate.format.archive.ZipLayout.FLAG_UTF8;
import static org.inkgate.format.archive.ZipLayout.LOCAL_HEADER_BYTES;
import static org.inkgate.format.archive.ZipLayout.LOCAL_SIGNATURE;
import static org.inkgate.format.archive.ZipLayout.METHOD_DEFLATED;
import static org.inkgate.format.archive.ZipLayout.METHOD_STORED;
import static org.inkgate.format.archive.ZipLayout.u16;
import static org.inkgate.format.archive.ZipLayout.u32;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.zip.CRC32;
import org.inkgate.format.refusal.DuplicateEntry;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.MalformedArchive;
import org.inkgate.format.refusal.SizeLimitExceeded;
import org.inkgate.format.refusal.UnsafeEntryName;
import org.inkgate.format.refusal.UnsupportedArchiveFeature;

/**
 * Reads, for import only, ZIP files that other programs wrote (item banks, authoring tools, Info-ZIP,
 * Python, the JDK): unlike {@link SafeZipReader} it accepts directory entries (skipped), extra
 * fields, data descriptors, any date, an archive comment and CP437 names, as PKWARE's APPNOTE 6.3.x
 * allows. It is as careful with hostile input: the central directory is the one authority (the end
 * record is searched for only over the largest comment's reach, and a second candidate is refused),
 * names are checked by {@link EntryNames} exactly as the strict reader checks them, limits and
 * compression ratios are applied to every entry on open before anything is unpacked, every local
 * header must name the same bytes and method as its central record, entries may not overlap, and
 * data is checked (CRC-32, exact size, exact packed length) as it is unpacked. Sizes come from the
 * central directory, never from a local header that defers them to a data descriptor. Refused by
 * name: encryption, methods other than stored and deflated, ZIP64, split archives, links. Nothing is
 * written anywhere.
 */
public final class ForeignZipReader implements AutoCloseable {

    private static final int ZIP64_LOCATOR_SIGNATURE = 0x07064b50;
    private static final int ZIP64_LOCATOR_BYTES = 20;
    private static final int MAX_COMMENT_BYTES = 0xFFFF;

    private static final int FLAG_ENCRYPTED = 0x0001;
    private static final int FLAG_DATA_DESCRIPTOR = 0x0008;
    private static final int FLAG_PATCHED = 0x0020;
    private static final int FLAG_STRONG_ENCRYPTION = 0x0040;
    private static final int FLAG_MASKED_HEADERS = 0x2000;
    /** Flags a local header must repeat: they change how its bytes are read. */
    private static final int FLAGS_REPEATED = FLAG_ENCRYPTED | FLAG_DATA_DESCRIPTOR | FLAG_UTF8;

    private static final int METHOD_AES = 99;
    /** APPNOTE 4.5.2: Info-ZIP Unicode Path Extra Field. */
    private static final int UNICODE_PATH_EXTRA = 0x7075;
    /** APPNOTE 4.4.2.2: version made by, upper byte 3 = UNIX (external attributes hold st_mode). */
    private static final int HOST_UNIX = 3;
    private static final long UNIX_FILE_TYPE = 0170000;
    private static final long UNIX_SYMLINK = 0120000;

    /** APPNOTE appendix D: names without the UTF-8 flag are IBM code page 437; absent from a trimmed JDK. */
    private static final Charset CP437 = Charset.isSupported("IBM437") ? Charset.forName("IBM437") : null;

    private final ArchiveSource source;
    private final Map<String, ArchiveEntry> entries;
    private final int directories;
    private final EntryData data;

    private ForeignZipReader(String fileName, ArchiveSource source, Map<String, ArchiveEntry> entries, int directories) {
        this.source = source;
        this.entries = entries;
        this.directories = directories;
        this.data = new EntryData(source, fileName, EntryData.Wording.FOREIGN);
    }

    public static ForeignZipReader open(Path file, ArchiveLimits limits) throws FormatRefusal, IOException {
        String name = file.getFileName() == null ? file.toString() : file.getFileName().toString();
        return open(name, ArchiveSource.open(file), limits);
    }

    public static ForeignZipReader open(String name, byte[] bytes, ArchiveLimits limits) throws FormatRefusal, IOException {
        return open(name, ArchiveSource.of(bytes), limits);
    }

    private static ForeignZipReader open(String name, ArchiveSource source, ArchiveLimits limits) throws FormatRefusal, IOException {
        try {
            Structure structure = new Structure(name, source, limits);
            Map<String, ArchiveEntry> entries = structure.read();
            return new ForeignZipReader(name, source, entries, structure.directories);
        } catch (FormatRefusal | IOException | RuntimeException e) {
            source.close();
            throw e;
        }
    }

    /** Whether names without the UTF-8 flag can be read (as CP437); without it, non-ASCII ones are refused. */
    public static boolean readsCp437Names() {
        return CP437 != null;
    }

    /** The file entries in central-directory order; directory entries are left out. */
    public List<ArchiveEntry> entries() {
        return List.copyOf(entries.values());
    }

    public Optional<ArchiveEntry> entry(String name) {
        return Optional.ofNullable(entries.get(name));
    }

    /** How many directory entries the archive held (they carry no data and are skipped). */
    public int directoryEntries() {
        return directories;
    }

    /** Reads one entry whole, checked. */
    public byte[] read(ArchiveEntry entry) throws FormatRefusal, IOException {
        return data.read(fromThisArchive(entry));
    }

    /**
     * Streams one entry's unpacked bytes to {@code out}, updating {@code digest} (may be null), and
     * checks size and CRC-32 against the central directory at the end.
     */
    public void copy(ArchiveEntry entry, OutputStream out, MessageDigest digest) throws FormatRefusal, IOException {
        data.copy(fromThisArchive(entry), out, digest);
    }

    private ArchiveEntry fromThisArchive(ArchiveEntry entry) {
        if (!entry.equals(entries.get(entry.name()))) {
            throw new IllegalArgumentException("entry \"" + entry.name() + "\" is not from this archive");
        }
        return entry;
    }

    @Override
    public void close() throws IOException {
        source.close();
    }

    /** One central directory record, before its local header is checked. */
    private record Central(String name, byte[] rawName, boolean directory, int flags, int method, long crc32,
            long packedSize, long size, long localOffset) {
    }

    /** The bytes one entry occupies, from its local header to the end of its data. */
    private record Span(String name, long start, long end) {
    }

    /** Parses and checks the archive's structure; reads headers only. */
    private static final class Structure {
        private final String file;
        private final ArchiveSource source;
        private final ArchiveLimits limits;
        private int directories;

        Structure(String file, ArchiveSource source, ArchiveLimits limits) {
            this.file = file;
            this.source = source;
            this.limits = limits;
        }

        Map<String, ArchiveEntry> read() throws FormatRefusal, IOException {
            long size = source.size();
            if (size > limits.maxArchiveBytes()) {
                throw new SizeLimitExceeded(file, "the archive's size (" + size + " bytes)", limits.maxArchiveBytes());
            }
            if (size < END_RECORD_BYTES) {
                throw MalformedArchive.foreign(file, "the file is too short to be a ZIP (" + size + " bytes)");
            }
            long endPosition = findEndRecord(size);
            if (endPosition >= ZIP64_LOCATOR_BYTES
                    && bytes(endPosition - ZIP64_LOCATOR_BYTES, 4).getInt() == ZIP64_LOCATOR_SIGNATURE) {
                throw zip64("the archive");
            }
            ByteBuffer end = bytes(endPosition, END_RECORD_BYTES);
            end.getInt();
            int disk = u16(end);
            int cdDisk = u16(end);
            int countOnDisk = u16(end);
            int count = u16(end);
            long cdSize = u32(end);
            long cdOffset = u32(end);
            if (count == 0xFFFF || countOnDisk == 0xFFFF || cdSize == 0xFFFF_FFFFL || cdOffset == 0xFFFF_FFFFL) {
                throw zip64("the archive");
            }
            if (disk != 0 || cdDisk != 0 || countOnDisk != count) {
                throw new UnsupportedArchiveFeature(file, "the archive is split over several parts (disks)",
                        "join the parts and pack the files again as one ZIP");
            }
            if (count > limits.maxEntries()) {
                throw new SizeLimitExceeded(file, "the number of entries (" + count + ")", limits.maxEntries());
            }
            if (cdOffset + cdSize != endPosition) {
                throw MalformedArchive.foreign(file, "the central directory does not end where the end record begins"
                        + " (bytes were added to the file, or it is a self-extracting program)");
            }
            if (cdSize > (long) count * (CENTRAL_HEADER_BYTES + 3L * 0xFFFF)) {
                throw MalformedArchive.foreign(file, "the central directory is larger than " + count + " records can be");
            }
            ByteBuffer cd = bytes(cdOffset, cdSize);
            Map<String, ArchiveEntry> files = new LinkedHashMap<>();
            EntryNames.NameSet names = new EntryNames.NameSet();
            List<Span> spans = new ArrayList<>();
            long total = 0;
            for (int i = 0; i < count; i++) {
                Central central = centralRecord(cd, i);
                if (central.directory()) {
                    String folder = central.name().substring(0, central.name().length() - 1);
                    String clash = names.addFolder(folder);
                    if (clash != null) {
                        throw new DuplicateEntry(file, central.name(), clash);
                    }
                    spans.add(locate(central, cdOffset).span);
                    directories++;
                    continue;
                }
                if (files.containsKey(central.name())) {
                    throw new DuplicateEntry(file, central.name());
                }
                String clash = names.add(central.name());
                if (clash != null) {
                    throw new DuplicateEntry(file, central.name(), clash);
                }
                limits.checkEntry(file, central.name(), central.size(), central.packedSize(),
                        central.method() == METHOD_DEFLATED);
                total += central.size();
                if (total > limits.maxTotalBytes()) {
                    throw new SizeLimitExceeded(file, "the unpacked size of all entries (" + total + " bytes so far)",
                            limits.maxTotalBytes());
                }
                Located located = locate(central, cdOffset);
                files.put(central.name(), located.entry);
                spans.add(located.span);
            }
            if (cd.hasRemaining()) {
                throw MalformedArchive.foreign(file, "the central directory holds more bytes than its " + count + " records");
            }
            refuseOverlaps(spans);
            return Collections.unmodifiableMap(files);
        }

        /**
         * The end record: the signature at the one place where the comment length it states reaches
         * exactly to the end of the file, searched for within the longest comment's reach.
         */
        private long findEndRecord(long size) throws FormatRefusal, IOException {
            int window = (int) Math.min(size, END_RECORD_BYTES + MAX_COMMENT_BYTES);
            long windowStart = size - window;
            ByteBuffer tail = bytes(windowStart, window);
            long found = -1;
            for (int i = window - END_RECORD_BYTES; i >= 0; i--) {
                if (tail.getInt(i) == END_SIGNATURE
                        && Short.toUnsignedInt(tail.getShort(i + 20)) == window - END_RECORD_BYTES - i) {
                    if (found >= 0) {
                        // a comment that hides a second end record: readers could disagree about the content
                        throw MalformedArchive.foreign(file, "the archive comment holds a second end-of-archive record");
                    }
                    found = windowStart + i;
                }
            }
            if (found < 0) {
                throw MalformedArchive.foreign(file, "no end-of-archive record (not a ZIP file, or cut short)");
            }
            return found;
        }

        private Central centralRecord(ByteBuffer cd, int index) throws FormatRefusal {
            String where = "central directory record " + (index + 1);
            if (cd.remaining() < CENTRAL_HEADER_BYTES || cd.getInt() != CENTRAL_SIGNATURE) {
                throw MalformedArchive.foreign(file, where + " is damaged");
            }
            int madeBy = u16(cd);
            u16(cd); // version needed: the method and flags below say what is needed
            int flags = u16(cd);
            int method = u16(cd);
            u16(cd); // time: any date is accepted
            u16(cd); // date
            long crc = u32(cd);
            long packed = u32(cd);
            long size = u32(cd);
            int nameLength = u16(cd);
            int extraLength = u16(cd);
            int commentLength = u16(cd);
            int diskStart = u16(cd);
            u16(cd); // internal attributes
            long external = u32(cd);
            long localOffset = u32(cd);
            if (nameLength == 0 || cd.remaining() < (long) nameLength + extraLength + commentLength) {
                throw MalformedArchive.foreign(file, where + " has a bad name, extra field or comment length");
            }
            byte[] rawName = new byte[nameLength];
            cd.get(rawName);
            byte[] extra = new byte[extraLength];
            cd.get(extra);
            cd.position(cd.position() + commentLength);

            String name = decodeName(rawName, flags, extra, where);
            boolean directory = name.endsWith("/");
            String problem = EntryNames.problem(directory ? name.substring(0, name.length() - 1) : name);
            if (problem != null) {
                throw new UnsafeEntryName(file, name, problem);
            }
            String entry = "entry \"" + name + "\"";
            if ((flags & (FLAG_ENCRYPTED | FLAG_STRONG_ENCRYPTION | FLAG_MASKED_HEADERS)) != 0 || method == METHOD_AES) {
                throw new UnsupportedArchiveFeature(file, entry + " is encrypted",
                        "ask for the package without a password, or unpack it with the password and pack it again without one");
            }
            if (packed == 0xFFFF_FFFFL || size == 0xFFFF_FFFFL || localOffset == 0xFFFF_FFFFL || diskStart == 0xFFFF) {
                throw zip64(entry);
            }
            if (diskStart != 0) {
                throw new UnsupportedArchiveFeature(file, entry + " starts on another part (disk) of a split archive",
                        "join the parts and pack the files again as one ZIP");
            }
            if (method != METHOD_STORED && method != METHOD_DEFLATED) {
                throw new UnsupportedArchiveFeature(file, entry + " uses compression method " + method + methodName(method),
                        "pack it again with deflate, the usual ZIP compression");
            }
            if ((flags & FLAG_PATCHED) != 0) {
                throw new UnsupportedArchiveFeature(file, entry + " holds patch data",
                        "pack it again with deflate, the usual ZIP compression");
            }
            if ((madeBy >>> 8) == HOST_UNIX && ((external >>> 16) & UNIX_FILE_TYPE) == UNIX_SYMLINK) {
                throw new UnsupportedArchiveFeature(file, entry + " is a symbolic link",
                        "pack the package again with the files themselves instead of links");
            }
            if (method == METHOD_STORED && packed != size) {
                throw MalformedArchive.foreign(file, "stored " + entry + " has different packed and unpacked sizes");
            }
            if (directory && size != 0) {
                throw MalformedArchive.foreign(file, "directory " + entry + " holds data");
            }
            return new Central(name, rawName, directory, flags, method, crc, packed, size, localOffset);
        }

        private String decodeName(byte[] raw, int flags, byte[] extra, String where) throws FormatRefusal {
            if ((flags & FLAG_UTF8) != 0) {
                return utf8(raw, where);
            }
            String unicodePath = unicodePath(raw, extra, where);
            if (unicodePath != null) {
                return unicodePath;
            }
            boolean ascii = true;
            for (byte b : raw) {
                ascii &= b >= 0;
            }
            if (ascii) {
                return new String(raw, StandardCharsets.US_ASCII);
            }
            if (CP437 == null) {
                throw new UnsupportedArchiveFeature(file, "the name in " + where + " is neither ASCII nor marked as UTF-8,"
                        + " and this Java runtime has no IBM437 (CP437) decoder to read it",
                        "pack it again with a program that writes UTF-8 names, or rename the file with ASCII letters only");
            }
            return new String(raw, CP437);
        }

        /** APPNOTE 4.6.9: a UTF-8 name in the extra field, used only when it is for these very name bytes. */
        private String unicodePath(byte[] raw, byte[] extra, String where) throws FormatRefusal {
            ByteBuffer e = ByteBuffer.wrap(extra).order(ByteOrder.LITTLE_ENDIAN);
            while (e.remaining() >= 4) {
                int id = u16(e);
                int length = u16(e);
                if (length > e.remaining()) {
                    return null; // some writers pad the extra field; nothing more to find
                }
                if (id == UNICODE_PATH_EXTRA && length >= 5) {
                    int version = Byte.toUnsignedInt(e.get());
                    long nameCrc = u32(e);
                    byte[] utf8 = new byte[length - 5];
                    e.get(utf8);
                    CRC32 crc = new CRC32();
                    crc.update(raw);
                    if (version == 1 && crc.getValue() == nameCrc && utf8.length > 0) {
                        return utf8(utf8, where + "'s Unicode path field");
                    }
                } else {
                    e.position(e.position() + length);
                }
            }
            return null;
        }

        private record Located(ArchiveEntry entry, Span span) {
        }

        /**
         * Checks the local header against the central record and finds the data. With a data
         * descriptor the local CRC and sizes may be zero or anything: the central ones are used.
         */
        private Located locate(Central central, long cdOffset) throws FormatRefusal, IOException {
            String entry = "entry \"" + central.name() + "\"";
            long offset = central.localOffset();
            if (offset + LOCAL_HEADER_BYTES > cdOffset) {
                throw MalformedArchive.foreign(file, "the local header of " + entry + " lies outside the entries");
            }
            ByteBuffer local = bytes(offset, LOCAL_HEADER_BYTES);
            if (local.getInt() != LOCAL_SIGNATURE) {
                throw MalformedArchive.foreign(file, "the central directory points to no local header for " + entry);
            }
            u16(local); // version needed
            int flags = u16(local);
            int method = u16(local);
            u16(local); // time
            u16(local); // date
            long crc = u32(local);
            long packed = u32(local);
            long size = u32(local);
            int nameLength = u16(local);
            int extraLength = u16(local);
            if (offset + LOCAL_HEADER_BYTES + nameLength > cdOffset) {
                throw MalformedArchive.foreign(file, "the local header of " + entry + " runs into the central directory");
            }
            byte[] localName = new byte[nameLength];
            bytes(offset + LOCAL_HEADER_BYTES, nameLength).get(localName);
            if (!java.util.Arrays.equals(localName, central.rawName())) {
                throw MalformedArchive.foreign(file, "the local header of " + entry + " gives another name (\""
                        + new String(localName, StandardCharsets.ISO_8859_1) + "\") than the central directory");
            }
            if (method != central.method() || (flags & FLAGS_REPEATED) != (central.flags() & FLAGS_REPEATED)) {
                throw MalformedArchive.foreign(file, "the local header of " + entry
                        + " disagrees with the central directory about its compression or flags");
            }
            if ((central.flags() & FLAG_DATA_DESCRIPTOR) == 0
                    && (crc != central.crc32() || packed != central.packedSize() || size != central.size())) {
                throw MalformedArchive.foreign(file, "the local header of " + entry
                        + " disagrees with the central directory about its sizes or CRC-32");
            }
            long dataOffset = offset + LOCAL_HEADER_BYTES + nameLength + extraLength;
            long dataEnd = dataOffset + central.packedSize();
            if (dataEnd > cdOffset) {
                throw MalformedArchive.foreign(file, entry + " runs into the central directory or past the end of the file");
            }
            return new Located(new ArchiveEntry(central.name(), central.method(), central.crc32(), central.packedSize(),
                    central.size(), dataOffset), new Span(central.name(), offset, dataEnd));
        }

        /** Entries that share bytes are the trick behind non-recursive zip bombs; no writer makes them. */
        private void refuseOverlaps(List<Span> spans) throws FormatRefusal {
            List<Span> sorted = new ArrayList<>(spans);
            sorted.sort(Comparator.comparingLong(Span::start));
            for (int i = 1; i < sorted.size(); i++) {
                Span before = sorted.get(i - 1);
                Span after = sorted.get(i);
                if (after.start() < before.end()) {
                    throw MalformedArchive.foreign(file, "entries \"" + before.name() + "\" and \"" + after.name()
                            + "\" share bytes (overlapping entries, a way to build decompression bombs)");
                }
            }
        }

        private UnsupportedArchiveFeature zip64(String what) {
            return new UnsupportedArchiveFeature(file, what + " uses ZIP64 records (for files over 4 GiB or 65,535 entries)",
                    "pack it again as an ordinary ZIP; a package for import is far smaller than that");
        }

        private String utf8(byte[] bytes, String where) throws FormatRefusal {
            try {
                return StandardCharsets.UTF_8.newDecoder()
                        .onMalformedInput(CodingErrorAction.REPORT)
                        .onUnmappableCharacter(CodingErrorAction.REPORT)
                        .decode(ByteBuffer.wrap(bytes)).toString();
            } catch (CharacterCodingException e) {
                throw MalformedArchive.foreign(file, "the name in " + where + " is marked as UTF-8 but is not valid UTF-8");
            }
        }

        private ByteBuffer bytes(long position, long length) throws FormatRefusal, IOException {
            return source.header(position, length, file, EntryData.Wording.FOREIGN);
        }
    }

    /** APPNOTE 4.4.5: the methods other tools may use, named so the user knows what to change. */
    private static String methodName(int method) {
        return switch (method) {
            case 1 -> " (shrink)";
            case 6 -> " (implode)";
            case 9 -> " (deflate64)";
            case 12 -> " (bzip2)";
            case 14 -> " (LZMA)";
            case 93 -> " (Zstandard)";
            case 95 -> " (xz)";
            case 98 -> " (PPMd)";
            default -> "";
        };
    }
}
