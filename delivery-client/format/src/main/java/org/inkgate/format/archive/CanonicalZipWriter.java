package org.inkgate.format.archive;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.util.HashSet;
import java.util.Set;
import java.util.zip.CRC32;
import java.util.zip.Deflater;

/**
 * Writes an archive in Inkgate's ZIP profile (see {@link ZipLayout}): the same entries always
 * give the same bytes, and standard unzip tools can still open the result.
 */
public final class CanonicalZipWriter implements AutoCloseable {

    private final OutputStream out;
    private final ByteArrayOutputStream central = new ByteArrayOutputStream();
    private final Set<String> names = new HashSet<>();
    private final EntryNames.NameSet fileNames = new EntryNames.NameSet();
    private long offset;
    private int count;
    private boolean finished;

    public CanonicalZipWriter(OutputStream out) {
        this.out = out;
    }

    /** Adds an entry stored as is: right for small text and for data already compressed or encrypted. */
    public void addStored(String name, byte[] data) throws IOException {
        add(name, data, ZipLayout.METHOD_STORED);
    }

    /**
     * Adds a deflated entry: right for large text such as event logs. Text so repetitive that it
     * would expand more than readers allow ({@link ArchiveLimits#DEFAULT_MAX_RATIO}) is stored
     * instead, so that Inkgate's own files are never refused as decompression bombs.
     */
    public void addDeflated(String name, byte[] data) throws IOException {
        add(name, data, ZipLayout.METHOD_DEFLATED);
    }

    /** Adds a deflated entry whatever its ratio; for tests that build hostile archives. */
    public void addDeflatedUnchecked(String name, byte[] data) throws IOException {
        addPacked(name, data, ZipLayout.METHOD_DEFLATED, deflate(data), true);
    }

    /**
     * Adds an entry without the name checks, for tests that build hostile archives (zip slip,
     * duplicates). Never used by Inkgate's writers.
     */
    void addUnchecked(String name, byte[] data) throws IOException {
        addPacked(name, data, ZipLayout.METHOD_STORED, data, false);
    }

    private void add(String name, byte[] data, int method) throws IOException {
        if (method == ZipLayout.METHOD_DEFLATED) {
            byte[] packed = deflate(data);
            if (packed.length == 0 || data.length / packed.length > ArchiveLimits.DEFAULT_MAX_RATIO) {
                addPacked(name, data, ZipLayout.METHOD_STORED, data, true);
            } else {
                addPacked(name, data, ZipLayout.METHOD_DEFLATED, packed, true);
            }
        } else {
            addPacked(name, data, ZipLayout.METHOD_STORED, data, true);
        }
    }

    private void addPacked(String name, byte[] data, int method, byte[] packed, boolean checkName) throws IOException {
        if (finished) {
            throw new IllegalStateException("archive already finished");
        }
        if (checkName) {
            EntryNames.requireSafe(name);
            if (!names.add(name)) {
                throw new IllegalArgumentException("entry \"" + name + "\" added twice");
            }
            String clash = fileNames.add(name);
            if (clash != null) {
                throw new IllegalArgumentException("entry \"" + name + "\" " + clash);
            }
        }
        byte[] nameBytes = name.getBytes(StandardCharsets.UTF_8);
        CRC32 crc = new CRC32();
        crc.update(data);
        if (offset + ZipLayout.LOCAL_HEADER_BYTES + nameBytes.length + packed.length > 0xFFFF_FFFFL) {
            throw new IOException("archive would exceed 4 GiB, which Inkgate's archive profile does not allow");
        }
        LittleEndianWriter local = new LittleEndianWriter(out);
        local.int32(ZipLayout.LOCAL_SIGNATURE);
        local.int16(ZipLayout.VERSION);
        local.int16(ZipLayout.FLAG_UTF8);
        local.int16(method);
        local.int16(ZipLayout.DOS_TIME);
        local.int16(ZipLayout.DOS_DATE);
        local.int32((int) crc.getValue());
        local.int32(packed.length);
        local.int32(data.length);
        local.int16(nameBytes.length);
        local.int16(0);
        out.write(nameBytes);
        out.write(packed);

        LittleEndianWriter cd = new LittleEndianWriter(central);
        cd.int32(ZipLayout.CENTRAL_SIGNATURE);
        cd.int16(ZipLayout.VERSION);
        cd.int16(ZipLayout.VERSION);
        cd.int16(ZipLayout.FLAG_UTF8);
        cd.int16(method);
        cd.int16(ZipLayout.DOS_TIME);
        cd.int16(ZipLayout.DOS_DATE);
        cd.int32((int) crc.getValue());
        cd.int32(packed.length);
        cd.int32(data.length);
        cd.int16(nameBytes.length);
        cd.int16(0);
        cd.int16(0);
        cd.int16(0);
        cd.int16(0);
        cd.int32(0);
        cd.int32((int) offset);
        central.write(nameBytes);

        offset += ZipLayout.LOCAL_HEADER_BYTES + nameBytes.length + packed.length;
        count++;
    }

    /** Writes the central directory and end record; the archive is complete after this. */
    public void finish() throws IOException {
        if (finished) {
            return;
        }
        finished = true;
        if (count > 0xFFFF) {
            throw new IOException("more than 65,535 entries, which Inkgate's archive profile does not allow");
        }
        byte[] cd = central.toByteArray();
        out.write(cd);
        LittleEndianWriter end = new LittleEndianWriter(out);
        end.int32(ZipLayout.END_SIGNATURE);
        end.int16(0);
        end.int16(0);
        end.int16(count);
        end.int16(count);
        end.int32(cd.length);
        end.int32((int) offset);
        end.int16(0);
        out.flush();
    }

    @Override
    public void close() throws IOException {
        finish();
        out.close();
    }

    private static byte[] deflate(byte[] data) {
        Deflater deflater = new Deflater(Deflater.BEST_COMPRESSION, true);
        try {
            deflater.setInput(data);
            deflater.finish();
            ByteArrayOutputStream packed = new ByteArrayOutputStream(Math.max(64, data.length / 4));
            byte[] buffer = new byte[64 * 1024];
            while (!deflater.finished()) {
                int n = deflater.deflate(buffer);
                packed.write(buffer, 0, n);
            }
            return packed.toByteArray();
        } finally {
            deflater.end();
        }
    }

    private record LittleEndianWriter(OutputStream out) {
        void int16(int v) throws IOException {
            out.write(v & 0xff);
            out.write((v >>> 8) & 0xff);
        }

        void int32(int v) throws IOException {
            int16(v & 0xffff);
            int16((v >>> 16) & 0xffff);
        }
    }
}
