package org.inkgate.format.refusal;

/** The archive holds an entry its signed manifest does not list. */
public final class UnlistedEntry extends FormatRefusal {

    public UnlistedEntry(String file, String entry) {
        super(file, "entry \"" + entry + "\" is not listed in the signed manifest: something was added after signing. Do not use this file.");
    }
}
