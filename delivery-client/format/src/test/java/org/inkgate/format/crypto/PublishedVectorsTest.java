package org.inkgate.format.crypto;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.security.PrivateKey;
import java.security.PublicKey;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The crypto wiring checked against the published test vectors of the RFCs that define it.
 * Every value below is copied from the RFC named beside it (cross-checked against several
 * independent public test suites that quote the same RFC sections).
 */
class PublishedVectorsTest {

    /** RFC 8032 section 7.1, TEST 1 (empty message) and TEST 2 (one byte, 0x72). */
    @ParameterizedTest(name = "RFC 8032 7.1 {0}")
    @CsvSource({
        "TEST 1, 9d61b19deffd5a60ba844af492ec2cc44449c5697b326919703bac031cae7f60,"
                + " d75a980182b10ab7d54bfed3c964073a0ee172f3daa62325af021a68f707511a, '',"
                + " e5564300c360ac729086e2cc806e828a84877f1eb8e5d974d873e065224901555fb8821590a33bacc61e39701cf9b46bd25bf5f0595bbe24655141438e7a100b",
        "TEST 2, 4ccd089b28ff96da9db6c346ec114e0f5b8a319f35aba624da8cf6ed4fb8a6fb,"
                + " 3d4017c3e843895a92b70aa74d1b7ebc9c982ccf2ec4968cc0cd55f12af4660c, 72,"
                + " 92a009a9f0d4cab8720e820b5f642540a2b27b5416503f8fb3762223ebdb69da085ac1e43e15996e458f3613d0f11d8c387b2eaeb4302aeeb00d291612bb0c00"
    })
    void ed25519_rfc8032Vector_givesPublishedKeyAndSignature(String name, String secret, String publicKey,
            String message, String signature) {
        PrivateKey key = Ed25519.privateFromSeed(Hex.parse(secret));
        byte[] msg = Hex.parse(message);

        assertEquals(publicKey, Hex.of(Ed25519.rawPublic(Ed25519.publicOf(key))), "public key");
        assertEquals(signature, Hex.of(Ed25519.sign(key, msg)), "signature");

        PublicKey decoded = Ed25519.publicFromRaw(Hex.parse(publicKey));
        assertTrue(Ed25519.verify(decoded, msg, Hex.parse(signature)), "published signature verifies");
        assertArrayEquals(Hex.parse(publicKey), Ed25519.rawPublic(decoded), "raw encoding round trip");
        byte[] altered = Hex.parse(signature);
        altered[10] ^= 1;
        assertFalse(Ed25519.verify(decoded, msg, altered), "an altered signature does not verify");
        assertFalse(Ed25519.verify(decoded, new byte[] {1, 2}, Hex.parse(signature)), "another message does not verify");
    }

    /** RFC 7748 section 5.2, the two X25519 function vectors (scalar, u-coordinate, output). */
    @ParameterizedTest(name = "RFC 7748 5.2 vector {index}")
    @CsvSource({
        "a546e36bf0527c9d3b16154b82465edd62144c0ac1fc5a18506a2244ba449ac4,"
                + " e6db6867583030db3594c1a424b15f7c726624ec26b3353b10a903a6d0ab1c4c,"
                + " c3da55379de9c6908e94ea4df28d084f32eccf03491c71f754b4075577a28552",
        // the second vector's u has its top bit set: X25519 must mask it (RFC 7748 section 5)
        "4b66e9d4d1b4673c5ad22691957d6af5c11b6421e0ea01d42ca4169e7918ba0d,"
                + " e5210f12786811d3f4b7959d0538ae2c31dbe7106fc03c3efc4cd549c715a493,"
                + " 95cbde9476e8907d7aade45cb4b873f88b595a68799fa152e6f8f7647aac7957"
    })
    void x25519_rfc7748Vector_givesPublishedOutput(String scalar, String u, String expected) {
        byte[] out = X25519.agree(X25519.privateFromRaw(Hex.parse(scalar)), X25519.publicFromRaw(Hex.parse(u)));
        assertEquals(expected, Hex.of(out));
        // the raw form, as a collect calls it: the u-coordinate exactly as published, top bit and all
        assertEquals(expected, Hex.of(X25519.agree(Hex.parse(scalar), Hex.parse(u))));
    }

    /** RFC 7748 section 6.1: an all-zero shared secret (here from u = 0, a point of small order) is refused. */
    @Test
    void x25519_lowOrderPoint_isRefused() {
        byte[] scalar = Hex.parse("77076d0a7318a57d3c16c17251b26645df4c2f87ebc0992ab177fba51db92c2a");
        org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class, () -> X25519.agree(scalar, new byte[32]));
    }

    /**
     * Verification (Bouncy Castle's RFC 8032 code) against the JDK's EdDSA provider as reference: signatures
     * the JDK makes over random messages verify, and every signature with one bit flipped, the key with one
     * bit flipped, or another message is refused by both.
     */
    @Test
    void ed25519_verification_agreesWithTheJdk() throws Exception {
        java.util.SplittableRandom random = new java.util.SplittableRandom(8032);
        for (int round = 0; round < 200; round++) {
            java.security.KeyPair pair = Ed25519.generate();
            byte[] message = new byte[random.nextInt(0, 600)];
            random.nextBytes(message);
            byte[] signature = Ed25519.sign(pair.getPrivate(), message);
            byte[] raw = Ed25519.rawPublic(pair.getPublic());
            assertTrue(Ed25519.verify(raw, message, signature));
            byte[] badSignature = signature.clone();
            badSignature[random.nextInt(64)] ^= (byte) (1 << random.nextInt(8));
            byte[] badKey = raw.clone();
            badKey[random.nextInt(32)] ^= (byte) (1 << random.nextInt(8));
            byte[] otherMessage = java.util.Arrays.copyOf(message, message.length + 1);
            assertEquals(jdkVerifies(raw, message, badSignature), Ed25519.verify(raw, message, badSignature));
            assertEquals(jdkVerifies(badKey, message, signature), Ed25519.verify(badKey, message, signature));
            assertEquals(jdkVerifies(raw, otherMessage, signature), Ed25519.verify(raw, otherMessage, signature));
        }
        assertFalse(Ed25519.verify(new byte[31], new byte[0], new byte[64]), "a short key is not valid");
        assertFalse(Ed25519.verify(new byte[32], new byte[0], new byte[63]), "a short signature is not valid");
    }

    private static boolean jdkVerifies(byte[] rawPublic, byte[] message, byte[] signature) throws Exception {
        java.security.Signature jdk = java.security.Signature.getInstance("Ed25519");
        try {
            jdk.initVerify(Ed25519.publicFromRaw(rawPublic));
            jdk.update(message);
            return jdk.verify(signature);
        } catch (java.security.GeneralSecurityException e) {
            return false;
        }
    }

    /** RFC 7748 section 6.1: Alice's and Bob's key pairs and their shared secret. */
    @Test
    void x25519_rfc7748DiffieHellman_givesPublishedKeysAndSharedSecret() {
        PrivateKey alice = X25519.privateFromRaw(Hex.parse("77076d0a7318a57d3c16c17251b26645df4c2f87ebc0992ab177fba51db92c2a"));
        PrivateKey bob = X25519.privateFromRaw(Hex.parse("5dab087e624a8a4b79e17f8b83800ee66f3bb1292618b6fd1c2f8b27ff88e0eb"));
        PublicKey alicePublic = X25519.publicOf(alice);
        PublicKey bobPublic = X25519.publicOf(bob);
        assertEquals("8520f0098930a754748b7ddcb43ef75a0dbf3a0d26381af4eba4a98eaa9b4e6a", Hex.of(X25519.rawPublic(alicePublic)));
        assertEquals("de9edb7d7b7dc1b4d35b61c2ece435373f8343c85b78674dadfc7e146f882b4f", Hex.of(X25519.rawPublic(bobPublic)));
        String shared = "4a5d9d5ba4ce2de1728e3bf480350f25e07e21c947d19e3376f09b3c1e161742";
        assertEquals(shared, Hex.of(X25519.agree(alice, bobPublic)));
        assertEquals(shared, Hex.of(X25519.agree(bob, X25519.publicFromRaw(X25519.rawPublic(alicePublic)))));
    }

    /** RFC 5869 appendix A, test cases 1-3 (the SHA-256 ones): PRK and OKM. */
    @Test
    void hkdf_rfc5869TestCase1_basicSha256() {
        checkHkdf(Hex.parse("0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b"), Hex.parse("000102030405060708090a0b0c"),
                Hex.parse("f0f1f2f3f4f5f6f7f8f9"), 42,
                "077709362c2e32df0ddc3f0dc47bba6390b6c73bb50f9c3122ec844ad7c2b3e5",
                "3cb25f25faacd57a90434f64d0362f2a2d2d0a90cf1a5a4c5db02d56ecc4c5bf34007208d5b887185865");
    }

    @Test
    void hkdf_rfc5869TestCase2_longerInputsAndOutput() {
        checkHkdf(sequence(0x00, 80), sequence(0x60, 80), sequence(0xb0, 80), 82,
                "06a6b88c5853361a06104c9ceb35b45cef760014904671014a193f40c15fc244",
                "b11e398dc80327a1c8e7f78c596a49344f012eda2d4efad8a050cc4c19afa97c59045a99cac7827271cb41c65e590e09"
                        + "da3275600c2f09b8367793a9aca3db71cc30c58179ec3e87c14c01d5c1f3434f1d87");
    }

    @Test
    void hkdf_rfc5869TestCase3_emptySaltAndInfo() {
        checkHkdf(Hex.parse("0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b0b"), new byte[0], new byte[0], 42,
                "19ef24a32c717b167f33a91d6f648bdf96596776afdb6377ac434c1c293ccb04",
                "8da4e775a563c18f715f802a063c5a31b8a11f5c5ee1879ec3454e5f3c738d2d9d201395faa4b61a96c8");
    }

    private static void checkHkdf(byte[] ikm, byte[] salt, byte[] info, int length, String prk, String okm) {
        byte[] actualPrk = Hkdf.extract(salt, ikm);
        assertEquals(prk, Hex.of(actualPrk), "PRK");
        assertEquals(okm, Hex.of(Hkdf.expand(actualPrk, info, length)), "OKM");
        assertEquals(okm, Hex.of(Hkdf.derive(salt, ikm, info, length)), "OKM in one step");
    }

    /** The RFC 5869 test case 2 inputs are runs of consecutive byte values. */
    private static byte[] sequence(int first, int count) {
        byte[] out = new byte[count];
        for (int i = 0; i < count; i++) {
            out[i] = (byte) (first + i);
        }
        return out;
    }
}
