package org.inkgate.format.bundle;

import org.inkgate.format.trust.TrustPolicy;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.Set;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import org.inkgate.format.refusal.UntrustedSigner;
import org.inkgate.format.refusal.WrongReleaseCode;
import org.inkgate.format.testutil.SampleExam;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BundleRoundTripTest {

    @TempDir
    Path dir;

    @Test
    void open_writtenBundle_givesBackManifestAndContents() throws Exception {
        Path file = dir.resolve("exam.inkexam");
        new BundleWriter(TestKeys.OWNER_SIGNING).write(SampleExam.manifest(), SampleExam.contents(), file);

        try (OpenedBundle bundle = new BundleReader(TrustPolicy.trusting(Set.of(TestKeys.ownerFingerprint()))).open(file)) {
            BundleManifest m = bundle.manifest();
            assertEquals("sample-exam", m.examId());
            assertEquals(2, m.forms().size());
            assertEquals(SampleExam.WITH_TOOLS, m.form("A").orElseThrow().slots().get(0).policy());
            assertEquals(3, m.entries().size());
            assertEquals(TestKeys.ownerFingerprint(), bundle.signerFingerprint());
            for (Map.Entry<String, byte[]> e : SampleExam.contents().entrySet()) {
                assertArrayEquals(e.getValue(), bundle.readBytes(e.getKey()), e.getKey());
            }
        }
    }

    @Test
    void write_sameInputTwice_givesIdenticalBytes() throws Exception {
        Path first = dir.resolve("a.inkexam");
        Path second = dir.resolve("b.inkexam");
        BundleWriter writer = new BundleWriter(TestKeys.OWNER_SIGNING);
        writer.write(SampleExam.manifest(), SampleExam.contents(), first);
        writer.write(SampleExam.manifest(), SampleExam.contents(), second);
        assertArrayEquals(Files.readAllBytes(first), Files.readAllBytes(second));
    }

    @Test
    void write_bundle_isReadableByTheJdkZipReaderToo() throws Exception {
        Path file = dir.resolve("exam.inkexam");
        new BundleWriter(TestKeys.OWNER_SIGNING).write(SampleExam.manifest(), SampleExam.contents(), file);
        Map<String, byte[]> seen = new HashMap<>();
        try (InputStream in = Files.newInputStream(file); ZipInputStream zip = new ZipInputStream(in)) {
            for (ZipEntry entry = zip.getNextEntry(); entry != null; entry = zip.getNextEntry()) {
                seen.put(entry.getName(), zip.readAllBytes());
            }
        }
        assertEquals(Set.of("manifest.json", "manifest.sig", "instructions.md", "prompts/t1.md", "prompts/t2.md"), seen.keySet());
        assertArrayEquals(SampleExam.contents().get("prompts/t1.md"), seen.get("prompts/t1.md"));
    }

    @Test
    void open_signedByAnotherKey_isRefusedAsUntrustedWithItsFingerprint() throws Exception {
        Path file = dir.resolve("exam.inkexam");
        new BundleWriter(TestKeys.OTHER_SIGNING).write(
                SampleExam.manifest(TestKeys.ownerKeys(TestKeys.OTHER_SIGNING), true), SampleExam.contents(), file);
        UntrustedSigner refusal = assertThrows(UntrustedSigner.class,
                () -> new BundleReader(TrustPolicy.trusting(Set.of(TestKeys.ownerFingerprint()))).open(file));
        assertTrue(refusal.getMessage().contains("not trusted"), refusal.getMessage());
    }

    @Test
    void unseal_rightCodeAfterWrongCode_opensTheContent() throws Exception {
        Path file = dir.resolve("sealed.inkexam");
        new BundleWriter(TestKeys.OWNER_SIGNING).writeSealed(SampleExam.manifest(), SampleExam.contents(),
                "river-lamp-42".toCharArray(), file);
        try (OpenedBundle bundle = new BundleReader(TrustPolicy.anySigner()).open(file)) {
            assertTrue(bundle.sealed());
            assertFalse(bundle.readable());
            assertThrows(IllegalStateException.class, () -> bundle.readBytes("prompts/t1.md"));
            // the stored entries are ciphertext: the prompt's words appear nowhere in the file
            assertFalse(new String(Files.readAllBytes(file), java.nio.charset.StandardCharsets.ISO_8859_1).contains("friend"));

            WrongReleaseCode wrong = assertThrows(WrongReleaseCode.class, () -> bundle.unseal("river-lamp-43".toCharArray()));
            assertTrue(wrong.getMessage().contains("release code"), wrong.getMessage());
            assertFalse(bundle.readable());

            bundle.unseal("river-lamp-42".toCharArray());
            assertTrue(bundle.readable());
            assertArrayEquals(SampleExam.contents().get("prompts/t1.md"), bundle.readBytes("prompts/t1.md"));
        }
    }

    @Test
    void close_openedBundle_deletesItsTemporaryFolder() throws Exception {
        Path file = dir.resolve("exam.inkexam");
        new BundleWriter(TestKeys.OWNER_SIGNING).write(SampleExam.manifest(), SampleExam.contents(), file);
        OpenedBundle bundle = new BundleReader(TrustPolicy.anySigner()).open(file);
        Path prompt = bundle.path("prompts/t1.md");
        assertTrue(Files.exists(prompt));
        bundle.close();
        assertFalse(Files.exists(prompt));
        assertFalse(Files.exists(prompt.getParent().getParent()));
    }

    @Test
    void write_manifestNamingAMissingPrompt_isRefusedBeforeWriting() {
        Map<String, byte[]> contents = new HashMap<>(SampleExam.contents());
        contents.remove("prompts/t2.md");
        Path file = dir.resolve("never.inkexam");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new BundleWriter(TestKeys.OWNER_SIGNING).write(SampleExam.manifest(), contents, file));
        assertTrue(e.getMessage().contains("prompts/t2.md"), e.getMessage());
        assertFalse(Files.exists(file));
    }
}
