package org.inkgate.admin.core.keys;

import java.security.AlgorithmParameters;
import java.security.GeneralSecurityException;
import java.security.KeyFactory;
import java.security.PrivateKey;
import java.security.SecureRandom;
import java.security.spec.PKCS8EncodedKeySpec;
import java.util.Arrays;
import java.util.Base64;
import javax.crypto.Cipher;
import javax.crypto.EncryptedPrivateKeyInfo;
import javax.crypto.SecretKey;
import javax.crypto.SecretKeyFactory;
import javax.crypto.spec.IvParameterSpec;
import javax.crypto.spec.PBEKeySpec;
import javax.crypto.spec.PBEParameterSpec;

/**
 * Private keys encrypted under a passphrase as PKCS#8 EncryptedPrivateKeyInfo (RFC 5958 section 3)
 * with PBES2 (RFC 8018 section 6.2): PBKDF2-HMAC-SHA256 and AES-256-CBC, through the JDK's own
 * {@code PBEWithHmacSHA256AndAES_256}. Stored as PEM ("ENCRYPTED PRIVATE KEY", RFC 7468 section 11),
 * which OpenSSL and other tools read too.
 */
public final class EncryptedKeys {

    /** The JDK's name for PBES2 with PBKDF2-HMAC-SHA256 and AES-256-CBC. */
    static final String PBES2 = "PBEWithHmacSHA256AndAES_256";
    /** OWASP Password Storage Cheat Sheet figure for PBKDF2-HMAC-SHA256 (December 2022 revision). */
    public static final int ITERATIONS = 600_000;
    private static final String PEM_LABEL = "ENCRYPTED PRIVATE KEY";
    private static final SecureRandom RANDOM = new SecureRandom();

    private EncryptedKeys() {
    }

    /** Thrown when the passphrase does not open the key (or the file is not such a key). */
    public static final class WrongPassphraseException extends Exception {
        WrongPassphraseException(String message, Throwable cause) {
            super(message, cause);
        }
    }

    public static byte[] encrypt(PrivateKey key, char[] passphrase) {
        return encrypt(key, passphrase, ITERATIONS);
    }

    static byte[] encrypt(PrivateKey key, char[] passphrase, int iterations) {
        byte[] salt = new byte[16];
        byte[] iv = new byte[16];
        RANDOM.nextBytes(salt);
        RANDOM.nextBytes(iv);
        byte[] plain = key.getEncoded();
        try {
            SecretKey pbeKey = SecretKeyFactory.getInstance(PBES2).generateSecret(new PBEKeySpec(passphrase));
            Cipher cipher = Cipher.getInstance(PBES2);
            cipher.init(Cipher.ENCRYPT_MODE, pbeKey, new PBEParameterSpec(salt, iterations, new IvParameterSpec(iv)));
            byte[] encrypted = cipher.doFinal(plain);
            // the cipher names its parameters by the JDK's cipher name, which EncryptedPrivateKeyInfo cannot map
            // to an OID; the same DER re-read as "PBES2" parameters carries the PBES2 OID (RFC 8018 A.4)
            AlgorithmParameters params = AlgorithmParameters.getInstance("PBES2");
            params.init(cipher.getParameters().getEncoded());
            return new EncryptedPrivateKeyInfo(params, encrypted).getEncoded();
        } catch (GeneralSecurityException | java.io.IOException e) {
            throw new IllegalStateException("the JDK could not encrypt the key with PBES2: " + e.getMessage(), e);
        } finally {
            Arrays.fill(plain, (byte) 0);
        }
    }

    /** Opens an EncryptedPrivateKeyInfo (DER) holding a key of the given JDK algorithm (Ed25519, X25519). */
    public static PrivateKey decrypt(byte[] der, char[] passphrase, String algorithm) throws WrongPassphraseException {
        try {
            EncryptedPrivateKeyInfo info = new EncryptedPrivateKeyInfo(der);
            AlgorithmParameters params = info.getAlgParameters();
            String name = params == null ? info.getAlgName() : params.toString();
            SecretKey pbeKey = SecretKeyFactory.getInstance(name).generateSecret(new PBEKeySpec(passphrase));
            Cipher cipher = Cipher.getInstance(name);
            cipher.init(Cipher.DECRYPT_MODE, pbeKey, params);
            PKCS8EncodedKeySpec spec = info.getKeySpec(cipher);
            return KeyFactory.getInstance(algorithm).generatePrivate(spec);
        } catch (GeneralSecurityException | java.io.IOException | IllegalArgumentException e) {
            throw new WrongPassphraseException("the passphrase does not open this key, or the file is not an encrypted "
                    + algorithm + " private key (PKCS#8 with PBES2); check the passphrase and the file", e);
        }
    }

    public static String pem(byte[] der) {
        String body = Base64.getMimeEncoder(64, "\n".getBytes(java.nio.charset.StandardCharsets.US_ASCII)).encodeToString(der);
        return "-----BEGIN " + PEM_LABEL + "-----\n" + body + "\n-----END " + PEM_LABEL + "-----\n";
    }

    /** The DER inside a PEM text with the given label (RFC 7468: base64 lines between the markers). */
    public static byte[] fromPem(String text, String label) {
        String begin = "-----BEGIN " + label + "-----";
        String end = "-----END " + label + "-----";
        int b = text.indexOf(begin);
        int e = text.indexOf(end);
        if (b < 0 || e < b) {
            throw new IllegalArgumentException("no \"" + begin + "\" block found");
        }
        return Base64.getMimeDecoder().decode(text.substring(b + begin.length(), e));
    }

    public static byte[] fromPem(String text) {
        return fromPem(text, PEM_LABEL);
    }
}
