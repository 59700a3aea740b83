package org.inkgate.analysis.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.data.RatingsReader;
import org.inkgate.analysis.report.Report;
import org.inkgate.analysis.report.Section;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * A parallel-groups study with three conditions, through the real analysis (ratings reader and
 * {@link StudyAnalysis#report}), against R 4.2.2 with car 3.1.1 (Debian):
 * src/test/resources/reference/parallel_groups.R wrote the INVENTED ratings file
 * parallel_groups_ratings.csv (seeded; 36 imagined candidates, one condition each, groups of 14, 12
 * and 10 with unequal spreads) and the values in parallel_groups.txt. Each check names the R call
 * that produced its value. Closed-form statistics to 1e-6 (relative where large); the studentized
 * range p-values and quantiles (R's ptukey/qtukey against our own integration) to 1e-6 as well.
 */
class ParallelGroupsReferenceTest {

    private static final Map<String, Map<String, Double>> R = new HashMap<>();
    private static Map<String, Object> summary;

    @BeforeAll
    static void analyse() throws Exception {
        for (String line : lines("parallel_groups.txt")) {
            String[] w = line.trim().split("\\s+");
            if (w.length < 3 || w[0].equals("version")) {
                continue;
            }
            Map<String, Double> m = new HashMap<>();
            for (int i = 1; i + 1 < w.length; i += 2) {
                m.put(w[i], Double.parseDouble(w[i + 1]));
            }
            R.put(w[0], m);
        }
        List<Rating> ratings;
        try (InputStream in = resource("parallel_groups_ratings.csv")) {
            ratings = RatingsReader.read("parallel_groups_ratings.csv",
                    new InputStreamReader(in, StandardCharsets.UTF_8));
        }
        Report report = StudyAnalysis.report(StudyData.ofRatings(ratings), StudyOptions.DEFAULT.withBaseline("none"));
        Section s = report.sections().stream().filter(x -> x.id().equals("comparison")).findFirst().orElseThrow();
        summary = s.summary();
    }

    private static InputStream resource(String file) {
        return ParallelGroupsReferenceTest.class.getResourceAsStream("/reference/" + file);
    }

    private static List<String> lines(String file) throws IOException {
        try (BufferedReader r = new BufferedReader(new InputStreamReader(resource(file), StandardCharsets.UTF_8))) {
            return r.lines().filter(l -> !l.isBlank()).toList();
        }
    }

    private static double r(String name, String key) {
        return R.get(name).get(key);
    }

    private static double ours(String key) {
        Object v = summary.get("comparison." + key);
        assertTrue(v instanceof Number, "comparison." + key + " in the summary: " + summary);
        return ((Number) v).doubleValue();
    }

    private static void close(double expected, String key) {
        assertEquals(expected, ours(key), 1e-6 * Math.max(1, Math.abs(expected)), key);
    }

    @Test
    void threeParallelGroups_areCompared_notJustDescribed() {
        assertEquals("parallel", summary.get("comparison.design"));
        assertEquals(true, summary.get("comparison.available"), summary.toString());
        assertEquals(3, ((Number) summary.get("comparison.conditions")).intValue());
        // group sizes and means: R's tapply(score, cond, length / mean)
        close(r("groups", "n_none"), "overall.n.none");
        close(r("groups", "n_full"), "overall.n.full");
        close(r("groups", "n_spelling"), "overall.n.spelling");
        close(r("groups", "mean_full"), "overall.mean.full");
    }

    @Test
    void oneWayAnovaAndEffectSizes_matchR() {
        // summary(aov(score ~ cond)); eta^2 and omega^2 from its sums of squares (Hays 1963)
        close(r("anova", "F"), "overall.f");
        close(r("anova", "df1"), "overall.df1");
        close(r("anova", "df2"), "overall.df2");
        close(r("anova", "p"), "overall.p");
        close(r("anova", "etasq"), "overall.eta_squared");
        close(r("anova", "omegasq"), "overall.omega_squared");
    }

    @Test
    void welchAnovaAndVarianceTests_matchR() {
        // oneway.test(score ~ cond, var.equal = FALSE)
        close(r("welch", "F"), "overall.welch_f");
        close(r("welch", "df2"), "overall.welch_df2");
        close(r("welch", "p"), "overall.welch_p");
        // car::leveneTest(score ~ cond, center = mean) and center = median (Brown-Forsythe)
        close(r("levene_mean", "F"), "overall.levene_f");
        close(r("levene_mean", "p"), "overall.levene_p");
        close(r("brown_forsythe", "F"), "overall.brown_forsythe_f");
        close(r("brown_forsythe", "p"), "overall.brown_forsythe_p");
    }

    @Test
    void kruskalWallis_matchesR() {
        // kruskal.test(score ~ cond); epsilon^2 = H / (n - 1) (Tomczak & Tomczak 2014)
        close(r("kruskal", "H"), "overall.kruskal_wallis_h");
        close(r("kruskal", "df"), "overall.kruskal_wallis_df");
        close(r("kruskal", "p"), "overall.kruskal_wallis_p");
        close(r("kruskal", "epsq"), "overall.kruskal_wallis_epsilon_squared");
    }

    @Test
    void tukeyHsdAndGamesHowell_matchR() {
        for (String pair : List.of("full_minus_none", "spelling_minus_none", "spelling_minus_full")) {
            String k = "overall.pairwise." + pair + ".";
            // TukeyHSD(aov(score ~ cond))
            close(r("tukey_" + pair, "diff"), k + "difference");
            close(r("tukey_" + pair, "lower"), k + "tukey_lower");
            close(r("tukey_" + pair, "upper"), k + "tukey_upper");
            close(r("tukey_" + pair, "p"), k + "tukey_p");
            // Games & Howell (1976) by formula with R's ptukey / qtukey
            close(r("games_howell_" + pair, "lower"), k + "games_howell_lower");
            close(r("games_howell_" + pair, "upper"), k + "games_howell_upper");
            close(r("games_howell_" + pair, "df"), k + "games_howell_df");
            close(r("games_howell_" + pair, "p"), k + "games_howell_p");
        }
    }

    @Test
    void unequalVariances_pointToWelchAndGamesHowell() {
        // Brown-Forsythe p 0.041 < 0.05 in R's output: the report reads the heteroscedastic versions
        assertEquals("welch_games_howell", summary.get("comparison.overall.read"), summary.toString());
    }
}
