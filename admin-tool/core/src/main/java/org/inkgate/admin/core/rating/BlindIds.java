package org.inkgate.admin.core.rating;

import java.security.SecureRandom;
import java.util.Set;
import java.util.random.RandomGenerator;

/**
 * Blind ids: 40 random bits written as eight characters of Crockford's base32 in two groups of
 * four (e.g. {@code 7KQ4-M2XD}), drawn from a {@link SecureRandom}, not from the assignment seed,
 * so that knowing the seed and the responses does not reveal which id is whose. The store keeps the
 * mapping; nothing else leads from an id to a candidate, level, form, condition or time.
 */
public final class BlindIds {

    /** Crockford's base32 alphabet: no I, L, O or U, so ids read aloud or copied by hand stay unambiguous. */
    static final String ALPHABET = "0123456789ABCDEFGHJKMNPQRSTVWXYZ";

    private final RandomGenerator random;

    public BlindIds() {
        this(new SecureRandom());
    }

    BlindIds(RandomGenerator random) {
        this.random = random;
    }

    /** A fresh id not in {@code taken} (which it is added to). */
    public String next(Set<String> taken) {
        while (true) {
            long bits = random.nextLong() & ((1L << 40) - 1);
            StringBuilder s = new StringBuilder(9);
            for (int i = 7; i >= 0; i--) {
                s.append(ALPHABET.charAt((int) ((bits >>> (5 * i)) & 31)));
                if (i == 4) {
                    s.append('-');
                }
            }
            String id = s.toString();
            if (taken.add(id)) {
                return id;
            }
        }
    }

    /** Whether the text has the shape of a blind id (for clear errors on hand-typed sheets). */
    public static boolean looksLikeId(String text) {
        return text.matches("[0-9A-HJKMNP-TV-Z]{4}-[0-9A-HJKMNP-TV-Z]{4}");
    }
}
