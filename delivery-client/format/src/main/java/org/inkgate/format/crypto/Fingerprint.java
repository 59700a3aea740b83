package org.inkgate.format.crypto;

/**
 * A short, readable name of a public key, for people to compare aloud: the first 16 bytes of the
 * SHA-256 of the raw key, as eight groups of four hex digits.
 */
public final class Fingerprint {

    private Fingerprint() {
    }

    public static String of(byte[] rawPublicKey) {
        String hex = Hex.of(Sha256.digest(rawPublicKey));
        StringBuilder out = new StringBuilder();
        for (int i = 0; i < 32; i += 4) {
            if (i > 0) {
                out.append('-');
            }
            out.append(hex, i, i + 4);
        }
        return out.toString();
    }
}
