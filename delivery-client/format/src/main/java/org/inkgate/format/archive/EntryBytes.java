package org.inkgate.format.archive;

import java.io.OutputStream;
import java.util.Arrays;

/**
 * Where an entry is unpacked in memory: an array of the entry's declared size (up to 16 MiB at first,
 * growing past that only as bytes arrive, so a false declaration cannot claim memory by itself), handed
 * out without a copy when it is exactly full, as it is after a successful unpack (the size was checked).
 * Why: a byte stream that grows by doubling and copies once more at the end moved each megabyte of an
 * event log three times more (collect, docs/benchmarks.md, issue 16).
 */
final class EntryBytes extends OutputStream {

    private static final int FIRST_AT_MOST = 16 << 20;

    private byte[] bytes;
    private int count;

    EntryBytes(long declaredSize) {
        bytes = new byte[(int) Math.min(declaredSize, FIRST_AT_MOST)];
    }

    @Override
    public void write(int b) {
        write(new byte[] {(byte) b}, 0, 1);
    }

    @Override
    public void write(byte[] b, int off, int len) {
        if (count + len > bytes.length) {
            bytes = Arrays.copyOf(bytes, Math.max(count + len, (int) Math.min(Integer.MAX_VALUE - 8, 2L * bytes.length)));
        }
        System.arraycopy(b, off, bytes, count, len);
        count += len;
    }

    /** The bytes written: the array itself when full, else a copy of its used part. */
    byte[] bytes() {
        return count == bytes.length ? bytes : Arrays.copyOf(bytes, count);
    }
}
