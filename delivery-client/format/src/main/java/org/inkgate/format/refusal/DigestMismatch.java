package org.inkgate.format.refusal;

/** An entry's bytes do not have the SHA-256 the signed manifest lists for them. */
public final class DigestMismatch extends FormatRefusal {

    private final String entry;

    public DigestMismatch(String file, String entry) {
        super(file, "entry \"" + entry + "\" does not match the digest in the signed manifest: it was altered or"
                + " damaged after signing. Do not use this file; copy it again from the source.");
        this.entry = entry;
    }

    public String entry() {
        return entry;
    }
}
