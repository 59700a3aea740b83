package org.inkgate.client.sitting.submit;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.KeyPair;
import java.security.PrivateKey;
import java.util.Arrays;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.io.AtomicFiles;

/**
 * The client installation's Ed25519 signing key (docs/formats.md, "Trust"): made once, the first
 * time a live sitting needs it, and kept in the client data folder as the 32-byte RFC 8032 seed
 * in hex ({@value #FILE_NAME}), readable by the owner only where the file system has POSIX
 * permissions. Its fingerprint is what the invigilator records with the seat, so the collector
 * can tell this machine's packages from any other.
 *
 * @param key         the private key
 * @param fingerprint the public key's fingerprint
 */
public record InstallationKey(PrivateKey key, String fingerprint) {

    public static final String FILE_NAME = "installation-signing.ed25519-seed.hex";

    /** Loads the key of this installation, making it on first use. */
    public static InstallationKey loadOrCreate(ClientDataFolder folder) throws IOException {
        folder.create();
        Path file = folder.installation().resolve(FILE_NAME);
        if (!Files.exists(file)) {
            KeyPair pair = Ed25519.generate();
            byte[] seed = Ed25519.seed(pair.getPrivate());
            byte[] text = (Hex.of(seed) + "\n").getBytes(StandardCharsets.US_ASCII);
            Arrays.fill(seed, (byte) 0);
            AtomicFiles.write(file, out -> out.write(text));
            if (Files.getFileStore(file).supportsFileAttributeView("posix")) {
                Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-------"));
            }
        }
        String hex = Files.readString(file, StandardCharsets.US_ASCII).strip();
        byte[] seed;
        try {
            seed = Hex.parse(hex);
        } catch (IllegalArgumentException e) {
            throw new IOException(file + ": the installation key is not hex (" + e.getMessage() + "). Move the file aside"
                    + " and start the client again to make a new key, then enrol the new fingerprint.", e);
        }
        if (seed.length != Ed25519.KEY_BYTES) {
            throw new IOException(file + ": the installation key has " + seed.length + " bytes, not " + Ed25519.KEY_BYTES
                    + ". Move the file aside and start the client again to make a new key, then enrol the new fingerprint.");
        }
        PrivateKey key = Ed25519.privateFromSeed(seed);
        Arrays.fill(seed, (byte) 0);
        return new InstallationKey(key, Fingerprint.of(Ed25519.rawPublic(Ed25519.publicOf(key))));
    }

    @Override
    public String toString() {
        return "InstallationKey[" + fingerprint + "]";
    }
}
