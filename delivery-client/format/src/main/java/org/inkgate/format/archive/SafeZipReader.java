package org.inkgate.format.archive;

import static org.inkgate.format.archive.ZipLayout.u16;
import static org.inkgate.format.archive.ZipLayout.u32;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.inkgate.format.refusal.DuplicateEntry;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.MalformedArchive;
import org.inkgate.format.refusal.SizeLimitExceeded;
import org.inkgate.format.refusal.UnsafeEntryName;

/**
 * Reads archives in Inkgate's ZIP profile ({@link ZipLayout}) from untrusted media. The whole
 * structure is checked on open, before any entry is unpacked: names, duplicates, limits,
 * compression ratios, and that every local header repeats its central directory record and
 * that entries lie end to end with nothing hidden between them. Entry data is checked (CRC-32,
 * exact size, exact packed length) as it is read. Nothing is written anywhere.
 */
public final class SafeZipReader implements AutoCloseable {

    private final ArchiveSource channel;
    private final Map<String, ArchiveEntry> entries;
    private final ArchiveLimits limits;
    private final EntryData data;

    private SafeZipReader(String fileName, ArchiveSource channel, Map<String, ArchiveEntry> entries, ArchiveLimits limits) {
        this.channel = channel;
        this.entries = entries;
        this.limits = limits;
        this.data = new EntryData(channel, fileName, EntryData.Wording.INKGATE);
    }

    public static SafeZipReader open(Path file, ArchiveLimits limits) throws FormatRefusal, IOException {
        String name = file.getFileName() == null ? file.toString() : file.getFileName().toString();
        return open(name, ArchiveSource.open(file), limits);
    }

    /** Reads an archive held in memory (e.g. just decrypted), so its content never touches the disk. */
    public static SafeZipReader open(String name, byte[] bytes, ArchiveLimits limits) throws FormatRefusal, IOException {
        return open(name, ArchiveSource.of(bytes), limits);
    }

    private static SafeZipReader open(String name, ArchiveSource source, ArchiveLimits limits) throws FormatRefusal, IOException {
        try {
            Map<String, ArchiveEntry> entries = new Structure(name, source, limits).read();
            return new SafeZipReader(name, source, entries, limits);
        } catch (FormatRefusal | IOException | RuntimeException e) {
            source.close();
            throw e;
        }
    }

    /** The entries in archive order. */
    public List<ArchiveEntry> entries() {
        return List.copyOf(entries.values());
    }

    public Optional<ArchiveEntry> entry(String name) {
        return Optional.ofNullable(entries.get(name));
    }

    /** Reads one entry whole; for small entries such as manifests. */
    public byte[] read(ArchiveEntry entry) throws FormatRefusal, IOException {
        return data.read(entry);
    }

    /**
     * Streams one entry's unpacked bytes to {@code out}, updating {@code digest} (may be null)
     * with the same bytes, and checks size and CRC-32 at the end.
     */
    public void copy(ArchiveEntry entry, OutputStream out, MessageDigest digest) throws FormatRefusal, IOException {
        data.copy(entry, out, digest);
    }

    public ArchiveLimits limits() {
        return limits;
    }

    @Override
    public void close() throws IOException {
        channel.close();
    }

    /** Parses and checks the archive's structure; reads headers only. */
    private static final class Structure {
        private final String file;
        private final ArchiveSource channel;
        private final ArchiveLimits limits;

        Structure(String file, ArchiveSource channel, ArchiveLimits limits) {
            this.file = file;
            this.channel = channel;
            this.limits = limits;
        }

        Map<String, ArchiveEntry> read() throws FormatRefusal, IOException {
            long size = channel.size();
            if (size > limits.maxArchiveBytes()) {
                throw new SizeLimitExceeded(file, "the archive's size (" + size + " bytes)", limits.maxArchiveBytes());
            }
            if (size < ZipLayout.END_RECORD_BYTES) {
                throw new MalformedArchive(file, "the file is too short to be an archive (" + size + " bytes)");
            }
            ByteBuffer end = bytes(size - ZipLayout.END_RECORD_BYTES, ZipLayout.END_RECORD_BYTES);
            if (end.getInt() != ZipLayout.END_SIGNATURE) {
                throw new MalformedArchive(file, "no end-of-archive record at the end of the file (truncated, or has a trailing comment)");
            }
            int disk = u16(end);
            int cdDisk = u16(end);
            int countOnDisk = u16(end);
            int count = u16(end);
            long cdSize = u32(end);
            long cdOffset = u32(end);
            int commentLength = u16(end);
            if (disk != 0 || cdDisk != 0 || countOnDisk != count || commentLength != 0) {
                throw new MalformedArchive(file, "the end-of-archive record is not in Inkgate's profile (split archive or comment)");
            }
            if (count > limits.maxEntries()) {
                throw new SizeLimitExceeded(file, "the number of entries (" + count + ")", limits.maxEntries());
            }
            if (cdSize > (long) count * (ZipLayout.CENTRAL_HEADER_BYTES + ZipLayout.MAX_NAME_BYTES)) {
                throw new MalformedArchive(file, "the central directory is larger than " + count + " records can be");
            }
            if (cdOffset + cdSize != size - ZipLayout.END_RECORD_BYTES) {
                throw new MalformedArchive(file, "the central directory does not end where the end record begins");
            }
            ByteBuffer cd = bytes(cdOffset, cdSize);
            Map<String, ArchiveEntry> entries = new LinkedHashMap<>();
            EntryNames.NameSet names = new EntryNames.NameSet();
            long expectedLocal = 0;
            long total = 0;
            for (int i = 0; i < count; i++) {
                ArchiveEntry entry = centralRecord(cd, i);
                if (entries.containsKey(entry.name())) {
                    throw new DuplicateEntry(file, entry.name());
                }
                String clash = names.add(entry.name());
                if (clash != null) {
                    throw new DuplicateEntry(file, entry.name(), clash);
                }
                limits.checkEntry(file, entry.name(), entry.size(), entry.packedSize(), entry.deflated());
                total += entry.size();
                if (total > limits.maxTotalBytes()) {
                    throw new SizeLimitExceeded(file, "the unpacked size of all entries (" + total + " bytes so far)",
                            limits.maxTotalBytes());
                }
                long localOffset = entry.dataOffset();
                if (localOffset != expectedLocal) {
                    throw new MalformedArchive(file, "entry \"" + entry.name() + "\" is not where the previous entry ends (hidden bytes between entries)");
                }
                ArchiveEntry located = checkLocalHeader(entry);
                entries.put(located.name(), located);
                expectedLocal = located.dataOffset() + located.packedSize();
            }
            if (cd.hasRemaining()) {
                throw new MalformedArchive(file, "the central directory holds more bytes than its " + count + " records");
            }
            if (expectedLocal != cdOffset) {
                throw new MalformedArchive(file, "there are bytes between the last entry and the central directory");
            }
            return Collections.unmodifiableMap(entries);
        }

        /** Reads one central record; its dataOffset field temporarily holds the local header offset. */
        private ArchiveEntry centralRecord(ByteBuffer cd, int index) throws FormatRefusal {
            if (cd.remaining() < ZipLayout.CENTRAL_HEADER_BYTES || cd.getInt() != ZipLayout.CENTRAL_SIGNATURE) {
                throw new MalformedArchive(file, "central directory record " + (index + 1) + " is damaged");
            }
            int madeBy = u16(cd);
            int needed = u16(cd);
            int flags = u16(cd);
            int method = u16(cd);
            int time = u16(cd);
            int date = u16(cd);
            long crc = u32(cd);
            long packed = u32(cd);
            long size = u32(cd);
            int nameLength = u16(cd);
            int extraLength = u16(cd);
            int commentLength = u16(cd);
            int diskStart = u16(cd);
            int internal = u16(cd);
            long external = u32(cd);
            long localOffset = u32(cd);
            if (nameLength == 0 || nameLength > ZipLayout.MAX_NAME_BYTES || cd.remaining() < nameLength) {
                throw new MalformedArchive(file, "central directory record " + (index + 1) + " has a bad name length");
            }
            byte[] nameBytes = new byte[nameLength];
            cd.get(nameBytes);
            String name = utf8(nameBytes, index);
            String problem = EntryNames.problem(name);
            if (problem != null) {
                throw new UnsafeEntryName(file, name, problem);
            }
            if (madeBy != ZipLayout.VERSION || needed != ZipLayout.VERSION || flags != ZipLayout.FLAG_UTF8
                    || time != ZipLayout.DOS_TIME || date != ZipLayout.DOS_DATE || extraLength != 0
                    || commentLength != 0 || diskStart != 0 || internal != 0 || external != 0) {
                throw new MalformedArchive(file, "entry \"" + name + "\" has headers outside Inkgate's profile"
                        + " (encryption, extra fields, comments, dates or attributes)");
            }
            if (method != ZipLayout.METHOD_STORED && method != ZipLayout.METHOD_DEFLATED) {
                throw new MalformedArchive(file, "entry \"" + name + "\" uses compression method " + method
                        + "; only stored and deflated entries are read");
            }
            if (method == ZipLayout.METHOD_STORED && packed != size) {
                throw new MalformedArchive(file, "stored entry \"" + name + "\" has different packed and unpacked sizes");
            }
            return new ArchiveEntry(name, method, crc, packed, size, localOffset);
        }

        private ArchiveEntry checkLocalHeader(ArchiveEntry central) throws FormatRefusal, IOException {
            long offset = central.dataOffset();
            byte[] nameBytes = central.name().getBytes(StandardCharsets.UTF_8);
            ByteBuffer local = bytes(offset, ZipLayout.LOCAL_HEADER_BYTES + nameBytes.length);
            boolean same = local.getInt() == ZipLayout.LOCAL_SIGNATURE
                    && u16(local) == ZipLayout.VERSION
                    && u16(local) == ZipLayout.FLAG_UTF8
                    && u16(local) == central.method()
                    && u16(local) == ZipLayout.DOS_TIME
                    && u16(local) == ZipLayout.DOS_DATE
                    && u32(local) == central.crc32()
                    && u32(local) == central.packedSize()
                    && u32(local) == central.size()
                    && u16(local) == nameBytes.length
                    && u16(local) == 0;
            if (same) {
                byte[] localName = new byte[nameBytes.length];
                local.get(localName);
                same = java.util.Arrays.equals(localName, nameBytes);
            }
            if (!same) {
                throw new MalformedArchive(file, "the local header of entry \"" + central.name()
                        + "\" does not repeat its central directory record");
            }
            long dataOffset = offset + ZipLayout.LOCAL_HEADER_BYTES + nameBytes.length;
            if (dataOffset + central.packedSize() > channel.size()) {
                throw new MalformedArchive(file, "entry \"" + central.name() + "\" runs past the end of the file");
            }
            return new ArchiveEntry(central.name(), central.method(), central.crc32(), central.packedSize(),
                    central.size(), dataOffset);
        }

        private String utf8(byte[] bytes, int index) throws FormatRefusal {
            try {
                return StandardCharsets.UTF_8.newDecoder()
                        .onMalformedInput(CodingErrorAction.REPORT)
                        .onUnmappableCharacter(CodingErrorAction.REPORT)
                        .decode(ByteBuffer.wrap(bytes)).toString();
            } catch (CharacterCodingException e) {
                throw new MalformedArchive(file, "the name of entry " + (index + 1) + " is not valid UTF-8");
            }
        }

        private ByteBuffer bytes(long position, long length) throws FormatRefusal, IOException {
            return channel.header(position, length, file, EntryData.Wording.INKGATE);
        }
    }
}
