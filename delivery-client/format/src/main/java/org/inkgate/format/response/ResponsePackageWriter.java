package org.inkgate.format.response;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Path;
import java.security.KeyPair;
import java.security.PrivateKey;
import java.security.PublicKey;
import java.security.SecureRandom;
import java.util.Arrays;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.format.archive.CanonicalZipWriter;
import org.inkgate.format.bundle.EntryDigest;
import org.inkgate.format.crypto.AesGcm;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.crypto.Hkdf;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.io.AtomicFiles;
import org.inkgate.format.json.Json;

/**
 * Writes response packages: the response and its hash-chained event log, signed with the
 * client installation's Ed25519 key, then encrypted to the test owner's X25519 key with a
 * one-time key pair (X25519, HKDF-SHA256 per RFC 5869, AES-256-GCM). Only the test owner's
 * private key opens it; any change to any byte is detected.
 */
public final class ResponsePackageWriter {

    private static final SecureRandom RANDOM = new SecureRandom();

    private final PrivateKey installationKey;
    private final byte[] installationPublic;
    private final PublicKey ownerEncryptionKey;

    public ResponsePackageWriter(PrivateKey installationSigningKey, PublicKey ownerEncryptionKey) {
        this.installationKey = installationSigningKey;
        this.installationPublic = Ed25519.rawPublic(Ed25519.publicOf(installationSigningKey));
        this.ownerEncryptionKey = ownerEncryptionKey;
    }

    /** Writes the package to {@code out} atomically (complete or not at all). */
    public void write(ResponseDocument response, List<ProcessEvent> events, Path out) throws IOException {
        byte[] packageBytes = encode(response, events);
        AtomicFiles.write(out, stream -> stream.write(packageBytes));
    }

    /** The package's bytes, for callers that write them to several places. */
    public byte[] encode(ResponseDocument response, List<ProcessEvent> events) throws IOException {
        if (!ResponseDocument.FORMAT.equals(response.format()) || response.schemaVersion() != ResponseDocument.SCHEMA_VERSION) {
            throw new IllegalArgumentException("the response document must be format " + ResponseDocument.FORMAT
                    + " version " + ResponseDocument.SCHEMA_VERSION);
        }
        List<String> problems = ResponseRules.problems(response);
        if (!problems.isEmpty()) {
            throw new IllegalArgumentException("the response is not consistent: " + String.join("; ", problems));
        }
        byte[] inner = innerArchive(response, events);
        KeyPair ephemeral = X25519.generate();
        byte[] ephemeralPublic = X25519.rawPublic(ephemeral.getPublic());
        byte[] recipientPublic = X25519.rawPublic(ownerEncryptionKey);
        byte[] salt = new byte[PackageLayout.SALT_BYTES];
        RANDOM.nextBytes(salt);
        Base64.Encoder b64 = Base64.getEncoder();
        Envelope envelope = new Envelope(Envelope.FORMAT, Envelope.SCHEMA_VERSION, response.packageId(),
                Fingerprint.of(recipientPublic), b64.encodeToString(ephemeralPublic), b64.encodeToString(salt),
                Envelope.SCHEME);
        byte[] envelopeBytes = Json.write(envelope);
        byte[] shared = X25519.agree(ephemeral.getPrivate(), ownerEncryptionKey);
        byte[] key = Hkdf.derive(salt, shared, PackageLayout.hkdfInfo(ephemeralPublic, recipientPublic), AesGcm.KEY_BYTES);
        try {
            byte[] payload = AesGcm.seal(key, inner, envelopeBytes);
            ByteArrayOutputStream out = new ByteArrayOutputStream(payload.length + 1024);
            try (CanonicalZipWriter zip = new CanonicalZipWriter(out)) {
                zip.addStored(PackageLayout.ENVELOPE, envelopeBytes);
                zip.addStored(PackageLayout.PAYLOAD, payload);
            }
            return out.toByteArray();
        } finally {
            Arrays.fill(key, (byte) 0);
            Arrays.fill(shared, (byte) 0);
        }
    }

    private byte[] innerArchive(ResponseDocument response, List<ProcessEvent> events) throws IOException {
        byte[] responseBytes = Json.write(response);
        byte[] eventBytes = EventChain.encode(events);
        Map<String, EntryDigest> entries = new TreeMap<>();
        entries.put(PackageLayout.RESPONSE, new EntryDigest(Sha256.hex(responseBytes), responseBytes.length, false));
        entries.put(PackageLayout.EVENTS, new EntryDigest(Sha256.hex(eventBytes), eventBytes.length, false));
        PackageManifest manifest = new PackageManifest(PackageManifest.FORMAT, PackageManifest.SCHEMA_VERSION,
                response.packageId(), Base64.getEncoder().encodeToString(installationPublic), events.size(),
                EventChain.head(eventBytes), entries);
        byte[] manifestBytes = Json.write(manifest);
        byte[] signature = Ed25519.sign(installationKey, manifestBytes);
        ByteArrayOutputStream out = new ByteArrayOutputStream(eventBytes.length / 4 + responseBytes.length + 4096);
        try (CanonicalZipWriter zip = new CanonicalZipWriter(out)) {
            zip.addStored(PackageLayout.MANIFEST, manifestBytes);
            zip.addStored(PackageLayout.SIGNATURE, signature);
            zip.addDeflated(PackageLayout.RESPONSE, responseBytes);
            zip.addDeflated(PackageLayout.EVENTS, eventBytes);
        }
        return out.toByteArray();
    }
}
