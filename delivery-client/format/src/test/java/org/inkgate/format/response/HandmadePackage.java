package org.inkgate.format.response;

import java.io.ByteArrayOutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.KeyPair;
import java.security.PrivateKey;
import java.security.PublicKey;
import java.util.Base64;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.UnaryOperator;
import org.inkgate.format.archive.CanonicalZipWriter;
import org.inkgate.format.bundle.EntryDigest;
import org.inkgate.format.crypto.AesGcm;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.crypto.Hkdf;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.json.Json;

/**
 * Builds response packages step by step like the writer, with hooks to tamper at each step and
 * still sign and encrypt correctly: the way to reach the checks behind the signature.
 */
final class HandmadePackage {

    byte[] responseBytes;
    byte[] eventBytes;
    UnaryOperator<PackageManifest> manifestHook = m -> m;
    UnaryOperator<Envelope> envelopeHook = e -> e;
    boolean includeSignature = true;
    PrivateKey signingKey;
    PublicKey recipient;

    HandmadePackage(ResponseDocument response, java.util.List<ProcessEvent> events, PrivateKey signingKey, PublicKey recipient) {
        this.responseBytes = Json.write(response);
        this.eventBytes = EventChain.encode(events);
        this.signingKey = signingKey;
        this.recipient = recipient;
    }

    Path writeTo(Path file, String packageId) throws Exception {
        Map<String, EntryDigest> entries = new TreeMap<>();
        entries.put(PackageLayout.RESPONSE, new EntryDigest(Sha256.hex(responseBytes), responseBytes.length, false));
        entries.put(PackageLayout.EVENTS, new EntryDigest(Sha256.hex(eventBytes), eventBytes.length, false));
        long lines = new String(eventBytes, java.nio.charset.StandardCharsets.UTF_8).lines().count();
        PackageManifest manifest = manifestHook.apply(new PackageManifest(PackageManifest.FORMAT, PackageManifest.SCHEMA_VERSION,
                packageId, Base64.getEncoder().encodeToString(Ed25519.rawPublic(Ed25519.publicOf(signingKey))), lines,
                EventChain.head(eventBytes), entries));
        byte[] manifestBytes = Json.write(manifest);
        ByteArrayOutputStream inner = new ByteArrayOutputStream();
        try (CanonicalZipWriter zip = new CanonicalZipWriter(inner)) {
            zip.addStored(PackageLayout.MANIFEST, manifestBytes);
            if (includeSignature) {
                zip.addStored(PackageLayout.SIGNATURE, Ed25519.sign(signingKey, manifestBytes));
            }
            zip.addStored(PackageLayout.RESPONSE, responseBytes);
            zip.addStored(PackageLayout.EVENTS, eventBytes);
        }
        KeyPair ephemeral = X25519.generate();
        byte[] ephemeralPublic = X25519.rawPublic(ephemeral.getPublic());
        byte[] recipientPublic = X25519.rawPublic(recipient);
        byte[] salt = new byte[PackageLayout.SALT_BYTES];
        Envelope envelope = envelopeHook.apply(new Envelope(Envelope.FORMAT, Envelope.SCHEMA_VERSION, packageId,
                Fingerprint.of(recipientPublic), Base64.getEncoder().encodeToString(ephemeralPublic),
                Base64.getEncoder().encodeToString(salt), Envelope.SCHEME));
        byte[] envelopeBytes = Json.write(envelope);
        byte[] key = Hkdf.derive(salt, X25519.agree(ephemeral.getPrivate(), recipient),
                PackageLayout.hkdfInfo(ephemeralPublic, recipientPublic), AesGcm.KEY_BYTES);
        try (CanonicalZipWriter zip = new CanonicalZipWriter(Files.newOutputStream(file))) {
            zip.addStored(PackageLayout.ENVELOPE, envelopeBytes);
            zip.addStored(PackageLayout.PAYLOAD, AesGcm.seal(key, inner.toByteArray(), envelopeBytes));
        }
        return file;
    }
}
