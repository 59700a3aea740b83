package org.inkgate.format.refusal;

/** Encrypted content could not be decrypted and authenticated. */
public final class DecryptionFailed extends FormatRefusal {

    public DecryptionFailed(String file, String detail, Throwable cause) {
        super(file, detail, cause);
    }
}
