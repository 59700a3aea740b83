package org.inkgate.format.refusal;

/** The file is of another kind, or of a schema version this build does not know. */
public final class UnsupportedSchema extends FormatRefusal {

    public UnsupportedSchema(String file, String detail) {
        super(file, detail);
    }
}
