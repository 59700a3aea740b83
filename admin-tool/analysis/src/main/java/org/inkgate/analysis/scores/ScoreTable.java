package org.inkgate.analysis.scores;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.data.ResponseKey;

/**
 * Response and candidate scores from ratings (rule stated by {@link ScoreRule#describe()}).
 * A candidate's score under a condition is their response score there; if a candidate sat more
 * than one task under a condition, the mean of those response scores.
 */
public final class ScoreTable {

    private final ScoreRule rule;
    private final List<ResponseScore> responses;
    private final List<String> conditions;
    private final List<String> criteria;
    private final List<String> levels;
    private final Map<String, String> levelOf;
    private final Map<String, Map<String, Double>> candidateScoreCache = new java.util.concurrent.ConcurrentHashMap<>();

    private ScoreTable(ScoreRule rule, List<ResponseScore> responses, List<String> conditions, List<String> criteria,
            List<String> levels, Map<String, String> levelOf) {
        this.rule = rule;
        this.responses = responses;
        this.conditions = conditions;
        this.criteria = criteria;
        this.levels = levels;
        this.levelOf = levelOf;
    }

    /**
     * Scores every response. Levels come from the ratings, or from {@code levels} (candidate to
     * level, e.g. the candidate table) where a rating's level is empty.
     */
    public static ScoreTable of(List<Rating> ratings, ScoreRule rule, Map<String, String> levels) {
        Map<ResponseKey, Map<String, double[]>> byResponse = new LinkedHashMap<>(); // criterion -> {sum, n}
        Map<ResponseKey, Rating> first = new HashMap<>();
        Map<ResponseKey, Set<String>> raters = new HashMap<>();
        Set<String> criteriaSeen = new java.util.HashSet<>();
        Set<String> conditionsSeen = new java.util.HashSet<>();
        // ratings of one response are usually neighbours: reuse the previous row's groups then
        Rating previous = null;
        Map<String, double[]> groupOfRow = null;
        Set<String> responseRaters = null;
        for (Rating r : ratings) {
            if (previous == null || !previous.candidate().equals(r.candidate()) || !previous.task().equals(r.task())) {
                ResponseKey key = ResponseKey.of(r);
                first.putIfAbsent(key, r);
                groupOfRow = byResponse.computeIfAbsent(key, k -> new HashMap<>());
                responseRaters = raters.computeIfAbsent(key, k -> new java.util.HashSet<>(4));
            }
            previous = r;
            double[] acc = groupOfRow.computeIfAbsent(r.criterion(), k -> new double[2]);
            acc[0] += r.score();
            acc[1]++;
            responseRaters.add(r.rater());
            criteriaSeen.add(r.criterion());
            conditionsSeen.add(r.condition());
        }
        Set<String> criteria = new TreeSet<>(criteriaSeen);
        Set<String> conditions = new TreeSet<>(conditionsSeen);
        List<ResponseScore> out = new ArrayList<>(byResponse.size());
        Map<String, String> levelOf = new HashMap<>();
        Set<String> levelSet = new TreeSet<>();
        for (var e : byResponse.entrySet()) {
            Rating r = first.get(e.getKey());
            Map<String, Double> perCriterion = new LinkedHashMap<>();
            double total = 0;
            for (String c : criteria) {
                double[] acc = e.getValue().get(c);
                if (acc != null) {
                    perCriterion.put(c, acc[0] / acc[1]);
                    total += acc[0] / acc[1];
                }
            }
            double score = rule == ScoreRule.MEAN ? total / perCriterion.size() : total;
            String level = r.level().isEmpty() && levels != null ? levels.getOrDefault(r.candidate(), "") : r.level();
            levelOf.put(r.candidate(), level);
            if (!level.isEmpty()) {
                levelSet.add(level);
            }
            out.add(new ResponseScore(r.candidate(), level, r.form(), r.task(), r.condition(), score, perCriterion,
                    raters.get(e.getKey()).size(), perCriterion.size() < criteria.size()));
        }
        return new ScoreTable(rule, out, List.copyOf(conditions), List.copyOf(criteria), List.copyOf(levelSet),
                levelOf);
    }

    public ScoreRule rule() {
        return rule;
    }

    public List<ResponseScore> responses() {
        return responses;
    }

    public List<String> conditions() {
        return conditions;
    }

    public List<String> criteria() {
        return criteria;
    }

    /** Levels named in the data, sorted; candidates without a level are not in any. */
    public List<String> levels() {
        return levels;
    }

    public String levelOf(String candidate) {
        return levelOf.getOrDefault(candidate, "");
    }

    /**
     * Candidate scores under a condition: candidate to score (criterion null = overall, else the
     * criterion's score), mean over that candidate's responses under the condition.
     */
    public Map<String, Double> candidateScores(String condition, String criterion) {
        return candidateScoreCache.computeIfAbsent(condition + '\u0000' + (criterion == null ? "\u0001" : criterion),
                k -> java.util.Collections.unmodifiableMap(computeCandidateScores(condition, criterion)));
    }

    private Map<String, Double> computeCandidateScores(String condition, String criterion) {
        Map<String, double[]> acc = new LinkedHashMap<>();
        for (ResponseScore r : responses) {
            if (!r.condition().equals(condition)) {
                continue;
            }
            Double v = criterion == null ? Double.valueOf(r.score()) : r.criterionScores().get(criterion);
            if (v != null) {
                double[] a = acc.computeIfAbsent(r.candidate(), k -> new double[2]);
                a[0] += v;
                a[1]++;
            }
        }
        Map<String, Double> out = new LinkedHashMap<>();
        acc.forEach((k, a) -> out.put(k, a[0] / a[1]));
        return out;
    }

    /** Candidates under more than one response in one condition (their scores are averaged). */
    public long candidatesWithSeveralResponses(String condition) {
        Map<String, Integer> n = new HashMap<>();
        responses.stream().filter(r -> r.condition().equals(condition)).forEach(r -> n.merge(r.candidate(), 1, Integer::sum));
        return n.values().stream().filter(v -> v > 1).count();
    }

    /** Candidates in order of first appearance. */
    public List<String> candidates() {
        return new ArrayList<>(new LinkedHashSet<>(responses.stream().map(ResponseScore::candidate).toList()));
    }
}
