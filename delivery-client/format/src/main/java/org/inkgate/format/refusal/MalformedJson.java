package org.inkgate.format.refusal;

/** A JSON entry that does not parse or does not fit the schema, with its location. */
public final class MalformedJson extends FormatRefusal {

    private final String entry;
    private final long line;
    private final long column;

    public MalformedJson(String file, String entry, long line, long column, String problem, Throwable cause) {
        super(file, "entry \"" + entry + "\" is not valid at line " + line + ", column " + column + ": " + problem
                + ". The file was damaged or written by another tool; copy it again from the source.", cause);
        this.entry = entry;
        this.line = line;
        this.column = column;
    }

    public String entry() {
        return entry;
    }

    public long line() {
        return line;
    }

    public long column() {
        return column;
    }
}
