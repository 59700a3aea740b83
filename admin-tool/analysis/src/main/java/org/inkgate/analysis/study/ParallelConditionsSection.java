package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.comparison.Holm;
import org.inkgate.analysis.descriptive.Moments;
import org.inkgate.analysis.descriptive.ShapiroWilk;
import org.inkgate.analysis.groups.Groups;
import org.inkgate.analysis.groups.KruskalWallis;
import org.inkgate.analysis.groups.OneWayAnova;
import org.inkgate.analysis.groups.PairwiseComparisons;
import org.inkgate.analysis.groups.VarianceHomogeneity;
import org.inkgate.analysis.groups.WelchAnova;
import org.inkgate.analysis.report.Chart;
import org.inkgate.analysis.report.Column;
import org.inkgate.analysis.report.PValueText;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.scores.ScoreTable;
import org.jfree.data.statistics.DefaultStatisticalCategoryDataset;

/**
 * Three or more independent condition groups (a parallel-groups design: each candidate under one
 * condition): one-way ANOVA with eta and omega squared, Welch's ANOVA beside it, Levene's and the
 * Brown-Forsythe test of equal variances, the Kruskal-Wallis test, and Tukey HSD and Games-Howell
 * pairwise comparisons, per measure with Holm across criteria. The statistics are the ones the
 * proficiency-group comparisons use ({@link GroupComparisons}), from {@code analysis.groups}.
 */
final class ParallelConditionsSection {

    /**
     * Largest over smallest group above this: group sizes count as unequal, and the report reads the
     * heteroscedastic versions whatever the variance test says (a rule of thumb: common practice).
     */
    static final double UNEQUAL_SIZES = 1.5;
    /** Groups smaller than this: the tests of normality and variance have little power (common practice). */
    static final int SMALL_GROUP = 10;

    private ParallelConditionsSection() {
    }

    private static List<Column> columns(List<String> conditions) {
        List<Column> c = new ArrayList<>(List.of(Column.of("measure")));
        for (int j = 0; j < conditions.size(); j++) {
            c.add(Column.of("n " + conditions.get(j), "n_condition_" + (j + 1)));
            c.add(Column.of("mean " + conditions.get(j), "mean_condition_" + (j + 1)));
            c.add(Column.of("SD " + conditions.get(j), "sd_condition_" + (j + 1)));
        }
        for (String label : List.of("F", "df1", "df2", "p", "p (Holm)", "eta squared", "omega squared", "Welch F",
                "Welch df1", "Welch df2", "Welch p", "Welch p (Holm)", "Levene F", "Levene p", "Brown-Forsythe F",
                "Brown-Forsythe p", "Kruskal-Wallis H", "Kruskal-Wallis df", "Kruskal-Wallis p",
                "Kruskal-Wallis p (Holm)", "epsilon squared", "normality in groups", "read")) {
            c.add(Column.of(label));
        }
        return c;
    }

    static void build(Section.Builder s, ScoreTable scores, StudyOptions options, List<String> conditions) {
        int k = conditions.size();
        s.paragraph("Each candidate wrote under one of " + k + " conditions, so the " + k + " groups of candidates"
                + " are compared as independent samples. The one-way ANOVA assumes normal scores with equal variances"
                + " in every group; Welch's ANOVA beside it does not assume equal variances, and Levene's and the"
                + " Brown-Forsythe tests check them. The Kruskal-Wallis test compares the groups' ranks and does not"
                + " assume normality. Which conditions differ is read from the pairwise table: Tukey HSD when the"
                + " variances are alike, Games-Howell when they are not; both hold the family-wise error rate over"
                + " all pairs. Criterion p-values are adjusted by Holm's method across criteria (the overall row is"
                + " not part of that family).");
        s.paragraph("The groups are not adjusted for level here (the level-adjusted comparison is made for two"
                + " groups only): random allocation balances levels only on average, so compare the groups' levels"
                + " before reading a difference as the conditions' effect. With small or unequal groups these tests"
                + " can mislead; the notes under the tables say where, and the test owner's regulations decide"
                + " what a study of this size may conclude.");
        Table.Builder t = Table.builder("comparison_groups", "Parallel groups: " + k + " conditions")
                .method("one-way ANOVA with eta squared and omega squared; Welch's ANOVA; Levene's test (centre ="
                        + " mean) and Brown-Forsythe (centre = median); Kruskal-Wallis test (tie-corrected, chi-square)"
                        + " with epsilon squared; Shapiro-Wilk per group; Holm adjustment across criteria",
                        "Fisher 1925; Hays 1963; Welch 1951; Levene 1960; Brown & Forsythe 1974; Kruskal & Wallis"
                                + " 1952; Tomczak & Tomczak 2014; Holm 1979")
                .columns(columns(conditions));
        Table.Builder post = Table.builder("comparison_groups_pairwise", "Pairwise comparisons of the condition groups")
                .method("Tukey HSD (Tukey-Kramer SE for unequal n) and Games-Howell, p and 95% family-wise CIs from"
                        + " the studentized range distribution", "Tukey 1953; Kramer 1956; Games & Howell 1976")
                .columns(Column.of("measure"), Column.of("second"), Column.of("first"), Column.of("n second"),
                        Column.of("n first"), Column.of("difference"), Column.of("Tukey lower"),
                        Column.of("Tukey upper"), Column.of("Tukey p"), Column.of("Games-Howell lower"),
                        Column.of("Games-Howell upper"), Column.of("Games-Howell df"), Column.of("Games-Howell p"),
                        Column.of("read"));
        List<String> measures = new ArrayList<>();
        measures.add(null);
        measures.addAll(scores.criteria());
        int m = measures.size();
        double[][] criterionP = new double[3][m - 1]; // ANOVA, Welch, Kruskal-Wallis
        List<Object[]> rows = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        boolean anyUnequalSizes = false;
        int smallest = Integer.MAX_VALUE;
        for (int i = 0; i < m; i++) {
            String measure = measures.get(i) == null ? "overall" : measures.get(i);
            String key = Keys.slug(measure) + ".";
            Groups groups = groups(scores, conditions, measures.get(i));
            OneWayAnova a = OneWayAnova.of(groups);
            WelchAnova w = WelchAnova.of(groups);
            OneWayAnova levene = VarianceHomogeneity.test(groups, VarianceHomogeneity.Centre.MEAN);
            OneWayAnova bf = VarianceHomogeneity.test(groups, VarianceHomogeneity.Centre.MEDIAN);
            KruskalWallis kw = KruskalWallis.of(groups);
            int[] sizes = groups.values().stream().mapToInt(v -> v.length).toArray();
            int min = Arrays.stream(sizes).min().orElse(0), max = Arrays.stream(sizes).max().orElse(0);
            smallest = Math.min(smallest, min);
            boolean unequalSizes = min > 0 && (double) max / min > UNEQUAL_SIZES;
            anyUnequalSizes |= unequalSizes;
            boolean unequalVariances = bf.p() < options.alpha();
            boolean heteroscedastic = unequalVariances || unequalSizes;
            List<String> notNormal = new ArrayList<>();
            for (int g = 0; g < k; g++) {
                ShapiroWilk.Result r = ShapiroWilk.test(groups.values().get(g));
                if (!Double.isNaN(r.p()) && r.rejects(options.alpha())) {
                    notNormal.add("'" + conditions.get(g) + "' (SW p " + PValueText.of(r.p()) + ")");
                }
            }
            String read = (heteroscedastic ? "Welch / Games-Howell" : "ANOVA / Tukey")
                    + (unequalVariances ? " (variances differ)" : unequalSizes ? " (group sizes differ)" : "")
                    + (notNormal.isEmpty() ? "" : "; compare Kruskal-Wallis");
            List<Object> row = new ArrayList<>(List.of(measure));
            for (int g = 0; g < k; g++) {
                double[] v = groups.values().get(g);
                row.add((long) v.length);
                row.add(v.length > 0 ? Moments.mean(v) : Double.NaN);
                row.add(v.length > 1 ? Math.sqrt(Moments.variance(v)) : Double.NaN);
                String c = Keys.slug(conditions.get(g));
                s.put(key + "n." + c, v.length).put(key + "mean." + c, v.length > 0 ? Moments.mean(v) : Double.NaN)
                        .put(key + "sd." + c, v.length > 1 ? Math.sqrt(Moments.variance(v)) : Double.NaN);
            }
            row.addAll(Arrays.asList(a.f(), a.dfBetween(), a.dfWithin(), a.p(), null, a.etaSquared(),
                    a.omegaSquared(), w.f(), w.df1(), w.df2(), w.p(), null, levene.f(), levene.p(), bf.f(), bf.p(),
                    kw.h(), kw.df(), kw.p(), null, kw.epsilonSquared(),
                    notNormal.isEmpty() ? "no departure found" : "not normal in " + String.join(", ", notNormal), read));
            rows.add(row.toArray());
            s.put(key + "f", a.f()).put(key + "df1", a.dfBetween()).put(key + "df2", a.dfWithin()).put(key + "p", a.p())
                    .put(key + "eta_squared", a.etaSquared()).put(key + "omega_squared", a.omegaSquared())
                    .put(key + "welch_f", w.f()).put(key + "welch_df1", w.df1()).put(key + "welch_df2", w.df2())
                    .put(key + "welch_p", w.p()).put(key + "levene_f", levene.f()).put(key + "levene_p", levene.p())
                    .put(key + "brown_forsythe_f", bf.f()).put(key + "brown_forsythe_p", bf.p())
                    .put(key + "kruskal_wallis_h", kw.h()).put(key + "kruskal_wallis_df", kw.df())
                    .put(key + "kruskal_wallis_p", kw.p()).put(key + "kruskal_wallis_epsilon_squared", kw.epsilonSquared())
                    .put(key + "unequal_variances", unequalVariances).put(key + "unequal_group_sizes", unequalSizes)
                    .put(key + "normality_doubtful", !notNormal.isEmpty())
                    .put(key + "read", heteroscedastic ? "welch_games_howell" : "anova_tukey");
            if (i > 0) {
                criterionP[0][i - 1] = a.p();
                criterionP[1][i - 1] = w.p();
                criterionP[2][i - 1] = kw.p();
            }
            a.cautions().forEach(x -> notes.add(measure + ": " + x));
            w.cautions().forEach(x -> notes.add(measure + ", Welch: " + x));
            kw.cautions().forEach(x -> notes.add(measure + ", Kruskal-Wallis: " + x));
            if (unequalVariances) {
                notes.add(measure + ": the Brown-Forsythe test finds unequal variances (p " + PValueText.of(bf.p())
                        + "): the ANOVA F and Tukey's intervals assume them equal; read Welch's ANOVA and"
                        + " Games-Howell");
            }
            pairwise(s, post, key, measure, groups, heteroscedastic);
        }
        holm(s, rows, measures, criterionP, k);
        rows.forEach(t::row);
        notes.forEach(t::note);
        if (anyUnequalSizes) {
            t.note("Group sizes differ by more than " + UNEQUAL_SIZES + " to 1 (largest over smallest): the ANOVA F"
                    + " and Tukey HSD are then sensitive to unequal variances even when the variance tests do not"
                    + " find them, so the report reads Welch's ANOVA and Games-Howell (common practice).");
        }
        if (smallest < SMALL_GROUP) {
            t.note("A group has fewer than " + SMALL_GROUP + " candidates: the tests of normality and of equal"
                    + " variances have little power, so 'no departure found' does not show the assumptions hold,"
                    + " and a non-significant difference is weak evidence of no effect. Whether a study of this"
                    + " size may support a conclusion is for the test owner's regulations.");
        }
        t.note("Eta squared overstates the effect in the population; omega squared corrects for that and can be"
                + " negative (read as none). Epsilon squared is the Kruskal-Wallis effect size, H / (n - 1).");
        post.note("Differences are the second condition minus the first. Tukey HSD pools the groups' variances;"
                + " Games-Howell uses each pair's own variances with Welch's degrees of freedom. Studentized-range"
                + " p-values are computed to about 1e-9; smaller ones are shown as 0.");
        s.put("conditions", k).put("unequal_group_sizes", anyUnequalSizes).put("smallest_group", smallest);
        s.table(t.build());
        s.table(post.build());
        s.chart(chart(scores, conditions));
    }

    /** The candidates' scores per condition, in the report's condition order. */
    private static Groups groups(ScoreTable scores, List<String> conditions, String criterion) {
        Map<String, double[]> map = new LinkedHashMap<>();
        for (String c : conditions) {
            map.put(c, Keys.values(scores.candidateScores(c, criterion).values()));
        }
        return Groups.of(map);
    }

    private static void pairwise(Section.Builder s, Table.Builder post, String key, String measure, Groups groups,
            boolean heteroscedastic) {
        List<PairwiseComparisons.Comparison> tukey = PairwiseComparisons.compare(groups,
                PairwiseComparisons.Method.TUKEY_HSD, 0.95);
        List<PairwiseComparisons.Comparison> gamesHowell = PairwiseComparisons.compare(groups,
                PairwiseComparisons.Method.GAMES_HOWELL, 0.95);
        for (PairwiseComparisons.Comparison c : tukey) {
            PairwiseComparisons.Comparison h = gamesHowell.stream()
                    .filter(x -> x.groupA().equals(c.groupA()) && x.groupB().equals(c.groupB())).findFirst().orElse(null);
            int nb = size(groups, c.groupB()), na = size(groups, c.groupA());
            post.row(measure, c.groupB(), c.groupA(), (long) nb, (long) na, c.difference(), c.lower(), c.upper(), c.p(),
                    h == null ? null : h.lower(), h == null ? null : h.upper(), h == null ? null : h.df(),
                    h == null ? null : h.p(), heteroscedastic ? "Games-Howell" : "Tukey");
            String pk = key + "pairwise." + Keys.slug(c.groupB()) + "_minus_" + Keys.slug(c.groupA()) + ".";
            s.put(pk + "difference", c.difference()).put(pk + "tukey_lower", c.lower())
                    .put(pk + "tukey_upper", c.upper()).put(pk + "tukey_p", c.p());
            if (h != null) {
                s.put(pk + "games_howell_lower", h.lower()).put(pk + "games_howell_upper", h.upper())
                        .put(pk + "games_howell_df", h.df()).put(pk + "games_howell_p", h.p());
            }
        }
    }

    private static int size(Groups groups, String label) {
        return groups.values().get(groups.labels().indexOf(label)).length;
    }

    /** Holm across criteria for the ANOVA, Welch and Kruskal-Wallis p-values (the overall row stays out). */
    private static void holm(Section.Builder s, List<Object[]> rows, List<String> measures, double[][] p, int k) {
        if (measures.size() < 2) {
            return;
        }
        double[] anova = Holm.adjust(p[0]), welch = Holm.adjust(p[1]), kruskal = Holm.adjust(p[2]);
        int first = 1 + 3 * k; // after the measure and n, mean, SD per condition
        for (int i = 1; i < measures.size(); i++) {
            Object[] row = rows.get(i);
            row[first + 4] = anova[i - 1];
            row[first + 11] = welch[i - 1];
            row[first + 19] = kruskal[i - 1];
            String key = Keys.slug(measures.get(i)) + ".";
            s.put(key + "p_holm", anova[i - 1]).put(key + "welch_p_holm", welch[i - 1])
                    .put(key + "kruskal_wallis_p_holm", kruskal[i - 1]);
        }
    }

    private static Chart chart(ScoreTable scores, List<String> conditions) {
        DefaultStatisticalCategoryDataset means = new DefaultStatisticalCategoryDataset();
        for (String c : conditions) {
            double[] v = Keys.values(scores.candidateScores(c, null).values());
            if (v.length > 0) {
                means.add(Moments.mean(v), GroupComparisons.halfWidth(v), "overall score", c);
            }
        }
        return Chart.of("comparison_groups_means", "Mean overall score by condition group",
                "Means with 95% confidence intervals (t-based, per group; not adjusted for the number of groups).",
                Charts.meansWithIntervals("condition", "mean overall score", means), 640, 360);
    }
}
