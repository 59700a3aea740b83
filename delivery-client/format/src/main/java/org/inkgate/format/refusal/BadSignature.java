package org.inkgate.format.refusal;

/** The signature is missing or does not match the manifest: the file was altered or not signed by its owner. */
public final class BadSignature extends FormatRefusal {

    public BadSignature(String file, String detail) {
        super(file, detail + ". The file may have been altered after it was signed: do not use it; ask the test owner for a fresh copy.");
    }
}
