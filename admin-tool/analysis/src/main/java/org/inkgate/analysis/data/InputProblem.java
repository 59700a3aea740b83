package org.inkgate.analysis.data;

/** One bad cell or row of an input table: where it is and how to fix it. */
public record InputProblem(String file, long row, String column, String message) {

    /** "ratings.csv, row 12, column score: ..." (row 1 is the header). */
    public String describe() {
        return file + ", row " + row + (column == null ? "" : ", column " + column) + ": " + message;
    }
}
