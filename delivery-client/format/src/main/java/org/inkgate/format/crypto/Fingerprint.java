package org.inkgate.format.crypto;

/**
 * A short, readable name of a public key, for people to compare aloud: the first 16 bytes of the
 * SHA-256 of the raw key, as eight groups of four hex digits.
 */
public final class Fingerprint {

    private Fingerprint() {
    }

    private static final int HEX_DIGITS = 32;

    public static String of(byte[] rawPublicKey) {
        return grouped(Hex.of(Sha256.digest(rawPublicKey)).substring(0, HEX_DIGITS));
    }

    /**
     * The canonical spelling of a fingerprint typed or pasted by a person: letter case, dashes
     * and spaces do not matter; anything else that is not 32 hex digits is refused.
     */
    public static String normalise(String fingerprint) {
        String hex = fingerprint == null ? "" : fingerprint.replaceAll("[\\s-]", "").toLowerCase(java.util.Locale.ROOT);
        if (hex.length() != HEX_DIGITS || !hex.chars().allMatch(c -> Character.digit(c, 16) >= 0)) {
            throw new IllegalArgumentException("\"" + fingerprint + "\" is not a key fingerprint: it must be "
                    + HEX_DIGITS + " hex digits (dashes and spaces allowed), like 3f2a-09c1-...");
        }
        return grouped(hex);
    }

    private static String grouped(String hex) {
        StringBuilder out = new StringBuilder();
        for (int i = 0; i < HEX_DIGITS; i += 4) {
            if (i > 0) {
                out.append('-');
            }
            out.append(hex, i, i + 4);
        }
        return out.toString();
    }
}
