package org.inkgate.format.crypto;

import java.math.BigInteger;
import java.security.GeneralSecurityException;
import java.security.KeyFactory;
import java.security.KeyPair;
import java.security.KeyPairGenerator;
import java.security.PrivateKey;
import java.security.PublicKey;
import java.security.Signature;
import java.security.interfaces.EdECPrivateKey;
import java.security.interfaces.EdECPublicKey;
import java.security.spec.EdECPoint;
import java.security.spec.EdECPrivateKeySpec;
import java.security.spec.EdECPublicKeySpec;
import java.security.spec.NamedParameterSpec;
import java.util.Arrays;

/**
 * Ed25519 signatures (RFC 8032): made by the JDK's EdDSA provider, verified by Bouncy Castle's RFC 8032
 * code (see {@link #verify(byte[], byte[], byte[])}), with the raw 32-byte key encodings the RFC uses, so
 * keys can be written into manifests and checked against the RFC's vectors.
 */
public final class Ed25519 {

    public static final int KEY_BYTES = 32;
    public static final int SIGNATURE_BYTES = 64;

    private Ed25519() {
    }

    public static KeyPair generate() {
        try {
            return KeyPairGenerator.getInstance("Ed25519").generateKeyPair();
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("the JDK's Ed25519 provider is unavailable", e);
        }
    }

    /** The private key whose 32-byte seed (RFC 8032 section 5.1.5 "private key") is given. */
    public static PrivateKey privateFromSeed(byte[] seed) {
        requireLength(seed, KEY_BYTES, "Ed25519 private key seed");
        try {
            return KeyFactory.getInstance("Ed25519")
                    .generatePrivate(new EdECPrivateKeySpec(NamedParameterSpec.ED25519, seed.clone()));
        } catch (GeneralSecurityException e) {
            throw new IllegalArgumentException("not an Ed25519 private key seed", e);
        }
    }

    public static byte[] seed(PrivateKey key) {
        return ((EdECPrivateKey) key).getBytes()
                .orElseThrow(() -> new IllegalArgumentException("this Ed25519 private key does not expose its seed"));
    }

    /** Decodes a public key from its 32-byte encoding (RFC 8032 section 5.1.3). */
    public static PublicKey publicFromRaw(byte[] raw) {
        requireLength(raw, KEY_BYTES, "Ed25519 public key");
        byte[] le = raw.clone();
        boolean xOdd = (le[KEY_BYTES - 1] & 0x80) != 0;
        le[KEY_BYTES - 1] &= 0x7f;
        BigInteger y = new BigInteger(1, reverse(le));
        try {
            return KeyFactory.getInstance("Ed25519")
                    .generatePublic(new EdECPublicKeySpec(NamedParameterSpec.ED25519, new EdECPoint(xOdd, y)));
        } catch (GeneralSecurityException e) {
            throw new IllegalArgumentException("not an Ed25519 public key", e);
        }
    }

    /** The 32-byte encoding of a public key (RFC 8032 section 5.1.2). */
    public static byte[] rawPublic(PublicKey key) {
        EdECPoint point = ((EdECPublicKey) key).getPoint();
        byte[] le = toLittleEndian(point.getY(), KEY_BYTES);
        if (point.isXOdd()) {
            le[KEY_BYTES - 1] |= (byte) 0x80;
        }
        return le;
    }

    /** The public key that belongs to a private key (the JDK does not derive it directly). */
    public static PublicKey publicOf(PrivateKey key) {
        // Signing is deterministic; derive via the pair generator seeded with the same secret.
        byte[] seed = seed(key);
        try {
            KeyPairGenerator generator = KeyPairGenerator.getInstance("Ed25519");
            generator.initialize(NamedParameterSpec.ED25519, new FixedBytesRandom(seed));
            KeyPair pair = generator.generateKeyPair();
            if (!Arrays.equals(seed(pair.getPrivate()), seed)) {
                throw new IllegalStateException("could not derive the Ed25519 public key");
            }
            return pair.getPublic();
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("the JDK's Ed25519 provider is unavailable", e);
        }
    }

    public static byte[] sign(PrivateKey key, byte[] message) {
        try {
            Signature signature = Signature.getInstance("Ed25519");
            signature.initSign(key);
            signature.update(message);
            return signature.sign();
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("Ed25519 signing failed", e);
        }
    }

    /** True only for a valid signature; malformed signatures are simply not valid. */
    public static boolean verify(PublicKey key, byte[] message, byte[] signatureBytes) {
        return verify(rawPublic(key), message, signatureBytes);
    }

    /**
     * True only for a valid signature by the key with this 32-byte encoding (RFC 8032 section 5.1.7);
     * a malformed key or signature is simply not valid. Verified by Bouncy Castle's RFC 8032 code rather
     * than the JDK's provider: about six times faster, which a collect of thousands of packages feels
     * (docs/benchmarks.md, issue 16); {@code PublishedVectorsTest} holds it to the RFC's vectors and to
     * signatures made by the JDK.
     */
    public static boolean verify(byte[] rawPublic, byte[] message, byte[] signatureBytes) {
        if (rawPublic == null || rawPublic.length != KEY_BYTES || message == null || signatureBytes == null
                || signatureBytes.length != SIGNATURE_BYTES) {
            return false;
        }
        return org.bouncycastle.math.ec.rfc8032.Ed25519.verify(signatureBytes, 0, rawPublic, 0, message, 0, message.length);
    }

    static byte[] reverse(byte[] bytes) {
        byte[] out = new byte[bytes.length];
        for (int i = 0; i < bytes.length; i++) {
            out[i] = bytes[bytes.length - 1 - i];
        }
        return out;
    }

    static byte[] toLittleEndian(BigInteger value, int length) {
        byte[] be = value.toByteArray();
        byte[] le = new byte[length];
        for (int i = 0; i < length && i < be.length; i++) {
            le[i] = be[be.length - 1 - i];
        }
        return le;
    }

    static void requireLength(byte[] bytes, int length, String what) {
        if (bytes == null || bytes.length != length) {
            throw new IllegalArgumentException(what + " must be " + length + " bytes, got "
                    + (bytes == null ? "none" : bytes.length));
        }
    }
}
