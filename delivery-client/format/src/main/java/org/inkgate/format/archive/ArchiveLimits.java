package org.inkgate.format.archive;

import org.inkgate.format.refusal.CompressionRatioExceeded;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.SizeLimitExceeded;

/**
 * What a reader accepts before it refuses an archive as too large or too compressed. The
 * defaults leave room for a bundle with the whole WordNet dictionary and a few glossaries.
 *
 * @param maxArchiveBytes   size of the archive file itself
 * @param maxEntries        number of entries
 * @param maxEntryBytes     unpacked size of any one entry
 * @param maxTotalBytes     unpacked size of all entries together
 * @param maxRatio          unpacked size over packed size of any deflated entry
 */
public record ArchiveLimits(long maxArchiveBytes, int maxEntries, long maxEntryBytes, long maxTotalBytes, long maxRatio) {

    /**
     * Common practice for zip readers facing untrusted input: refuse anything expanding over 100
     * times. One value for every Inkgate archive, defined beside the pack reader, which sits below.
     */
    public static final long DEFAULT_MAX_RATIO = org.inkgate.packs.pack.PackFiles.MAX_COMPRESSION_RATIO;

    public static ArchiveLimits defaults() {
        return new ArchiveLimits(1L << 30, 10_000, 512L << 20, 1L << 30, DEFAULT_MAX_RATIO);
    }

    public ArchiveLimits {
        if (maxArchiveBytes <= 0 || maxEntries <= 0 || maxEntryBytes <= 0 || maxTotalBytes <= 0 || maxRatio <= 0) {
            throw new IllegalArgumentException("archive limits must all be positive");
        }
        if (maxArchiveBytes > 0xFFFF_FFFFL || maxEntryBytes > 0xFFFF_FFFFL) {
            throw new IllegalArgumentException("archive limits must stay under 4 GiB: Inkgate's archive profile has no ZIP64");
        }
    }

    /**
     * Refuses an entry too large unpacked or, if deflated, expanding more than {@code maxRatio}
     * times; both readers check every entry with this on open, before anything is unpacked.
     */
    void checkEntry(String file, String name, long size, long packedSize, boolean deflated) throws FormatRefusal {
        if (size > maxEntryBytes) {
            throw new SizeLimitExceeded(file, "entry \"" + name + "\" (" + size + " bytes unpacked)", maxEntryBytes);
        }
        if (deflated && size > 0) {
            if (packedSize == 0) {
                throw new CompressionRatioExceeded(file, name, Long.MAX_VALUE, maxRatio);
            }
            // exact comparison: size / packed > maxRatio, without integer division rounding down
            if (size > packedSize * maxRatio) {
                throw new CompressionRatioExceeded(file, name, size / packedSize, maxRatio);
            }
        }
    }
}
