package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.data.ResponseKey;
import org.inkgate.analysis.raters.Agreement;
import org.inkgate.analysis.raters.Correlation;
import org.inkgate.analysis.raters.Icc;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.scores.ScoreRule;

/**
 * Rater agreement on the score a test owner reports: per response, each rater's score under the
 * score rule (the mean, or with SUM the total, of that rater's criterion scores), compared between
 * the first and second rater of the response (in input order, among raters who scored every
 * criterion the response was rated on), over all responses, per task and per condition. Same
 * methods as the per-criterion figures: Pearson r with Fisher-z CI and t-test p, Spearman rho,
 * exact and adjacent agreement, the six Shrout-Fleiss ICC forms with F-based 95% CIs.
 */
final class ReportedScoreAgreement {

    static final String LEVEL = "reported score";

    private ReportedScoreAgreement() {
    }

    /** Adds the two tables and the {@code reported_score.*} keys to the raters section. */
    static void addTo(Section.Builder s, List<Rating> ratings, ScoreRule rule) {
        int[] leftOut = {0};
        List<Pair> pairs = pairs(ratings, rule, leftOut);
        String scale = rule == ScoreRule.SUM ? "total over criteria" : "mean over criteria";
        Table.Builder agree = Table.builder("raters_score_agreement",
                "Agreement on the reported score (" + scale + "), first and second rater")
                .method("Pearson r (Fisher-z CI, t-test p), Spearman rho (t-approximation p), exact agreement (equal"
                        + " totals), adjacent agreement (totals at most 1 point apart), mean absolute difference on the"
                        + " reported scale", "Pearson 1896; Spearman 1904")
                .columns("level", "scope", "responses", "Pearson r", "r lower", "r upper", "r p", "Spearman rho",
                        "rho p", "exact", "adjacent", "mean |difference|");
        Table.Builder icc = Table.builder("raters_score_icc", "Intraclass correlations on the reported score ("
                + scale + ")")
                .method("ICC in the six Shrout-Fleiss forms with F-based 95% CIs", "Shrout & Fleiss 1979; McGraw & Wong 1996")
                .columns("level", "scope", "form", "description", "ICC", "lower", "upper", "F", "df1", "df2", "p");
        Map<String, List<Pair>> scopes = new LinkedHashMap<>();
        scopes.put("all", pairs);
        Map<String, List<Pair>> byTask = new TreeMap<>(), byCondition = new TreeMap<>();
        for (Pair p : pairs) {
            byTask.computeIfAbsent(p.task, k -> new ArrayList<>()).add(p);
            byCondition.computeIfAbsent(p.condition, k -> new ArrayList<>()).add(p);
        }
        byTask.forEach((t, list) -> scopes.put("task " + t, list));
        byCondition.forEach((c, list) -> scopes.put("condition " + c, list));
        s.put("reported_score.rule", rule.name().toLowerCase(java.util.Locale.ROOT)).put("reported_score.pairs", pairs.size())
                .put("reported_score.left_out", leftOut[0]);
        for (var e : scopes.entrySet()) {
            String scope = e.getKey();
            List<Pair> p = e.getValue();
            double[] x = p.stream().mapToDouble(q -> q.first).toArray();
            double[] y = p.stream().mapToDouble(q -> q.second).toArray();
            double[] tx = p.stream().mapToDouble(q -> q.firstTotal).toArray();
            double[] ty = p.stream().mapToDouble(q -> q.secondTotal).toArray();
            Correlation pr = Correlation.pearson(x, y);
            Correlation sp = Correlation.spearman(x, y);
            Agreement ag = Agreement.of(tx, ty); // on totals: "adjacent" is one point on one criterion
            double mad = 0;
            for (int i = 0; i < x.length; i++) {
                mad += Math.abs(x[i] - y[i]) / x.length;
            }
            if (x.length == 0) {
                mad = Double.NaN;
            }
            agree.row(LEVEL, scope, (long) x.length, pr.r(), pr.lower(), pr.upper(), pr.p(), sp.r(), sp.p(), ag.exact(),
                    ag.adjacent(), mad);
            pr.cautions().forEach(c -> agree.note(scope + ": " + c));
            String key = "reported_score." + scopeKey(scope) + ".";
            s.put(key + "pairs", x.length).put(key + "pearson_r", pr.r()).put(key + "pearson_lower", pr.lower())
                    .put(key + "pearson_upper", pr.upper()).put(key + "pearson_p", pr.p())
                    .put(key + "spearman_rho", sp.r()).put(key + "spearman_p", sp.p())
                    .put(key + "exact_agreement", ag.exact()).put(key + "adjacent_agreement", ag.adjacent())
                    .put(key + "mean_abs_difference", mad);
            double[][] table = new double[x.length][];
            for (int i = 0; i < x.length; i++) {
                table[i] = new double[] {x[i], y[i]};
            }
            Icc ic = Icc.of(table, 0.95);
            for (Icc.Form f : ic.forms()) {
                icc.row(LEVEL, scope, f.name(), f.description(), f.value(), f.lower(), f.upper(), f.f(), f.df1(),
                        f.df2(), f.p());
                String fk = key + Keys.slug(f.name());
                s.put(fk, f.value()).put(fk + "_lower", f.lower()).put(fk + "_upper", f.upper());
            }
            ic.cautions().forEach(c -> icc.note(scope + ": " + c));
        }
        agree.note("Each rater's reported score of a response is the " + scale + " of their own criterion scores; only"
                + " raters who scored every criterion the response was rated on count, and the first two of them in"
                + " input order are compared. Exact and adjacent agreement compare the two raters' totals over"
                + " criteria: exact = equal totals; adjacent = totals differ by at most 1 point, i.e. one point on one"
                + " criterion (on the mean scale, 1 divided by the number of criteria).");
        if (leftOut[0] > 0) {
            agree.note(leftOut[0] + " response(s) rated by two or more raters are left out: fewer than two of their raters"
                    + " scored every criterion, so no two complete reported scores can be compared.");
        }
        agree.note("The test owner's reported score may instead be an adjudicated or resolved score; these figures"
                + " describe the raters' independent scores before any adjudication.");
        s.table(agree.build());
        s.table(icc.build());
    }

    private static String scopeKey(String scope) {
        if (scope.equals("all")) {
            return "all";
        }
        int space = scope.indexOf(' ');
        return scope.substring(0, space) + "." + Keys.slug(scope.substring(space + 1));
    }

    /** The first and second complete rater's reported score (and total) of one response. */
    private record Pair(String task, String condition, double first, double second, double firstTotal,
            double secondTotal) {
    }

    private static List<Pair> pairs(List<Rating> ratings, ScoreRule rule, int[] leftOut) {
        // response -> rater (input order) -> criterion -> score; response -> criteria rated by anyone
        Map<ResponseKey, Map<String, Map<String, Double>>> byResponse = new LinkedHashMap<>();
        Map<ResponseKey, Rating> first = new LinkedHashMap<>();
        Map<ResponseKey, java.util.Set<String>> criteria = new LinkedHashMap<>();
        for (Rating r : ratings) {
            ResponseKey key = ResponseKey.of(r);
            first.putIfAbsent(key, r);
            byResponse.computeIfAbsent(key, k -> new LinkedHashMap<>()).computeIfAbsent(r.rater(), k -> new LinkedHashMap<>())
                    .putIfAbsent(r.criterion(), r.score());
            criteria.computeIfAbsent(key, k -> new java.util.HashSet<>()).add(r.criterion());
        }
        List<Pair> out = new ArrayList<>();
        for (var e : byResponse.entrySet()) {
            int c = criteria.get(e.getKey()).size();
            List<double[]> complete = new ArrayList<>(); // {reported, total}
            for (Map<String, Double> scores : e.getValue().values()) {
                if (scores.size() == c && complete.size() < 2) {
                    double total = scores.values().stream().mapToDouble(Double::doubleValue).sum();
                    complete.add(new double[] {rule == ScoreRule.SUM ? total : total / c, total});
                }
            }
            if (complete.size() < 2 && e.getValue().size() >= 2) {
                leftOut[0]++;
            }
            if (complete.size() == 2) {
                Rating r = first.get(e.getKey());
                out.add(new Pair(r.task(), r.condition(), complete.get(0)[0], complete.get(1)[0], complete.get(0)[1],
                        complete.get(1)[1]));
            }
        }
        return out;
    }
}
