package org.inkgate.admin.core.rating;

import org.inkgate.admin.core.source.ExamSource;

/**
 * Blind double rating of one exam in a results store, every concern behind its own interface:
 * raters ({@link RaterRegister}), assignment runs ({@link AssignmentRuns}), the rater's desk
 * ({@link RatingDesk}) and its records ({@link DeskRecords}), referrals ({@link Referrals}),
 * discrepancy review and adjudication ({@link DiscrepancyReview}), final scores and ratings for
 * exports ({@link RatingResults}), control scripts ({@link ControlScripts}) and the qualification set
 * ({@link QualificationSet}). Opened from a
 * store location by {@code store.Stores}; calls are serialised, whichever thread they come from.
 */
public interface RatingStore extends RatingDesk, RaterRegister, AssignmentRuns, DeskRecords, Referrals,
        DiscrepancyReview, RatingResults, ControlScripts, QualificationSet, AutoCloseable {

    /** The exam this store rates. */
    String examId();

    /** The exam's rubric as registered in the store. */
    ExamSource.Rubric rubric();

    @Override
    void close() throws RatingException;
}
