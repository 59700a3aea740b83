package org.inkgate.admin.core.rating;

import java.util.List;
import java.util.Map;

/**
 * The scores of one response (one sitting's answer to one task) as exports report them: the
 * current rating of every rater, and the final score when it is decided.
 *
 * @param ratings     every current rating, first ratings before adjudications, by rater id
 * @param finalScores final score per criterion, empty while the response is pending
 * @param method      how the final score was reached ({@link FinalScore}), or null while pending
 */
public record ResponseScores(List<Rating> ratings, Map<String, Double> finalScores, String method) {

    public ResponseScores {
        ratings = List.copyOf(ratings);
        finalScores = Map.copyOf(finalScores);
    }

    /** Which response: the sitting (one response package) and the task. */
    public record Key(long sittingId, String taskId) {
    }

    /** One rater's current scores of the response, per criterion. */
    public record Rating(String raterId, RatingDesk.Kind kind, Map<String, Integer> scores) {
        public Rating {
            scores = Map.copyOf(scores);
        }
    }
}
