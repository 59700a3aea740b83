package org.inkgate.format.bundle;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.PrivateKey;
import java.util.Arrays;
import java.util.Base64;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.format.archive.CanonicalZipWriter;
import org.inkgate.format.archive.EntryNames;
import org.inkgate.format.crypto.AesGcm;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Pbkdf2;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.io.AtomicFiles;
import org.inkgate.format.json.Json;

/**
 * Writes exam bundles: the content entries, a manifest listing their digests, and the owner's
 * Ed25519 signature over the manifest's exact bytes. The schema version written is the lowest that
 * holds the manifest ({@link BundleManifest#versionFor}), whatever the given manifest says. Output is written to a temporary file
 * and moved into place, so a half-written bundle never carries the final name.
 */
public final class BundleWriter {

    static final String MANIFEST = "manifest.json";
    static final String SIGNATURE = "manifest.sig";
    static final String CHECK_TEXT = "inkgate release code check";
    static final byte[] CHECK_AAD = "inkgate-seal-check".getBytes(StandardCharsets.UTF_8);

    private final PrivateKey signingKey;
    private final byte[] signingPublic;

    public BundleWriter(PrivateKey ownerSigningKey) {
        this.signingKey = ownerSigningKey;
        this.signingPublic = Ed25519.rawPublic(Ed25519.publicOf(ownerSigningKey));
    }

    /** Writes an unsealed bundle; the same input always gives the same bytes. */
    public void write(BundleManifest manifest, Map<String, byte[]> contents, Path out) throws IOException {
        write(manifest, contents, null, out);
    }

    /**
     * Writes a bundle whose content entries are encrypted under a key derived from the release
     * code. The sealed bundle lets anyone who copies it guess codes offline, so the code must be
     * long: use {@link ReleaseCode#generate()} (100 random bits) unless there is a reason not to.
     */
    public void writeSealed(BundleManifest manifest, Map<String, byte[]> contents, char[] releaseCode, Path out)
            throws IOException {
        if (releaseCode == null || releaseCode.length < ReleaseCode.MIN_LENGTH) {
            throw new IllegalArgumentException("a release code needs at least " + ReleaseCode.MIN_LENGTH
                    + " characters, because a copied sealed bundle can be attacked offline; ReleaseCode.generate() makes one");
        }
        write(manifest, contents, releaseCode, out);
    }

    private void write(BundleManifest asGiven, Map<String, byte[]> contents, char[] releaseCode, Path out)
            throws IOException {
        // the lowest version that holds the content: clients that read only version 1 keep opening bundles without a design
        BundleManifest manifest = asGiven.withSchemaVersion(BundleManifest.versionFor(asGiven.design()));
        checkBeforeWriting(manifest, contents);
        Map<String, byte[]> stored = new TreeMap<>();
        BundleManifest draft = manifest;
        if (releaseCode != null) {
            byte[] salt = Pbkdf2.newSalt();
            byte[] key = Pbkdf2.derive(releaseCode, salt, Pbkdf2.ITERATIONS, AesGcm.KEY_BYTES);
            try {
                byte[] check = AesGcm.seal(key, CHECK_TEXT.getBytes(StandardCharsets.UTF_8), CHECK_AAD);
                Base64.Encoder b64 = Base64.getEncoder();
                draft = draft.withSeal(new SealSpec(SealSpec.KDF, Pbkdf2.ITERATIONS, b64.encodeToString(salt),
                        b64.encodeToString(check)));
                for (Map.Entry<String, byte[]> e : contents.entrySet()) {
                    stored.put(e.getKey(), AesGcm.seal(key, e.getValue(), sealedEntryAad(e.getKey())));
                }
            } finally {
                Arrays.fill(key, (byte) 0);
            }
        } else {
            stored.putAll(contents);
        }
        Map<String, EntryDigest> digests = new LinkedHashMap<>();
        stored.forEach((name, bytes) -> digests.put(name, new EntryDigest(Sha256.hex(bytes), bytes.length, releaseCode != null)));
        byte[] manifestBytes = Json.write(draft.withEntries(digests));
        byte[] signature = Ed25519.sign(signingKey, manifestBytes);

        AtomicFiles.write(out, stream -> {
            try (CanonicalZipWriter zip = new CanonicalZipWriter(stream)) {
                zip.addStored(MANIFEST, manifestBytes);
                zip.addStored(SIGNATURE, signature);
                for (Map.Entry<String, byte[]> e : stored.entrySet()) {
                    zip.addStored(e.getKey(), e.getValue());
                }
            }
        });
    }

    static byte[] sealedEntryAad(String name) {
        return ("inkgate-sealed-entry:" + name).getBytes(StandardCharsets.UTF_8);
    }

    private void checkBeforeWriting(BundleManifest manifest, Map<String, byte[]> contents) {
        if (manifest.ownerKeys() == null
                || !Arrays.equals(Base64.getDecoder().decode(manifest.ownerKeys().signing()), signingPublic)) {
            throw new IllegalArgumentException("the manifest's ownerKeys.signing is not the public half of the key"
                    + " signing this bundle: put the signing key's public key in the manifest");
        }
        for (String name : contents.keySet()) {
            EntryNames.requireSafe(name);
            if (name.equals(MANIFEST) || name.equals(SIGNATURE)) {
                throw new IllegalArgumentException("\"" + name + "\" is reserved for the bundle's own manifest");
            }
        }
        List<String> problems = ManifestRules.problems(manifest.withEntries(placeholderDigests(contents)));
        if (!problems.isEmpty()) {
            throw new IllegalArgumentException("the bundle is not consistent: " + String.join("; ", problems));
        }
    }

    private static Map<String, EntryDigest> placeholderDigests(Map<String, byte[]> contents) {
        Map<String, EntryDigest> digests = new TreeMap<>();
        contents.forEach((name, bytes) -> digests.put(name, new EntryDigest(Sha256.hex(bytes), bytes.length, false)));
        return digests;
    }
}
