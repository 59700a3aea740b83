package org.inkgate.format.refusal;

/** The archive holds two entries with one name, so which one a reader uses is ambiguous. */
public final class DuplicateEntry extends FormatRefusal {

    public DuplicateEntry(String file, String entry) {
        super(file, "entry \"" + entry + "\" appears more than once. The archive was built by another tool or altered; do not use it.");
    }
}
