package org.inkgate.format.bundle;

import java.security.MessageDigest;
import java.util.Base64;
import org.inkgate.format.crypto.Pbkdf2;

/** Hashes and checks invigilator PINs; the bundle carries only the salted hash. */
public final class PinHasher {

    private static final int HASH_BYTES = 32;

    private PinHasher() {
    }

    public static PinHash hash(char[] pin) {
        if (pin == null || pin.length < 4) {
            throw new IllegalArgumentException("an invigilator PIN needs at least 4 characters");
        }
        byte[] salt = Pbkdf2.newSalt();
        byte[] hash = Pbkdf2.derive(pin, salt, Pbkdf2.ITERATIONS, HASH_BYTES);
        Base64.Encoder b64 = Base64.getEncoder();
        return new PinHash(b64.encodeToString(salt), Pbkdf2.ITERATIONS, b64.encodeToString(hash));
    }

    /** Constant-time comparison of the derived bytes. */
    public static boolean matches(PinHash stored, char[] pin) {
        if (stored.iterations() < Pbkdf2.MIN_ITERATIONS || stored.iterations() > Pbkdf2.MAX_ITERATIONS) {
            return false;
        }
        Base64.Decoder b64 = Base64.getDecoder();
        byte[] expected = b64.decode(stored.hash());
        byte[] actual = Pbkdf2.derive(pin, b64.decode(stored.salt()), stored.iterations(), expected.length);
        return MessageDigest.isEqual(expected, actual);
    }
}
