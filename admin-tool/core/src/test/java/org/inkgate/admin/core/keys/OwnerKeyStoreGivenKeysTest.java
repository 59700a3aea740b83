package org.inkgate.admin.core.keys;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import java.security.KeyPair;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.crypto.X25519;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Keys handed to the key folder come back as they went in, under the passphrase, with the public file
 * naming them; the RFC 8032 section 7.1 TEST 1 key (seed and public key copied from the RFC) checks
 * the public encoding against a published value. A folder that has keys is not overwritten.
 */
class OwnerKeyStoreGivenKeysTest {

    @TempDir
    Path dir;

    @Test
    void givenKeys_readBackUnderThePassphrase() throws Exception {
        KeyPair signing = pair(Ed25519.privateFromSeed(Hex.parse(
                "9d61b19deffd5a60ba844af492ec2cc44449c5697b326919703bac031cae7f60")));
        KeyPair encryption = X25519.generate();
        char[] passphrase = "a long enough passphrase".toCharArray();
        OwnerKeyStore store = new OwnerKeyStore(dir.resolve("keys"));
        OwnerKeyStore.PublicKeys pub = store.init(passphrase, signing, encryption);

        assertEquals("d75a980182b10ab7d54bfed3c964073a0ee172f3daa62325af021a68f707511a",
                Hex.of(java.util.Base64.getDecoder().decode(pub.signing())), "RFC 8032 7.1 TEST 1 public key");
        assertEquals(pub, store.publicKeys());
        assertArrayEquals(Ed25519.seed(signing.getPrivate()), Ed25519.seed(store.signingKey(passphrase)));
        assertArrayEquals(X25519.rawPrivate(encryption.getPrivate()), X25519.rawPrivate(store.encryptionKey(passphrase)));
        assertThrows(java.nio.file.FileAlreadyExistsException.class, () -> store.init(passphrase, signing, encryption));
    }

    private static KeyPair pair(java.security.PrivateKey signing) {
        return new KeyPair(Ed25519.publicOf(signing), signing);
    }
}
