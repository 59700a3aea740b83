package org.inkgate.format.archive;

import java.nio.ByteBuffer;

/**
 * The one ZIP profile Inkgate writes and reads (a strict subset of PKWARE's APPNOTE 6.3.x):
 * no ZIP64, no extra fields, no comments, no data descriptors, no directories, UTF-8 names,
 * every entry dated 1980-01-01 00:00, entries packed end to end from offset 0. Because every
 * header byte is fixed or repeated in the central directory, any change to the metadata of a
 * file in this profile is noticed, and the content bytes are covered by the signed digests.
 * The record signatures, fixed header lengths, the UTF-8 flag and the two methods are APPNOTE's
 * own for every ZIP, so {@link ForeignZipReader} uses them too.
 */
final class ZipLayout {

    static final int LOCAL_SIGNATURE = 0x04034b50;
    static final int CENTRAL_SIGNATURE = 0x02014b50;
    static final int END_SIGNATURE = 0x06054b50;
    static final int LOCAL_HEADER_BYTES = 30;
    static final int CENTRAL_HEADER_BYTES = 46;
    static final int END_RECORD_BYTES = 22;

    static final int VERSION = 20;
    static final int FLAG_UTF8 = 0x0800;
    static final int METHOD_STORED = 0;
    static final int METHOD_DEFLATED = 8;
    /** MS-DOS date of 1980-01-01: ((1980 - 1980) << 9) | (1 << 5) | 1. */
    static final int DOS_DATE = 0x0021;
    static final int DOS_TIME = 0;
    static final int MAX_NAME_BYTES = 255;

    /** Header fields are little-endian and unsigned; the buffer must be in little-endian order. */
    static int u16(ByteBuffer b) {
        return Short.toUnsignedInt(b.getShort());
    }

    static long u32(ByteBuffer b) {
        return Integer.toUnsignedLong(b.getInt());
    }

    private ZipLayout() {
    }
}
