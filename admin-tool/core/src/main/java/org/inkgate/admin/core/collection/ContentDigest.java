package org.inkgate.admin.core.collection;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.response.EventLines;

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
    private byte[] buffer = new byte[16 * 1024];
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

    /**
     * Hashes the part of the event at {@code index} of a log read from plain lines, {@code seq|at|mono|type|task|data}
     * with the data map's {@code toString}, from the line's bytes: a plain line's fields are the JSON of their
     * values ({@link EventLines}), and a data object of texts, whole numbers and booleans with no escape becomes its
     * map's {@code toString} by dropping the quotes, writing {@code =} for the colon after a key and {@code ", "}
     * for the comma between entries; the text in UTF-8, as {@link #add(CharSequence)} would encode it.
     */
    void addPlain(EventLines lines, int index) {
        byte[] b = lines.bytes();
        int seqFrom = lines.start(index, EventLines.Field.SEQ);
        int dataFrom = lines.start(index, EventLines.Field.DATA);
        int dataTo = lines.end(index, EventLines.Field.DATA);
        // at most: the line's bytes up to the data's end and a space for each comma of the data
        int most = 4 + dataTo - seqFrom + (dataTo - dataFrom);
        if (most > buffer.length - used) {
            flush();
            if (most > buffer.length) {
                buffer = new byte[most];
            }
        }
        byte[] out = buffer;
        int lengthAt = used;
        int n = used + 4;
        n = lines.copy(index, EventLines.Field.SEQ, out, n);
        out[n++] = '|';
        n = lines.copy(index, EventLines.Field.AT, out, n);
        out[n++] = '|';
        n = lines.copy(index, EventLines.Field.MONO, out, n);
        out[n++] = '|';
        n = lines.copy(index, EventLines.Field.TYPE, out, n);
        out[n++] = '|';
        n = lines.copy(index, EventLines.Field.TASK, out, n);
        out[n++] = '|';
        boolean inText = false;
        for (int k = dataFrom; k < dataTo; k++) {
            byte c = b[k];
            if (c == '"') {
                inText = !inText;
            } else if (inText) {
                out[n++] = c;
            } else if (c == ':') {
                out[n++] = '=';
            } else if (c == ',') {
                out[n++] = ',';
                out[n++] = ' ';
            } else {
                out[n++] = c;
            }
        }
        int length = n - lengthAt - 4;
        out[lengthAt] = (byte) (length >>> 24);
        out[lengthAt + 1] = (byte) (length >>> 16);
        out[lengthAt + 2] = (byte) (length >>> 8);
        out[lengthAt + 3] = (byte) length;
        used = n;
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
