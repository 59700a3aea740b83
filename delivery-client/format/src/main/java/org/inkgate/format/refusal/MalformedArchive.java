package org.inkgate.format.refusal;

/** The bytes are not a well-formed archive in the profile Inkgate writes, or not a well-formed ZIP at all. */
public final class MalformedArchive extends FormatRefusal {

    public MalformedArchive(String file, String detail) {
        super(file, "not a readable Inkgate archive: " + detail + ". The file is damaged or was not written by Inkgate; copy it again from the source.");
    }

    private MalformedArchive(String file, String detail, boolean foreign) {
        super(file, "not a readable ZIP archive: " + detail + ". The file is damaged or its writer broke the ZIP"
                + " format; ask the sender for a fresh copy, or unpack it and pack it again with another program.");
    }

    /** For a ZIP another program wrote (read by {@code ForeignZipReader}): no claim that Inkgate wrote it. */
    public static MalformedArchive foreign(String file, String detail) {
        return new MalformedArchive(file, detail, true);
    }
}
