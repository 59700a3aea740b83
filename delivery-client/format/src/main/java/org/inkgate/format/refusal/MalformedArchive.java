package org.inkgate.format.refusal;

/** The bytes are not a well-formed archive in the profile Inkgate writes. */
public final class MalformedArchive extends FormatRefusal {

    public MalformedArchive(String file, String detail) {
        super(file, "not a readable Inkgate archive: " + detail + ". The file is damaged or was not written by Inkgate; copy it again from the source.");
    }
}
