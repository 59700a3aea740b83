package org.inkgate.format.bundle;

import java.security.SecureRandom;

/**
 * Release codes for sealed bundles: 20 characters from a 32-letter alphabet without look-alikes
 * (no I, L, O, U), in four groups of five, so 100 random bits that invigilators can read aloud
 * and type. The code is entered exactly as printed, dashes included.
 */
public final class ReleaseCode {

    /** Shortest code the writer accepts from a person; generated codes are 23 characters with dashes. */
    public static final int MIN_LENGTH = 12;
    private static final String ALPHABET = "0123456789ABCDEFGHJKMNPQRSTVWXYZ";
    private static final SecureRandom RANDOM = new SecureRandom();

    private ReleaseCode() {
    }

    public static char[] generate() {
        char[] code = new char[23];
        for (int i = 0; i < code.length; i++) {
            code[i] = i % 6 == 5 ? '-' : ALPHABET.charAt(RANDOM.nextInt(ALPHABET.length()));
        }
        return code;
    }
}
