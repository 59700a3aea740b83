package org.inkgate.admin.core.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.Test;

class BlindIdsTest {

    @Test
    void next_manyIds_uniqueWellFormedAndFromCrockfordsAlphabet() {
        BlindIds ids = new BlindIds();
        Set<String> taken = new HashSet<>();
        for (int i = 0; i < 20_000; i++) {
            String id = ids.next(taken);
            assertTrue(BlindIds.looksLikeId(id), id);
        }
        assertEquals(20_000, taken.size());
        // Crockford's base32 (crockford.com/base32.html) leaves out I, L, O and U
        assertEquals(32, BlindIds.ALPHABET.length());
        for (char ch : "ILOU".toCharArray()) {
            assertTrue(BlindIds.ALPHABET.indexOf(ch) < 0);
        }
    }

    @Test
    void next_collision_drawsAgain() {
        long[] draws = {5, 5, 7};
        int[] at = {0};
        java.util.random.RandomGenerator repeating = () -> draws[at[0]++];
        BlindIds ids = new BlindIds(repeating);
        Set<String> taken = new HashSet<>();
        String first = ids.next(taken);
        String second = ids.next(taken);
        assertEquals("0000-0005", first, "40 bits of 5 in base32");
        assertEquals("0000-0007", second, "the repeated 5 was skipped");
        assertEquals(3, at[0]);
    }
}
