package org.inkgate.format.crypto;

import java.security.GeneralSecurityException;
import javax.crypto.Mac;
import javax.crypto.spec.SecretKeySpec;

/**
 * HKDF with HMAC-SHA256 (RFC 5869). Written here on the JDK's HmacSHA256 because the JDK 21
 * baseline has no public HKDF API and the construction is a dozen lines.
 */
public final class Hkdf {

    private static final int HASH_LEN = 32;

    private Hkdf() {
    }

    /** RFC 5869 section 2.2: PRK = HMAC-Hash(salt, IKM); an absent salt is HashLen zeros. */
    public static byte[] extract(byte[] salt, byte[] ikm) {
        byte[] key = salt == null || salt.length == 0 ? new byte[HASH_LEN] : salt;
        return hmac(key).doFinal(ikm);
    }

    /** RFC 5869 section 2.3: T(i) = HMAC-Hash(PRK, T(i-1) | info | i), L at most 255 HashLen. */
    public static byte[] expand(byte[] prk, byte[] info, int length) {
        if (length < 0 || length > 255 * HASH_LEN) {
            throw new IllegalArgumentException("HKDF-SHA256 output length must be 0.." + 255 * HASH_LEN + ", got " + length);
        }
        Mac mac = hmac(prk);
        byte[] out = new byte[length];
        byte[] previous = new byte[0];
        int written = 0;
        for (int i = 1; written < length; i++) {
            mac.update(previous);
            if (info != null) {
                mac.update(info);
            }
            mac.update((byte) i);
            previous = mac.doFinal();
            int take = Math.min(previous.length, length - written);
            System.arraycopy(previous, 0, out, written, take);
            written += take;
        }
        return out;
    }

    public static byte[] derive(byte[] salt, byte[] ikm, byte[] info, int length) {
        return expand(extract(salt, ikm), info, length);
    }

    private static Mac hmac(byte[] key) {
        try {
            Mac mac = Mac.getInstance("HmacSHA256");
            mac.init(new SecretKeySpec(key, "HmacSHA256"));
            return mac;
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("the JDK's HmacSHA256 is unavailable", e);
        }
    }
}
