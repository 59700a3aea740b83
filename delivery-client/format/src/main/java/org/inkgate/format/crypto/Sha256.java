package org.inkgate.format.crypto;

import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;

/** SHA-256 (FIPS 180-4) from the JDK. */
public final class Sha256 {

    private Sha256() {
    }

    public static MessageDigest newDigest() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("this JDK has no SHA-256, which every Java SE runtime must provide", e);
        }
    }

    public static byte[] digest(byte[] data) {
        return newDigest().digest(data);
    }

    public static String hex(byte[] data) {
        return Hex.of(digest(data));
    }
}
