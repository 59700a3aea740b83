package org.inkgate.format.response;

import java.nio.charset.StandardCharsets;

/** Entry names and key-derivation labels of response packages. */
final class PackageLayout {

    static final String ENVELOPE = "envelope.json";
    static final String PAYLOAD = "payload.bin";
    static final String MANIFEST = "package.json";
    static final String SIGNATURE = "package.sig";
    static final String RESPONSE = "response.json";
    static final String EVENTS = "events.jsonl";
    static final int SALT_BYTES = 32;

    private PackageLayout() {
    }

    /** HKDF info: binds the derived key to the scheme and to both public keys. */
    static byte[] hkdfInfo(byte[] ephemeralPublic, byte[] recipientPublic) {
        byte[] label = ("inkgate response package v1 " + Envelope.SCHEME).getBytes(StandardCharsets.UTF_8);
        byte[] info = new byte[label.length + ephemeralPublic.length + recipientPublic.length];
        System.arraycopy(label, 0, info, 0, label.length);
        System.arraycopy(ephemeralPublic, 0, info, label.length, ephemeralPublic.length);
        System.arraycopy(recipientPublic, 0, info, label.length + ephemeralPublic.length, recipientPublic.length);
        return info;
    }
}
