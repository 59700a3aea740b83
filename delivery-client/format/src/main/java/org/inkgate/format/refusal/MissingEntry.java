package org.inkgate.format.refusal;

/** A required entry is absent. */
public final class MissingEntry extends FormatRefusal {

    public MissingEntry(String file, String entry) {
        super(file, "required entry \"" + entry + "\" is missing. The file is incomplete (interrupted copy?) or was not written by Inkgate; copy it again from the source.");
    }
}
