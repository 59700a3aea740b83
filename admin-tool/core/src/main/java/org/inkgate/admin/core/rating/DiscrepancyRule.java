package org.inkgate.admin.core.rating;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.inkgate.admin.core.source.ExamSource;

/**
 * When two raters disagree too much to average them: some criterion's scores lie more than
 * {@code maxCriterionBandGap} rubric bands apart, or the totals (sum over criteria) more than
 * {@code maxTotalGap} points apart. Either part may be absent; at least one is required. A
 * flagged response goes to adjudication, and its final score follows {@code adjudicatedScore}.
 * Such rules, and both ways to settle a flagged response, are common practice in writing
 * assessment; the thresholds are the test owner's to set, never ours.
 */
public record DiscrepancyRule(Integer maxCriterionBandGap, Integer maxTotalGap, AdjudicatedScore adjudicatedScore) {

    /** How the final score of a response with an adjudicator's rating is formed. */
    public enum AdjudicatedScore {
        /** Mean of the two ratings whose totals are closest (the adjudicator's among them or not). */
        CLOSEST_PAIR_MEAN("closest-pair-mean"),
        /** The adjudicator's rating replaces the disagreeing ones. */
        ADJUDICATOR("adjudicator");

        private final String label;

        AdjudicatedScore(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }

        /** The method named by its label, or an error listing the labels. */
        public static AdjudicatedScore of(String label) {
            for (AdjudicatedScore a : values()) {
                if (a.label.equals(label)) {
                    return a;
                }
            }
            throw new IllegalArgumentException("'" + label + "' is not a way to settle an adjudicated response; use "
                    + "closest-pair-mean or adjudicator");
        }
    }

    public DiscrepancyRule {
        if (maxCriterionBandGap == null && maxTotalGap == null) {
            throw new IllegalArgumentException("a discrepancy rule needs a criterion band gap, a total gap, or both");
        }
        if (maxCriterionBandGap != null && maxCriterionBandGap < 0 || maxTotalGap != null && maxTotalGap < 0) {
            throw new IllegalArgumentException("discrepancy gaps are 0 or more (0 flags any difference)");
        }
        if (adjudicatedScore == null) {
            throw new IllegalArgumentException("say how an adjudicated response is scored: closest-pair-mean or adjudicator");
        }
    }

    /** A line for reports, e.g. "criterion scores more than 1 band apart, or totals more than 4 apart". */
    public String describe() {
        String c = maxCriterionBandGap == null ? null : "a criterion's scores more than " + maxCriterionBandGap
                + (maxCriterionBandGap == 1 ? " band" : " bands") + " apart";
        String t = maxTotalGap == null ? null : "totals more than " + maxTotalGap + " points apart";
        return (c != null && t != null ? c + ", or " + t : c != null ? c : t) + "; adjudicated responses scored by "
                + adjudicatedScore.label();
    }

    /** Why these complete ratings of one response disagree too much, or empty when they may be combined. */
    public Optional<String> disagreement(List<Map<String, Integer>> ratings, ExamSource.Rubric rubric) {
        for (ExamSource.Criterion c : rubric.criteria()) {
            if (maxCriterionBandGap == null) {
                break;
            }
            int lo = Integer.MAX_VALUE;
            int hi = Integer.MIN_VALUE;
            int loScore = 0;
            int hiScore = 0;
            for (Map<String, Integer> r : ratings) {
                int score = r.get(c.id());
                int band = band(c, score);
                if (band < lo) {
                    lo = band;
                    loScore = score;
                }
                if (band > hi) {
                    hi = band;
                    hiScore = score;
                }
            }
            if (hi - lo > maxCriterionBandGap) {
                return Optional.of(c.id() + ": scores " + loScore + " and " + hiScore + " lie " + (hi - lo)
                        + " bands apart (rule: more than " + maxCriterionBandGap + ")");
            }
        }
        if (maxTotalGap != null) {
            int lo = Integer.MAX_VALUE;
            int hi = Integer.MIN_VALUE;
            for (Map<String, Integer> r : ratings) {
                int total = r.values().stream().mapToInt(Integer::intValue).sum();
                lo = Math.min(lo, total);
                hi = Math.max(hi, total);
            }
            if (hi - lo > maxTotalGap) {
                return Optional.of("totals " + lo + " and " + hi + " lie " + (hi - lo) + " points apart (rule: more than "
                        + maxTotalGap + ")");
            }
        }
        return Optional.empty();
    }

    /**
     * The 0-based band of a score: the rubric's band descriptors that cover it, counted from the
     * lowest; a criterion without descriptors counts every score point as a band.
     */
    static int band(ExamSource.Criterion c, int score) {
        if (c.bands().isEmpty()) {
            return score;
        }
        List<ExamSource.Band> sorted = c.bands().stream().sorted(java.util.Comparator.comparingInt(ExamSource.Band::from))
                .toList();
        for (int i = 0; i < sorted.size(); i++) {
            if (score >= sorted.get(i).from() && score <= sorted.get(i).to()) {
                return i;
            }
        }
        throw new IllegalArgumentException("score " + score + " of criterion " + c.id() + " lies in no band");
    }
}
