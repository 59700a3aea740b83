package org.inkgate.admin.core.rating;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.inkgate.admin.core.source.ExamSource;

/**
 * What a rater's desk needs from the results store, for one exam. Everything a rater is shown is
 * blind: a response is known by its blind id only, never by candidate, level, form, condition or
 * time, and its text comes without any trace of the tools that were offered.
 */
public interface RatingDesk {

    /** A rater who may sign in. */
    record Rater(String id, String label) {
    }

    /** What a queue item asks of the rater. */
    enum Kind {
        /** A first or second (or further) independent rating. */
        RATING,
        /** A third, independent rating of a response whose ratings disagreed by more than the rule allows. */
        ADJUDICATION,
        /**
         * A script of the qualification set, scored before live rating opens; the rater is told. Its
         * rating measures the rater and never enters a candidate's scores.
         */
        QUALIFICATION
    }

    /**
     * One response in a rater's queue, in the order the rater works.
     *
     * @param position 1-based place in the queue
     * @param blindId  the id the rater sees; reveals nothing about the response
     * @param taskId   the task (queues are grouped by task)
     * @param kind     what is asked
     * @param done     whether the rater has submitted this rating
     */
    record QueueItem(int position, String blindId, String taskId, Kind kind, boolean done) {
    }

    /**
     * A response as a rater sees it: plain text, with the task it answers (title and prompt, the
     * prompt empty when the store has none), nothing else.
     */
    record BlindResponse(String blindId, String taskId, String taskTitle, String text, String prompt) {
        public BlindResponse {
            prompt = prompt == null ? "" : prompt;
        }
    }

    /** Scores per criterion id (criteria not yet scored are absent) and a free comment. */
    record RatingSheet(Map<String, Integer> scores, String comment) {
        public RatingSheet {
            scores = Map.copyOf(scores);
            comment = comment == null ? "" : comment;
        }
    }

    /** How far a rater is. */
    record Progress(int total, int rated, int remaining, int flagged) {
    }

    /** The raters of this exam. */
    List<Rater> raters() throws RatingException;

    /** The rater's queue, in working order (assignment order; adjudications after the rater's own items). */
    List<QueueItem> queue(String raterId) throws RatingException;

    /** The response behind a blind id in this rater's queue; any other id is refused. */
    BlindResponse response(String raterId, String blindId) throws RatingException;

    /** The rubric the response is rated on. */
    ExamSource.Rubric rubric(String blindId) throws RatingException;

    /** The rater's unfinished or submitted sheet for a response, if any. */
    Optional<RatingSheet> sheet(String raterId, String blindId) throws RatingException;

    /** Keeps an unfinished sheet; durable when this returns, so a crash loses nothing typed before. */
    void saveDraft(String raterId, String blindId, RatingSheet sheet) throws RatingException;

    /**
     * Submits the rating: every criterion scored within its range, or a {@link RatingException}
     * naming what is missing or out of range. Resubmitting changes the rating and keeps the earlier
     * one in the history.
     */
    void submit(String raterId, String blindId, RatingSheet sheet) throws RatingException;

    /**
     * Refers a script of the rater's queue to the test owner ({@link Referrals}); the note says
     * what the rater saw. Returns the referral number. The script stays in the queue.
     */
    long refer(String raterId, String blindId, Referrals.Reason reason, String note) throws RatingException;

    /** The rater's progress. */
    Progress progress(String raterId) throws RatingException;
}
