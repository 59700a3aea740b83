package org.inkgate.format.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.inkgate.format.archive.HostileArchives;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.refusal.BadSignature;
import org.inkgate.format.refusal.BrokenHashChain;
import org.inkgate.format.refusal.DecryptionFailed;
import org.inkgate.format.refusal.DigestMismatch;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.InvalidContent;
import org.inkgate.format.refusal.MissingEntry;
import org.inkgate.format.refusal.UnlistedEntry;
import org.inkgate.format.refusal.UnsupportedSchema;
import org.inkgate.format.testutil.SampleResponse;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ResponsePackageTest {

    @TempDir
    Path dir;
    final ResponsePackageReader reader = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TestKeys.installations());
    final ResponseDocument document = SampleResponse.document();
    final List<ProcessEvent> events = SampleResponse.events(40);

    private Path written() throws Exception {
        Path file = dir.resolve("1001.inkresp");
        new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic()).write(document, events, file);
        return file;
    }

    private HandmadePackage handmade() {
        return new HandmadePackage(document, events, TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
    }

    private <T extends FormatRefusal> T refused(Class<T> type, Path file) {
        return assertThrows(type, () -> reader.open(file));
    }

    @Test
    void open_writtenPackage_givesBackResponseAndEvents() throws Exception {
        OpenedResponse opened = reader.open(written());
        assertEquals(document, opened.response());
        assertEquals(events, opened.events());
        assertEquals(Fingerprint.of(Ed25519.rawPublic(Ed25519.publicOf(TestKeys.INSTALLATION_SIGNING))),
                opened.installationFingerprint());
        assertEquals(document.packageId(), opened.envelope().packageId());
    }

    @Test
    void open_answerSoRepetitiveItWouldLookLikeABomb_stillOpens() throws Exception {
        // a candidate holding a key down: deflate would shrink it far past the ratio limit of 100
        String held = "a".repeat(300_000);
        TaskResponse t = document.tasks().get(0);
        ResponseDocument repetitive = new ResponseDocument(document.format(), document.schemaVersion(), document.packageId(),
                document.examId(), document.bundleManifestSha256(), document.candidateNumber(), document.seat(),
                document.formId(), document.clientVersion(), document.startedAt(), document.submittedAt(),
                List.of(new TaskResponse(t.taskId(), t.conditionId(), held, 1, t.startedAt(), t.endedAt(),
                        t.extraTimeSeconds(), t.policy(), t.toolsOffered(), t.toolUse(), t.endReason())),
                document.questionnaires());
        Path file = dir.resolve("held-key.inkresp");
        new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic()).write(repetitive, events, file);
        assertEquals(held, reader.open(file).response().tasks().get(0).text());
    }

    @Test
    void write_package_holdsNoReadableAnswerText() throws Exception {
        String raw = new String(Files.readAllBytes(written()), StandardCharsets.ISO_8859_1);
        assertTrue(!raw.contains("Sunday") && !raw.contains("1001"), "answer text and candidate number are encrypted");
    }

    @Test
    void handmade_untamperedPackage_opens() throws Exception {
        // guards the helper: the refusals below come from the tampering, not from the helper
        reader.open(handmade().writeTo(dir.resolve("ok.inkresp"), document.packageId()));
    }

    @Test
    void open_withAnotherOwnersKey_isRefusedNamingBothKeys() throws Exception {
        DecryptionFailed refusal = assertThrows(DecryptionFailed.class,
                () -> new ResponsePackageReader(TestKeys.OTHER_ENCRYPTION, TestKeys.installations()).open(written()));
        assertTrue(refusal.getMessage().contains("not to this key"), refusal.getMessage());
    }

    @Test
    void open_alteredPayload_isRefusedAsDecryptionFailed() throws Exception {
        // rewritten with a correct CRC-32, so that the change reaches the AES-GCM tag check
        Path file = written();
        byte[] payload;
        try (var zip = org.inkgate.format.archive.SafeZipReader.open(file, org.inkgate.format.archive.ArchiveLimits.defaults())) {
            payload = zip.read(zip.entry("payload.bin").orElseThrow());
        }
        payload[payload.length / 2] ^= 0x40;
        Path bad = dir.resolve("altered.inkresp");
        HostileArchives.replaceEntry(file, bad, "payload.bin", payload);
        DecryptionFailed refusal = refused(DecryptionFailed.class, bad);
        assertTrue(refusal.getMessage().contains("altered or damaged"), refusal.getMessage());
    }

    @Test
    void open_editedEventResignedWithoutRechaining_isRefusedNamingTheLine() throws Exception {
        HandmadePackage pkg = handmade();
        String log = new String(pkg.eventBytes, StandardCharsets.UTF_8);
        String[] lines = log.split("\n");
        lines[16] = lines[16].replace("\"text.insert\"", "\"text.delete\"");
        pkg.eventBytes = (String.join("\n", lines) + "\n").getBytes(StandardCharsets.UTF_8);
        BrokenHashChain refusal = refused(BrokenHashChain.class, pkg.writeTo(dir.resolve("chain.inkresp"), document.packageId()));
        // line 17 was edited: the chain breaks at the next line, whose link no longer matches
        assertEquals(18, refusal.line());
        assertTrue(refusal.getMessage().contains("broken at line 18"), refusal.getMessage());
    }

    @Test
    void open_removedEvent_isRefusedNamingTheLine() throws Exception {
        HandmadePackage pkg = handmade();
        List<String> lines = new java.util.ArrayList<>(List.of(new String(pkg.eventBytes, StandardCharsets.UTF_8).split("\n")));
        lines.remove(4);
        pkg.eventBytes = (String.join("\n", lines) + "\n").getBytes(StandardCharsets.UTF_8);
        BrokenHashChain refusal = refused(BrokenHashChain.class, pkg.writeTo(dir.resolve("removed.inkresp"), document.packageId()));
        assertEquals(5, refusal.line());
    }

    @Test
    void open_missingSignature_isRefusedAsBadSignature() throws Exception {
        HandmadePackage pkg = handmade();
        pkg.includeSignature = false;
        BadSignature refusal = refused(BadSignature.class, pkg.writeTo(dir.resolve("unsigned.inkresp"), document.packageId()));
        assertTrue(refusal.getMessage().contains("carries no signature"), refusal.getMessage());
    }

    @Test
    void open_signedByAnotherKeyThanNamed_isRefusedAsBadSignature() throws Exception {
        HandmadePackage pkg = handmade();
        pkg.manifestHook = m -> new PackageManifest(m.format(), m.schemaVersion(), m.packageId(),
                java.util.Base64.getEncoder().encodeToString(Ed25519.rawPublic(Ed25519.publicOf(TestKeys.OTHER_SIGNING))),
                m.eventCount(), m.chainHead(), m.entries());
        refused(BadSignature.class, pkg.writeTo(dir.resolve("other-signer.inkresp"), document.packageId()));
    }

    @Test
    void open_answerChangedAfterSigning_isRefusedAsDigestMismatch() throws Exception {
        HandmadePackage pkg = handmade();
        byte[] original = pkg.responseBytes;
        pkg.manifestHook = m -> m; // digests are computed from the original below
        pkg.responseBytes = new String(original, StandardCharsets.UTF_8).replace("Friday", "Monday").getBytes(StandardCharsets.UTF_8);
        Map<String, org.inkgate.format.bundle.EntryDigest> signedDigests = Map.of(
                PackageLayout.RESPONSE, new org.inkgate.format.bundle.EntryDigest(
                        org.inkgate.format.crypto.Sha256.hex(original), original.length, false),
                PackageLayout.EVENTS, new org.inkgate.format.bundle.EntryDigest(
                        org.inkgate.format.crypto.Sha256.hex(pkg.eventBytes), pkg.eventBytes.length, false));
        pkg.manifestHook = m -> new PackageManifest(m.format(), m.schemaVersion(), m.packageId(), m.signingKey(),
                m.eventCount(), m.chainHead(), signedDigests);
        DigestMismatch refusal = refused(DigestMismatch.class, pkg.writeTo(dir.resolve("changed.inkresp"), document.packageId()));
        assertEquals("response.json", refusal.entry());
    }

    @Test
    void open_newerEnvelopeSchema_isRefusedAsUnsupported() throws Exception {
        HandmadePackage pkg = handmade();
        pkg.envelopeHook = e -> new Envelope(e.format(), 9, e.packageId(), e.recipient(), e.ephemeralKey(), e.salt(), e.scheme());
        UnsupportedSchema refusal = refused(UnsupportedSchema.class, pkg.writeTo(dir.resolve("v9.inkresp"), document.packageId()));
        assertTrue(refusal.getMessage().contains("schema version 9"), refusal.getMessage());
    }

    @Test
    void open_newerContentSchema_isRefusedAsUnsupported() throws Exception {
        HandmadePackage pkg = handmade();
        pkg.manifestHook = m -> new PackageManifest(m.format(), 2, m.packageId(), m.signingKey(), m.eventCount(),
                m.chainHead(), m.entries());
        refused(UnsupportedSchema.class, pkg.writeTo(dir.resolve("v2.inkresp"), document.packageId()));
    }

    @Test
    void open_partsOfDifferentPackages_isRefusedAsInvalidContent() throws Exception {
        InvalidContent refusal = refused(InvalidContent.class,
                handmade().writeTo(dir.resolve("mixed.inkresp"), "00000000-0000-0000-0000-000000000000"));
        assertTrue(refusal.getMessage().contains("package id differs"), refusal.getMessage());
    }

    @Test
    void open_extraOuterEntry_isRefusedAsUnlisted() throws Exception {
        Path bad = dir.resolve("extra.inkresp");
        HostileArchives.rewrite(written(), bad, null, Map.of("note.txt", new byte[] {1}));
        refused(UnlistedEntry.class, bad);
    }

    @Test
    void open_missingPayload_isRefusedAsMissingEntry() throws Exception {
        Path bad = dir.resolve("no-payload.inkresp");
        HostileArchives.rewrite(written(), bad, "payload.bin", Map.of());
        MissingEntry refusal = refused(MissingEntry.class, bad);
        assertTrue(refusal.getMessage().contains("\"payload.bin\" is missing"), refusal.getMessage());
    }

    @Test
    void open_bundleGivenAsPackage_isRefusedForItsUnlistedEntries() throws Exception {
        Path bundle = dir.resolve("exam.inkexam");
        new org.inkgate.format.bundle.BundleWriter(TestKeys.OWNER_SIGNING).write(
                org.inkgate.format.testutil.SampleExam.manifest(), org.inkgate.format.testutil.SampleExam.contents(), bundle);
        refused(UnlistedEntry.class, bundle);
    }
}
