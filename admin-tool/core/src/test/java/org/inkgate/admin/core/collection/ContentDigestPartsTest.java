package org.inkgate.admin.core.collection;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * ContentDigest against its definition computed with the JDK's SHA-256 directly, one part at a time:
 * each part's UTF-8 length as four big-endian bytes, then its bytes. Parts of every size around the
 * buffer's (16 KiB), as bytes and as text, ASCII and not, so every path through the buffer is taken.
 */
class ContentDigestPartsTest {

    @Test
    void partsOfEverySizeAndKind_giveTheDefinedDigest() throws Exception {
        SplittableRandom random = new SplittableRandom(10);
        for (int round = 0; round < 300; round++) {
            ContentDigest fast = new ContentDigest();
            MessageDigest reference = MessageDigest.getInstance("SHA-256");
            int parts = random.nextInt(0, 60);
            for (int p = 0; p < parts; p++) {
                int size = switch (random.nextInt(4)) {
                    case 0 -> random.nextInt(0, 5);
                    case 1 -> random.nextInt(0, 300);
                    case 2 -> random.nextInt(16 * 1024 - 8, 16 * 1024 + 8);
                    default -> random.nextInt(0, 40_000);
                };
                StringBuilder text = new StringBuilder();
                boolean ascii = random.nextBoolean();
                for (int c = 0; c < size; c++) {
                    text.append(ascii ? (char) random.nextInt(0, 0x80) : "aé€\uD83D\uDE00z".charAt(random.nextInt(6)));
                }
                byte[] bytes = text.toString().getBytes(StandardCharsets.UTF_8);
                if (random.nextBoolean()) {
                    fast.add(bytes);
                } else {
                    fast.add(text);
                }
                int n = bytes.length;
                reference.update(new byte[] {(byte) (n >>> 24), (byte) (n >>> 16), (byte) (n >>> 8), (byte) n});
                reference.update(bytes);
            }
            assertEquals(HexFormat.of().formatHex(reference.digest()), fast.hex(), "round " + round);
        }
    }
}
