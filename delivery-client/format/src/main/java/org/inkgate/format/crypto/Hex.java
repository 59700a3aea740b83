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
}
