package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.data.ResponseKey;
import org.inkgate.analysis.raters.Agreement;
import org.inkgate.analysis.raters.Correlation;
import org.inkgate.analysis.raters.Icc;
import org.inkgate.analysis.raters.Kappa;
import org.inkgate.analysis.raters.Krippendorff;
import org.inkgate.analysis.report.Chart;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;

/**
 * Rater agreement on double-rated responses: the first and second rating of each response and
 * criterion (in input order), per criterion and pooled.
 */
final class RatersSection {

    /** Chart points are capped so the report stays small; the tables use every pair. */
    static final int SCATTER_POINTS = 2000;

    private RatersSection() {
    }

    static Section build(List<Rating> ratings, StudyOptions options) {
        Section.Builder s = Section.builder("raters", "Raters");
        // index responses, criteria and raters once; a unit (response x criterion) is then an array slot
        Map<ResponseKey, Integer> responseId = new HashMap<>();
        Map<String, Integer> criterionId = new HashMap<>();
        Map<String, Integer> raterId = new HashMap<>();
        List<String> criterionNames = new ArrayList<>(), raterNames = new ArrayList<>();
        int n = ratings.size();
        int[] unitOf = new int[n], raterOf = new int[n];
        int[] respOf = new int[n], critOf = new int[n];
        Rating previous = null;
        for (int i = 0; i < n; i++) {
            Rating r = ratings.get(i);
            // ratings of one response are usually neighbours: reuse the previous row's id then
            if (previous != null && previous.candidate().equals(r.candidate()) && previous.task().equals(r.task())) {
                respOf[i] = respOf[i - 1];
            } else {
                respOf[i] = responseId.computeIfAbsent(ResponseKey.of(r), k -> responseId.size());
            }
            previous = r;
            critOf[i] = criterionId.computeIfAbsent(r.criterion(), k -> {
                criterionNames.add(k);
                return criterionNames.size() - 1;
            });
            raterOf[i] = raterId.computeIfAbsent(r.rater(), k -> {
                raterNames.add(k);
                return raterNames.size() - 1;
            });
        }
        int nc = criterionNames.size(), nr = raterNames.size(), nResp = responseId.size();
        int nUnits = nResp * nc;
        int[] count = new int[nUnits];
        for (int i = 0; i < n; i++) {
            unitOf[i] = respOf[i] * nc + critOf[i];
            count[unitOf[i]]++;
        }
        int[] start = new int[nUnits + 1];
        for (int u = 0; u < nUnits; u++) {
            start[u + 1] = start[u] + count[u];
        }
        int[] fill = start.clone();
        double[] value = new double[n];
        int[] valueRater = new int[n];
        for (int i = 0; i < n; i++) {
            int at = fill[unitOf[i]]++; // input order kept within a unit: first and second rating
            value[at] = ratings.get(i).score();
            valueRater[at] = raterOf[i];
        }
        Map<String, List<double[]>> pairsByCriterion = new TreeMap<>();
        Map<String, List<double[]>> valuesByCriterion = new TreeMap<>();
        double[][] responseMeans = new double[nResp][3]; // {sum first, sum second, criteria paired}
        long[][] perRaterCounts = new long[nr][3]; // {ratings, paired, discrepant}
        double[] raterTotal = new double[nr];
        for (int u = 0; u < nUnits; u++) {
            int m = count[u];
            if (m == 0) {
                continue;
            }
            String criterion = criterionNames.get(u % nc);
            double[] vals = java.util.Arrays.copyOfRange(value, start[u], start[u] + m);
            valuesByCriterion.computeIfAbsent(criterion, k -> new ArrayList<>()).add(vals);
            for (int j = start[u]; j < start[u] + m; j++) {
                perRaterCounts[valueRater[j]][0]++;
                raterTotal[valueRater[j]] += value[j];
            }
            if (m >= 2) {
                double a = value[start[u]], b = value[start[u] + 1];
                pairsByCriterion.computeIfAbsent(criterion, k -> new ArrayList<>()).add(new double[] {a, b});
                long discrepant = Math.abs(a - b) > 1 ? 1 : 0;
                for (int j = start[u]; j < start[u] + 2; j++) {
                    perRaterCounts[valueRater[j]][1]++;
                    perRaterCounts[valueRater[j]][2] += discrepant;
                }
                double[] rm = responseMeans[u / nc];
                rm[0] += a;
                rm[1] += b;
                rm[2]++;
            }
        }
        Map<String, long[]> perRater = new HashMap<>();
        Map<String, Double> raterSum = new HashMap<>();
        for (int r = 0; r < nr; r++) {
            perRater.put(raterNames.get(r), perRaterCounts[r]);
            raterSum.put(raterNames.get(r), raterTotal[r]);
        }
        long pairs = pairsByCriterion.values().stream().mapToLong(List::size).sum();
        s.put("pairs", pairs);
        if (pairs == 0) {
            s.paragraph("No response has two ratings of the same criterion: rater agreement cannot be estimated.");
            s.put("available", false);
            return s.build();
        }
        s.paragraph("For every response and criterion rated at least twice, the first two ratings in input order are"
                + " compared as 'first' and 'second' rating. Raters usually differ between responses, so the"
                + " one-way ICC (ICC1, Shrout-Fleiss case 1) fits the design; the two-way forms treat 'first' and"
                + " 'second' as fixed judges. Krippendorff's alpha uses every rating of every unit.");
        s.paragraph("Each figure names its level: 'criterion' (the ratings of one criterion), 'pooled criterion"
                + " ratings' (the criterion rating pairs of every criterion taken together), or 'reported score' (each"
                + " rater's score of a whole response under the score rule, the score a test owner reports).");
        Table.Builder agree = Table.builder("raters_agreement", "Agreement between first and second rating")
                .method("Pearson r (Fisher-z CI), Spearman rho, exact and adjacent (|difference| <= 1) agreement,"
                        + " Cohen's kappa unweighted, linear and quadratic weighted with large-sample SEs and 95% CIs",
                        "Cohen 1960, 1968; Fleiss, Cohen & Everitt 1969")
                .columns("level", "criterion", "pairs", "Pearson r", "r lower", "r upper", "Spearman rho", "exact", "adjacent",
                        "kappa", "kappa SE", "kappa lower", "kappa upper", "linear kappa", "linear SE",
                        "quadratic kappa", "quadratic SE");
        Table.Builder icc = Table.builder("raters_icc", "Intraclass correlations (first and second rating)")
                .method("ICC in the six Shrout-Fleiss forms with F-based 95% CIs", "Shrout & Fleiss 1979; McGraw & Wong 1996")
                .columns("level", "criterion", "form", "description", "ICC", "lower", "upper", "F", "df1", "df2", "p");
        Table.Builder kripp = Table.builder("raters_krippendorff", "Krippendorff's alpha (all ratings)")
                .method("coincidence-matrix alpha, ordinal and interval metrics", "Krippendorff 2011")
                .columns("level", "criterion", "pairable units", "ordinal alpha", "interval alpha");
        List<String> criteria = new ArrayList<>(pairsByCriterion.keySet());
        List<double[]> pooled = new ArrayList<>();
        pairsByCriterion.values().forEach(pooled::addAll);
        List<double[]> pooledValues = new ArrayList<>();
        valuesByCriterion.values().forEach(pooledValues::addAll);
        criteria.add("all criteria");
        for (String criterion : criteria) {
            boolean all = criterion.equals("all criteria");
            String level = all ? "pooled criterion ratings" : "criterion";
            List<double[]> p = all ? pooled : pairsByCriterion.get(criterion);
            double[] x = new double[p.size()], y = new double[p.size()];
            for (int i = 0; i < x.length; i++) {
                x[i] = p.get(i)[0];
                y[i] = p.get(i)[1];
            }
            Correlation pr = Correlation.pearson(x, y);
            Correlation sp = Correlation.spearman(x, y);
            Agreement ag = Agreement.of(x, y);
            Kappa k0 = Kappa.of(x, y, Kappa.Weights.UNWEIGHTED);
            Kappa k1 = Kappa.of(x, y, Kappa.Weights.LINEAR);
            Kappa k2 = Kappa.of(x, y, Kappa.Weights.QUADRATIC);
            agree.row(level, criterion, (long) x.length, pr.r(), pr.lower(), pr.upper(), sp.r(), ag.exact(), ag.adjacent(),
                    k0.kappa(), k0.se(), k0.lower(), k0.upper(), k1.kappa(), k1.se(), k2.kappa(), k2.se());
            pr.cautions().forEach(c -> agree.note(criterion + ": " + c));
            k0.cautions().forEach(c -> agree.note(criterion + ": " + c));
            String key = Keys.slug(criterion.equals("all criteria") ? "all" : criterion) + ".";
            s.put(key + "pairs", x.length).put(key + "pearson_r", pr.r()).put(key + "spearman_rho", sp.r())
                    .put(key + "exact_agreement", ag.exact()).put(key + "adjacent_agreement", ag.adjacent())
                    .put(key + "kappa", k0.kappa()).put(key + "kappa_se", k0.se())
                    .put(key + "kappa_linear", k1.kappa()).put(key + "kappa_linear_se", k1.se())
                    .put(key + "kappa_quadratic", k2.kappa()).put(key + "kappa_quadratic_se", k2.se());
            double[][] table = new double[x.length][];
            for (int i = 0; i < x.length; i++) {
                table[i] = new double[] {x[i], y[i]};
            }
            Icc ic = Icc.of(table, 0.95);
            for (Icc.Form f : ic.forms()) {
                icc.row(level, criterion, f.name(), f.description(), f.value(), f.lower(), f.upper(), f.f(), f.df1(), f.df2(),
                        f.p());
                s.put(key + Keys.slug(f.name()), f.value()).put(key + Keys.slug(f.name()) + "_lower", f.lower())
                        .put(key + Keys.slug(f.name()) + "_upper", f.upper());
            }
            ic.cautions().forEach(c -> icc.note(criterion + ": " + c));
            List<double[]> vals = all ? pooledValues : valuesByCriterion.get(criterion);
            Krippendorff.Result ord = Krippendorff.alpha(vals, Krippendorff.Metric.ORDINAL);
            Krippendorff.Result itv = Krippendorff.alpha(vals, Krippendorff.Metric.INTERVAL);
            kripp.row(level, criterion, (long) ord.units(), ord.alpha(), itv.alpha());
            ord.cautions().forEach(c -> kripp.note(criterion + ": " + c));
            s.put(key + "krippendorff_ordinal", ord.alpha()).put(key + "krippendorff_interval", itv.alpha());
        }
        agree.note("Kappa categories are the distinct scores observed; weights use their rank order.");
        agree.note("'all criteria' pools the pairs of every criterion; criteria with different scales make it hard to read.");
        s.table(agree.build());
        s.table(icc.build());
        kripp.note("'all criteria' pools units of every criterion (each response-criterion is one unit).");
        s.table(kripp.build());
        ReportedScoreAgreement.addTo(s, ratings, options.scoreRule());
        Table.Builder raters = Table.builder("raters_individual", "Raters")
                .method("per rater: number of ratings, mean score, share of their paired ratings that differ from the"
                        + " other rating by more than 1 point (discrepant; common practice)", "")
                .columns("rater", "ratings", "mean score", "paired ratings", "discrepant", "share discrepant");
        new TreeMap<>(perRater).forEach((r, c) -> {
            raters.row(r, c[0], raterSum.get(r) / c[0], c[1], c[2], c[1] == 0 ? Double.NaN : (double) c[2] / c[1]);
            s.put("rater." + Keys.slug(r) + ".mean", raterSum.get(r) / c[0])
                    .put("rater." + Keys.slug(r) + ".share_discrepant", c[1] == 0 ? null : (double) c[2] / c[1]);
        });
        s.table(raters.build());
        // scatter: response means of first vs second rating, every k-th response to cap the points
        List<double[]> paired = new ArrayList<>();
        for (double[] m : responseMeans) {
            if (m[2] > 0) {
                paired.add(m);
            }
        }
        int np = paired.size();
        int step = Math.max(1, (np + SCATTER_POINTS - 1) / SCATTER_POINTS);
        List<double[]> pts = new ArrayList<>();
        for (int i = 0; i < np; i += step) {
            double[] m = paired.get(i);
            pts.add(new double[] {m[0] / m[2], m[1] / m[2]});
        }
        double[] px = pts.stream().mapToDouble(a -> a[0]).toArray();
        double[] py = pts.stream().mapToDouble(a -> a[1]).toArray();
        s.chart(Chart.of("chart_rater_scatter", "First against second rating",
                "Each point is one response: the mean over criteria of its first rating against that of its second."
                        + (step > 1 ? " Every " + step + "th response is drawn (" + pts.size() + " of " + np + ")." : ""),
                Charts.scatter("first rating (mean over criteria)", "second rating (mean over criteria)", px, py), 560,
                480));
        return s.build();
    }
}
