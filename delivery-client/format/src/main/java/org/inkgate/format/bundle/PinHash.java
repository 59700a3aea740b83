package org.inkgate.format.bundle;

/**
 * The invigilator PIN as PBKDF2-HMAC-SHA256 over the PIN; the PIN itself never travels.
 *
 * @param salt       base64 salt
 * @param iterations PBKDF2 iteration count
 * @param hash       base64 derived bytes (32)
 */
public record PinHash(String salt, int iterations, String hash) {
}
