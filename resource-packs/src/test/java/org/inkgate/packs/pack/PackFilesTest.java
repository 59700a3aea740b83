package org.inkgate.packs.pack;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.function.Consumer;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import java.util.zip.ZipOutputStream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Pack files: round trip, and refusal of every kind of damage, each changing nothing on disk. */
class PackFilesTest {
    @TempDir
    Path dir;
    Path content;
    Path pack;

    static final PackDraft DRAFT = new PackDraft("test-pack", PackKind.GLOSSARY, "1.0", "Test pack", List.of("en", "es"),
            "Apache-2.0", "", 2, Instant.parse("2026-01-01T00:00:00Z"));

    @BeforeEach
    void writePack() throws Exception {
        content = dir.resolve("content");
        Files.createDirectories(content.resolve("index"));
        Files.writeString(content.resolve("index/a.bin"), "alpha");
        Files.writeString(content.resolve("LICENSE.txt"), "licence text");
        pack = dir.resolve("t.inkpack");
        PackFiles.write(pack, DRAFT, content);
    }

    @Test
    void sha256Hex_fipsVector_matches() {
        // FIPS 180-2, Appendix B.1: SHA-256("abc")
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                PackDigests.sha256Hex("abc".getBytes(StandardCharsets.US_ASCII)));
    }

    @Test
    void verify_writtenPack_returnsManifestWithDigestsOfTheFiles() throws Exception {
        PackManifest m = PackFiles.verify(pack);
        assertEquals("test-pack", m.id());
        assertEquals(List.of("LICENSE.txt", "index/a.bin"), m.files().stream().map(PackFileEntry::path).toList());
        // SHA-256 of "alpha", computed independently: printf alpha | sha256sum (GNU coreutils)
        assertEquals("8ed3f6ad685b959ead7022518e1af76cd816f8e8ec7ccdda1ed4018e8f2223f8", m.files().get(1).sha256());
        assertEquals(PackDigests.contentDigest(m.files()), m.contentSha256());
        assertEquals(m, PackFiles.readManifest(pack));
    }

    @Test
    void write_sameContent_givesSameBytes() throws Exception {
        Path again = dir.resolve("again.inkpack");
        PackFiles.write(again, DRAFT, content);
        assertArrayEquals(Files.readAllBytes(pack), Files.readAllBytes(again));
    }

    @Test
    void open_extractsVerifiedCopyAndCloseDeletesIt() throws Exception {
        Path work = dir.resolve("work");
        Path folder;
        try (OpenedPack opened = PackFiles.open(pack, work)) {
            folder = opened.folder();
            assertEquals("alpha", Files.readString(folder.resolve("index/a.bin")));
        }
        assertFalse(Files.exists(folder));
    }

    @Test
    void verify_alteredContent_isRefusedAndOpenLeavesNothing() throws Exception {
        Path bad = rewrite(z -> put(z, "index/a.bin", "alphA"));
        PackRefusal r = assertThrows(PackRefusal.class, () -> PackFiles.verify(bad));
        assertEquals(PackRefusal.Reason.CONTENT_MISMATCH, r.reason());
        assertTrue(r.getMessage().contains("index/a.bin"), r.getMessage());
        Path work = dir.resolve("work2");
        assertThrows(PackRefusal.class, () -> PackFiles.open(bad, work));
        try (var left = Files.list(work)) {
            assertEquals(0, left.count(), "a refused open leaves no extracted files");
        }
    }

    @Test
    void verify_extraFile_isRefused() throws Exception {
        Path bad = rewrite(true, z -> put(z, "index/extra.bin", "x"));
        assertEquals(PackRefusal.Reason.CONTENT_MISMATCH, assertThrows(PackRefusal.class, () -> PackFiles.verify(bad)).reason());
    }

    @Test
    void readManifest_traversalName_isRefused() throws Exception {
        Path bad = rewrite(true, z -> put(z, "../evil.txt", "x"));
        assertEquals(PackRefusal.Reason.UNSAFE_ENTRY, assertThrows(PackRefusal.class, () -> PackFiles.readManifest(bad)).reason());
    }

    @Test
    void readManifest_newerFormat_isRefusedAsNewer() throws Exception {
        Path bad = rewriteManifest(json -> json.replace("\"formatVersion\" : 1", "\"formatVersion\" : 2"));
        assertEquals(PackRefusal.Reason.NEWER_VERSION, assertThrows(PackRefusal.class, () -> PackFiles.readManifest(bad)).reason());
    }

    @Test
    void readManifest_changedDigestInList_isRefused() throws Exception {
        Path bad = rewriteManifest(json -> json.replace("8ed3f6ad685b959ead7022518e1af76cd816f8e8ec7ccdda1ed4018e8f2223f8",
                "0000000000000000000000000000000000000000000000000000000000000000"));
        assertEquals(PackRefusal.Reason.CONTENT_MISMATCH, assertThrows(PackRefusal.class, () -> PackFiles.readManifest(bad)).reason());
    }

    @Test
    void readManifest_unknownField_isRefusedWithLine() throws Exception {
        Path bad = rewriteManifest(json -> json.replace("\"id\" :", "\"surprise\" : 1,\n  \"id\" :"));
        PackRefusal r = assertThrows(PackRefusal.class, () -> PackFiles.readManifest(bad));
        assertEquals(PackRefusal.Reason.BAD_MANIFEST, r.reason());
        assertTrue(r.getMessage().contains("line"), r.getMessage());
    }

    @Test
    void readManifest_notAZip_isRefused() throws Exception {
        Path junk = dir.resolve("junk.inkpack");
        Files.writeString(junk, "hello");
        assertEquals(PackRefusal.Reason.NOT_A_PACK, assertThrows(PackRefusal.class, () -> PackFiles.readManifest(junk)).reason());
    }

    @Test
    void write_badId_isRefusedAndWritesNothing() {
        PackDraft bad = new PackDraft("Bad Id!", PackKind.GLOSSARY, "1", "t", List.of("en"), "MIT", "", 0, Instant.EPOCH);
        Path target = dir.resolve("bad.inkpack");
        assertThrows(PackRefusal.class, () -> PackFiles.write(target, bad, content));
        assertFalse(Files.exists(target));
    }

    @Test
    void requireKind_otherKind_isRefusedAndCleansUp() throws Exception {
        OpenedPack opened = PackFiles.open(pack, dir.resolve("w3"));
        assertEquals(PackRefusal.Reason.WRONG_PACK, assertThrows(PackRefusal.class, () -> opened.requireKind(PackKind.DICTIONARY)).reason());
        assertFalse(Files.exists(opened.folder()));
    }

    /** Copies the pack without index/a.bin, then lets {@code extra} add entries. */
    private Path rewrite(Consumer<ZipOutputStream> extra) throws Exception {
        return rewrite(false, extra);
    }

    /** Copies the pack (keeping index/a.bin only when asked), then lets {@code extra} add entries. */
    private Path rewrite(boolean keepA, Consumer<ZipOutputStream> extra) throws Exception {
        Path out = dir.resolve("altered.inkpack");
        try (ZipFile in = new ZipFile(pack.toFile()); ZipOutputStream z = new ZipOutputStream(Files.newOutputStream(out))) {
            for (var e : java.util.Collections.list(in.entries())) {
                if (!keepA && e.getName().equals("index/a.bin")) {
                    continue;
                }
                z.putNextEntry(new ZipEntry(e.getName()));
                in.getInputStream(e).transferTo(z);
                z.closeEntry();
            }
            extra.accept(z);
        }
        return out;
    }

    private Path rewriteManifest(java.util.function.UnaryOperator<String> edit) throws Exception {
        Path out = dir.resolve("altered-manifest.inkpack");
        try (ZipFile in = new ZipFile(pack.toFile()); ZipOutputStream z = new ZipOutputStream(Files.newOutputStream(out))) {
            for (var e : java.util.Collections.list(in.entries())) {
                z.putNextEntry(new ZipEntry(e.getName()));
                byte[] bytes = in.getInputStream(e).readAllBytes();
                if (e.getName().equals("manifest.json")) {
                    String json = new String(bytes, StandardCharsets.UTF_8);
                    String edited = edit.apply(json);
                    assertFalse(edited.equals(json), "the edit must change the manifest");
                    bytes = edited.getBytes(StandardCharsets.UTF_8);
                }
                z.write(bytes);
                z.closeEntry();
            }
        }
        return out;
    }

    private static void put(ZipOutputStream z, String name, String text) {
        try {
            z.putNextEntry(new ZipEntry(name));
            OutputStream o = z;
            o.write(text.getBytes(StandardCharsets.UTF_8));
            z.closeEntry();
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
