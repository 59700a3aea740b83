package org.inkgate.format.crypto;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HexFormat;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** {@link Hex#spells} against the JDK's {@link HexFormat} as reference: true exactly for its lower-case text. */
class HexTest {

    @Test
    void spells_isTrueExactlyForTheJdksLowerCaseText() {
        SplittableRandom random = new SplittableRandom(16);
        for (int round = 0; round < 10_000; round++) {
            byte[] bytes = new byte[random.nextInt(0, 40)];
            random.nextBytes(bytes);
            String text = HexFormat.of().formatHex(bytes);
            assertTrue(Hex.spells(text, bytes), text);
            if (bytes.length > 0) {
                assertFalse(Hex.spells(text.toUpperCase(java.util.Locale.ROOT), bytes) && !text.equals(text.toUpperCase(
                        java.util.Locale.ROOT)), "upper case is another spelling");
                int at = random.nextInt(text.length());
                char other = "0123456789abcdefABCDEFg ".charAt(random.nextInt(24));
                String changed = text.substring(0, at) + other + text.substring(at + 1);
                assertEquals(changed.equals(text), Hex.spells(changed, bytes), changed);
            }
            assertFalse(Hex.spells(text + "0", bytes), "longer");
            assertFalse(Hex.spells(null, bytes), "none");
        }
    }
}
