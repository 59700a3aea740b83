package org.inkgate.client.demo;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.PrivateKey;
import java.util.Base64;
import org.inkgate.format.bundle.OwnerKeys;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.crypto.X25519;

/**
 * The demo test owner's keys, read from hex files that are published on purpose (DEMO ONLY,
 * NOT SECRET): a bundle signed with them proves nothing about who made it.
 *
 * @param signing   Ed25519 private key that signs the demo bundle
 * @param ownerKeys the public halves, as the manifest carries them
 */
record DemoKeys(PrivateKey signing, OwnerKeys ownerKeys) {

    static final String FOLDER = "keys";
    static final String SIGNING_FILE = "demo-only-not-secret-owner-signing.ed25519-seed.hex";
    static final String ENCRYPTION_FILE = "demo-only-not-secret-owner-encryption.x25519.hex";

    private static final int KEY_HEX_DIGITS = 64;

    static DemoKeys read(Path sourceDir) throws DemoSourceException {
        PrivateKey signing = Ed25519.privateFromSeed(readKeyBytes(sourceDir, SIGNING_FILE));
        PrivateKey encryption = X25519.privateFromRaw(readKeyBytes(sourceDir, ENCRYPTION_FILE));
        Base64.Encoder b64 = Base64.getEncoder();
        OwnerKeys publicKeys = new OwnerKeys(
                b64.encodeToString(Ed25519.rawPublic(Ed25519.publicOf(signing))),
                b64.encodeToString(X25519.rawPublic(X25519.publicOf(encryption))));
        return new DemoKeys(signing, publicKeys);
    }

    private static byte[] readKeyBytes(Path sourceDir, String fileName) throws DemoSourceException {
        Path file = sourceDir.resolve(FOLDER).resolve(fileName);
        if (!Files.isRegularFile(file)) {
            throw new DemoSourceException(file + " is missing: the demo build needs it. Restore it from the"
                    + " repository, or write 32 random bytes as " + KEY_HEX_DIGITS + " hex digits into it.");
        }
        String text;
        try {
            text = Files.readString(file, StandardCharsets.ISO_8859_1).strip();
        } catch (IOException e) {
            throw new DemoSourceException(file + " cannot be read (" + e.getMessage() + ")", e);
        }
        if (text.length() != KEY_HEX_DIGITS || !text.chars().allMatch(DemoKeys::isHexDigit)) {
            throw new DemoSourceException(file + " must hold exactly " + KEY_HEX_DIGITS
                    + " hex digits (32 bytes) and nothing else; it holds " + text.length() + " characters"
                    + (text.chars().allMatch(DemoKeys::isHexDigit) ? "" : ", some of them not hex digits") + ".");
        }
        return Hex.parse(text.toLowerCase(java.util.Locale.ROOT));
    }

    private static boolean isHexDigit(int c) {
        return (c >= '0' && c <= '9') || (c >= 'a' && c <= 'f') || (c >= 'A' && c <= 'F');
    }
}
