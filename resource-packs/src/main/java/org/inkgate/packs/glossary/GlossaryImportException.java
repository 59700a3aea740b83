package org.inkgate.packs.glossary;

/** A term bank file could not be imported; the message names the file, the line or row, and the fix. */
public final class GlossaryImportException extends Exception {
    private static final long serialVersionUID = 1L;
    private final long line;
    private final long column;

    /**
     * @param where   the file
     * @param line    1-based line (or CSV row) of the problem, 0 when unknown
     * @param column  1-based column, 0 when unknown
     * @param problem what is wrong and how to fix it
     */
    public GlossaryImportException(String where, long line, long column, String problem) {
        super(where + (line > 0 ? ", line " + line : "") + (column > 0 ? ", column " + column : "") + ": " + problem);
        this.line = line;
        this.column = column;
    }

    /** 1-based line of the problem, 0 when unknown. */
    public long line() {
        return line;
    }

    /** 1-based column of the problem, 0 when unknown. */
    public long column() {
        return column;
    }
}
