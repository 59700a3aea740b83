package org.inkgate.format.bundle;

import java.security.MessageDigest;
import java.util.Base64;
import org.inkgate.format.crypto.Pbkdf2;

/**
 * Hashes and checks invigilator PINs; the bundle carries only the salted hash. Anyone who copies
 * a bundle can still guess PINs offline against that hash, a few per second per core at 600,000
 * PBKDF2 iterations (measured 150-430 ms per try here): a 6-digit PIN falls in days on one core
 * and in hours on many. Live sittings should use a longer PIN, changed for every sitting.
 */
public final class PinHasher {

    /** The shortest PIN accepted; docs/formats.md explains the offline-guessing risk. */
    public static final int MIN_LENGTH = 6;
    private static final int HASH_BYTES = 32;

    private PinHasher() {
    }

    public static PinHash hash(char[] pin) {
        if (pin == null || pin.length < MIN_LENGTH) {
            throw new IllegalArgumentException("an invigilator PIN needs at least " + MIN_LENGTH + " characters");
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
