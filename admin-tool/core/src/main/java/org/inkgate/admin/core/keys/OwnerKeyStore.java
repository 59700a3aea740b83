package org.inkgate.admin.core.keys;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.KeyPair;
import java.security.PrivateKey;
import java.security.PublicKey;
import java.util.Base64;
import java.util.LinkedHashMap;
import java.util.Map;
import org.inkgate.format.bundle.OwnerKeys;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.io.AtomicFiles;
import org.inkgate.format.json.Json;

/**
 * The test owner's key folder: an Ed25519 signing pair (signs bundles) and an X25519 encryption
 * pair (response packages are encrypted to it). Private keys are stored only encrypted under a
 * passphrase ({@link EncryptedKeys}); the public keys and fingerprints in {@code owner-public.json}.
 */
public final class OwnerKeyStore {

    public static final String SIGNING_FILE = "owner-signing.key.pem";
    public static final String ENCRYPTION_FILE = "owner-encryption.key.pem";
    public static final String PUBLIC_FILE = "owner-public.json";
    /** Shortest passphrase accepted (common practice for a passphrase guarding offline-attackable keys). */
    public static final int MIN_PASSPHRASE = 12;

    private final Path folder;

    public OwnerKeyStore(Path folder) {
        this.folder = folder;
    }

    /** The public half, readable without the passphrase. */
    public record PublicKeys(String signing, String encryption, String signingFingerprint, String encryptionFingerprint) {
        public OwnerKeys ownerKeys() {
            return new OwnerKeys(signing, encryption);
        }
    }

    /** Creates both key pairs; refuses to overwrite an existing key folder. */
    public PublicKeys init(char[] passphrase) throws IOException {
        return init(passphrase, Ed25519.generate(), X25519.generate());
    }

    /**
     * Writes the given key pairs here, protected by the passphrase, as {@link #init(char[])} writes new ones
     * (bench commands write the test keys this way, so the real command line can open their packages).
     */
    public PublicKeys init(char[] passphrase, KeyPair signing, KeyPair encryption) throws IOException {
        if (passphrase == null || passphrase.length < MIN_PASSPHRASE) {
            throw new IllegalArgumentException("the passphrase needs at least " + MIN_PASSPHRASE + " characters: anyone who"
                    + " copies the key files can try passphrases offline");
        }
        for (String f : new String[] {SIGNING_FILE, ENCRYPTION_FILE, PUBLIC_FILE}) {
            if (Files.exists(folder.resolve(f))) {
                throw new FileAlreadyExistsException(folder.resolve(f).toString(), null,
                        "keys already exist here; new keys would make every bundle and response package made with the old"
                        + " ones unusable. Choose another folder, or move the old keys away on purpose");
            }
        }
        Files.createDirectories(folder);
        writePrivate(SIGNING_FILE, EncryptedKeys.pem(EncryptedKeys.encrypt(signing.getPrivate(), passphrase)));
        writePrivate(ENCRYPTION_FILE, EncryptedKeys.pem(EncryptedKeys.encrypt(encryption.getPrivate(), passphrase)));
        PublicKeys pub = publicKeys(signing.getPublic(), encryption.getPublic());
        Map<String, String> json = new LinkedHashMap<>();
        json.put("signing", pub.signing());
        json.put("encryption", pub.encryption());
        json.put("signingFingerprint", pub.signingFingerprint());
        json.put("encryptionFingerprint", pub.encryptionFingerprint());
        AtomicFiles.write(folder.resolve(PUBLIC_FILE), out -> out.write(Json.write(json)));
        return pub;
    }

    private void writePrivate(String name, String pem) throws IOException {
        Path file = folder.resolve(name);
        AtomicFiles.write(file, out -> out.write(pem.getBytes(StandardCharsets.US_ASCII)));
        try {
            Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-------"));
        } catch (UnsupportedOperationException e) {
            // not a POSIX file system (Windows): the folder's own access rights apply
        }
    }

    static PublicKeys publicKeys(PublicKey signing, PublicKey encryption) {
        byte[] s = Ed25519.rawPublic(signing);
        byte[] e = X25519.rawPublic(encryption);
        Base64.Encoder b64 = Base64.getEncoder();
        return new PublicKeys(b64.encodeToString(s), b64.encodeToString(e), Fingerprint.of(s), Fingerprint.of(e));
    }

    /** Reads the public keys; no passphrase needed. */
    public PublicKeys publicKeys() throws IOException {
        Path file = folder.resolve(PUBLIC_FILE);
        if (!Files.isRegularFile(file)) {
            throw new IOException("no " + PUBLIC_FILE + " in " + folder + ": create keys with \"inkgate-admin keys init\"");
        }
        JsonNode tree = Json.mapper().readTree(Files.readAllBytes(file));
        PublicKey s = Ed25519.publicFromRaw(Base64.getDecoder().decode(tree.path("signing").asText()));
        PublicKey e = X25519.publicFromRaw(Base64.getDecoder().decode(tree.path("encryption").asText()));
        return publicKeys(s, e);
    }

    public PrivateKey signingKey(char[] passphrase) throws IOException, EncryptedKeys.WrongPassphraseException {
        PrivateKey key = EncryptedKeys.decrypt(readPem(SIGNING_FILE), passphrase, "Ed25519");
        String pub = Base64.getEncoder().encodeToString(Ed25519.rawPublic(Ed25519.publicOf(key)));
        if (!pub.equals(publicKeys().signing())) {
            throw new IOException(SIGNING_FILE + " does not belong to " + PUBLIC_FILE + " in " + folder
                    + ": the files come from different key sets; restore the matching files");
        }
        return key;
    }

    public PrivateKey encryptionKey(char[] passphrase) throws IOException, EncryptedKeys.WrongPassphraseException {
        PrivateKey key = EncryptedKeys.decrypt(readPem(ENCRYPTION_FILE), passphrase, "X25519");
        String pub = Base64.getEncoder().encodeToString(X25519.rawPublic(X25519.publicOf(key)));
        if (!pub.equals(publicKeys().encryption())) {
            throw new IOException(ENCRYPTION_FILE + " does not belong to " + PUBLIC_FILE + " in " + folder
                    + ": the files come from different key sets; restore the matching files");
        }
        return key;
    }

    private byte[] readPem(String name) throws IOException {
        Path file = folder.resolve(name);
        if (!Files.isRegularFile(file)) {
            throw new IOException("no " + name + " in " + folder + ": create keys with \"inkgate-admin keys init\"");
        }
        return EncryptedKeys.fromPem(Files.readString(file, StandardCharsets.US_ASCII));
    }

    public Path folder() {
        return folder;
    }
}
