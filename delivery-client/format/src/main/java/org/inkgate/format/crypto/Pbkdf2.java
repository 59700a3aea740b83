package org.inkgate.format.crypto;

import java.security.GeneralSecurityException;
import java.security.SecureRandom;
import javax.crypto.SecretKeyFactory;
import javax.crypto.spec.PBEKeySpec;

/**
 * PBKDF2-HMAC-SHA256 (RFC 8018 section 5.2) for release codes and invigilator PINs.
 * {@link #ITERATIONS} follows the OWASP Password Storage Cheat Sheet, section PBKDF2:
 * "PBKDF2-HMAC-SHA256: 600,000 iterations" (the figure since the sheet's December 2022
 * revision, which raised it from 310,000).
 */
public final class Pbkdf2 {

    public static final int ITERATIONS = 600_000;
    public static final int SALT_BYTES = 16;
    /** Readers refuse counts outside this range: too few is weak, too many is a denial of service. */
    public static final int MIN_ITERATIONS = 100_000;
    public static final int MAX_ITERATIONS = 10_000_000;
    private static final SecureRandom RANDOM = new SecureRandom();

    private Pbkdf2() {
    }

    public static byte[] newSalt() {
        byte[] salt = new byte[SALT_BYTES];
        RANDOM.nextBytes(salt);
        return salt;
    }

    public static byte[] derive(char[] secret, byte[] salt, int iterations, int lengthBytes) {
        PBEKeySpec spec = new PBEKeySpec(secret, salt, iterations, lengthBytes * 8);
        try {
            return SecretKeyFactory.getInstance("PBKDF2WithHmacSHA256").generateSecret(spec).getEncoded();
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("the JDK's PBKDF2WithHmacSHA256 is unavailable", e);
        } finally {
            spec.clearPassword();
        }
    }
}
