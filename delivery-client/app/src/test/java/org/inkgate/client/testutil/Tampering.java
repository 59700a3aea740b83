package org.inkgate.client.testutil;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.CRC32;

/**
 * Changes one byte of a stored entry in a copy of an archive and repairs the entry's CRC-32 in
 * both headers, as a careful tamperer would, so only the signed digests can catch the change.
 */
public final class Tampering {

    private static final int LOCAL_SIGNATURE = 0x04034b50;
    private static final int CENTRAL_SIGNATURE = 0x02014b50;

    private Tampering() {
    }

    /** Writes {@code target}: {@code source} with one byte in the middle of {@code entry} flipped. */
    public static void flipByteInEntry(Path source, String entry, Path target) throws IOException {
        ByteBuffer zip = ByteBuffer.wrap(Files.readAllBytes(source)).order(ByteOrder.LITTLE_ENDIAN);
        byte[] name = entry.getBytes(StandardCharsets.UTF_8);
        int local = findLocalHeader(zip, name);
        int size = zip.getInt(local + 18);
        int dataStart = local + 30 + zip.getShort(local + 26) + zip.getShort(local + 28);
        zip.put(dataStart + size / 2, (byte) (zip.get(dataStart + size / 2) ^ 0x20));
        CRC32 crc = new CRC32();
        crc.update(zip.array(), dataStart, size);
        zip.putInt(local + 14, (int) crc.getValue());
        zip.putInt(findCentralRecord(zip, name) + 16, (int) crc.getValue());
        Files.write(target, zip.array());
    }

    private static int findLocalHeader(ByteBuffer zip, byte[] name) {
        for (int at = 0; at + 30 <= zip.limit(); at++) {
            if (zip.getInt(at) == LOCAL_SIGNATURE && zip.getShort(at + 26) == name.length
                    && nameAt(zip, at + 30, name)) {
                return at;
            }
        }
        throw new IllegalArgumentException("no local header for " + new String(name, StandardCharsets.UTF_8));
    }

    private static int findCentralRecord(ByteBuffer zip, byte[] name) {
        for (int at = 0; at + 46 <= zip.limit(); at++) {
            if (zip.getInt(at) == CENTRAL_SIGNATURE && zip.getShort(at + 28) == name.length
                    && nameAt(zip, at + 46, name)) {
                return at;
            }
        }
        throw new IllegalArgumentException("no central record for " + new String(name, StandardCharsets.UTF_8));
    }

    private static boolean nameAt(ByteBuffer zip, int at, byte[] name) {
        for (int i = 0; i < name.length; i++) {
            if (zip.get(at + i) != name[i]) {
                return false;
            }
        }
        return true;
    }
}
