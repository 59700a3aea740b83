package org.inkgate.format.response;

/**
 * The readable outside of a response package ({@code envelope.json}): enough to find the key
 * that opens it, nothing about the candidate. Its exact bytes are the AES-GCM associated data,
 * so changing any field makes the payload fail to decrypt.
 *
 * @param format        always {@link #FORMAT}
 * @param schemaVersion schema version
 * @param packageId     random UUID of the package
 * @param recipient     fingerprint of the test owner's X25519 key the package is encrypted to
 * @param ephemeralKey  the sender's one-time X25519 public key, raw, base64
 * @param salt          HKDF salt, base64 (32 random bytes)
 * @param scheme        always {@link #SCHEME}
 */
public record Envelope(String format, int schemaVersion, String packageId, String recipient, String ephemeralKey,
        String salt, String scheme) {

    public static final String FORMAT = "inkgate-response-package";
    public static final int SCHEMA_VERSION = 1;
    public static final String SCHEME = "X25519-HKDF-SHA256-AES-256-GCM";
}
