package org.inkgate.format.archive;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.security.MessageDigest;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.zip.CRC32;
import java.util.zip.DataFormatException;
import java.util.zip.Inflater;
import org.inkgate.format.refusal.CompressionRatioExceeded;
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

    private final String fileName;
    private final Source channel;
    private final Map<String, ArchiveEntry> entries;
    private final ArchiveLimits limits;

    private SafeZipReader(String fileName, Source channel, Map<String, ArchiveEntry> entries, ArchiveLimits limits) {
        this.fileName = fileName;
        this.channel = channel;
        this.entries = entries;
        this.limits = limits;
    }

    public static SafeZipReader open(Path file, ArchiveLimits limits) throws FormatRefusal, IOException {
        String name = file.getFileName() == null ? file.toString() : file.getFileName().toString();
        return open(name, new FileSource(FileChannel.open(file, StandardOpenOption.READ)), limits);
    }

    /** Reads an archive held in memory (e.g. just decrypted), so its content never touches the disk. */
    public static SafeZipReader open(String name, byte[] bytes, ArchiveLimits limits) throws FormatRefusal, IOException {
        return open(name, new BytesSource(bytes), limits);
    }

    private static SafeZipReader open(String name, Source source, ArchiveLimits limits) throws FormatRefusal, IOException {
        try {
            Map<String, ArchiveEntry> entries = new Structure(name, source, limits).read();
            return new SafeZipReader(name, source, entries, limits);
        } catch (FormatRefusal | IOException | RuntimeException e) {
            source.close();
            throw e;
        }
    }

    /** Positional reads from a file or from memory. */
    private interface Source extends AutoCloseable {
        long size() throws IOException;

        int read(ByteBuffer into, long position) throws IOException;

        @Override
        void close() throws IOException;
    }

    private record FileSource(FileChannel channel) implements Source {
        @Override
        public long size() throws IOException {
            return channel.size();
        }

        @Override
        public int read(ByteBuffer into, long position) throws IOException {
            return channel.read(into, position);
        }

        @Override
        public void close() throws IOException {
            channel.close();
        }
    }

    private record BytesSource(byte[] bytes) implements Source {
        @Override
        public long size() {
            return bytes.length;
        }

        @Override
        public int read(ByteBuffer into, long position) {
            if (position >= bytes.length) {
                return -1;
            }
            int n = (int) Math.min(into.remaining(), bytes.length - position);
            into.put(bytes, (int) position, n);
            return n;
        }

        @Override
        public void close() {
            // nothing held
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
        ByteArrayOutputStream out = new ByteArrayOutputStream((int) Math.min(entry.size(), 1 << 20));
        copy(entry, out, null);
        return out.toByteArray();
    }

    /**
     * Streams one entry's unpacked bytes to {@code out}, updating {@code digest} (may be null)
     * with the same bytes, and checks size and CRC-32 at the end.
     */
    public void copy(ArchiveEntry entry, OutputStream out, MessageDigest digest) throws FormatRefusal, IOException {
        CRC32 crc = new CRC32();
        long produced = entry.deflated() ? inflate(entry, out, digest, crc) : copyStored(entry, out, digest, crc);
        if (produced != entry.size()) {
            throw new MalformedArchive(fileName, "entry \"" + entry.name() + "\" unpacks to " + produced
                    + " bytes where its header says " + entry.size());
        }
        if (crc.getValue() != entry.crc32()) {
            throw new MalformedArchive(fileName, "entry \"" + entry.name() + "\" fails its CRC-32 check");
        }
    }

    private long copyStored(ArchiveEntry entry, OutputStream out, MessageDigest digest, CRC32 crc) throws IOException {
        long position = entry.dataOffset();
        long remaining = entry.packedSize();
        ByteBuffer buffer = ByteBuffer.allocate(64 * 1024);
        while (remaining > 0) {
            buffer.clear().limit((int) Math.min(buffer.capacity(), remaining));
            int n = channel.read(buffer, position);
            if (n < 0) {
                throw new IOException("archive ended early while reading " + entry.name());
            }
            emit(buffer.array(), n, out, digest, crc);
            position += n;
            remaining -= n;
        }
        return entry.packedSize();
    }

    private long inflate(ArchiveEntry entry, OutputStream out, MessageDigest digest, CRC32 crc)
            throws FormatRefusal, IOException {
        Inflater inflater = new Inflater(true);
        try {
            long position = entry.dataOffset();
            long remainingIn = entry.packedSize();
            long produced = 0;
            ByteBuffer in = ByteBuffer.allocate(64 * 1024);
            byte[] outBuffer = new byte[64 * 1024];
            while (!inflater.finished()) {
                if (inflater.needsInput()) {
                    if (remainingIn == 0) {
                        throw new MalformedArchive(fileName, "entry \"" + entry.name() + "\" has a truncated deflate stream");
                    }
                    in.clear().limit((int) Math.min(in.capacity(), remainingIn));
                    int n = channel.read(in, position);
                    if (n < 0) {
                        throw new IOException("archive ended early while reading " + entry.name());
                    }
                    position += n;
                    remainingIn -= n;
                    inflater.setInput(in.array(), 0, n);
                }
                int n = inflater.inflate(outBuffer);
                produced += n;
                // never unpack past the declared size: the declared size already passed the limits
                if (produced > entry.size()) {
                    throw new MalformedArchive(fileName, "entry \"" + entry.name() + "\" unpacks to more than the "
                            + entry.size() + " bytes its header says");
                }
                emit(outBuffer, n, out, digest, crc);
                if (n == 0 && !inflater.needsInput() && !inflater.finished()) {
                    // no progress without a reason the stream states: a preset dictionary or a corrupt stream
                    throw new MalformedArchive(fileName, "entry \"" + entry.name() + "\" has a deflate stream that makes no progress");
                }
            }
            if (remainingIn != 0 || inflater.getRemaining() != 0) {
                throw new MalformedArchive(fileName, "entry \"" + entry.name() + "\" has bytes after its deflate stream");
            }
            return produced;
        } catch (DataFormatException e) {
            throw new MalformedArchive(fileName, "entry \"" + entry.name() + "\" has a corrupt deflate stream ("
                    + e.getMessage() + ")");
        } finally {
            inflater.end();
        }
    }

    private static void emit(byte[] bytes, int n, OutputStream out, MessageDigest digest, CRC32 crc) throws IOException {
        crc.update(bytes, 0, n);
        if (digest != null) {
            digest.update(bytes, 0, n);
        }
        out.write(bytes, 0, n);
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
        private final Source channel;
        private final ArchiveLimits limits;

        Structure(String file, Source channel, ArchiveLimits limits) {
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
                checkLimits(entry);
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

        private void checkLimits(ArchiveEntry entry) throws FormatRefusal {
            if (entry.size() > limits.maxEntryBytes()) {
                throw new SizeLimitExceeded(file, "entry \"" + entry.name() + "\" (" + entry.size() + " bytes unpacked)",
                        limits.maxEntryBytes());
            }
            if (entry.deflated() && entry.size() > 0) {
                if (entry.packedSize() == 0) {
                    throw new CompressionRatioExceeded(file, entry.name(), Long.MAX_VALUE, limits.maxRatio());
                }
                // exact comparison: size / packed > maxRatio, without integer division rounding down
                if (entry.size() > entry.packedSize() * limits.maxRatio()) {
                    throw new CompressionRatioExceeded(file, entry.name(), entry.size() / entry.packedSize(), limits.maxRatio());
                }
            }
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
            if (position < 0 || length < 0 || position + length > channel.size() || length > Integer.MAX_VALUE) {
                throw new MalformedArchive(file, "a header points outside the file");
            }
            ByteBuffer buffer = ByteBuffer.allocate((int) length).order(ByteOrder.LITTLE_ENDIAN);
            while (buffer.hasRemaining()) {
                if (channel.read(buffer, position + buffer.position()) < 0) {
                    throw new MalformedArchive(file, "the file ended inside a header");
                }
            }
            return buffer.flip();
        }
    }

    private static int u16(ByteBuffer b) {
        return Short.toUnsignedInt(b.getShort());
    }

    private static long u32(ByteBuffer b) {
        return Integer.toUnsignedLong(b.getInt());
    }
}
