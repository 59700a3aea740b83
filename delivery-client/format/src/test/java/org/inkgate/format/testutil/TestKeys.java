package org.inkgate.format.testutil;

import java.security.PrivateKey;
import java.security.PublicKey;
import java.util.Base64;
import org.inkgate.format.bundle.OwnerKeys;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.crypto.X25519;

/** Fixed keys for tests only: made from fixed byte patterns so test files are reproducible. */
public final class TestKeys {

    public static final PrivateKey OWNER_SIGNING = Ed25519.privateFromSeed(pattern(0x11));
    public static final PrivateKey OWNER_ENCRYPTION = X25519.privateFromRaw(pattern(0x22));
    public static final PrivateKey INSTALLATION_SIGNING = Ed25519.privateFromSeed(pattern(0x33));
    public static final PrivateKey OTHER_SIGNING = Ed25519.privateFromSeed(pattern(0x44));
    public static final PrivateKey OTHER_ENCRYPTION = X25519.privateFromRaw(pattern(0x55));

    private TestKeys() {
    }

    public static PublicKey ownerEncryptionPublic() {
        return X25519.publicOf(OWNER_ENCRYPTION);
    }

    public static OwnerKeys ownerKeys() {
        return ownerKeys(OWNER_SIGNING);
    }

    /** Owner keys naming the given signing key (and the test owner's encryption key). */
    public static OwnerKeys ownerKeys(PrivateKey signing) {
        Base64.Encoder b64 = Base64.getEncoder();
        return new OwnerKeys(b64.encodeToString(Ed25519.rawPublic(Ed25519.publicOf(signing))),
                b64.encodeToString(X25519.rawPublic(ownerEncryptionPublic())));
    }

    /** The test client installation, enrolled: what a collector trusts for the sample sitting. */
    public static org.inkgate.format.trust.TrustPolicy installations() {
        return org.inkgate.format.trust.TrustPolicy.trusting(java.util.Set.of(
                Fingerprint.of(Ed25519.rawPublic(Ed25519.publicOf(INSTALLATION_SIGNING)))));
    }

    public static String ownerFingerprint() {
        return Fingerprint.of(Ed25519.rawPublic(Ed25519.publicOf(OWNER_SIGNING)));
    }

    private static byte[] pattern(int seed) {
        byte[] bytes = new byte[32];
        for (int i = 0; i < bytes.length; i++) {
            bytes[i] = (byte) (seed * (i + 1) + i);
        }
        return bytes;
    }
}
