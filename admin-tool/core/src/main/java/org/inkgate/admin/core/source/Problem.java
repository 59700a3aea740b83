package org.inkgate.admin.core.source;

/**
 * One problem found in an exam source folder or an input file: which file, where in it, which
 * field, and what to do about it.
 *
 * @param file    the file, relative to the folder checked
 * @param line    1-based line, or 0 when the problem concerns the whole file
 * @param column  1-based column, or 0 when unknown
 * @param field   the field's path (e.g. {@code tasks[1].timeLimitMinutes}), or empty
 * @param message what is wrong and how to fix it
 */
public record Problem(String file, int line, int column, String field, String message) {

    /** Reads as {@code file:line:column: field: message}, the shape editors and terminals link. */
    @Override
    public String toString() {
        StringBuilder s = new StringBuilder(file);
        if (line > 0) {
            s.append(':').append(line);
            if (column > 0) {
                s.append(':').append(column);
            }
        }
        s.append(": ");
        if (!field.isEmpty()) {
            s.append(field).append(": ");
        }
        return s.append(message).toString();
    }
}
