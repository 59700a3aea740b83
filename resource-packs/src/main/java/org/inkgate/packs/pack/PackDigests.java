package org.inkgate.packs.pack;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;

/** SHA-256 (FIPS 180-4) helpers for pack contents; every JDK provides the algorithm. */
public final class PackDigests {
    private PackDigests() {
    }

    /** A fresh SHA-256 digest. */
    public static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("this JDK has no SHA-256, which every Java SE platform must provide", e);
        }
    }

    /** Lower-case hex of the given bytes' SHA-256. */
    public static String sha256Hex(byte[] bytes) {
        return HexFormat.of().formatHex(sha256().digest(bytes));
    }

    /**
     * The pack's content digest: SHA-256 of the UTF-8 text made of one line
     * {@code <sha256-hex> <size> <path>\n} per content file, in the manifest's (sorted) order.
     * Two packs with the same digest carry byte-identical content files.
     */
    public static String contentDigest(List<PackFileEntry> files) {
        StringBuilder listing = new StringBuilder();
        for (PackFileEntry f : files) {
            listing.append(f.sha256()).append(' ').append(f.size()).append(' ').append(f.path()).append('\n');
        }
        return sha256Hex(listing.toString().getBytes(StandardCharsets.UTF_8));
    }
}
