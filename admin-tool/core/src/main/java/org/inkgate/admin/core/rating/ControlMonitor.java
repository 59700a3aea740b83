package org.inkgate.admin.core.rating;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Each rater's agreement with the agreed scores of the control scripts they rated, and its drift
 * over the rating period. Over every criterion score of every control script a rater submitted:
 * exact agreement is the share with |score - agreed| = 0, adjacent agreement the share with
 * |score - agreed| &lt;= 1 (the usual consensus measures of rater agreement; common practice, the same
 * definitions as the analysis's {@code raters.Agreement}), the mean difference is the mean of
 * score - agreed (positive: more lenient than agreed). Drift is the mean difference over the later
 * half of the rater's control scripts (in submission order) minus that over the earlier half.
 */
public final class ControlMonitor {

    /** Limits below (agreement) or beyond (difference, drift) which a rater is flagged; null: not checked. */
    public record Thresholds(Double minExact, Double minAdjacent, Double maxMeanDifference, Double maxDrift) {
        /**
         * Where the command and the window start: placeholders, not a standard; the test owner sets
         * the limits their scoring rules give. No exact-agreement limit by default.
         */
        public static final double PLACEHOLDER_MIN_ADJACENT = 0.8;
        public static final double PLACEHOLDER_MAX_MEAN_DIFFERENCE = 1.0;
        public static final double PLACEHOLDER_MAX_DRIFT = 1.0;
    }

    /** One control script as rated: when, and the mean of score - agreed over its criteria. */
    public record Point(String submittedAt, String blindId, double meanDifference) {
    }

    /**
     * One rater's figures.
     *
     * @param scripts control scripts rated
     * @param pairs   criterion scores compared
     * @param drift   NaN with fewer than two control scripts
     * @param flags   why the rater is flagged for the test owner; empty when not
     */
    public record RaterReport(String raterId, int scripts, int pairs, double exact, double adjacent,
            double meanDifference, double drift, List<Point> timeline, List<String> flags) {
        public boolean flagged() {
            return !flags.isEmpty();
        }
    }

    private ControlMonitor() {
    }

    public static List<RaterReport> of(List<ControlScripts.ControlRating> ratings, Thresholds limits) {
        Map<String, List<ControlScripts.ControlRating>> byRater = new TreeMap<>();
        for (ControlScripts.ControlRating r : ratings) {
            byRater.computeIfAbsent(r.raterId(), k -> new ArrayList<>()).add(r);
        }
        List<RaterReport> out = new ArrayList<>();
        byRater.forEach((rater, list) -> out.add(report(rater, list, limits)));
        return out;
    }

    private static RaterReport report(String rater, List<ControlScripts.ControlRating> list, Thresholds limits) {
        // in submission order as the store lists them (its submission numbers follow the clock)
        List<ControlScripts.ControlRating> sorted = list;
        int pairs = 0;
        int exact = 0;
        int adjacent = 0;
        double sum = 0;
        List<Point> timeline = new ArrayList<>();
        for (ControlScripts.ControlRating r : sorted) {
            double scriptSum = 0;
            int scriptPairs = 0;
            for (Map.Entry<String, Integer> agreed : new LinkedHashMap<>(r.agreed()).entrySet()) {
                Integer score = r.scores().get(agreed.getKey());
                if (score == null) {
                    continue;
                }
                int d = score - agreed.getValue();
                exact += d == 0 ? 1 : 0;
                adjacent += Math.abs(d) <= 1 ? 1 : 0;
                sum += d;
                scriptSum += d;
                pairs++;
                scriptPairs++;
            }
            timeline.add(new Point(r.submittedAt(), r.blindId(), scriptPairs == 0 ? Double.NaN : scriptSum / scriptPairs));
        }
        double exactShare = pairs == 0 ? Double.NaN : (double) exact / pairs;
        double adjacentShare = pairs == 0 ? Double.NaN : (double) adjacent / pairs;
        double mean = pairs == 0 ? Double.NaN : sum / pairs;
        double drift = Double.NaN;
        if (timeline.size() >= 2) {
            int half = timeline.size() / 2;
            drift = mean(timeline.subList(timeline.size() - half, timeline.size())) - mean(timeline.subList(0, half));
        }
        List<String> flags = new ArrayList<>();
        if (limits.minExact() != null && exactShare < limits.minExact()) {
            flags.add(String.format(java.util.Locale.ROOT, "exact agreement %.2f below %.2f", exactShare, limits.minExact()));
        }
        if (limits.minAdjacent() != null && adjacentShare < limits.minAdjacent()) {
            flags.add(String.format(java.util.Locale.ROOT, "adjacent agreement %.2f below %.2f", adjacentShare,
                    limits.minAdjacent()));
        }
        if (limits.maxMeanDifference() != null && Math.abs(mean) > limits.maxMeanDifference()) {
            flags.add(String.format(java.util.Locale.ROOT, "mean difference %+.2f beyond +-%.2f", mean,
                    limits.maxMeanDifference()));
        }
        if (limits.maxDrift() != null && !Double.isNaN(drift) && Math.abs(drift) > limits.maxDrift()) {
            flags.add(String.format(java.util.Locale.ROOT, "drift %+.2f beyond +-%.2f", drift, limits.maxDrift()));
        }
        return new RaterReport(rater, sorted.size(), pairs, exactShare, adjacentShare, mean, drift, List.copyOf(timeline),
                List.copyOf(flags));
    }

    private static double mean(List<Point> points) {
        return points.stream().mapToDouble(Point::meanDifference).filter(d -> !Double.isNaN(d)).average()
                .orElse(Double.NaN);
    }
}
