package org.inkgate.format.bundle;

/**
 * The digest of one bundle entry as stored (for a sealed entry: of its ciphertext).
 *
 * @param sha256 SHA-256 of the stored bytes, lower-case hex
 * @param size   number of stored bytes
 * @param sealed whether the stored bytes are encrypted under the release code
 */
public record EntryDigest(String sha256, long size, boolean sealed) {
}
