package org.inkgate.format.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.security.KeyPair;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import org.inkgate.format.archive.ArchiveLimits;
import org.inkgate.format.archive.HostileArchives;
import org.inkgate.format.archive.SafeZipReader;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.json.Json;
import org.inkgate.format.refusal.DecryptionFailed;
import org.inkgate.format.refusal.InvalidContent;
import org.inkgate.format.refusal.UntrustedSigner;
import org.inkgate.format.testutil.SampleResponse;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.format.trust.TrustPolicy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Attacks found in the format review on response packages, each kept as a test. */
class ResponseHardeningTest {

    @TempDir
    Path dir;

    /**
     * The owner's encryption key is public and the package id readable in the envelope, so anyone
     * can write a replacement package; only the installation key that signs it tells them apart.
     */
    @Test
    void open_replacementSignedByAnUnenrolledKey_isRefusedAsUntrusted() throws Exception {
        Path genuine = dir.resolve("1001.inkresp");
        new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic())
                .write(SampleResponse.document(), SampleResponse.events(10), genuine);
        String victimId;
        try (SafeZipReader zip = SafeZipReader.open(genuine, ArchiveLimits.defaults())) {
            victimId = Json.mapper().readTree(zip.read(zip.entry("envelope.json").orElseThrow())).get("packageId").asText();
        }
        KeyPair attacker = Ed25519.generate();
        Path forged = dir.resolve("1001-replaced.inkresp");
        new ResponsePackageWriter(attacker.getPrivate(), TestKeys.ownerEncryptionPublic())
                .write(SampleResponse.document(victimId), SampleResponse.events(3), forged);

        ResponsePackageReader enrolled = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TestKeys.installations());
        enrolled.open(genuine);
        UntrustedSigner refusal = assertThrows(UntrustedSigner.class, () -> enrolled.open(forged));
        assertTrue(refusal.getMessage().contains(Fingerprint.of(Ed25519.rawPublic(attacker.getPublic()))), refusal.getMessage());

        // a collector that accepts any signer still sees the difference, in the fingerprint it must check
        ResponsePackageReader open = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TrustPolicy.anySigner());
        assertNotEquals(open.open(genuine).installationFingerprint(), open.open(forged).installationFingerprint());
    }

    @Test
    void write_packageWithoutAPackageId_isRefusedBeforeWriting() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic())
                        .write(SampleResponse.document(null), SampleResponse.events(2), dir.resolve("noid.inkresp")));
        assertTrue(e.getMessage().contains("not a UUID"), e.getMessage());
    }

    @Test
    void open_packageWithoutAPackageId_isRefused() throws Exception {
        // a faulty or hostile client that skips the writer's checks: the reader refuses it too
        Path file = new HandmadePackage(SampleResponse.document(null), SampleResponse.events(2), TestKeys.INSTALLATION_SIGNING,
                TestKeys.ownerEncryptionPublic()).writeTo(dir.resolve("noid.inkresp"), null);
        InvalidContent refusal = assertThrows(InvalidContent.class,
                () -> new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TestKeys.installations()).open(file));
        assertTrue(refusal.getMessage().contains("not a UUID"), refusal.getMessage());
    }

    @Test
    void write_toolsOfferedThatDifferFromThePolicy_isRefused() {
        ResponseDocument d = SampleResponse.document();
        TaskResponse t = d.tasks().get(1); // sat without tools
        TaskResponse claimed = new TaskResponse(t.taskId(), t.conditionId(), t.text(), t.wordCount(), t.startedAt(),
                t.endedAt(), t.extraTimeSeconds(), t.policy(), java.util.Set.of(org.inkgate.packs.policy.Tool.SPELLING),
                t.toolUse(), t.endReason());
        ResponseDocument bad = new ResponseDocument(d.format(), d.schemaVersion(), d.packageId(), d.examId(),
                d.bundleManifestSha256(), d.candidateNumber(), d.seat(), d.formId(), d.clientVersion(), d.startedAt(),
                d.submittedAt(), List.of(d.tasks().get(0), claimed), d.questionnaires());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic())
                        .write(bad, List.of(), dir.resolve("claimed.inkresp")));
        assertTrue(e.getMessage().contains("differ from what its policy offers"), e.getMessage());
    }

    @Test
    void open_useRecordedForAToolNotOffered_isRefused() throws Exception {
        ResponseDocument d = SampleResponse.document();
        TaskResponse t = d.tasks().get(1);
        TaskResponse used = new TaskResponse(t.taskId(), t.conditionId(), t.text(), t.wordCount(), t.startedAt(),
                t.endedAt(), t.extraTimeSeconds(), t.policy(), t.toolsOffered(),
                java.util.Map.of(org.inkgate.packs.policy.Tool.DICTIONARY, new ToolUse(3, 0, 2, 0, 0, 0, 0)), t.endReason());
        ResponseDocument bad = new ResponseDocument(d.format(), d.schemaVersion(), d.packageId(), d.examId(),
                d.bundleManifestSha256(), d.candidateNumber(), d.seat(), d.formId(), d.clientVersion(), d.startedAt(),
                d.submittedAt(), List.of(d.tasks().get(0), used), d.questionnaires());
        Path file = new HandmadePackage(bad, SampleResponse.events(2), TestKeys.INSTALLATION_SIGNING,
                TestKeys.ownerEncryptionPublic()).writeTo(dir.resolve("used.inkresp"), d.packageId());
        InvalidContent refusal = assertThrows(InvalidContent.class,
                () -> new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TestKeys.installations()).open(file));
        assertTrue(refusal.getMessage().contains("not offered"), refusal.getMessage());
    }

    /** RFC 7748 section 6.1: an all-zero shared secret (low-order point) must be refused. */
    @Test
    void open_lowOrderEphemeralKey_isRefusedBeforeAnyDecryption() throws Exception {
        String recipient = Fingerprint.of(X25519.rawPublic(TestKeys.ownerEncryptionPublic()));
        for (int u : new int[] {0, 1}) {
            byte[] raw = new byte[32];
            raw[0] = (byte) u;
            Envelope envelope = new Envelope(Envelope.FORMAT, Envelope.SCHEMA_VERSION, "00000000-0000-4000-8000-000000000001",
                    recipient, Base64.getEncoder().encodeToString(raw), Base64.getEncoder().encodeToString(new byte[32]),
                    Envelope.SCHEME);
            Path file = dir.resolve("low" + u + ".inkresp");
            HostileArchives.writeRaw(file, Map.entry("envelope.json", Json.write(envelope)), Map.entry("payload.bin", new byte[64]));
            DecryptionFailed refusal = assertThrows(DecryptionFailed.class,
                    () -> new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TestKeys.installations()).open(file));
            assertTrue(refusal.getMessage().contains("one-time key"), refusal.getMessage());
        }
    }

    @Test
    void trusting_fingerprintTypedInCapitalsWithSpaces_stillMatches() throws Exception {
        String fingerprint = Fingerprint.of(Ed25519.rawPublic(Ed25519.publicOf(TestKeys.INSTALLATION_SIGNING)));
        String typed = fingerprint.toUpperCase().replace("-", " ");
        Path file = dir.resolve("1001.inkresp");
        new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic())
                .write(SampleResponse.document(), List.of(), file);
        assertEquals(fingerprint, new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TrustPolicy.trusting(java.util.Set.of(typed)))
                .open(file).installationFingerprint());
        assertThrows(IllegalArgumentException.class, () -> TrustPolicy.trusting(java.util.Set.of("not-a-fingerprint")));
    }
}
