package org.inkgate.format.archive;

/**
 * One entry of an archive as its headers describe it; the reader has checked these against
 * the local header and the limits, but not yet the data.
 */
public record ArchiveEntry(String name, int method, long crc32, long packedSize, long size, long dataOffset) {

    public boolean deflated() {
        return method == ZipLayout.METHOD_DEFLATED;
    }
}
