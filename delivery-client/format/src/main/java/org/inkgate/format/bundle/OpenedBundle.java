package org.inkgate.format.bundle;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Base64;
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
 * {@link #close()} deletes. A sealed bundle's entries stay encrypted on disk: after
 * {@link #unseal} has checked the release code and every entry, {@link #readBytes} decrypts
 * in memory, so a crash never leaves a decrypted prompt behind.
 */
public final class OpenedBundle implements AutoCloseable {

    private final String fileName;
    private final BundleManifest manifest;
    private final String signerFingerprint;
    private final String manifestSha256;
    private final PrivateTempFolder folder;
    private byte[] sealKey;

    OpenedBundle(String fileName, BundleManifest manifest, String signerFingerprint, String manifestSha256,
            PrivateTempFolder folder) {
        this.fileName = fileName;
        this.manifest = manifest;
        this.signerFingerprint = signerFingerprint;
        this.manifestSha256 = manifestSha256;
        this.folder = folder;
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
    public synchronized boolean readable() {
        return !manifest.sealed() || sealKey != null;
    }

    /**
     * Checks the release code and then decrypts every sealed entry once, in memory, to prove the
     * whole bundle opens (and every pack matches its digest) before a sitting relies on it. A
     * wrong code changes nothing: the bundle stays sealed and the code can be entered again.
     */
    public synchronized void unseal(char[] releaseCode) throws FormatRefusal, IOException {
        if (readable()) {
            return;
        }
        SealSpec seal = manifest.seal();
        Base64.Decoder b64 = Base64.getDecoder();
        byte[] key = Pbkdf2.derive(releaseCode, b64.decode(seal.salt()), seal.iterations(), AesGcm.KEY_BYTES);
        boolean kept = false;
        try {
            try {
                byte[] check = AesGcm.open(key, b64.decode(seal.check()), BundleWriter.CHECK_AAD);
                if (!BundleWriter.CHECK_TEXT.equals(new String(check, StandardCharsets.UTF_8))) {
                    throw new WrongReleaseCode(fileName);
                }
            } catch (AEADBadTagException e) {
                throw new WrongReleaseCode(fileName);
            }
            for (String entry : manifest.entries().keySet()) {
                byte[] plain = decrypt(key, entry);
                PackRef pack = manifest.packs().stream().filter(p -> p.file().equals(entry)).findFirst().orElse(null);
                if (pack != null && !Sha256.hex(plain).equals(pack.sha256())) {
                    throw new DigestMismatch(fileName, entry);
                }
                Arrays.fill(plain, (byte) 0);
            }
            sealKey = key;
            kept = true;
        } finally {
            if (!kept) {
                Arrays.fill(key, (byte) 0);
            }
        }
    }

    private byte[] decrypt(byte[] key, String entry) throws FormatRefusal, IOException {
        try {
            return AesGcm.open(key, Files.readAllBytes(folder.resolve(entry)), BundleWriter.sealedEntryAad(entry));
        } catch (AEADBadTagException e) {
            throw new DecryptionFailed(fileName, "sealed entry \"" + entry
                    + "\" does not decrypt although the release code is right: the bundle was built wrongly."
                    + " Ask the test owner for a new bundle.", e);
        }
    }

    /** The bytes of a content entry (prompt, instructions, pack); decrypted in memory when sealed. */
    public synchronized byte[] readBytes(String entry) throws IOException {
        requireEntry(entry);
        if (!manifest.sealed()) {
            return Files.readAllBytes(folder.resolve(entry));
        }
        try {
            return decrypt(sealKey, entry);
        } catch (FormatRefusal e) {
            // unseal() already decrypted this entry from the same verified bytes: only a changed temp file gets here
            throw new IOException("sealed entry \"" + entry + "\" changed on disk after it was checked: " + e.getMessage(), e);
        }
    }

    public String readText(String entry) throws IOException {
        return new String(readBytes(entry), StandardCharsets.UTF_8);
    }

    /**
     * Where an unsealed bundle's entry lies unpacked, for tools that need a file. Sealed entries
     * are never written decrypted to disk; read them with {@link #readBytes}.
     */
    public Path path(String entry) {
        requireEntry(entry);
        if (manifest.sealed()) {
            throw new IllegalStateException("\"" + entry + "\" is sealed: sealed entries are never written decrypted"
                    + " to disk; read them with readBytes after unsealing");
        }
        return folder.resolve(entry);
    }

    private void requireEntry(String entry) {
        if (!readable()) {
            throw new IllegalStateException("the bundle is sealed: unseal it with the release code first");
        }
        if (!manifest.entries().containsKey(entry)) {
            throw new IllegalArgumentException("\"" + entry + "\" is not an entry of this bundle");
        }
    }

    @Override
    public synchronized void close() throws IOException {
        if (sealKey != null) {
            Arrays.fill(sealKey, (byte) 0);
            sealKey = null;
        }
        folder.close();
    }
}
