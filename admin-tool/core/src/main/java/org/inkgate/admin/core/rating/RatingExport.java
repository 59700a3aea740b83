package org.inkgate.admin.core.rating;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.List;
import org.inkgate.admin.core.csv.Csv;

/**
 * The exam's ratings as the analysis reads them (tidy long CSV, one row per rating:
 * {@code candidate,level,form,task,condition,rater,criterion,score}, then {@code kind},
 * {@code rated_at} and {@code design}, the study design the exam's bundle declared, the same on
 * every row) and the final-score table with the method and rule
 * behind every score. Columns are described in docs/data-dictionary.md.
 */
public final class RatingExport {

    public static final List<String> RATING_COLUMNS = List.of("candidate", "level", "form", "task", "condition", "rater",
            "criterion", "score", "kind", "rated_at", "design");
    public static final List<String> FINAL_COLUMNS = List.of("candidate", "level", "form", "task", "condition",
            "criterion", "score", "method", "rule", "raters", "decided_at");

    private RatingExport() {
    }

    /** Writes every current rating; returns the number of rows. */
    public static long ratings(RatingStore store, Writer out) throws RatingException, IOException {
        Csv.writeRow(out, RATING_COLUMNS);
        long[] n = {0};
        String design = store.studyDesign();
        try {
            store.forEachRating(r -> row(out, n, List.of(r.candidate(), r.level(), r.form(), r.task(), r.condition(),
                    r.rater(), r.criterion(), String.valueOf(r.score()), r.kind(), r.ratedAt(), design)));
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
        out.flush();
        return n[0];
    }

    /** Writes every final score; returns the number of rows. */
    public static long finalScores(RatingStore store, Writer out) throws RatingException, IOException {
        Csv.writeRow(out, FINAL_COLUMNS);
        long[] n = {0};
        try {
            store.forEachFinalScore(r -> row(out, n, List.of(r.candidate(), r.level(), r.form(), r.task(), r.condition(),
                    r.criterion(), number(r.score()), r.method(), r.rule(), r.basis(), r.decidedAt())));
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
        out.flush();
        return n[0];
    }

    /** Whole numbers without a decimal point, halves and thirds as plain decimals (e.g. 5, 5.5, 5.333333). */
    static String number(double v) {
        if (v == Math.rint(v)) {
            return String.valueOf((long) v);
        }
        return java.math.BigDecimal.valueOf(v).setScale(6, java.math.RoundingMode.HALF_EVEN).stripTrailingZeros()
                .toPlainString();
    }

    private static void row(Writer out, long[] n, List<String> fields) {
        try {
            Csv.writeRow(out, fields);
            n[0]++;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
