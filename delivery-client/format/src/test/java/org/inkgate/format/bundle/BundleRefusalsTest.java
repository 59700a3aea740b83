package org.inkgate.format.bundle;

import org.inkgate.format.trust.TrustPolicy;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.stream.Stream;
import org.inkgate.format.archive.ArchiveLimits;
import org.inkgate.format.archive.HostileArchives;
import org.inkgate.format.json.Json;
import org.inkgate.format.refusal.BadSignature;
import org.inkgate.format.refusal.CompressionRatioExceeded;
import org.inkgate.format.refusal.DigestMismatch;
import org.inkgate.format.refusal.DuplicateEntry;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.InvalidContent;
import org.inkgate.format.refusal.MalformedArchive;
import org.inkgate.format.refusal.MalformedJson;
import org.inkgate.format.refusal.MissingEntry;
import org.inkgate.format.refusal.SizeLimitExceeded;
import org.inkgate.format.refusal.UnlistedEntry;
import org.inkgate.format.refusal.UnsafeEntryName;
import org.inkgate.format.refusal.UnsupportedSchema;
import org.inkgate.format.testutil.SignedBundles;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** One test per refusal: each builds the bad file and checks the exact error and its message. */
class BundleRefusalsTest {

    @TempDir
    Path dir;
    Path good;
    final BundleReader reader = new BundleReader(TrustPolicy.anySigner());

    @BeforeEach
    void writeGoodBundle() throws Exception {
        good = SignedBundles.good(dir);
    }

    private <T extends FormatRefusal> T refused(Class<T> type, Path file) {
        T refusal = assertThrows(type, () -> reader.open(file).close());
        assertTrue(refusal.getMessage().startsWith(file.getFileName() + ": "), refusal.getMessage());
        return refusal;
    }

    private byte[] entry(String name) throws Exception {
        return SignedBundles.entry(good, name);
    }

    private Path signedWith(String fileName, byte[] manifest) throws Exception {
        return SignedBundles.signedWith(dir, fileName, manifest, Map.of());
    }

    private ObjectNode manifestTree() throws Exception {
        return (ObjectNode) Json.mapper().readTree(entry("manifest.json"));
    }

    @Test
    void open_alteredSignature_isRefusedAsBadSignature() throws Exception {
        byte[] sig = entry("manifest.sig");
        sig[5] ^= 0x01;
        Path bad = dir.resolve("bad-sig.inkexam");
        HostileArchives.replaceEntry(good, bad, "manifest.sig", sig);
        BadSignature refusal = refused(BadSignature.class, bad);
        assertTrue(refusal.getMessage().contains("does not match the manifest"), refusal.getMessage());
    }

    @Test
    void open_missingSignature_isRefusedAsBadSignature() throws Exception {
        Path bad = dir.resolve("unsigned.inkexam");
        HostileArchives.rewrite(good, bad, "manifest.sig", Map.of());
        BadSignature refusal = refused(BadSignature.class, bad);
        assertTrue(refusal.getMessage().contains("carries no signature"), refusal.getMessage());
    }

    @Test
    void open_manifestChangedAfterSigning_isRefusedAsBadSignature() throws Exception {
        // a candidate turns the spelling check on in the task sat without resources
        String manifest = new String(entry("manifest.json"), StandardCharsets.UTF_8)
                .replaceFirst("\"spelling\" : \"off\"", "\"spelling\" : \"suggestions\"");
        Path bad = dir.resolve("policy-changed.inkexam");
        HostileArchives.replaceEntry(good, bad, "manifest.json", manifest.getBytes(StandardCharsets.UTF_8));
        refused(BadSignature.class, bad);
    }

    @Test
    void open_promptChangedAfterSigning_isRefusedAsDigestMismatchNamingTheEntry() throws Exception {
        Path bad = dir.resolve("prompt-changed.inkexam");
        HostileArchives.replaceEntry(good, bad, "prompts/t2.md",
                "Should the town library close on Sundays? Give your view.\n".getBytes(StandardCharsets.UTF_8));
        DigestMismatch refusal = refused(DigestMismatch.class, bad);
        assertEquals("prompts/t2.md", refusal.entry());
        assertTrue(refusal.getMessage().contains("\"prompts/t2.md\" does not match the digest"), refusal.getMessage());
    }

    @Test
    void open_newerSchemaVersion_isRefusedAsUnsupportedSchema() throws Exception {
        ObjectNode tree = manifestTree();
        tree.put("schemaVersion", BundleManifest.SCHEMA_VERSION + 1);
        UnsupportedSchema refusal = refused(UnsupportedSchema.class, signedWith("newer.inkexam", Json.write(tree)));
        assertTrue(refusal.getMessage().contains("schema version " + (BundleManifest.SCHEMA_VERSION + 1) + ", newer than the "
                + BundleManifest.SCHEMA_VERSION), refusal.getMessage());
    }

    @Test
    void open_otherFormat_isRefusedAsUnsupportedSchema() throws Exception {
        ObjectNode tree = manifestTree();
        tree.put("format", "something-else");
        UnsupportedSchema refusal = refused(UnsupportedSchema.class, signedWith("other.inkexam", Json.write(tree)));
        assertTrue(refusal.getMessage().contains("not an exam bundle"), refusal.getMessage());
    }

    @Test
    void open_malformedManifest_isRefusedWithLineAndColumn() throws Exception {
        byte[] broken = "{\n  \"format\" : \"inkgate-exam-bundle\",\n  \"schemaVersion\" : ,\n}".getBytes(StandardCharsets.UTF_8);
        MalformedJson refusal = refused(MalformedJson.class, signedWith("broken.inkexam", broken));
        assertEquals("manifest.json", refusal.entry());
        assertEquals(3, refusal.line());
        // the stray comma is the 21st character of line 3: two spaces, "schemaVersion" in quotes, " : "
        assertEquals(21, refusal.column());
        assertTrue(refusal.getMessage().contains("line 3, column 21"), refusal.getMessage());
    }

    @Test
    void open_wrongValueDeepInManifest_isRefusedNamingItsPath() throws Exception {
        ObjectNode tree = manifestTree();
        ((ObjectNode) tree.withArray("forms").get(1).withArray("slots").get(0).get("policy")).put("spelling", "always");
        MalformedJson refusal = refused(MalformedJson.class, signedWith("enum.inkexam", Json.write(tree)));
        assertTrue(refusal.getMessage().contains("at forms[1].slots[0].policy.spelling"), refusal.getMessage());
    }

    @Test
    void open_unknownFieldInManifest_isRefusedNamingIt() throws Exception {
        ObjectNode tree = manifestTree();
        ((ObjectNode) tree.withArray("tasks").get(0)).put("hint", "write about your neighbour");
        MalformedJson refusal = refused(MalformedJson.class, signedWith("unknown.inkexam", Json.write(tree)));
        assertTrue(refusal.getMessage().contains("at tasks[0].hint"), refusal.getMessage());
    }

    @Test
    void open_duplicateKeyInManifest_isRefusedAsMalformedJson() throws Exception {
        String text = new String(entry("manifest.json"), StandardCharsets.UTF_8)
                .replaceFirst("\\{", "{\n  \"practice\" : false,");
        MalformedJson refusal = refused(MalformedJson.class, signedWith("dup-key.inkexam", text.getBytes(StandardCharsets.UTF_8)));
        assertTrue(refusal.getMessage().contains("practice"), refusal.getMessage());
    }

    @Test
    void open_manifestBreakingTheRules_isRefusedAsInvalidContent() throws Exception {
        ObjectNode tree = manifestTree();
        ((ObjectNode) tree.withArray("forms").get(0).withArray("slots").get(0)).put("taskId", "t9");
        InvalidContent refusal = refused(InvalidContent.class, signedWith("rules.inkexam", Json.write(tree)));
        assertTrue(refusal.getMessage().contains("form \"A\", task \"t9\": no such task"), refusal.getMessage());
    }

    @Test
    void open_absolutePathEntry_isRefusedAsUnsafeName() throws Exception {
        Path bad = dir.resolve("absolute.inkexam");
        HostileArchives.rewrite(good, bad, null, Map.of("/etc/cron.d/job", new byte[] {1}));
        UnsafeEntryName refusal = refused(UnsafeEntryName.class, bad);
        assertTrue(refusal.getMessage().contains("\"/etc/cron.d/job\" is not a safe relative path (absolute path)"),
                refusal.getMessage());
    }

    @Test
    void open_dotDotEntry_isRefusedAsUnsafeNameAndWritesNothingOutside() throws Exception {
        Path bad = dir.resolve("slip.inkexam");
        HostileArchives.rewrite(good, bad, null, Map.of("prompts/../../escaped.txt", new byte[] {1}));
        refused(UnsafeEntryName.class, bad);
        try (Stream<Path> files = Files.walk(dir.getParent(), 2)) {
            assertTrue(files.noneMatch(p -> p.getFileName().toString().equals("escaped.txt")));
        }
    }

    @Test
    void open_duplicateEntry_isRefusedAsDuplicate() throws Exception {
        Path bad = dir.resolve("duplicate.inkexam");
        HostileArchives.writeRaw(bad, Map.entry("manifest.json", entry("manifest.json")),
                Map.entry("manifest.sig", entry("manifest.sig")),
                Map.entry("prompts/t1.md", entry("prompts/t1.md")),
                Map.entry("prompts/t1.md", "another prompt".getBytes(StandardCharsets.UTF_8)));
        DuplicateEntry refusal = refused(DuplicateEntry.class, bad);
        assertTrue(refusal.getMessage().contains("\"prompts/t1.md\" appears more than once"), refusal.getMessage());
    }

    @Test
    void open_entryOverSizeLimit_isRefusedAsSizeLimit() {
        BundleReader strict = new BundleReader(TrustPolicy.anySigner(), new ArchiveLimits(1 << 20, 100, 64, 1 << 20, 100));
        SizeLimitExceeded refusal = assertThrows(SizeLimitExceeded.class, () -> strict.open(good));
        assertTrue(refusal.getMessage().contains("over the limit of 64"), refusal.getMessage());
    }

    @Test
    void open_totalOverSizeLimit_isRefusedAsSizeLimit() {
        BundleReader strict = new BundleReader(TrustPolicy.anySigner(), new ArchiveLimits(1 << 20, 100, 1 << 20, 1000, 100));
        SizeLimitExceeded refusal = assertThrows(SizeLimitExceeded.class, () -> strict.open(good));
        assertTrue(refusal.getMessage().contains("unpacked size of all entries"), refusal.getMessage());
    }

    @Test
    void open_tooManyEntries_isRefusedAsSizeLimit() {
        BundleReader strict = new BundleReader(TrustPolicy.anySigner(), new ArchiveLimits(1 << 20, 3, 1 << 20, 1 << 20, 100));
        SizeLimitExceeded refusal = assertThrows(SizeLimitExceeded.class, () -> strict.open(good));
        assertTrue(refusal.getMessage().contains("number of entries (5)"), refusal.getMessage());
    }

    @Test
    void open_zipBomb_isRefusedBeforeUnpacking() throws Exception {
        Path bomb = dir.resolve("bomb.inkexam");
        HostileArchives.writeWithDeflated(bomb, Map.of("manifest.json", entry("manifest.json"),
                "manifest.sig", entry("manifest.sig")), "prompts/t1.md", new byte[50 << 20]);
        assertTrue(Files.size(bomb) < 200_000, "50 MiB of zeros packs small");
        CompressionRatioExceeded refusal = refused(CompressionRatioExceeded.class, bomb);
        assertTrue(refusal.getMessage().contains("over the limit of 100"), refusal.getMessage());
    }

    @Test
    void open_missingManifest_isRefusedAsMissingEntry() throws Exception {
        Path bad = dir.resolve("no-manifest.inkexam");
        HostileArchives.rewrite(good, bad, "manifest.json", Map.of());
        MissingEntry refusal = refused(MissingEntry.class, bad);
        assertTrue(refusal.getMessage().contains("\"manifest.json\" is missing"), refusal.getMessage());
    }

    @Test
    void open_missingListedPrompt_isRefusedAsMissingEntry() throws Exception {
        Path bad = dir.resolve("no-prompt.inkexam");
        HostileArchives.rewrite(good, bad, "prompts/t1.md", Map.of());
        MissingEntry refusal = refused(MissingEntry.class, bad);
        assertTrue(refusal.getMessage().contains("\"prompts/t1.md\" is missing"), refusal.getMessage());
    }

    @Test
    void open_extraUnlistedEntry_isRefusedAsUnlisted() throws Exception {
        Path bad = dir.resolve("extra.inkexam");
        HostileArchives.rewrite(good, bad, null, Map.of("prompts/hint.md", "the answer".getBytes(StandardCharsets.UTF_8)));
        UnlistedEntry refusal = refused(UnlistedEntry.class, bad);
        assertTrue(refusal.getMessage().contains("\"prompts/hint.md\" is not listed"), refusal.getMessage());
    }

    @Test
    void open_truncatedFile_isRefusedAsMalformedArchive() throws Exception {
        byte[] bytes = Files.readAllBytes(good);
        Path bad = dir.resolve("truncated.inkexam");
        Files.write(bad, java.util.Arrays.copyOf(bytes, bytes.length - 10));
        refused(MalformedArchive.class, bad);
    }

    @Test
    void open_notAZipAtAll_isRefusedAsMalformedArchive() throws Exception {
        Path bad = dir.resolve("text.inkexam");
        Files.writeString(bad, "this is a note, not an exam bundle");
        MalformedArchive refusal = refused(MalformedArchive.class, bad);
        assertTrue(refusal.getMessage().contains("copy it again"), refusal.getMessage());
    }
}
