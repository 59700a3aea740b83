package org.inkgate.format.refusal;

/** The release code does not open this sealed bundle. */
public final class WrongReleaseCode extends FormatRefusal {

    public WrongReleaseCode(String file) {
        super(file, "the release code does not open this sealed bundle. Check the code with the test owner (codes are case-sensitive) and enter it again; nothing was decrypted.");
    }
}
