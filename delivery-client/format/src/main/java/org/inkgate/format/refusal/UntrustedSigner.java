package org.inkgate.format.refusal;

/** The signature is valid but made by a key the reader was not told to trust. */
public final class UntrustedSigner extends FormatRefusal {

    public UntrustedSigner(String file, String fingerprint) {
        super(file, "signed by a key that is not trusted here (fingerprint " + fingerprint + "). Compare the fingerprint with the one the test owner published; if it matches, add it to the trusted keys.");
    }
}
