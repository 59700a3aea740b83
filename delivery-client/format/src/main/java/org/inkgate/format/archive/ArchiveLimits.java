package org.inkgate.format.archive;

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

    /** Common practice for zip readers facing untrusted input: refuse anything expanding over 100 times. */
    public static final long DEFAULT_MAX_RATIO = 100;

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
}
