package org.inkgate.format.archive;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;
import java.util.Map;
import java.util.zip.CRC32;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;
import org.inkgate.format.refusal.CompressionRatioExceeded;
import org.inkgate.format.refusal.DuplicateEntry;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.MalformedArchive;
import org.inkgate.format.refusal.SizeLimitExceeded;
import org.inkgate.format.refusal.UnsafeEntryName;
import org.inkgate.format.refusal.UnsupportedArchiveFeature;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@link ForeignZipReader} over ZIPs other programs write (the JDK's ZipOutputStream here; Info-ZIP
 * and Python's zipfile in the admin tool's QTI command test) and over hostile ones. Header offsets
 * patched below are those of PKWARE's APPNOTE 6.3.x, sections 4.3.7 (local file header) and 4.3.12
 * (central directory header).
 */
class ForeignZipReaderTest {

    private static final byte[] MANIFEST = "<manifest>an invented package</manifest>\n".getBytes(StandardCharsets.UTF_8);
    private static final byte[] ITEM = "<item>Write about an invented ferry.</item>\n".repeat(20).getBytes(StandardCharsets.UTF_8);

    @TempDir
    Path dir;

    /** A package as authoring tools write one: directories, data descriptors, real dates, extra fields, comments. */
    private static byte[] jdkZip() throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ZipOutputStream zip = new ZipOutputStream(bytes)) {
            zip.setComment("written by an invented item bank");
            zip.putNextEntry(new ZipEntry("items/"));
            zip.closeEntry();
            ZipEntry manifest = new ZipEntry("imsmanifest.xml");
            manifest.setMethod(ZipEntry.STORED);
            manifest.setSize(MANIFEST.length);
            CRC32 crc = new CRC32();
            crc.update(MANIFEST);
            manifest.setCrc(crc.getValue());
            manifest.setLastModifiedTime(FileTime.fromMillis(1_764_000_000_000L)); // adds an extended-timestamp extra field
            manifest.setComment("the manifest");
            zip.putNextEntry(manifest);
            zip.write(MANIFEST);
            zip.closeEntry();
            ZipEntry item = new ZipEntry("items/ferry.xml"); // deflated: the JDK writes a data descriptor
            item.setExtra(new byte[] {(byte) 0xfe, (byte) 0xca, 2, 0, 7, 7}); // an unknown extra field
            zip.putNextEntry(item);
            zip.write(ITEM);
            zip.closeEntry();
        }
        return bytes.toByteArray();
    }

    private static ForeignZipReader open(byte[] zip) throws Exception {
        return ForeignZipReader.open("package.zip", zip, ArchiveLimits.defaults());
    }

    @Test
    void jdkZip_withDirectoriesDescriptorsExtrasAndComment_isRead() throws Exception {
        byte[] zip = jdkZip();
        // the file really has what the strict profile refuses
        assertEquals(0x0808, u16(zip, localHeader(zip, "items/ferry.xml") + 6), "data descriptor and UTF-8 flags");
        assertThrows(MalformedArchive.class, () -> SafeZipReader.open("package.zip", zip, ArchiveLimits.defaults()));

        try (ForeignZipReader reader = open(zip)) {
            assertEquals(List.of("imsmanifest.xml", "items/ferry.xml"), reader.entries().stream().map(ArchiveEntry::name).toList());
            assertEquals(1, reader.directoryEntries());
            assertArrayEquals(MANIFEST, reader.read(reader.entry("imsmanifest.xml").orElseThrow()));
            assertArrayEquals(ITEM, reader.read(reader.entry("items/ferry.xml").orElseThrow()));
        }
    }

    @Test
    void inkgatesOwnArchive_isReadToo() throws Exception {
        Path file = dir.resolve("own.zip");
        HostileArchives.writeRaw(file, Map.entry("a.txt", MANIFEST), Map.entry("b/c.txt", ITEM));
        try (ForeignZipReader reader = ForeignZipReader.open(file, ArchiveLimits.defaults())) {
            assertArrayEquals(ITEM, reader.read(reader.entry("b/c.txt").orElseThrow()));
        }
    }

    @Test
    void namesWithoutUtf8Flag_areReadAsCp437() throws Exception {
        assertTrue(ForeignZipReader.readsCp437Names(), "the JDK's jdk.charsets module has IBM437");
        // CP437 0x82 is é (IBM code page 437 table, APPNOTE appendix D)
        byte[] zip = zip(StandardCharsets.ISO_8859_1, "caf\u0082.txt", MANIFEST);
        assertEquals(0, u16(zip, localHeader(zip, "caf\u0082.txt") + 6) & 0x0800, "no UTF-8 flag");
        try (ForeignZipReader reader = open(zip)) {
            assertArrayEquals(MANIFEST, reader.read(reader.entry("café.txt").orElseThrow()));
        }
    }

    @Test
    void zipSlipNames_areRefusedAsUnsafe() throws Exception {
        for (String name : List.of("../evil.xml", "/etc/evil.xml", "items\\evil.xml", "C:evil.xml", "a\u0000b.xml",
                "items/../../evil.xml", "../")) {
            FormatRefusal e = assertThrows(UnsafeEntryName.class, () -> open(zip(StandardCharsets.UTF_8, name, MANIFEST)), name);
            assertTrue(e.getMessage().contains("not a safe relative path"), e.getMessage());
        }
    }

    @Test
    void duplicateNames_areRefused() throws Exception {
        Path file = dir.resolve("dup.zip");
        HostileArchives.writeRaw(file, Map.entry("imsmanifest.xml", MANIFEST), Map.entry("imsmanifest.xml", ITEM));
        DuplicateEntry exact = assertThrows(DuplicateEntry.class, () -> ForeignZipReader.open(file, ArchiveLimits.defaults()));
        assertTrue(exact.getMessage().contains("appears more than once"), exact.getMessage());

        byte[] cased = zip(StandardCharsets.UTF_8, "Items/Ferry.xml", MANIFEST, "items/ferry.xml", ITEM);
        DuplicateEntry folded = assertThrows(DuplicateEntry.class, () -> open(cased));
        assertTrue(folded.getMessage().contains("ignores case"), folded.getMessage());

        byte[] fileAndFolder = zip(StandardCharsets.UTF_8, "items", MANIFEST, "items/", new byte[0]);
        DuplicateEntry both = assertThrows(DuplicateEntry.class, () -> open(fileAndFolder));
        assertTrue(both.getMessage().contains("both a file and a folder"), both.getMessage());
    }

    @Test
    void bomb_isRefusedFromTheCentralDirectoryBeforeUnpacking() throws Exception {
        byte[] zip = zip(StandardCharsets.UTF_8, "bomb.xml", new byte[10 << 20]);
        CompressionRatioExceeded e = assertThrows(CompressionRatioExceeded.class, () -> open(zip));
        assertTrue(e.getMessage().contains("decompression bomb"), e.getMessage());
    }

    @Test
    void tooManyEntries_andTooLargeEntries_areRefused() throws Exception {
        byte[] zip = jdkZip();
        ArchiveLimits two = new ArchiveLimits(1 << 20, 2, 1 << 20, 1 << 20, 100);
        SizeLimitExceeded count = assertThrows(SizeLimitExceeded.class, () -> ForeignZipReader.open("p.zip", zip, two));
        assertTrue(count.getMessage().contains("number of entries (3)"), count.getMessage());
        ArchiveLimits small = new ArchiveLimits(1 << 20, 10, 100, 1 << 20, 100);
        SizeLimitExceeded size = assertThrows(SizeLimitExceeded.class, () -> ForeignZipReader.open("p.zip", zip, small));
        assertTrue(size.getMessage().contains("items/ferry.xml"), size.getMessage());
        ArchiveLimits total = new ArchiveLimits(1 << 20, 10, 1000, 500, 100);
        SizeLimitExceeded all = assertThrows(SizeLimitExceeded.class, () -> ForeignZipReader.open("p.zip", zip, total));
        assertTrue(all.getMessage().contains("unpacked size of all entries"), all.getMessage());
        ArchiveLimits file = new ArchiveLimits(100, 10, 1000, 1000, 100);
        SizeLimitExceeded archive = assertThrows(SizeLimitExceeded.class, () -> ForeignZipReader.open("p.zip", zip, file));
        assertTrue(archive.getMessage().contains("the archive's size"), archive.getMessage());
    }

    @Test
    void badCrc_isRefusedWhileReading() throws Exception {
        byte[] zip = jdkZip();
        int data = localHeader(zip, "imsmanifest.xml") + 30 + "imsmanifest.xml".length() + u16(zip, localHeader(zip, "imsmanifest.xml") + 28);
        zip[data] ^= 1;
        try (ForeignZipReader reader = open(zip)) {
            MalformedArchive e = assertThrows(MalformedArchive.class, () -> reader.read(reader.entry("imsmanifest.xml").orElseThrow()));
            assertTrue(e.getMessage().contains("fails its CRC-32 check"), e.getMessage());
            assertTrue(e.getMessage().contains("not a readable ZIP archive"), e.getMessage());
        }
    }

    @Test
    void localHeaderNamingAnotherFile_isRefused() throws Exception {
        byte[] zip = jdkZip();
        int local = localHeader(zip, "items/ferry.xml");
        System.arraycopy("items/fairy".getBytes(StandardCharsets.US_ASCII), 0, zip, local + 30, 11);
        MalformedArchive e = assertThrows(MalformedArchive.class, () -> open(zip));
        assertTrue(e.getMessage().contains("gives another name (\"items/fairy.xml\")"), e.getMessage());
    }

    @Test
    void encryptedEntry_isRefused() throws Exception {
        byte[] zip = jdkZip();
        setBoth(zip, "imsmanifest.xml", 6, 8, u16(zip, localHeader(zip, "imsmanifest.xml") + 6) | 1);
        UnsupportedArchiveFeature e = assertThrows(UnsupportedArchiveFeature.class, () -> open(zip));
        assertTrue(e.getMessage().contains("entry \"imsmanifest.xml\" is encrypted"), e.getMessage());
        assertTrue(e.getMessage().contains("without a password"), e.getMessage());
    }

    @Test
    void unsupportedMethod_isRefusedByName() throws Exception {
        byte[] zip = jdkZip();
        setBoth(zip, "items/ferry.xml", 8, 10, 12);
        UnsupportedArchiveFeature e = assertThrows(UnsupportedArchiveFeature.class, () -> open(zip));
        assertTrue(e.getMessage().contains("entry \"items/ferry.xml\" uses compression method 12 (bzip2)"), e.getMessage());
        assertTrue(e.getMessage().contains("pack it again with deflate"), e.getMessage());
    }

    @Test
    void zip64AndSplitArchives_areRefusedClearly() throws Exception {
        byte[] zip = jdkZip();
        int end = endRecord(zip);
        byte[] split = zip.clone();
        put16(split, end + 4, 1);
        UnsupportedArchiveFeature s = assertThrows(UnsupportedArchiveFeature.class, () -> open(split));
        assertTrue(s.getMessage().contains("split over several parts"), s.getMessage());
        byte[] zip64 = zip.clone();
        put32(zip64, centralHeader(zip64, "items/ferry.xml") + 24, -1); // unpacked size 0xFFFFFFFF: in a ZIP64 field
        UnsupportedArchiveFeature z = assertThrows(UnsupportedArchiveFeature.class, () -> open(zip64));
        assertTrue(z.getMessage().contains("ZIP64"), z.getMessage());
        // a ZIP64 end-of-central-directory locator (APPNOTE 4.3.15) right before the end record
        byte[] located = new byte[zip.length + 20];
        System.arraycopy(zip, 0, located, 0, end);
        put32(located, end, 0x07064b50);
        System.arraycopy(zip, end, located, end + 20, zip.length - end);
        UnsupportedArchiveFeature l = assertThrows(UnsupportedArchiveFeature.class, () -> open(located));
        assertTrue(l.getMessage().contains("the archive uses ZIP64 records"), l.getMessage());
    }

    @Test
    void overlappingEntries_andASecondEndRecordInTheComment_areRefused() throws Exception {
        MalformedArchive shared = assertThrows(MalformedArchive.class, () -> open(overlapping()));
        assertTrue(shared.getMessage().contains("entries \"a.txt\" and \"b.txt\" share bytes"), shared.getMessage());

        byte[] zip = jdkZip();

        // a real end record whose comment holds a forged one reaching exactly to the end
        int end = endRecord(zip);
        byte[] forged = new byte[22];
        System.arraycopy(zip, end, forged, 0, 20);
        byte[] twice = new byte[end + 22 + 22];
        System.arraycopy(zip, 0, twice, 0, end + 20);
        put16(twice, end + 20, 22);
        System.arraycopy(forged, 0, twice, end + 22, 22);
        MalformedArchive e = assertThrows(MalformedArchive.class, () -> open(twice));
        assertTrue(e.getMessage().contains("second end-of-archive record"), e.getMessage());
    }

    @Test
    void garbageAndTruncation_areRefusedAsMalformed() throws Exception {
        byte[] zip = jdkZip();
        assertThrows(MalformedArchive.class, () -> open("not a zip at all, just text".getBytes(StandardCharsets.UTF_8)));
        for (int cut = 1; cut < zip.length; cut += 7) {
            byte[] part = java.util.Arrays.copyOf(zip, cut);
            assertThrows(FormatRefusal.class, () -> {
                try (ForeignZipReader r = open(part)) {
                    for (ArchiveEntry e : r.entries()) {
                        r.read(e);
                    }
                }
            }, "cut at " + cut);
        }
    }

    // ---- helpers: ZIPs from the JDK, and header offsets per APPNOTE 4.3.7 / 4.3.12 / 4.3.16

    /** Name, content pairs; deflated; names encoded in {@code names} (the UTF-8 flag is set only for UTF-8). */
    private static byte[] zip(java.nio.charset.Charset names, Object... nameAndData) throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ZipOutputStream zip = new ZipOutputStream(bytes, names)) {
            for (int i = 0; i < nameAndData.length; i += 2) {
                zip.putNextEntry(new ZipEntry((String) nameAndData[i]));
                zip.write((byte[]) nameAndData[i + 1]);
                zip.closeEntry();
            }
        }
        return bytes.toByteArray();
    }

    private static byte[] storedZip(String name, byte[] data) throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ZipOutputStream zip = new ZipOutputStream(bytes)) {
            ZipEntry entry = new ZipEntry(name);
            entry.setMethod(ZipEntry.STORED);
            entry.setSize(data.length);
            CRC32 crc = new CRC32();
            crc.update(data);
            entry.setCrc(crc.getValue());
            zip.putNextEntry(entry);
            zip.write(data);
            zip.closeEntry();
        }
        return bytes.toByteArray();
    }

    /**
     * Entry a.txt stores a complete local header and data of b.txt, and a second central record
     * points into it: every header agrees, but the two entries share bytes.
     */
    private static byte[] overlapping() throws Exception {
        byte[] inner = storedZip("b.txt", MANIFEST);
        int innerCd = centralHeader(inner, "b.txt");
        byte[] outer = storedZip("a.txt", java.util.Arrays.copyOf(inner, innerCd));
        int aLocal = localHeader(outer, "a.txt");
        int aData = aLocal + 30 + 5 + u16(outer, aLocal + 28);
        byte[] bRecord = java.util.Arrays.copyOfRange(inner, innerCd, endRecord(inner));
        put32(bRecord, 42, aData);
        int outerEnd = endRecord(outer);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        out.write(outer, 0, outerEnd);
        out.write(bRecord);
        byte[] end = java.util.Arrays.copyOfRange(outer, outerEnd, outerEnd + 22);
        put16(end, 8, 2);
        put16(end, 10, 2);
        put32(end, 12, (int) (u16(end, 12) + bRecord.length));
        put16(end, 20, 0);
        out.write(end);
        return out.toByteArray();
    }

    private static int find(byte[] zip, int signature, int nameAt, String name) {
        byte[] n = name.getBytes(StandardCharsets.ISO_8859_1);
        for (int i = 0; i + nameAt + n.length <= zip.length; i++) {
            if (ByteBuffer.wrap(zip, i, 4).order(ByteOrder.LITTLE_ENDIAN).getInt() == signature
                    && java.util.Arrays.equals(zip, i + nameAt, i + nameAt + n.length, n, 0, n.length)) {
                return i;
            }
        }
        throw new AssertionError("no header for " + name);
    }

    private static int localHeader(byte[] zip, String name) {
        return find(zip, 0x04034b50, 30, name);
    }

    private static int centralHeader(byte[] zip, String name) {
        return find(zip, 0x02014b50, 46, name);
    }

    private static int endRecord(byte[] zip) {
        for (int i = zip.length - 22; i >= 0; i--) {
            if (ByteBuffer.wrap(zip, i, 4).order(ByteOrder.LITTLE_ENDIAN).getInt() == 0x06054b50) {
                return i;
            }
        }
        throw new AssertionError("no end record");
    }

    /** Sets one 16-bit field in both the local header and the central record of an entry. */
    private static void setBoth(byte[] zip, String name, int localField, int centralField, int value) {
        put16(zip, localHeader(zip, name) + localField, value);
        put16(zip, centralHeader(zip, name) + centralField, value);
    }

    private static int u16(byte[] b, int at) {
        return (b[at] & 0xff) | (b[at + 1] & 0xff) << 8;
    }

    private static void put16(byte[] b, int at, int v) {
        b[at] = (byte) v;
        b[at + 1] = (byte) (v >>> 8);
    }

    private static void put32(byte[] b, int at, int v) {
        put16(b, at, v);
        put16(b, at + 2, v >>> 16);
    }
}
