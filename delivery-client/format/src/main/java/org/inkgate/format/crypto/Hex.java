package org.inkgate.format.crypto;

import java.util.HexFormat;

/** Lower-case hex, the spelling every digest in Inkgate's files uses. */
public final class Hex {

    private static final HexFormat HEX = HexFormat.of();

    private Hex() {
    }

    public static String of(byte[] bytes) {
        return HEX.formatHex(bytes);
    }

    public static byte[] parse(String hex) {
        return HEX.parseHex(hex);
    }

    /**
     * Whether {@code hex} is exactly {@link #of}{@code (bytes)}: the same length and the same lower-case
     * digits, compared without writing the text out (an event log compares one digest per line).
     */
    public static boolean spells(String hex, byte[] bytes) {
        if (hex == null || hex.length() != bytes.length * 2) {
            return false;
        }
        for (int i = 0; i < bytes.length; i++) {
            int b = bytes[i] & 0xff;
            if (hex.charAt(2 * i) != DIGITS[b >>> 4] || hex.charAt(2 * i + 1) != DIGITS[b & 0xf]) {
                return false;
            }
        }
        return true;
    }

    /**
     * Whether the {@code 2 * bytes.length} bytes of {@code text} from {@code from} are exactly the ASCII of
     * {@link #of}{@code (bytes)}, as {@link #spells(String, byte[])} judges the same characters.
     */
    public static boolean spells(byte[] text, int from, byte[] bytes) {
        if (from < 0 || text.length - from < bytes.length * 2) {
            return false;
        }
        for (int i = 0; i < bytes.length; i++) {
            int b = bytes[i] & 0xff;
            if (text[from + 2 * i] != DIGITS[b >>> 4] || text[from + 2 * i + 1] != DIGITS[b & 0xf]) {
                return false;
            }
        }
        return true;
    }

    private static final char[] DIGITS = "0123456789abcdef".toCharArray();
}
