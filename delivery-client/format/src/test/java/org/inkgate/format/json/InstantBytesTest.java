package org.inkgate.format.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Times read from bytes by one reader that remembers its last day, against {@link InstantText#parse} of the same
 * text (itself held to the JDK's parser by {@code InstantTextTest}): 300,000 texts, written ones on a few days in
 * a row and each of them damaged at random (a digit, a separator, a length, an impossible date), read in one
 * sequence so that the remembered day meets texts of other days and broken ones.
 */
class InstantBytesTest {

    @Test
    void timesFromBytes_areTheTimesTheTextGives() {
        SplittableRandom random = new SplittableRandom(2027);
        InstantBytes reader = new InstantBytes();
        byte[] noise = "0123456789-:.TZ x".getBytes(StandardCharsets.US_ASCII);
        int read = 0;
        for (int i = 0; i < 300_000; i++) {
            long seconds = random.nextInt(4) == 0 ? random.nextLong(0, 253_402_300_800L)
                    : 1_780_000_000L + random.nextInt(3 * 86_400);
            Instant t = Instant.ofEpochSecond(seconds, random.nextBoolean() ? 0 : random.nextInt(1_000_000_000));
            String text = InstantText.text(t);
            if (random.nextInt(3) == 0) {
                StringBuilder damaged = new StringBuilder(text);
                int at = random.nextInt(damaged.length());
                switch (random.nextInt(4)) {
                    case 0 -> damaged.setCharAt(at, (char) noise[random.nextInt(noise.length)]);
                    case 1 -> damaged.deleteCharAt(at);
                    case 2 -> damaged.insert(at, (char) noise[random.nextInt(noise.length)]);
                    default -> damaged.replace(5, 10, random.nextBoolean() ? "02-30" : "13-01");
                }
                text = damaged.toString();
            }
            byte[] padded = ("[" + text + "]").getBytes(StandardCharsets.US_ASCII);
            Instant expected = InstantText.parse(text);
            assertEquals(expected, reader.parse(padded, 1, padded.length - 1), text);
            read += expected == null ? 0 : 1;
        }
        assertTrue(read > 200_000 && read < 299_000, read + " texts read: both kinds must be exercised");
    }
}
