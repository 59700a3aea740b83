package org.inkgate.analysis.data;

import java.util.List;

/**
 * Scores no rubric gives: below zero, or above {@value #MAX}. Rubric scores are small non-negative
 * numbers (bands of a few points, totals of a few criteria); a value beyond them is a typo, a column
 * mix-up or a corrupted file, and a value like 1e308 would overflow every sum the analysis takes.
 * The cap of 1000 is common practice for a sanity bound, far above any rubric in use.
 */
final class ScoreBounds {

    static final double MAX = 1000;

    private ScoreBounds() {
    }

    /** Adds a problem at the row and column when {@code score} is impossible; NaN (already reported) passes. */
    static void check(CsvTable t, CsvTable.Row row, String column, double score, List<InputProblem> problems) {
        if (score < 0) {
            problems.add(new InputProblem(t.file(), row.number(), column, "score " + plain(score)
                    + " is negative; rubric scores are 0 or more"));
        } else if (score > MAX) {
            problems.add(new InputProblem(t.file(), row.number(), column, "score " + plain(score)
                    + " is beyond any rubric (over " + (int) MAX + "); check the cell for a typo or a shifted column"));
        }
    }

    private static String plain(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? String.valueOf((long) v) : String.valueOf(v);
    }
}
