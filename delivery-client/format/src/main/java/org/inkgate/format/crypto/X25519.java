package org.inkgate.format.crypto;

import java.math.BigInteger;
import java.security.GeneralSecurityException;
import java.security.KeyFactory;
import java.security.KeyPair;
import java.security.KeyPairGenerator;
import java.security.PrivateKey;
import java.security.PublicKey;
import java.security.interfaces.XECPrivateKey;
import java.security.interfaces.XECPublicKey;
import java.security.spec.NamedParameterSpec;
import java.security.spec.XECPrivateKeySpec;
import java.security.spec.XECPublicKeySpec;

/** X25519 key agreement (RFC 7748) on the JDK's XDH provider, with raw 32-byte encodings. */
public final class X25519 {

    public static final int KEY_BYTES = 32;

    private X25519() {
    }

    public static KeyPair generate() {
        try {
            return KeyPairGenerator.getInstance("X25519").generateKeyPair();
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("the JDK's X25519 provider is unavailable", e);
        }
    }

    /** The private key with the given 32-byte scalar (clamped by the function, RFC 7748 section 5). */
    public static PrivateKey privateFromRaw(byte[] scalar) {
        Ed25519.requireLength(scalar, KEY_BYTES, "X25519 private key");
        try {
            return KeyFactory.getInstance("X25519")
                    .generatePrivate(new XECPrivateKeySpec(NamedParameterSpec.X25519, scalar.clone()));
        } catch (GeneralSecurityException e) {
            throw new IllegalArgumentException("not an X25519 private key", e);
        }
    }

    public static byte[] rawPrivate(PrivateKey key) {
        return ((XECPrivateKey) key).getScalar()
                .orElseThrow(() -> new IllegalArgumentException("this X25519 private key does not expose its scalar"));
    }

    /**
     * Decodes a u-coordinate. RFC 7748 section 5: "implementations of X25519 ... MUST mask the
     * most significant bit in the final byte", which is done here.
     */
    public static PublicKey publicFromRaw(byte[] raw) {
        Ed25519.requireLength(raw, KEY_BYTES, "X25519 public key");
        byte[] le = raw.clone();
        le[KEY_BYTES - 1] &= 0x7f;
        BigInteger u = new BigInteger(1, Ed25519.reverse(le));
        try {
            return KeyFactory.getInstance("X25519")
                    .generatePublic(new XECPublicKeySpec(NamedParameterSpec.X25519, u));
        } catch (GeneralSecurityException e) {
            throw new IllegalArgumentException("not an X25519 public key", e);
        }
    }

    public static byte[] rawPublic(PublicKey key) {
        return Ed25519.toLittleEndian(((XECPublicKey) key).getU(), KEY_BYTES);
    }

    /** The public key of a private key, rebuilt through the JDK generator from the same scalar. */
    public static PublicKey publicOf(PrivateKey key) {
        byte[] scalar = rawPrivate(key);
        try {
            KeyPairGenerator generator = KeyPairGenerator.getInstance("X25519");
            generator.initialize(NamedParameterSpec.X25519, new FixedBytesRandom(scalar));
            return generator.generateKeyPair().getPublic();
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("the JDK's X25519 provider is unavailable", e);
        }
    }

    /** The shared secret X25519(k, u); refuses the all-zero result (RFC 7748 section 6.1). */
    public static byte[] agree(PrivateKey ownPrivate, PublicKey peerPublic) {
        return agree(rawPrivate(ownPrivate), rawPublic(peerPublic));
    }

    /**
     * The shared secret X25519(k, u) of a 32-byte scalar and a 32-byte u-coordinate (its top bit masked,
     * RFC 7748 section 5); refuses the all-zero result (section 6.1). Computed by Bouncy Castle's RFC 7748
     * code rather than the JDK's provider: about twice as fast, with less to compile at start-up
     * (docs/benchmarks.md, issue 16); {@code PublishedVectorsTest} holds it to the RFC's vectors.
     */
    public static byte[] agree(byte[] ownScalar, byte[] peerU) {
        Ed25519.requireLength(ownScalar, KEY_BYTES, "X25519 private key");
        Ed25519.requireLength(peerU, KEY_BYTES, "X25519 public key");
        byte[] shared = new byte[KEY_BYTES];
        if (!org.bouncycastle.math.ec.rfc7748.X25519.calculateAgreement(ownScalar, 0, peerU, 0, shared, 0)) {
            throw new IllegalArgumentException("X25519 key agreement failed (a low-order public key?)");
        }
        return shared;
    }
}
