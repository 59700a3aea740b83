package org.inkgate.admin.core.rating;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The final score of one response from its submitted ratings, and the method that produced it
 * (kept in the store beside the score). The methods (common practice in writing assessment;
 * see docs/test-owner-guide.md, "Rating"):
 * <ul>
 *   <li>{@code single-rating}: one rater per response; the rating is the score;</li>
 *   <li>{@code mean-of-ratings}: the ratings agree within the rule (or no rule is set); per criterion the mean;</li>
 *   <li>{@code closest-pair-mean}: flagged and adjudicated; per criterion the mean of the two ratings
 *       whose totals are closest; when two pairs are equally close, the mean of all ratings
 *       ({@code mean-of-all-tied});</li>
 *   <li>{@code adjudicator}: flagged and adjudicated; the adjudicator's rating;</li>
 *   <li>{@code resolution-entry}: flagged and settled by a named person (e.g. after discussion); their scores.</li>
 * </ul>
 */
public final class FinalScore {

    /** One submitted rating of a response. */
    public record Submitted(String raterId, RatingDesk.Kind kind, Map<String, Integer> scores) {
    }

    /** A final score per criterion, how it was formed, and from which raters. */
    public record Result(Map<String, Double> scores, String method, List<String> basis) {
    }

    private FinalScore() {
    }

    /**
     * The final score, or empty while it is pending: ratings missing, or flagged without an
     * adjudication or a resolution entry yet.
     */
    public static Optional<Result> of(List<Submitted> ratings, int ratersPerResponse, boolean flagged,
            Optional<Map<String, Integer>> resolutionEntry, String resolvedBy, DiscrepancyRule.AdjudicatedScore how) {
        if (resolutionEntry.isPresent()) {
            return Optional.of(new Result(asDouble(resolutionEntry.get()), "resolution-entry", List.of(resolvedBy)));
        }
        List<Submitted> regular = ratings.stream().filter(r -> r.kind() == RatingDesk.Kind.RATING).toList();
        List<Submitted> adjudications = ratings.stream().filter(r -> r.kind() == RatingDesk.Kind.ADJUDICATION).toList();
        if (regular.size() < ratersPerResponse) {
            return Optional.empty();
        }
        if (!flagged) {
            return Optional.of(new Result(mean(regular), ratersPerResponse == 1 ? "single-rating" : "mean-of-ratings",
                    raters(regular)));
        }
        if (adjudications.isEmpty()) {
            return Optional.empty();
        }
        if (how == DiscrepancyRule.AdjudicatedScore.ADJUDICATOR) {
            Submitted last = adjudications.get(adjudications.size() - 1);
            return Optional.of(new Result(asDouble(last.scores()), "adjudicator", List.of(last.raterId())));
        }
        List<Submitted> all = new ArrayList<>(regular);
        all.addAll(adjudications);
        int bestGap = Integer.MAX_VALUE;
        List<Submitted> best = null;
        boolean tie = false;
        for (int i = 0; i < all.size(); i++) {
            for (int j = i + 1; j < all.size(); j++) {
                int gap = Math.abs(total(all.get(i)) - total(all.get(j)));
                if (gap < bestGap) {
                    bestGap = gap;
                    best = List.of(all.get(i), all.get(j));
                    tie = false;
                } else if (gap == bestGap) {
                    tie = true;
                }
            }
        }
        if (tie) {
            return Optional.of(new Result(mean(all), "mean-of-all-tied", raters(all)));
        }
        return Optional.of(new Result(mean(best), "closest-pair-mean", raters(best)));
    }

    private static int total(Submitted s) {
        return s.scores().values().stream().mapToInt(Integer::intValue).sum();
    }

    private static List<String> raters(List<Submitted> s) {
        return s.stream().map(Submitted::raterId).toList();
    }

    private static Map<String, Double> mean(List<Submitted> ratings) {
        Map<String, Double> out = new LinkedHashMap<>();
        for (String c : new java.util.TreeSet<>(ratings.get(0).scores().keySet())) {
            out.put(c, ratings.stream().mapToInt(r -> r.scores().get(c)).average().orElseThrow());
        }
        return out;
    }

    private static Map<String, Double> asDouble(Map<String, Integer> scores) {
        Map<String, Double> out = new LinkedHashMap<>();
        new java.util.TreeMap<>(scores).forEach((k, v) -> out.put(k, v.doubleValue()));
        return out;
    }
}
