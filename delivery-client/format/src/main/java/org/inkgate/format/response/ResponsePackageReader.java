package org.inkgate.format.response;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.PrivateKey;
import java.util.Arrays;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import javax.crypto.AEADBadTagException;
import org.inkgate.format.archive.ArchiveEntry;
import org.inkgate.format.archive.ArchiveLimits;
import org.inkgate.format.archive.SafeZipReader;
import org.inkgate.format.archive.SignedArchive;
import org.inkgate.format.archive.SignedArchive.ListedDigest;
import org.inkgate.format.crypto.AesGcm;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.crypto.Hkdf;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.json.Json;
import org.inkgate.format.json.SchemaCheck;
import org.inkgate.format.refusal.BadSignature;
import org.inkgate.format.refusal.DecryptionFailed;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.InvalidContent;
import org.inkgate.format.refusal.MissingEntry;
import org.inkgate.format.refusal.SizeLimitExceeded;
import org.inkgate.format.refusal.UnlistedEntry;
import org.inkgate.format.refusal.UnsupportedSchema;
import org.inkgate.format.refusal.UntrustedSigner;
import org.inkgate.format.trust.TrustPolicy;

/**
 * Opens response packages with the test owner's X25519 private key: checks the outer
 * archive, decrypts and authenticates the payload, checks the inner archive, the client's
 * signature and whether that client installation is trusted, every digest and the event
 * log's hash chain. Only then is anything handed out. The file is read once, and decrypted
 * content stays in memory: answers are never written to disk in the clear.
 *
 * <p>Anyone can encrypt to the owner's public key, so a package's origin rests on the
 * installation key that signed it: give the reader the fingerprints of the installations
 * enrolled for the sitting, or accept any signer and check {@link OpenedResponse#installationFingerprint()}.
 */
public final class ResponsePackageReader {

    private final byte[] ownerScalar;
    private final byte[] ownerPublic;
    private final TrustPolicy installations;
    private final ArchiveLimits limits;

    public ResponsePackageReader(PrivateKey ownerEncryptionKey, TrustPolicy installations) {
        this(ownerEncryptionKey, installations, defaultLimits());
    }

    public ResponsePackageReader(PrivateKey ownerEncryptionKey, TrustPolicy installations, ArchiveLimits limits) {
        this.ownerScalar = X25519.rawPrivate(ownerEncryptionKey);
        this.ownerPublic = X25519.rawPublic(X25519.publicOf(ownerEncryptionKey));
        this.installations = Objects.requireNonNull(installations, "installations: say which installation keys to trust");
        this.limits = limits;
    }

    /** A response package holds one candidate's sitting: 256 MiB is far above any real one. */
    public static ArchiveLimits defaultLimits() {
        return new ArchiveLimits(256L << 20, 16, 256L << 20, 512L << 20, ArchiveLimits.DEFAULT_MAX_RATIO);
    }

    public OpenedResponse open(Path file) throws FormatRefusal, IOException {
        String name = file.getFileName().toString();
        long size = Files.size(file);
        if (size > limits.maxArchiveBytes()) {
            throw new SizeLimitExceeded(name, "the package's size (" + size + " bytes)", limits.maxArchiveBytes());
        }
        return open(name, Files.readAllBytes(file));
    }

    /**
     * Opens a package already read into memory, e.g. by a collector that hashed the file first to
     * skip packages it already holds: the file is then read once, not twice.
     *
     * @param name the file name, for messages
     */
    public OpenedResponse open(String name, byte[] bytes) throws FormatRefusal, IOException {
        return open(name, bytes, Sha256.hex(bytes));
    }

    /**
     * Opens a package already read and hashed, e.g. by a collector that hashed the file to skip packages it
     * already holds: the bytes are then hashed once, not twice.
     *
     * @param packageSha256 the SHA-256 of {@code bytes} in lower-case hex, as {@link Sha256#hex} gives it
     */
    public OpenedResponse open(String name, byte[] bytes, String packageSha256) throws FormatRefusal, IOException {
        if (bytes.length > limits.maxArchiveBytes()) {
            throw new SizeLimitExceeded(name, "the package's size (" + bytes.length + " bytes)", limits.maxArchiveBytes());
        }
        byte[] envelopeBytes;
        byte[] payload;
        try (SafeZipReader outer = SafeZipReader.open(name, bytes, limits)) {
            for (ArchiveEntry entry : outer.entries()) {
                if (!entry.name().equals(PackageLayout.ENVELOPE) && !entry.name().equals(PackageLayout.PAYLOAD)) {
                    throw new UnlistedEntry(name, entry.name());
                }
            }
            envelopeBytes = SignedArchive.manifest(name, outer, PackageLayout.ENVELOPE);
            ArchiveEntry payloadEntry = outer.entry(PackageLayout.PAYLOAD)
                    .orElseThrow(() -> new MissingEntry(name, PackageLayout.PAYLOAD));
            payload = outer.read(payloadEntry);
        }
        bytes = null; // the outer archive is no longer needed; let it go before decrypting
        JsonNode envelopeTree = Json.tree(name, PackageLayout.ENVELOPE, envelopeBytes);
        checkSchema(name, envelopeTree, Envelope.FORMAT, Envelope.SCHEMA_VERSION, "response package");
        Envelope envelope = Json.bind(name, PackageLayout.ENVELOPE, envelopeBytes, Envelope.class);
        byte[] inner = decrypt(name, envelope, envelopeBytes, payload);
        payload = null;
        return readInner(name, envelope, inner, packageSha256);
    }

    private byte[] decrypt(String name, Envelope envelope, byte[] envelopeBytes, byte[] payload) throws FormatRefusal {
        if (!Envelope.SCHEME.equals(envelope.scheme())) {
            throw new UnsupportedSchema(name, "the package is encrypted with \"" + envelope.scheme()
                    + "\", which this version does not know");
        }
        String mine = Fingerprint.of(ownerPublic);
        if (!mine.equals(envelope.recipient())) {
            throw new DecryptionFailed(name, "the package is encrypted to key " + envelope.recipient()
                    + ", not to this key (" + mine + "). Open it with the test owner key of the exam it belongs to.", null);
        }
        byte[] ephemeralPublic;
        byte[] salt;
        try {
            Base64.Decoder b64 = Base64.getDecoder();
            ephemeralPublic = b64.decode(envelope.ephemeralKey());
            salt = b64.decode(envelope.salt());
        } catch (IllegalArgumentException | NullPointerException e) {
            throw new InvalidContent(name, "the envelope's ephemeralKey or salt is not base64; the file is damaged");
        }
        byte[] shared;
        try {
            shared = X25519.agree(ownerScalar, ephemeralPublic);
        } catch (IllegalArgumentException e) {
            throw new DecryptionFailed(name, "the envelope's one-time key is not a usable X25519 key; the file is damaged", e);
        }
        byte[] key = Hkdf.derive(salt, shared, PackageLayout.hkdfInfo(ephemeralPublic, ownerPublic), AesGcm.KEY_BYTES);
        try {
            return AesGcm.open(key, payload, envelopeBytes);
        } catch (AEADBadTagException e) {
            throw new DecryptionFailed(name, "the package does not decrypt: it was altered or damaged after it was written."
                    + " Use the local copy the client kept, or the invigilator's second copy.", e);
        } finally {
            Arrays.fill(key, (byte) 0);
            Arrays.fill(shared, (byte) 0);
        }
    }

    private OpenedResponse readInner(String name, Envelope envelope, byte[] inner, String packageSha256)
            throws FormatRefusal, IOException {
        try (SafeZipReader zip = SafeZipReader.open(name, inner, limits)) {
            byte[] manifestBytes = SignedArchive.manifest(name, zip, PackageLayout.MANIFEST);
            byte[] signature = SignedArchive.signature(name, zip, PackageLayout.SIGNATURE);
            JsonNode tree = Json.tree(name, PackageLayout.MANIFEST, manifestBytes);
            checkFormat(name, tree, PackageManifest.FORMAT, "response package");
            byte[] signer;
            try {
                signer = Base64.getDecoder().decode(tree.path("signingKey").asText(""));
            } catch (IllegalArgumentException e) {
                throw new BadSignature(name, "the package names no valid client signing key");
            }
            if (signer.length != Ed25519.KEY_BYTES) {
                throw new BadSignature(name, "the package names no valid client signing key");
            }
            if (!Ed25519.verify(signer, manifestBytes, signature)) {
                throw new BadSignature(name, "the client's signature does not match the package contents");
            }
            checkSchemaVersion(name, tree, PackageManifest.SCHEMA_VERSION, "response package");
            String installation = Fingerprint.of(signer);
            if (!installations.trusts(installation)) {
                throw UntrustedSigner.installation(name, installation);
            }
            PackageManifest manifest = Json.bind(name, PackageLayout.MANIFEST, manifestBytes, PackageManifest.class);
            if (!manifest.entries().keySet().equals(Set.of(PackageLayout.RESPONSE, PackageLayout.EVENTS))) {
                throw new InvalidContent(name, "the package lists " + manifest.entries().keySet()
                        + " instead of response.json and events.jsonl");
            }
            Map<String, byte[]> content = SignedArchive.readListed(name, zip,
                    ListedDigest.of(manifest.entries(), d -> new ListedDigest(d.sha256(), d.size())),
                    Set.of(PackageLayout.MANIFEST, PackageLayout.SIGNATURE));
            byte[] responseBytes = content.get(PackageLayout.RESPONSE);
            byte[] eventBytes = content.get(PackageLayout.EVENTS);
            JsonNode responseTree = Json.tree(name, PackageLayout.RESPONSE, responseBytes);
            checkFormat(name, responseTree, ResponseDocument.FORMAT, "response");
            checkSchemaVersion(name, responseTree, ResponseDocument.SCHEMA_VERSION, "response");
            ResponseDocument response = Json.bind(name, PackageLayout.RESPONSE, responseBytes, ResponseDocument.class);
            EventChain.Decoded log = EventChain.decodeWithHead(name, PackageLayout.EVENTS, eventBytes);
            List<ProcessEvent> events = log.events();
            if (events.size() != manifest.eventCount() || !log.head().equals(manifest.chainHead())) {
                throw new InvalidContent(name, "the event log does not end where the signed manifest says it ends");
            }
            checkPackageId(name, envelope.packageId(), manifest.packageId(), response.packageId());
            List<String> problems = ResponseRules.problems(response);
            if (!problems.isEmpty()) {
                throw new InvalidContent(name, "the signed response breaks the response rules: " + String.join("; ", problems)
                        + ". The client that wrote it is faulty; keep the file and report it.");
            }
            return new OpenedResponse(name, envelope, response, events, log.lines(), installation, packageSha256);
        }
    }

    /** One UUID in all three places: copies can then be matched and parts of packages not mixed. */
    private static void checkPackageId(String name, String envelopeId, String manifestId, String responseId)
            throws InvalidContent {
        if (!ResponseRules.isUuid(envelopeId)) {
            throw new InvalidContent(name, "the package id \"" + envelopeId + "\" is not a UUID");
        }
        if (!envelopeId.equals(manifestId) || !envelopeId.equals(responseId)) {
            throw new InvalidContent(name, "the package id differs between envelope, manifest and response"
                    + " (parts of different packages were combined)");
        }
    }

    private static void checkSchema(String name, JsonNode tree, String format, int newest, String what)
            throws UnsupportedSchema {
        checkFormat(name, tree, format, what);
        checkSchemaVersion(name, tree, newest, what);
    }

    private static void checkFormat(String name, JsonNode tree, String format, String what) throws UnsupportedSchema {
        SchemaCheck.requireFormat(name, tree, format, "a " + what,
                "Collect .inkresp files written by the Inkgate delivery client.");
    }

    private static void checkSchemaVersion(String name, JsonNode tree, int newest, String what) throws UnsupportedSchema {
        // the envelope is read before anything can be authenticated, so an edit looks the same
        SchemaCheck.requireVersion(name, tree, newest, what, "Update the admin tool to the version that matches the"
                + " client; if no newer client was used, the file was altered.");
    }
}
