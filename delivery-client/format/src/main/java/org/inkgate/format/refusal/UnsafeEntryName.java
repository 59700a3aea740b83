package org.inkgate.format.refusal;

/**
 * An entry name that could write outside the reader's folder (absolute, drive letter, "..") or
 * that is not one plain file on every file system (see docs/formats.md, entry names).
 */
public final class UnsafeEntryName extends FormatRefusal {

    public UnsafeEntryName(String file, String entry, String reason) {
        super(file, "entry name \"" + entry + "\" is not a safe relative path (" + reason
                + "). The file was crafted or damaged; do not use it.");
    }
}
