package org.inkgate.admin.core.keys;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.KeyFactory;
import java.security.PrivateKey;
import java.security.spec.PKCS8EncodedKeySpec;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Hex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class EncryptedKeysTest {

    /** RFC 8410 section 10.1: the public key of the section 10.3 example private key. */
    private static final String RFC8410_PUBLIC = "19bf44096984cdfe8541bac167dc3b96c85086aa30b6b6cb0c5c38ad703166e1";

    private static String resource(String name) throws Exception {
        try (InputStream in = EncryptedKeysTest.class.getResourceAsStream("/keys/" + name)) {
            return new String(in.readAllBytes(), StandardCharsets.US_ASCII);
        }
    }

    private static PrivateKey rfc8410Key() throws Exception {
        byte[] der = EncryptedKeys.fromPem(resource("rfc8410-section-10.3-private.pem"), "PRIVATE KEY");
        return KeyFactory.getInstance("Ed25519").generatePrivate(new PKCS8EncodedKeySpec(der));
    }

    @Test
    void rfc8410Example_readAsPkcs8_givesThePublicKeyOfSection10_1() throws Exception {
        assertEquals(RFC8410_PUBLIC, Hex.of(Ed25519.rawPublic(Ed25519.publicOf(rfc8410Key()))));
    }

    @Test
    void encryptThenDecrypt_rfc8410Key_givesTheSameKeyBack() throws Exception {
        char[] pass = "invented passphrase for tests".toCharArray();
        byte[] der = EncryptedKeys.encrypt(rfc8410Key(), pass, 1000);
        PrivateKey back = EncryptedKeys.decrypt(der, pass, "Ed25519");
        assertEquals(RFC8410_PUBLIC, Hex.of(Ed25519.rawPublic(Ed25519.publicOf(back))));
        // PBES2 OID 1.2.840.113549.1.5.13 (RFC 8018 appendix A.4) as DER: 06 09 2a 86 48 86 f7 0d 01 05 0d
        assertEquals(true, Hex.of(der).contains("06092a864886f70d01050d"), "the algorithm is PBES2");
        // id-hmacWithSHA256 1.2.840.113549.2.9 and aes256-CBC 2.16.840.1.101.3.4.1.42 (RFC 8018 B.1.2, B.2.5)
        assertEquals(true, Hex.of(der).contains("06082a864886f70d0209"), "PRF is HMAC-SHA256");
        assertEquals(true, Hex.of(der).contains("060960864801650304012a"), "cipher is AES-256-CBC");
    }

    @Test
    void decrypt_fileEncryptedByOpenSsl_opensWithOurReader() throws Exception {
        // made by src/test/resources/keys/make-openssl-fixture.sh (OpenSSL 3.0, PBES2, HMAC-SHA256, AES-256-CBC)
        byte[] der = EncryptedKeys.fromPem(resource("openssl-pbes2-rfc8410.pem"));
        PrivateKey key = EncryptedKeys.decrypt(der, "correct horse battery".toCharArray(), "Ed25519");
        assertArrayEquals(Ed25519.seed(rfc8410Key()), Ed25519.seed(key));
    }

    @Test
    void decrypt_wrongPassphrase_isRefusedWithAdvice() throws Exception {
        byte[] der = EncryptedKeys.fromPem(resource("openssl-pbes2-rfc8410.pem"));
        EncryptedKeys.WrongPassphraseException e = assertThrows(EncryptedKeys.WrongPassphraseException.class,
                () -> EncryptedKeys.decrypt(der, "wrong horse battery".toCharArray(), "Ed25519"));
        assertEquals(true, e.getMessage().contains("check the passphrase"));
    }

    @Test
    void ownerKeyStore_initShowAndOpen_keysMatchTheirPublicHalves(@TempDir Path dir) throws Exception {
        char[] pass = "invented passphrase for tests".toCharArray();
        OwnerKeyStore store = new OwnerKeyStore(dir.resolve("keys"));
        OwnerKeyStore.PublicKeys made = store.init(pass);
        assertEquals(made, store.publicKeys());
        store.signingKey(pass);
        store.encryptionKey(pass);
        assertNotEquals(made.signingFingerprint(), made.encryptionFingerprint());
        assertThrows(java.nio.file.FileAlreadyExistsException.class, () -> store.init(pass));
        assertThrows(IllegalArgumentException.class, () -> new OwnerKeyStore(dir.resolve("k2")).init("short".toCharArray()));
        assertThrows(EncryptedKeys.WrongPassphraseException.class,
                () -> store.signingKey("not the passphrase!".toCharArray()));
    }
}
