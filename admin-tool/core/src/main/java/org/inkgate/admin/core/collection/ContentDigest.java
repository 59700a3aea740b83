package org.inkgate.admin.core.collection;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.crypto.Sha256;

/**
 * The SHA-256 of a package's content ({@link Collector#contentSha256}): each part hashed after its length
 * in UTF-8 bytes as four big-endian bytes, so no two different sequences of parts feed the digest the
 * same bytes. Text made only of ASCII characters is copied into one reused buffer instead of becoming a
 * string and then a new byte array for each of a log's thousands of events (docs/benchmarks.md, issue 16);
 * other text is encoded by the JDK. Either way the bytes hashed are the text's UTF-8 encoding.
 */
final class ContentDigest {

    private final MessageDigest digest = Sha256.newDigest();
    private final byte[] prefix = new byte[4];
    private byte[] buffer = new byte[512];

    /** Hashes one part given as bytes. */
    void add(byte[] bytes) {
        add(bytes, bytes.length);
    }

    /** Hashes one part given as text. */
    void add(CharSequence text) {
        int n = text.length();
        if (buffer.length < n) {
            buffer = new byte[Math.max(n, buffer.length * 2)];
        }
        for (int i = 0; i < n; i++) {
            char c = text.charAt(i);
            if (c >= 0x80) {
                add(text.toString().getBytes(StandardCharsets.UTF_8));
                return;
            }
            buffer[i] = (byte) c;
        }
        add(buffer, n);
    }

    private void add(byte[] bytes, int n) {
        prefix[0] = (byte) (n >>> 24);
        prefix[1] = (byte) (n >>> 16);
        prefix[2] = (byte) (n >>> 8);
        prefix[3] = (byte) n;
        digest.update(prefix);
        digest.update(bytes, 0, n);
    }

    /** The digest of everything added, in lower-case hex. */
    String hex() {
        return Hex.of(digest.digest());
    }
}
