package org.inkgate.format.refusal;

/**
 * The archive holds two entries that are, or could be, the same file: the same name twice, names
 * that differ only in case or Unicode form, or a name that is both a file and a folder.
 */
public final class DuplicateEntry extends FormatRefusal {

    public DuplicateEntry(String file, String entry) {
        this(file, entry, "appears more than once");
    }

    public DuplicateEntry(String file, String entry, String how) {
        super(file, "entry \"" + entry + "\" " + how
                + ". Which content a reader uses would depend on the machine; do not use this file.");
    }
}
