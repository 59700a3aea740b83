package org.inkgate.format.refusal;

/** An entry name that could write outside the reader's folder (absolute, drive letter, "..") or is not plain. */
public final class UnsafeEntryName extends FormatRefusal {

    public UnsafeEntryName(String file, String entry) {
        super(file, "entry name \"" + entry + "\" is not a safe relative path (absolute, with \"..\","
                + " a drive letter, a backslash or a control character). The file was crafted or damaged; do not use it.");
    }
}
