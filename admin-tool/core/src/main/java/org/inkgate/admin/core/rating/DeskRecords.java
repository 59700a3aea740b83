package org.inkgate.admin.core.rating;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The desk seen from the test owner's side: submitted ratings and their history, rating sheets
 * submitted in bulk, settled responses, progress per rater and task. Never shown to raters.
 */
public interface DeskRecords {

    /** The submission history of one assignment (every submission, oldest first): for audits and tests. */
    record HistoryEntry(String raterId, Map<String, Integer> scores, String comment, String submittedAt, String via) {
    }

    /** Progress of one rater on one task: assigned, rated, remaining, and how many of them are flagged. */
    record ProgressRow(String raterId, String taskId, int total, int rated, int remaining, int flagged) {
    }

    /**
     * When the response behind a blind id was settled by a resolution entry, if it was: from then
     * on its final score is the test owner's, so no rating for it is taken.
     */
    Optional<String> settledAt(String blindId) throws RatingException;

    /** The rater whose queue holds a blind id, if the id exists in this exam (for the test owner's tools, never raters). */
    Optional<String> raterOf(String blindId) throws RatingException;

    /** The rater's latest submitted sheet for a response (drafts left out), if any. */
    Optional<RatingDesk.RatingSheet> submitted(String raterId, String blindId) throws RatingException;

    /** What is wrong with a sheet: unknown criteria, scores out of range, and (if complete) missing criteria. */
    List<String> check(RatingDesk.RatingSheet sheet, boolean complete);

    /**
     * Submits several ratings of one rater in one transaction (all or none), e.g. from a rating
     * sheet; a rating identical to the current one (scores and comment) is left as it is, so a
     * repeated import adds nothing. Returns how many ratings were new or changed.
     */
    int submitAll(String raterId, Map<String, RatingDesk.RatingSheet> sheets, String via) throws RatingException;

    List<HistoryEntry> history(String blindId) throws RatingException;

    /** Progress per rater and task (raters with nothing assigned are left out). */
    List<ProgressRow> progressRows() throws RatingException;
}
