package org.inkgate.format.bundle;

import org.inkgate.format.trust.TrustPolicy;
import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Path;
import java.security.PublicKey;
import java.util.Base64;
import java.util.List;
import java.util.Set;
import org.inkgate.format.archive.ArchiveLimits;
import org.inkgate.format.archive.SafeZipReader;
import org.inkgate.format.archive.SignedArchive;
import org.inkgate.format.archive.SignedArchive.ListedDigest;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.io.PrivateTempFolder;
import org.inkgate.format.json.Json;
import org.inkgate.format.json.SchemaCheck;
import org.inkgate.format.refusal.BadSignature;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.InvalidContent;
import org.inkgate.format.refusal.UnsupportedSchema;
import org.inkgate.format.refusal.UntrustedSigner;

/**
 * Opens exam bundles from untrusted media. A bundle is handed out only after every check has
 * passed: archive structure and limits, schema version, the Ed25519 signature over the
 * manifest's exact bytes, the signer's trust, the manifest's rules, and the SHA-256 of every
 * entry. Entries are unpacked into a private temporary folder owned by the returned bundle.
 */
public final class BundleReader {

    private final TrustPolicy trust;
    private final ArchiveLimits limits;

    public BundleReader(TrustPolicy trust) {
        this(trust, ArchiveLimits.defaults());
    }

    public BundleReader(TrustPolicy trust, ArchiveLimits limits) {
        this.trust = trust;
        this.limits = limits;
    }

    public OpenedBundle open(Path file) throws FormatRefusal, IOException {
        String name = file.getFileName().toString();
        try (SafeZipReader zip = SafeZipReader.open(file, limits)) {
            byte[] manifestBytes = SignedArchive.manifest(name, zip, BundleWriter.MANIFEST);
            byte[] signature = SignedArchive.signature(name, zip, BundleWriter.SIGNATURE);
            JsonNode tree = Json.tree(name, BundleWriter.MANIFEST, manifestBytes);
            checkFormat(name, tree);
            PublicKey signer = signingKey(name, tree);
            if (!Ed25519.verify(signer, manifestBytes, signature)) {
                throw new BadSignature(name, "the signature in " + BundleWriter.SIGNATURE + " does not match the manifest");
            }
            // only a signed version number is believed: an edited one is an altered file, not a newer bundle
            checkSchemaVersion(name, tree);
            String fingerprint = Fingerprint.of(Ed25519.rawPublic(signer));
            if (!trust.trusts(fingerprint)) {
                throw new UntrustedSigner(name, fingerprint);
            }
            BundleManifest manifest = Json.bind(name, BundleWriter.MANIFEST, manifestBytes, BundleManifest.class);
            List<String> problems = ManifestRules.problems(manifest);
            if (!problems.isEmpty()) {
                throw new InvalidContent(name, "the signed manifest breaks the bundle rules: " + String.join("; ", problems)
                        + ". Ask the test owner to rebuild the bundle.");
            }
            checkSeal(name, manifest);
            PrivateTempFolder folder = PrivateTempFolder.create("inkgate-bundle-");
            try {
                SignedArchive.extractListed(name, zip,
                        ListedDigest.of(manifest.entries(), d -> new ListedDigest(d.sha256(), d.size())),
                        Set.of(BundleWriter.MANIFEST, BundleWriter.SIGNATURE), folder);
                return new OpenedBundle(name, manifest, fingerprint, Sha256.hex(manifestBytes), folder);
            } catch (FormatRefusal | IOException | RuntimeException e) {
                try {
                    folder.close();
                } catch (IOException cleanup) {
                    e.addSuppressed(cleanup);
                }
                throw e;
            }
        }
    }

    private static void checkFormat(String name, JsonNode tree) throws UnsupportedSchema {
        SchemaCheck.requireFormat(name, tree, BundleManifest.FORMAT, "an exam bundle",
                "Open a .inkexam file made by the Inkgate admin tool.");
    }

    private static void checkSchemaVersion(String name, JsonNode tree) throws UnsupportedSchema {
        SchemaCheck.requireVersion(name, tree, BundleManifest.SCHEMA_VERSION, "bundle",
                "Install the client version the test owner names for this exam.");
    }

    private static PublicKey signingKey(String name, JsonNode tree) throws BadSignature {
        String encoded = tree.path("ownerKeys").path("signing").asText("");
        try {
            return Ed25519.publicFromRaw(Base64.getDecoder().decode(encoded));
        } catch (IllegalArgumentException e) {
            throw new BadSignature(name, "the manifest names no valid Ed25519 signing key");
        }
    }

    private static void checkSeal(String name, BundleManifest manifest) throws InvalidContent, UnsupportedSchema {
        boolean anySealed = manifest.entries().values().stream().anyMatch(EntryDigest::sealed);
        if (anySealed && manifest.seal() == null) {
            throw new InvalidContent(name, "entries are marked sealed but the manifest gives no seal parameters;"
                    + " ask the test owner to rebuild the bundle.");
        }
        if (manifest.seal() != null) {
            SealSpec seal = manifest.seal();
            if (!SealSpec.KDF.equals(seal.kdf())) {
                throw new UnsupportedSchema(name, "the bundle is sealed with \"" + seal.kdf() + "\", which this client does not know");
            }
            if (seal.iterations() < org.inkgate.format.crypto.Pbkdf2.MIN_ITERATIONS
                    || seal.iterations() > org.inkgate.format.crypto.Pbkdf2.MAX_ITERATIONS) {
                throw new InvalidContent(name, "the seal's iteration count " + seal.iterations() + " is outside "
                        + org.inkgate.format.crypto.Pbkdf2.MIN_ITERATIONS + ".." + org.inkgate.format.crypto.Pbkdf2.MAX_ITERATIONS);
            }
        }
    }
}
