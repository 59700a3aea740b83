package org.inkgate.format.response;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.Arrays;
import java.util.Map;
import org.inkgate.format.json.InstantBytes;
import org.inkgate.format.json.InstantText;

/**
 * Reads an event line written exactly as the writer writes it, byte by byte, without a general JSON
 * parser: {@code {"seq":N,"at":"T","mono":N,"type":"S"[,"task":"S"],"data":{...},"prev":"S"}} with the
 * fields in that order, no space, whole numbers in the range of a long, the writer's own form of a time,
 * data keys in ascending order and data values that are text, whole numbers or booleans; text in
 * well-formed UTF-8 with JSON's escapes (surrogates only as an escaped pair) and at most {@value #MAX_TEXT} bytes.
 * For any other line it answers null and {@link EventLineReader} reads the line with Jackson, which
 * decides as before; so a line this class accepts is one the binding accepts with the same values
 * ({@code EventLineScannerTest} compares the two over written, hand-made and damaged lines). One
 * exception, for speed: 64 bytes of {@code prev} between quotes are left as bytes for the caller, and the
 * line counts as read only if they spell the digest the chain expects ({@link #prevFrom}).
 *
 * <p>Why: a general parser paid for what a written log never has (names in any order, spacing,
 * nesting, every kind of number), about a quarter of a collect's reading time, and its large methods
 * were a good part of what the JIT compiler had to do in every fresh collect (docs/benchmarks.md,
 * issue 16). One scanner reads one log; it keeps a small table of the short texts it has met, since
 * an event log repeats its types, task ids, data keys and many values thousands of times.
 */
final class EventLineScanner {

    /** Longer text is left to Jackson, whose own limits (names of 50,000 characters) then decide. */
    static final int MAX_TEXT = 10_000;

    private static final byte[] SEQ = ascii("{\"seq\":");
    private static final byte[] AT = ascii(",\"at\":\"");
    private static final byte[] MONO = ascii(",\"mono\":");
    private static final byte[] TYPE = ascii(",\"type\":");
    private static final byte[] TASK = ascii(",\"task\":");
    private static final byte[] DATA = ascii(",\"data\":{");
    private static final byte[] PREV = ascii(",\"prev\":");
    private static final byte[] TRUE = ascii("true");
    private static final byte[] FALSE = ascii("false");

    private final byte[] b;
    private final JsonTextBytes decoder;
    private final InstantBytes times = new InstantBytes();
    private int i;
    private long number;
    private String[] keys = new String[8];
    private Object[] values = new Object[8];
    private final String[] known = new String[256];
    /** Data read earlier, by a hash of their keys: their key arrays are shared with later data of the same keys. */
    private final EventData[] keySets = new EventData[64];
    /** The bytes of each text in {@link #known}. */
    private final byte[][] knownBytes = new byte[256][];
    /** Start and end of each field of the line last read, in {@link EventLines.Field}'s order. */
    private final int[] fields = new int[2 * EventLines.Field.values().length];
    /** Where the text {@link #text} last read lies, between its quotes. */
    private int textFrom;
    private int textTo;
    /** Whether a text of the line being read has an escape. */
    private boolean escaped;
    /** Whether the line last read is plain ({@link EventLines}). */
    private boolean plain;

    EventLineScanner(byte[] bytes) {
        this.b = bytes;
        this.decoder = new JsonTextBytes(bytes);
    }

    private int lineEnd;
    private int prevFrom;

    /** A SHA-256 in hex, as the writer writes the previous line's digest. */
    static final int PREV_DIGITS = 64;

    /**
     * The line starting at {@code start} and ending at the next newline or the end of the bytes, or null
     * if it is not exactly in the writer's form (then nothing is known about where it ends).
     */
    EventChain.Line read(int start) {
        try {
            return line(start);
        } catch (ArrayIndexOutOfBoundsException e) {
            return null; // ran past the bytes: not a whole line in the writer's form
        }
    }

    /** Where the line {@link #read} last gave ends: the index of its newline, or the length of the bytes. */
    int lineEnd() {
        return lineEnd;
    }

    /**
     * Where the 64 bytes of {@code prev} start, when the line {@link #read} last gave has 64 between quotes: its
     * {@code prev} is then null, and the line is read only if those bytes spell the digest the chain expects (the
     * caller compares them; lower-case hex digits, then, as the writer writes them). If they do not, nothing is
     * known about the line and the general reader decides what it says. Otherwise the line's {@code prev} is its text.
     */
    int prevFrom() {
        return prevFrom;
    }

    /** The line {@link #read} last gave, with its prev as text also when it was left as bytes ({@link #prevFrom}). */
    EventChain.Line withPrevText(EventChain.Line line) {
        if (line.prev() != null) {
            return line;
        }
        return new EventChain.Line(line.seq(), line.at(), line.mono(), line.type(), line.task(), line.data(),
                new String(b, prevFrom, PREV_DIGITS, StandardCharsets.ISO_8859_1));
    }

    /** Whether the line {@link #read} last gave is plain, as {@link EventLines} defines it. */
    boolean plain() {
        return plain;
    }

    /** Start and end of each field of the line {@link #read} last gave, in {@link EventLines.Field}'s order (shared). */
    int[] fields() {
        return fields;
    }

    private void field(EventLines.Field field, int from, int to) {
        fields[2 * field.ordinal()] = from;
        fields[2 * field.ordinal() + 1] = to;
    }

    private EventChain.Line line(int start) {
        i = start;
        escaped = false;
        if (!literal(SEQ) || !number()) {
            return null;
        }
        field(EventLines.Field.SEQ, start + SEQ.length, i);
        long seq = number;
        if (!literal(AT)) {
            return null;
        }
        int from = i;
        while (b[i] != '"') {
            if (b[i] < 0x20 || b[i] == '\\') { // also every byte from 0x80: negative
                return null;
            }
            i++;
        }
        if (i - from > 30) {
            return null;
        }
        Instant at = times.parse(b, from, i);
        if (at == null) {
            return null;
        }
        boolean timeAsWritten = InstantText.writesIn(at, i - from);
        field(EventLines.Field.AT, from, i);
        i++;
        if (!literal(MONO)) {
            return null;
        }
        from = i;
        if (!number()) {
            return null;
        }
        field(EventLines.Field.MONO, from, i);
        long mono = number;
        if (!literal(TYPE)) {
            return null;
        }
        String type = text();
        if (type == null) {
            return null;
        }
        field(EventLines.Field.TYPE, textFrom, textTo);
        String task = null;
        if (literal(TASK)) {
            if ((task = text()) == null) {
                return null;
            }
            field(EventLines.Field.TASK, textFrom, textTo);
        } else {
            field(EventLines.Field.TASK, -1, -1);
        }
        if (!literal(DATA)) {
            return null;
        }
        from = i - 1;
        Map<String, Object> data = data();
        field(EventLines.Field.DATA, from, i);
        if (data == null || !literal(PREV)) {
            return null;
        }
        String prev;
        if (b[i] == '"' && b[i + 1 + PREV_DIGITS] == '"') {
            // 64 characters, compared as bytes by the caller (prevFrom) instead of becoming text for each line
            prev = null;
            prevFrom = i + 1;
            i += PREV_DIGITS + 2;
        } else if ((prev = text()) == null) {
            return null;
        }
        if (b[i] != '}' || i + 1 < b.length && b[i + 1] != '\n') {
            return null;
        }
        lineEnd = i + 1;
        plain = timeAsWritten && !escaped;
        return new EventChain.Line(seq, at, mono, type, task, data, prev);
    }

    /** The data object's entries after its opening brace, through its closing one; null if not in the writer's form. */
    private Map<String, Object> data() {
        int size = 0;
        if (b[i] == '}') {
            i++;
            return EventData.ofSorted(keys, values, 0);
        }
        while (true) {
            String key = text();
            if (key == null || b[i++] != ':') {
                return null;
            }
            Object value;
            byte c = b[i];
            if (c == '"') {
                value = text();
            } else if (c == '-' || c >= '0' && c <= '9') {
                value = number() ? whole(number) : null;
            } else if (literal(TRUE)) {
                value = Boolean.TRUE;
            } else if (literal(FALSE)) {
                value = Boolean.FALSE;
            } else {
                value = null;
            }
            if (value == null) {
                return null;
            }
            if (size == keys.length) {
                keys = Arrays.copyOf(keys, size * 2);
                values = Arrays.copyOf(values, size * 2);
            }
            keys[size] = key;
            values[size++] = value;
            c = b[i++];
            if (c == '}') {
                return data(size); // null unless strictly ascending, as written
            }
            if (c != ',') {
                return null;
            }
        }
    }

    /**
     * The data read into {@link #keys} and {@link #values}: with the key array of an earlier event whose keys were
     * the very same texts (the table of texts met before gives the same text for the same bytes), else checked
     * for ascending order and copied. An event log has a few key sets, repeated thousands of times.
     */
    private EventData data(int size) {
        int slot = (keys[0].hashCode() + 31 * keys[size - 1].hashCode() + size) & (keySets.length - 1);
        EventData earlier = keySets[slot];
        if (earlier != null && sameKeys(earlier.keyArray(), size)) {
            return EventData.withKeysOf(earlier, values, size);
        }
        EventData data = EventData.ofSorted(keys, values, size);
        if (data != null) {
            keySets[slot] = data;
        }
        return data;
    }

    /** Whether {@code set} holds the very texts (the same objects) of the {@code size} keys just read. */
    private boolean sameKeys(String[] set, int size) {
        if (set.length != size) {
            return false;
        }
        for (int k = 0; k < size; k++) {
            if (set[k] != keys[k]) {
                return false;
            }
        }
        return true;
    }

    /** Integer when it fits, else Long: the kinds Jackson gives a whole number in the range of a long in a map. */
    private static Object whole(long v) {
        if (v == (int) v) {
            return Integer.valueOf((int) v);
        }
        return Long.valueOf(v);
    }

    private boolean literal(byte[] expected) {
        for (int k = 0; k < expected.length; k++) {
            if (b[i + k] != expected[k]) {
                return false;
            }
        }
        i += expected.length;
        return true;
    }

    /**
     * A whole number in the range of a long, with a minus sign or none, no leading zero and not "-0", into
     * {@link #number}; false for anything else (Jackson then decides, also on numbers too long for a long).
     */
    private boolean number() {
        boolean negative = b[i] == '-';
        int from = negative ? ++i : i;
        long v = 0;
        while (b[i] >= '0' && b[i] <= '9') {
            v = v * 10 + (b[i++] - '0');
        }
        int digits = i - from;
        if (digits == 0 || digits > 19 || b[from] == '0' && (digits > 1 || negative)) {
            return false;
        }
        byte next = b[i];
        if (next == '.' || next == 'e' || next == 'E') {
            return false;
        }
        if (digits == 19) { // near the ends of a long: the JDK says whether it is one
            try {
                number = Long.parseLong(new String(b, negative ? from - 1 : from, digits + (negative ? 1 : 0),
                        StandardCharsets.ISO_8859_1));
                return true;
            } catch (NumberFormatException e) {
                return false;
            }
        }
        number = negative ? -v : v;
        return true;
    }

    /** A JSON text starting at its quote, through its closing quote; null if not in the writer's form. */
    private String text() {
        if (b[i] != '"') {
            return null;
        }
        int from = ++i;
        boolean plain = true;
        boolean ascii = true;
        int h = 0; // for the table of texts met before
        while (true) {
            byte c = b[i];
            h = 31 * h + c;
            if (c == '"') {
                break;
            }
            if (c == '\\') {
                plain = false;
                i += 2; // the escaped character; a \\u's four digits are plain bytes the next turns pass
                continue;
            }
            if (c >= 0 && c < 0x20) {
                return null; // a raw control character: JSON refuses it
            }
            if (c < 0) {
                ascii = false;
            }
            i++;
        }
        int to = i++;
        if (to - from > MAX_TEXT) {
            return null;
        }
        textFrom = from;
        textTo = to;
        escaped |= !plain;
        if (plain && ascii) {
            return known(from, to, h);
        }
        return plain ? decoder.utf8(from, to) : decoder.unescape(from, to);
    }

    /**
     * ASCII text without escapes, from the table of texts met before when it is short; {@code h} is a hash of
     * its bytes (any function of them: it only picks the slot, the bytes decide).
     */
    private String known(int from, int to, int h) {
        int n = to - from;
        if (n > 32) {
            return new String(b, from, n, StandardCharsets.ISO_8859_1);
        }
        int slot = (h ^ h >>> 8) & (known.length - 1);
        byte[] met = knownBytes[slot];
        if (met != null && Arrays.equals(met, 0, met.length, b, from, to)) {
            return known[slot];
        }
        String s = new String(b, from, n, StandardCharsets.ISO_8859_1);
        known[slot] = s;
        knownBytes[slot] = Arrays.copyOfRange(b, from, to);
        return s;
    }

    private static byte[] ascii(String s) {
        return s.getBytes(StandardCharsets.US_ASCII);
    }
}
