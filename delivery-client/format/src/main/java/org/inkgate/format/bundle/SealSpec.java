package org.inkgate.format.bundle;

/**
 * How the sealed entries (prompts, instructions, packs) are encrypted: AES-256-GCM under a key
 * derived from the release code with PBKDF2-HMAC-SHA256.
 *
 * @param kdf        always "PBKDF2-HMAC-SHA256"
 * @param iterations PBKDF2 iteration count
 * @param salt       base64 salt (16 bytes)
 * @param check      base64 nonce and GCM ciphertext of a fixed text, so a wrong code is told
 *                   apart from a damaged entry before anything large is decrypted
 */
public record SealSpec(String kdf, int iterations, String salt, String check) {

    public static final String KDF = "PBKDF2-HMAC-SHA256";
}
