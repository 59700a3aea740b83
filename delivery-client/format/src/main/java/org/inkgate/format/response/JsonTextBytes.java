package org.inkgate.format.response;

import java.nio.charset.StandardCharsets;

/**
 * Decodes the text between a JSON string's quotes, taken from the bytes of a line, for
 * {@link EventLineScanner}: well-formed UTF-8 (Unicode table 3-7: no overlong forms, no surrogates,
 * nothing past U+10FFFF) and JSON's escapes, with surrogates only as an escaped pair, high then low.
 * Anything else gives null, and the line is left to Jackson, which decides (so what is decoded here is
 * what Jackson would decode; {@code EventLineScannerTest}).
 */
final class JsonTextBytes {

    private final byte[] b;
    private char[] chars = new char[64];

    JsonTextBytes(byte[] bytes) {
        this.b = bytes;
    }

    /** Text without escapes that is well-formed UTF-8; null otherwise. */
    String utf8(int from, int to) {
        for (int k = from; k < to; ) {
            int length = sequence(k, to);
            if (length == 0) {
                return null;
            }
            k += length;
        }
        return new String(b, from, to - from, StandardCharsets.UTF_8);
    }

    /** Text with JSON's escapes and perhaps UTF-8 sequences, decoded; null for anything not in the writer's form. */
    String unescape(int from, int to) {
        if (chars.length < to - from) {
            chars = new char[to - from];
        }
        int n = 0;
        for (int k = from; k < to; ) {
            byte c = b[k];
            if (c == '\\') {
                char e = (char) b[k + 1];
                char decoded;
                switch (e) {
                    case '"', '\\', '/' -> decoded = e;
                    case 'b' -> decoded = '\b';
                    case 'f' -> decoded = '\f';
                    case 'n' -> decoded = '\n';
                    case 'r' -> decoded = '\r';
                    case 't' -> decoded = '\t';
                    case 'u' -> {
                        int v = hex4(k, to);
                        if (v < 0) {
                            return null;
                        }
                        if (Character.isHighSurrogate((char) v)) {
                            // the writer escapes a character beyond U+FFFF as its two halves, high then low
                            int low = b[k + 6] == '\\' && b[k + 7] == 'u' ? hex4(k + 6, to) : -1;
                            if (low < 0 || !Character.isLowSurrogate((char) low)) {
                                return null; // a lone half: Jackson decides
                            }
                            chars[n++] = (char) v;
                            chars[n++] = (char) low;
                            k += 12;
                            continue;
                        }
                        if (Character.isLowSurrogate((char) v)) {
                            return null;
                        }
                        chars[n++] = (char) v;
                        k += 6;
                        continue;
                    }
                    default -> {
                        return null;
                    }
                }
                chars[n++] = decoded;
                k += 2;
            } else if (c >= 0) {
                chars[n++] = (char) c;
                k++;
            } else {
                int length = sequence(k, to);
                if (length == 0) {
                    return null;
                }
                String s = new String(b, k, length, StandardCharsets.UTF_8);
                for (int j = 0; j < s.length(); j++) {
                    chars[n++] = s.charAt(j);
                }
                k += length;
            }
        }
        return new String(chars, 0, n);
    }

    /** The value of the four hex digits of the \\u escape at {@code k}, or -1 if they are not four hex digits before {@code to}. */
    private int hex4(int k, int to) {
        if (k + 6 > to) {
            return -1;
        }
        int v = 0;
        for (int d = k + 2; d < k + 6; d++) {
            int digit = b[d] < 0 ? -1 : Character.digit(b[d], 16);
            if (digit < 0) {
                return -1;
            }
            v = v * 16 + digit;
        }
        return v;
    }

    /**
     * The length of the well-formed UTF-8 sequence at {@code k} (Unicode table 3-7: no overlong forms,
     * no surrogates, nothing past U+10FFFF), or 0 if there is none before {@code to}.
     */
    private int sequence(int k, int to) {
        int lead = b[k] & 0xff;
        if (lead < 0x80) {
            return 1;
        }
        int length;
        int low = 0x80;
        int high = 0xbf;
        if (lead >= 0xc2 && lead <= 0xdf) {
            length = 2;
        } else if (lead >= 0xe0 && lead <= 0xef) {
            length = 3;
            if (lead == 0xe0) {
                low = 0xa0;
            } else if (lead == 0xed) {
                high = 0x9f;
            }
        } else if (lead >= 0xf0 && lead <= 0xf4) {
            length = 4;
            if (lead == 0xf0) {
                low = 0x90;
            } else if (lead == 0xf4) {
                high = 0x8f;
            }
        } else {
            return 0;
        }
        if (k + length > to) {
            return 0;
        }
        int second = b[k + 1] & 0xff;
        if (second < low || second > high) {
            return 0;
        }
        for (int j = k + 2; j < k + length; j++) {
            if ((b[j] & 0xc0) != 0x80) {
                return 0;
            }
        }
        return length;
    }
}
