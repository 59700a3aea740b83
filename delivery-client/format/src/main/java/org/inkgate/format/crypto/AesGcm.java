package org.inkgate.format.crypto;

import java.security.GeneralSecurityException;
import java.security.SecureRandom;
import java.util.Arrays;
import javax.crypto.AEADBadTagException;
import javax.crypto.Cipher;
import javax.crypto.spec.GCMParameterSpec;
import javax.crypto.spec.SecretKeySpec;

/**
 * AES-256-GCM (NIST SP 800-38D) with a fresh random 96-bit nonce per message, stored in front of
 * the ciphertext: {@code nonce(12) | ciphertext | tag(16)}. Associated data binds a ciphertext to
 * its place (an entry name, an envelope), so ciphertexts cannot be swapped unnoticed.
 */
public final class AesGcm {

    public static final int KEY_BYTES = 32;
    public static final int NONCE_BYTES = 12;
    public static final int TAG_BITS = 128;
    private static final SecureRandom RANDOM = new SecureRandom();

    private AesGcm() {
    }

    public static byte[] seal(byte[] key, byte[] plaintext, byte[] associatedData) {
        byte[] nonce = new byte[NONCE_BYTES];
        RANDOM.nextBytes(nonce);
        try {
            Cipher cipher = cipher(Cipher.ENCRYPT_MODE, key, nonce);
            if (associatedData != null) {
                cipher.updateAAD(associatedData);
            }
            byte[] sealed = cipher.doFinal(plaintext);
            byte[] out = new byte[NONCE_BYTES + sealed.length];
            System.arraycopy(nonce, 0, out, 0, NONCE_BYTES);
            System.arraycopy(sealed, 0, out, NONCE_BYTES, sealed.length);
            return out;
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("AES-GCM encryption failed", e);
        }
    }

    /** Decrypts and authenticates; throws {@link AEADBadTagException} for a wrong key or altered bytes. */
    public static byte[] open(byte[] key, byte[] sealed, byte[] associatedData) throws AEADBadTagException {
        if (sealed.length < NONCE_BYTES + TAG_BITS / 8) {
            throw new AEADBadTagException("sealed data is shorter than a nonce and a tag");
        }
        try {
            Cipher cipher = cipher(Cipher.DECRYPT_MODE, key, Arrays.copyOf(sealed, NONCE_BYTES));
            if (associatedData != null) {
                cipher.updateAAD(associatedData);
            }
            return cipher.doFinal(sealed, NONCE_BYTES, sealed.length - NONCE_BYTES);
        } catch (AEADBadTagException e) {
            throw e;
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("AES-GCM decryption failed", e);
        }
    }

    private static Cipher cipher(int mode, byte[] key, byte[] nonce) throws GeneralSecurityException {
        Ed25519.requireLength(key, KEY_BYTES, "AES-256 key");
        Cipher cipher = Cipher.getInstance("AES/GCM/NoPadding");
        cipher.init(mode, new SecretKeySpec(key, "AES"), new GCMParameterSpec(TAG_BITS, nonce));
        return cipher;
    }
}
