package org.inkgate.format.bundle;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Base64;
import java.util.Map;
import javax.crypto.AEADBadTagException;
import org.inkgate.format.crypto.AesGcm;
import org.inkgate.format.crypto.Pbkdf2;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.io.PrivateTempFolder;
import org.inkgate.format.refusal.DecryptionFailed;
import org.inkgate.format.refusal.DigestMismatch;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.WrongReleaseCode;

/**
 * A bundle that passed every check, unpacked into a private temporary folder that
 * {@link #close()} deletes. A sealed bundle's content stays encrypted until {@link #unseal}
 * is given the right release code.
 */
public final class OpenedBundle implements AutoCloseable {

    private final String fileName;
    private final BundleManifest manifest;
    private final String signerFingerprint;
    private final String manifestSha256;
    private final PrivateTempFolder folder;
    private boolean unsealed;

    OpenedBundle(String fileName, BundleManifest manifest, String signerFingerprint, String manifestSha256,
            PrivateTempFolder folder) {
        this.fileName = fileName;
        this.manifest = manifest;
        this.signerFingerprint = signerFingerprint;
        this.manifestSha256 = manifestSha256;
        this.folder = folder;
        this.unsealed = !manifest.sealed();
    }

    public BundleManifest manifest() {
        return manifest;
    }

    /** Fingerprint of the key that signed the manifest, for people to compare with the published one. */
    public String signerFingerprint() {
        return signerFingerprint;
    }

    /** SHA-256 of the manifest's bytes: names exactly this bundle in the responses written from it. */
    public String manifestSha256() {
        return manifestSha256;
    }

    public String fileName() {
        return fileName;
    }

    public boolean sealed() {
        return manifest.sealed();
    }

    /** True when the content can be read: the bundle was never sealed, or it has been unsealed. */
    public boolean readable() {
        return unsealed;
    }

    /**
     * Decrypts the sealed entries with the release code. A wrong code is refused before anything
     * is decrypted; the bundle stays sealed and the code can be entered again.
     */
    public synchronized void unseal(char[] releaseCode) throws FormatRefusal, IOException {
        if (unsealed) {
            return;
        }
        SealSpec seal = manifest.seal();
        Base64.Decoder b64 = Base64.getDecoder();
        byte[] key = Pbkdf2.derive(releaseCode, b64.decode(seal.salt()), seal.iterations(), AesGcm.KEY_BYTES);
        try {
            try {
                byte[] check = AesGcm.open(key, b64.decode(seal.check()), BundleWriter.CHECK_AAD);
                if (!BundleWriter.CHECK_TEXT.equals(new String(check, StandardCharsets.UTF_8))) {
                    throw new WrongReleaseCode(fileName);
                }
            } catch (AEADBadTagException e) {
                throw new WrongReleaseCode(fileName);
            }
            for (Map.Entry<String, EntryDigest> e : manifest.entries().entrySet()) {
                if (!e.getValue().sealed()) {
                    continue;
                }
                Path path = folder.resolve(e.getKey());
                byte[] plain;
                try {
                    plain = AesGcm.open(key, Files.readAllBytes(path), BundleWriter.sealedEntryAad(e.getKey()));
                } catch (AEADBadTagException ex) {
                    throw new DecryptionFailed(fileName, "sealed entry \"" + e.getKey()
                            + "\" does not decrypt although the release code is right: the bundle was built wrongly."
                            + " Ask the test owner for a new bundle.", ex);
                }
                Files.write(path, plain);
            }
            for (PackRef pack : manifest.packs()) {
                if (!Sha256.hex(Files.readAllBytes(folder.resolve(pack.file()))).equals(pack.sha256())) {
                    throw new DigestMismatch(fileName, pack.file());
                }
            }
            unsealed = true;
        } finally {
            Arrays.fill(key, (byte) 0);
        }
    }

    /** The bytes of a content entry (prompt, instructions, pack). */
    public byte[] readBytes(String entry) throws IOException {
        return Files.readAllBytes(path(entry));
    }

    public String readText(String entry) throws IOException {
        return new String(readBytes(entry), StandardCharsets.UTF_8);
    }

    /** Where a content entry lies unpacked, for tools that need a file (pack indexes). */
    public Path path(String entry) {
        if (!unsealed) {
            throw new IllegalStateException("the bundle is sealed: unseal it with the release code first");
        }
        if (!manifest.entries().containsKey(entry)) {
            throw new IllegalArgumentException("\"" + entry + "\" is not an entry of this bundle");
        }
        return folder.resolve(entry);
    }

    @Override
    public void close() throws IOException {
        folder.close();
    }
}
