package org.inkgate.packs.pack;

import java.util.Objects;

/**
 * One content file of a pack as the manifest lists it.
 *
 * @param path   entry name inside the zip, forward slashes, e.g. {@code index/_0.cfs}
 * @param size   uncompressed size in bytes
 * @param sha256 lower-case hex SHA-256 of the uncompressed bytes
 */
public record PackFileEntry(String path, long size, String sha256) {
    public PackFileEntry {
        Objects.requireNonNull(path, "path");
        Objects.requireNonNull(sha256, "sha256");
    }
}
