package org.inkgate.format.archive;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.io.ByteArrayOutputStream;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * EntryBytes gives back exactly the bytes written, as the JDK's {@link ByteArrayOutputStream} (the
 * reference it replaced) does, whether the declared size is right, too small or too large.
 */
class EntryBytesTest {

    @Test
    void anyDeclaredSize_givesBackExactlyTheBytesWritten() {
        SplittableRandom random = new SplittableRandom(5);
        for (int round = 0; round < 2_000; round++) {
            int actual = random.nextInt(0, 200_000);
            long declared = switch (random.nextInt(3)) {
                case 0 -> actual;
                case 1 -> random.nextInt(0, actual + 1);
                default -> actual + random.nextInt(1, 1000);
            };
            EntryBytes fast = new EntryBytes(declared);
            ByteArrayOutputStream reference = new ByteArrayOutputStream();
            int written = 0;
            while (written < actual) {
                byte[] chunk = new byte[Math.min(actual - written, random.nextInt(1, 70_000))];
                random.nextBytes(chunk);
                int off = random.nextInt(0, chunk.length);
                int len = chunk.length - off;
                if (random.nextInt(20) == 0) {
                    fast.write(chunk[off]);
                    reference.write(chunk[off]);
                    len = 1;
                } else {
                    fast.write(chunk, off, len);
                    reference.write(chunk, off, len);
                }
                written += len;
            }
            assertArrayEquals(reference.toByteArray(), fast.bytes(), "round " + round);
        }
    }
}
