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

    private static final char[] DIGITS = "0123456789abcdef".toCharArray();
}
