package org.inkgate.admin.core.rating;

import java.util.Map;
import java.util.function.Consumer;

/** Current ratings and final scores, as exports and the analysis read them (control ratings left out). */
public interface RatingResults {

    /** One current rating in the analysis's tidy long form, with who and when. */
    record RatingRow(String candidate, String level, String form, String task, String condition, String rater,
            String criterion, int score, String kind, String ratedAt) {
    }

    /** One final score of one criterion of one response, and how it was reached. */
    record FinalRow(String candidate, String level, String form, String task, String condition, String criterion,
            double score, String method, String rule, String basis, String decidedAt) {
    }

    /** Every current rating of the exam (first ratings and adjudications), ordered by candidate, task, rater, criterion. */
    void forEachRating(Consumer<RatingRow> sink) throws RatingException;

    /** Every final score of the exam; responses still pending have none. */
    void forEachFinalScore(Consumer<FinalRow> sink) throws RatingException;

    /**
     * The current ratings and final scores of every rated response of the exam, by sitting and task
     * (the QTI results export writes them per response package).
     */
    Map<ResponseScores.Key, ResponseScores> scoresByResponse() throws RatingException;

    /**
     * The study design the exam's bundle declared ({@code crossover}, {@code latin-square},
     * {@code parallel}), or empty when its bundle predates recorded designs.
     */
    String studyDesign() throws RatingException;

    /** Responses with a rating assignment but no final score yet. */
    int pendingResponses() throws RatingException;
}
