package org.inkgate.admin.core.collection;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.crypto.Sha256;

/**
 * The SHA-256 of a package's content ({@link Collector#contentSha256}): each part hashed after its length
 * in UTF-8 bytes as four big-endian bytes, so no two different sequences of parts feed the digest the
 * same bytes. Why a class: a log's thousands of parts are gathered in one buffer and handed to the digest
 * a buffer at a time, and text made only of ASCII characters is copied in directly instead of becoming a
 * string and then a new byte array per event (docs/benchmarks.md, issue 16); other text is encoded by
 * the JDK. Either way the digest sees the same bytes in the same order.
 */
final class ContentDigest {

    private final MessageDigest digest = Sha256.newDigest();
    private final byte[] buffer = new byte[16 * 1024];
    private int used;

    /** Hashes one part given as bytes. */
    void add(byte[] bytes) {
        length(bytes.length);
        put(bytes, 0, bytes.length);
    }

    /** Hashes one part given as text. */
    void add(CharSequence text) {
        int n = text.length();
        for (int i = 0; i < n; i++) {
            if (text.charAt(i) >= 0x80) {
                add(text.toString().getBytes(StandardCharsets.UTF_8));
                return;
            }
        }
        length(n);
        for (int i = 0; i < n; i++) {
            if (used == buffer.length) {
                flush();
            }
            buffer[used++] = (byte) text.charAt(i);
        }
    }

    /** The digest of everything added, in lower-case hex. */
    String hex() {
        flush();
        return Hex.of(digest.digest());
    }

    private void length(int n) {
        if (used + 4 > buffer.length) {
            flush();
        }
        buffer[used++] = (byte) (n >>> 24);
        buffer[used++] = (byte) (n >>> 16);
        buffer[used++] = (byte) (n >>> 8);
        buffer[used++] = (byte) n;
    }

    private void put(byte[] bytes, int from, int n) {
        if (n > buffer.length - used) {
            flush();
            digest.update(bytes, from, n);
            return;
        }
        System.arraycopy(bytes, from, buffer, used, n);
        used += n;
    }

    private void flush() {
        digest.update(buffer, 0, used);
        used = 0;
    }
}
