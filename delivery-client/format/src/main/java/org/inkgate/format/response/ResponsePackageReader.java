package org.inkgate.format.response;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.PrivateKey;
import java.security.PublicKey;
import java.util.Arrays;
import java.util.Base64;
import java.util.List;
import java.util.Set;
import javax.crypto.AEADBadTagException;
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
import org.inkgate.format.io.PrivateTempFolder;
import org.inkgate.format.json.Json;
import org.inkgate.format.refusal.BadSignature;
import org.inkgate.format.refusal.DecryptionFailed;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.InvalidContent;
import org.inkgate.format.refusal.UnlistedEntry;
import org.inkgate.format.refusal.UnsupportedSchema;

/**
 * Opens response packages with the test owner's X25519 private key: checks the outer
 * archive, decrypts and authenticates the payload, checks the inner archive, the client's
 * signature, every digest and the event log's hash chain. Only then is anything handed out.
 */
public final class ResponsePackageReader {

    private final PrivateKey ownerKey;
    private final byte[] ownerPublic;
    private final ArchiveLimits limits;

    public ResponsePackageReader(PrivateKey ownerEncryptionKey) {
        this(ownerEncryptionKey, ArchiveLimits.defaults());
    }

    public ResponsePackageReader(PrivateKey ownerEncryptionKey, ArchiveLimits limits) {
        this.ownerKey = ownerEncryptionKey;
        this.ownerPublic = X25519.rawPublic(X25519.publicOf(ownerEncryptionKey));
        this.limits = limits;
    }

    public OpenedResponse open(Path file) throws FormatRefusal, IOException {
        String name = file.getFileName().toString();
        byte[] envelopeBytes;
        byte[] payload;
        try (SafeZipReader outer = SafeZipReader.open(file, limits)) {
            for (var entry : outer.entries()) {
                if (!entry.name().equals(PackageLayout.ENVELOPE) && !entry.name().equals(PackageLayout.PAYLOAD)) {
                    throw new UnlistedEntry(name, entry.name());
                }
            }
            envelopeBytes = SignedArchive.required(name, outer, PackageLayout.ENVELOPE);
            payload = SignedArchive.required(name, outer, PackageLayout.PAYLOAD);
        }
        JsonNode envelopeTree = Json.tree(name, PackageLayout.ENVELOPE, envelopeBytes);
        checkSchema(name, envelopeTree, Envelope.FORMAT, Envelope.SCHEMA_VERSION, "response package");
        Envelope envelope = Json.bind(name, PackageLayout.ENVELOPE, envelopeBytes, Envelope.class);
        byte[] inner = decrypt(name, envelope, envelopeBytes, payload);
        try (PrivateTempFolder folder = PrivateTempFolder.create("inkgate-response-")) {
            Path innerFile = folder.resolve("content.zip");
            Files.write(innerFile, inner);
            return readInner(name, envelope, innerFile, folder, Sha256.hex(Files.readAllBytes(file)));
        }
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
            shared = X25519.agree(ownerKey, X25519.publicFromRaw(ephemeralPublic));
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

    private OpenedResponse readInner(String name, Envelope envelope, Path innerFile, PrivateTempFolder folder,
            String packageSha256) throws FormatRefusal, IOException {
        try (SafeZipReader zip = SafeZipReader.open(innerFile, limits)) {
            byte[] manifestBytes = SignedArchive.required(name, zip, PackageLayout.MANIFEST);
            byte[] signature = zip.entry(PackageLayout.SIGNATURE).isPresent()
                    ? zip.read(zip.entry(PackageLayout.SIGNATURE).get()) : null;
            if (signature == null) {
                throw new BadSignature(name, "the package carries no signature (" + PackageLayout.SIGNATURE + " is missing)");
            }
            JsonNode tree = Json.tree(name, PackageLayout.MANIFEST, manifestBytes);
            checkSchema(name, tree, PackageManifest.FORMAT, PackageManifest.SCHEMA_VERSION, "response package");
            PublicKey signer;
            try {
                signer = Ed25519.publicFromRaw(Base64.getDecoder().decode(tree.path("signingKey").asText("")));
            } catch (IllegalArgumentException e) {
                throw new BadSignature(name, "the package names no valid client signing key");
            }
            if (!Ed25519.verify(signer, manifestBytes, signature)) {
                throw new BadSignature(name, "the client's signature does not match the package contents");
            }
            PackageManifest manifest = Json.bind(name, PackageLayout.MANIFEST, manifestBytes, PackageManifest.class);
            if (!manifest.entries().keySet().equals(Set.of(PackageLayout.RESPONSE, PackageLayout.EVENTS))) {
                throw new InvalidContent(name, "the package lists " + manifest.entries().keySet()
                        + " instead of response.json and events.jsonl");
            }
            SignedArchive.extractListed(name, zip,
                    ListedDigest.of(manifest.entries(), d -> new ListedDigest(d.sha256(), d.size())),
                    Set.of(PackageLayout.MANIFEST, PackageLayout.SIGNATURE), folder);
            byte[] responseBytes = Files.readAllBytes(folder.resolve(PackageLayout.RESPONSE));
            byte[] eventBytes = Files.readAllBytes(folder.resolve(PackageLayout.EVENTS));
            JsonNode responseTree = Json.tree(name, PackageLayout.RESPONSE, responseBytes);
            checkSchema(name, responseTree, ResponseDocument.FORMAT, ResponseDocument.SCHEMA_VERSION, "response");
            ResponseDocument response = Json.bind(name, PackageLayout.RESPONSE, responseBytes, ResponseDocument.class);
            List<ProcessEvent> events = EventChain.decode(name, PackageLayout.EVENTS, eventBytes);
            if (events.size() != manifest.eventCount() || !EventChain.head(eventBytes).equals(manifest.chainHead())) {
                throw new InvalidContent(name, "the event log does not end where the signed manifest says it ends");
            }
            if (!java.util.Objects.equals(envelope.packageId(), manifest.packageId())
                    || !java.util.Objects.equals(manifest.packageId(), response.packageId())) {
                throw new InvalidContent(name, "the package id differs between envelope, manifest and response"
                        + " (parts of different packages were combined)");
            }
            return new OpenedResponse(name, envelope, response, events,
                    Fingerprint.of(Ed25519.rawPublic(signer)), packageSha256);
        }
    }

    static void checkSchema(String name, JsonNode tree, String format, int newest, String what) throws UnsupportedSchema {
        String actual = tree.path("format").asText("");
        if (!format.equals(actual)) {
            throw new UnsupportedSchema(name, "this is not a " + what + " (format \"" + actual + "\" where \"" + format
                    + "\" was expected). Collect .inkresp files written by the Inkgate delivery client.");
        }
        JsonNode version = tree.path("schemaVersion");
        if (!version.isIntegralNumber() || version.asInt() < 1) {
            throw new UnsupportedSchema(name, "the " + what + " has no valid schemaVersion; the file is damaged.");
        }
        if (version.asInt() > newest) {
            throw new UnsupportedSchema(name, "the " + what + " uses schema version " + version.asInt() + ", newer than the "
                    + newest + " this version reads. Update the admin tool to the version that matches the client.");
        }
    }
}
