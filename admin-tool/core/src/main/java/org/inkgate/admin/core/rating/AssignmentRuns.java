package org.inkgate.admin.core.rating;

import java.util.List;

/** Assignment runs: responses handed to raters, blind, with the seed and design recorded. */
public interface AssignmentRuns {

    /** What an assignment run did. */
    record AssignmentOutcome(long runId, RatingAssigner.Plan plan, RaterLinks.Report wholeDesign) {
    }

    /** The exam's responses that no rater has been given yet. */
    List<RatingAssigner.Response> unassignedResponses() throws RatingException;

    /**
     * Assigns every response not yet assigned to {@code k} raters and stores the plan with fresh
     * blind ids. A design whose raters do not all link through shared responses is refused (nothing
     * stored) unless {@code allowUnlinked}; with k = 1 it is always unlinked and only warned about.
     */
    AssignmentOutcome assign(int k, long seed, boolean allowUnlinked) throws RatingException;

    /** The linking graph of the exam's whole rating design so far (first ratings and adjudications). */
    RaterLinks.Report design() throws RatingException;
}
