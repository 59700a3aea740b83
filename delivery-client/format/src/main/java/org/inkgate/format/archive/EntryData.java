package org.inkgate.format.archive;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.security.MessageDigest;
import java.util.zip.CRC32;
import java.util.zip.DataFormatException;
import java.util.zip.Inflater;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.MalformedArchive;

/**
 * Unpacks one entry whose structure a reader has already checked, checking the data as it goes:
 * never more than the declared size, the exact packed length, CRC-32 and size at the end. Both
 * readers use it; they differ only in how a refusal is worded ({@link Wording}).
 */
final class EntryData {

    private static final int BUFFER_BYTES = 64 * 1024;

    /** How each reader words a damaged archive, and which record it names as the authority on sizes. */
    enum Wording {
        /** {@link SafeZipReader}: Inkgate's own profile, whose local header repeats the central record. */
        INKGATE("its header"),
        /** {@link ForeignZipReader}: sizes come from the central directory alone. */
        FOREIGN("the central directory");

        private final String sizeAuthority;

        Wording(String sizeAuthority) {
            this.sizeAuthority = sizeAuthority;
        }

        MalformedArchive malformed(String file, String detail) {
            return this == INKGATE ? new MalformedArchive(file, detail) : MalformedArchive.foreign(file, detail);
        }

        /** The data of an Inkgate archive was bounded against the file on open, so running out is an I/O fault there. */
        private void endedInside(String file, ArchiveEntry entry) throws FormatRefusal, IOException {
            if (this == INKGATE) {
                throw new IOException("archive ended early while reading " + entry.name());
            }
            throw malformed(file, "the file ended inside entry \"" + entry.name() + "\"");
        }
    }

    private final ArchiveSource source;
    private final String file;
    private final Wording wording;

    EntryData(ArchiveSource source, String file, Wording wording) {
        this.source = source;
        this.file = file;
        this.wording = wording;
    }

    byte[] read(ArchiveEntry entry) throws FormatRefusal, IOException {
        EntryBytes out = new EntryBytes(entry.size());
        copy(entry, out, null);
        return out.bytes();
    }

    /** Streams the unpacked bytes to {@code out}, updating {@code digest} (may be null) with the same bytes. */
    void copy(ArchiveEntry entry, OutputStream out, MessageDigest digest) throws FormatRefusal, IOException {
        CRC32 crc = new CRC32();
        long produced = entry.deflated() ? inflate(entry, out, digest, crc) : copyStored(entry, out, digest, crc);
        if (produced != entry.size()) {
            throw wording.malformed(file, "entry \"" + entry.name() + "\" unpacks to " + produced
                    + " bytes where " + wording.sizeAuthority + " says " + entry.size());
        }
        if (crc.getValue() != entry.crc32()) {
            throw wording.malformed(file, "entry \"" + entry.name() + "\" fails its CRC-32 check");
        }
    }

    private long copyStored(ArchiveEntry entry, OutputStream out, MessageDigest digest, CRC32 crc)
            throws FormatRefusal, IOException {
        long position = entry.dataOffset();
        long remaining = entry.packedSize();
        ByteBuffer buffer = ByteBuffer.allocate(bufferFor(remaining));
        while (remaining > 0) {
            buffer.clear().limit((int) Math.min(buffer.capacity(), remaining));
            int n = source.read(buffer, position);
            if (n < 0) {
                wording.endedInside(file, entry);
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
            ByteBuffer in = ByteBuffer.allocate(bufferFor(remainingIn));
            // one byte more than the declared size, so that an entry unpacking to more is seen in the first call
            byte[] outBuffer = new byte[bufferFor(entry.size() + 1)];
            while (!inflater.finished()) {
                if (inflater.needsInput()) {
                    if (remainingIn == 0) {
                        throw wording.malformed(file, "entry \"" + entry.name() + "\" has a truncated deflate stream");
                    }
                    in.clear().limit((int) Math.min(in.capacity(), remainingIn));
                    int n = source.read(in, position);
                    if (n < 0) {
                        wording.endedInside(file, entry);
                    }
                    position += n;
                    remainingIn -= n;
                    inflater.setInput(in.array(), 0, n);
                }
                int n = inflater.inflate(outBuffer);
                produced += n;
                // never unpack past the declared size: the declared size already passed the limits
                if (produced > entry.size()) {
                    throw wording.malformed(file, "entry \"" + entry.name() + "\" unpacks to more than the "
                            + entry.size() + " bytes " + wording.sizeAuthority + " says");
                }
                emit(outBuffer, n, out, digest, crc);
                if (n == 0 && !inflater.needsInput() && !inflater.finished()) {
                    // no progress without a reason the stream states: a preset dictionary or a corrupt stream
                    throw wording.malformed(file, "entry \"" + entry.name() + "\" has a deflate stream that makes no progress");
                }
            }
            if (remainingIn != 0 || inflater.getRemaining() != 0) {
                throw wording.malformed(file, "entry \"" + entry.name() + "\" has bytes after its deflate stream");
            }
            return produced;
        } catch (DataFormatException e) {
            throw wording.malformed(file, "entry \"" + entry.name() + "\" has a corrupt deflate stream ("
                    + e.getMessage() + ")");
        } finally {
            inflater.end();
        }
    }

    /** A buffer no larger than the bytes it will hold (most entries are a few hundred bytes), nor than 64 KiB. */
    private static int bufferFor(long bytes) {
        return (int) Math.max(1, Math.min(BUFFER_BYTES, bytes));
    }

    private static void emit(byte[] bytes, int n, OutputStream out, MessageDigest digest, CRC32 crc) throws IOException {
        crc.update(bytes, 0, n);
        if (digest != null) {
            digest.update(bytes, 0, n);
        }
        out.write(bytes, 0, n);
    }
}
