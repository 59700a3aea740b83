package org.inkgate.format.bundle;

/**
 * The test owner's public keys, raw and base64 encoded (32 bytes each, RFC 8032 / RFC 7748).
 *
 * @param signing    Ed25519 key that signed this manifest
 * @param encryption X25519 key response packages are encrypted to
 */
public record OwnerKeys(String signing, String encryption) {
}
