package org.inkgate.format.crypto;

import java.security.SecureRandom;

/** Hands out given bytes once; lets a JDK key generator rebuild a key pair from a known secret. */
final class FixedBytesRandom extends SecureRandom {

    private static final long serialVersionUID = 1L;
    private final byte[] bytes;

    FixedBytesRandom(byte[] bytes) {
        this.bytes = bytes.clone();
    }

    @Override
    public void nextBytes(byte[] out) {
        if (out.length != bytes.length) {
            throw new IllegalStateException("expected a request for " + bytes.length + " bytes, got " + out.length);
        }
        System.arraycopy(bytes, 0, out, 0, out.length);
    }
}
