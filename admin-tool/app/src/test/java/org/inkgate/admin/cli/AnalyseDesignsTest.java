package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * The real {@code analyse} command on the designs of issue 20: a parallel-groups ratings file, a
 * three-condition within-candidate file, a file that fits neither, and a declared design the data
 * contradict. The ratings are SIMULATED here (seeded; invented candidates, not demo data): structure
 * and the choice of analyses are checked, the statistics themselves against R elsewhere
 * (analysis module, DesignAnalysesReferenceTest).
 */
public class AnalyseDesignsTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        CommandLine cl = new CommandLine(new AnalyseCommand());
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    private static final String HEADER = "candidate,level,form,task,condition,rater,criterion,score\n";

    /** One candidate's ratings on one task under one condition: 2 raters x 2 criteria, scores 0..6. */
    private static void rate(StringBuilder b, Random rnd, String id, String level, String task, String condition,
            double ability) {
        for (String rater : new String[] {"R1", "R2"}) {
            for (String criterion : new String[] {"content", "language"}) {
                double x = 3 + ability + rnd.nextGaussian() * 0.7 + (rater.equals("R2") ? -0.3 : 0);
                long score = Math.max(0, Math.min(6, Math.round(x)));
                b.append(id).append(',').append(level).append(",,").append(task).append(',').append(condition)
                        .append(',').append(rater).append(',').append(criterion).append(',').append(score).append('\n');
            }
        }
    }

    /** 40 candidates, half under 'none' and half under 'tools', two tasks each; 'tools' adds ~1.5 points. */
    public static String parallelRatings(long seed) {
        Random rnd = new Random(seed);
        StringBuilder b = new StringBuilder(HEADER);
        for (int i = 0; i < 40; i++) {
            String level = i % 4 < 2 ? "B1" : "B2";
            String condition = i % 2 == 0 ? "none" : "tools";
            double ability = rnd.nextGaussian() * 0.8 + (level.equals("B2") ? 0.8 : -0.4)
                    + (condition.equals("tools") ? 1.5 : 0);
            for (String task : new String[] {"letter", "essay"}) {
                rate(b, rnd, "P" + i, level, task, condition, ability);
            }
        }
        return b.toString();
    }

    /** 45 candidates, 15 under each of none / spelling / full (one condition each); 'full' adds ~1.5 points. */
    static String parallelThreeRatings(long seed) {
        Random rnd = new Random(seed);
        StringBuilder b = new StringBuilder(HEADER);
        String[] conditions = {"none", "spelling", "full"};
        for (int i = 0; i < 45; i++) {
            String level = i % 6 < 3 ? "B1" : "B2";
            String condition = conditions[i % 3];
            double ability = rnd.nextGaussian() * 0.8 + (level.equals("B2") ? 0.8 : -0.4)
                    + (condition.equals("full") ? 1.5 : 0);
            for (String task : new String[] {"letter", "essay"}) {
                rate(b, rnd, "T" + i, level, task, condition, ability);
            }
        }
        return b.toString();
    }

    /** 30 candidates, every one under three conditions (one task each, rotated); 'full' adds ~1 point. */
    static String threeConditionRatings(long seed) {
        Random rnd = new Random(seed);
        StringBuilder b = new StringBuilder(HEADER);
        String[] conditions = {"none", "spelling", "full"};
        String[] tasks = {"letter", "essay", "report"};
        for (int i = 0; i < 30; i++) {
            String level = i % 2 == 0 ? "B1" : "B2";
            double ability = rnd.nextGaussian() * 0.8 + (level.equals("B2") ? 0.5 : -0.5);
            for (int j = 0; j < 3; j++) {
                String condition = conditions[j];
                double effect = condition.equals("full") ? 1.0 : condition.equals("spelling") ? 0.3 : 0;
                rate(b, rnd, "W" + i, level, tasks[(i + j) % 3], condition, ability + effect);
            }
        }
        return b.toString();
    }

    private JsonNode summary(Path outDir) throws Exception {
        return new ObjectMapper().readTree(outDir.resolve("summary.json").toFile());
    }

    @Test
    void analyse_parallelGroups_comparesIndependentGroupsAndAdjustsForLevel(@TempDir Path dir) throws Exception {
        Path ratings = Files.writeString(dir.resolve("ratings.csv"), parallelRatings(20261203));
        Path outDir = dir.resolve("report");
        assertEquals(0, run("--ratings", ratings.toString(), "--out", outDir.toString(), "--baseline", "none",
                "--mfrm-facets", "task,condition,rater,criterion", "--mfrm-bias", "condition:rater"), err.toString());
        JsonNode s = summary(outDir);
        assertEquals("parallel", s.get("comparison.design").asText());
        assertTrue(s.get("comparison.available").asBoolean());
        assertEquals(20, s.get("comparison.overall.baseline_n").asInt());
        assertEquals(20, s.get("comparison.overall.other_n").asInt());
        assertTrue(s.get("comparison.overall.welch_p").asDouble() < 0.05, "planted effect found: " + s);
        assertTrue(s.get("comparison.overall.difference").asDouble() > 0, "tools minus none");
        assertTrue(s.has("comparison.overall.mann_whitney_u"));
        assertTrue(s.has("comparison.overall.hedges_g_lower"));
        assertEquals("level_factor", s.get("comparison.adjusted.adjustment").asText());
        assertTrue(s.get("comparison.adjusted.p").asDouble() < 0.05);
        assertTrue(Files.exists(outDir.resolve("tables/comparison_independent.csv")));
        assertTrue(Files.exists(outDir.resolve("tables/comparison_adjusted.csv")));
        assertFalse(Files.exists(outDir.resolve("tables/comparison_paired.csv")));
        String html = Files.readString(outDir.resolve("report.html"));
        assertTrue(html.contains("parallel-groups design"), "the report says why");
        // the Rasch section runs, with condition describing candidates rather than crossed with them
        assertTrue(s.get("mfrm.available").asBoolean(), html);
        assertEquals("describes candidates", s.get("mfrm.condition_treatment").asText());
        assertTrue(s.get("mfrm.condition_groups.welch_p").asDouble() < 0.05, "the groups differ in measure too");
        assertTrue(Files.exists(outDir.resolve("tables/mfrm_condition_groups.csv")));
    }

    @Test
    void analyse_threeParallelGroups_anovaWelchKruskalWallisAndPairwise(@TempDir Path dir) throws Exception {
        Path ratings = Files.writeString(dir.resolve("ratings.csv"), parallelThreeRatings(20261205));
        Path outDir = dir.resolve("report");
        assertEquals(0, run("--ratings", ratings.toString(), "--out", outDir.toString(), "--baseline", "none",
                "--mfrm-facets", "task,condition,rater,criterion"), err.toString());
        JsonNode s = summary(outDir);
        assertEquals("parallel", s.get("comparison.design").asText());
        assertTrue(s.get("comparison.available").asBoolean(), s.toString());
        assertEquals(3, s.get("comparison.conditions").asInt());
        assertEquals(15, s.get("comparison.overall.n.spelling").asInt());
        assertTrue(s.get("comparison.overall.p").asDouble() < 0.05, "planted effect found: " + s);
        for (String key : new String[] {"eta_squared", "omega_squared", "welch_p", "levene_p", "brown_forsythe_p",
                "kruskal_wallis_p", "kruskal_wallis_epsilon_squared", "read"}) {
            assertTrue(s.has("comparison.overall." + key), key);
        }
        assertTrue(s.has("comparison.content.p_holm"), "Holm across criteria");
        assertTrue(s.get("comparison.overall.pairwise.full_minus_none.tukey_p").asDouble() < 0.05, s.toString());
        assertTrue(s.has("comparison.overall.pairwise.spelling_minus_full.games_howell_p"));
        for (String table : new String[] {"comparison_groups", "comparison_groups_pairwise"}) {
            assertTrue(Files.exists(outDir.resolve("tables/" + table + ".csv")), table);
        }
        assertFalse(Files.exists(outDir.resolve("tables/comparison_independent.csv")));
        String header = Files.readAllLines(outDir.resolve("tables/comparison_groups.csv")).get(0);
        assertTrue(header.contains("mean_condition_1") && header.contains("kruskal_wallis_p_holm"), header);
        String html = Files.readString(outDir.resolve("report.html"));
        assertTrue(html.contains("Scores of 3 condition groups"), "the section says what it compares");
        assertTrue(html.contains("regulations decide"), "small or unequal groups defer to the test owner's regulations");
        assertFalse(html.contains("not part of this report yet"));
        // the Rasch section takes the three conditions as describing candidates, not as a crossed facet
        assertTrue(s.get("mfrm.available").asBoolean(), html);
        assertEquals("describes candidates", s.get("mfrm.condition_treatment").asText());
        assertTrue(s.get("mfrm.condition_groups.welch_anova_p").asDouble() < 0.05, "the groups differ in measure too");
    }

    @Test
    void analyse_threeConditions_repeatedMeasuresWithPairwiseFriedmanAndMixed(@TempDir Path dir) throws Exception {
        Path ratings = Files.writeString(dir.resolve("ratings.csv"), threeConditionRatings(20261204));
        Path outDir = dir.resolve("report");
        assertEquals(0, run("--ratings", ratings.toString(), "--out", outDir.toString(), "--design", "within",
                "--mfrm-facets", "task,condition,rater,criterion", "--mfrm-bias", "condition:level"), err.toString());
        JsonNode s = summary(outDir);
        assertEquals("within", s.get("comparison.design").asText());
        assertTrue(s.get("comparison.available").asBoolean());
        assertEquals(30, s.get("comparison.overall.candidates").asInt());
        assertTrue(s.get("comparison.overall.p").asDouble() < 0.05, "planted effect found");
        assertTrue(s.has("comparison.overall.mauchly_p"));
        assertTrue(s.has("comparison.overall.friedman_p"));
        // conditions in alphabetical order (full, none, spelling): each pair is the later minus the earlier
        assertTrue(s.get("comparison.pairwise.none_minus_full.p_holm").asDouble() < 0.05, s.toString());
        assertTrue(s.get("comparison.mixed.available").asBoolean());
        assertTrue(s.has("comparison.mixed.interaction.p"));
        for (String table : new String[] {"comparison_repeated", "comparison_pairwise", "comparison_mixed",
                "comparison_linear_mixed_model", "comparison_variance_components"}) {
            assertTrue(Files.exists(outDir.resolve("tables/" + table + ".csv")), table);
        }
        // the linear mixed model on every rating finds the same difference (Wald interval excludes 0)
        assertTrue(s.get("comparison.linear_mixed_model.available").asBoolean());
        double lower = s.get("comparison.linear_mixed_model.overall.none_minus_full.ci_lower").asDouble();
        double upper = s.get("comparison.linear_mixed_model.overall.none_minus_full.ci_upper").asDouble();
        assertTrue(lower > 0 || upper < 0, "none minus full: " + lower + " to " + upper);
        assertTrue(s.has("comparison.linear_mixed_model.overall.variance_rater"));
        assertTrue(s.get("mfrm.available").asBoolean());
        assertEquals("crossed facet", s.get("mfrm.condition_treatment").asText());
    }

    @Test
    void analyse_candidateUnderTwoOfThreeConditions_isReportedNotAnalysed(@TempDir Path dir) throws Exception {
        String text = parallelRatings(7) + "P0,B1,,report,tools,R1,content,4\n";
        Path ratings = Files.writeString(dir.resolve("ratings.csv"), text);
        Path outDir = dir.resolve("report");
        assertEquals(0, run("--ratings", ratings.toString(), "--out", outDir.toString()), err.toString());
        JsonNode s = summary(outDir);
        assertFalse(s.get("comparison.available").asBoolean());
        assertEquals("not fitting", s.get("comparison.design").asText());
        assertEquals("P0", s.get("comparison.design_misfits").asText());
        assertFalse(Files.exists(outDir.resolve("tables/comparison_independent.csv")));
        assertFalse(Files.exists(outDir.resolve("tables/comparison_paired.csv")));
    }

    @Test
    void analyse_declaredParallelOnWithinData_reportsTheMismatch(@TempDir Path dir) throws Exception {
        Path ratings = Files.writeString(dir.resolve("ratings.csv"), threeConditionRatings(3));
        Path outDir = dir.resolve("report");
        assertEquals(0, run("--ratings", ratings.toString(), "--out", outDir.toString(), "--design", "parallel"),
                err.toString());
        JsonNode s = summary(outDir);
        assertFalse(s.get("comparison.available").asBoolean());
        assertTrue(s.get("comparison.design_mismatch").asBoolean());
        assertEquals("within", s.get("comparison.design_found").asText());
        assertTrue(Files.readString(outDir.resolve("report.html")).contains("The design was declared parallel"));
    }

    @Test
    void analyse_unknownDesignWord_isRefusedWithTheChoices(@TempDir Path dir) throws Exception {
        Path ratings = Files.writeString(dir.resolve("ratings.csv"), parallelRatings(1));
        assertEquals(AnalyseCommand.INPUT_REFUSED, run("--ratings", ratings.toString(), "--out",
                dir.resolve("r").toString(), "--design", "crossover"));
        assertTrue(err.toString().contains("give within"), err.toString());
    }

    @Test
    void analyse_preTestColumn_isTheCovariate_andAnUnknownColumnIsRefused(@TempDir Path dir) throws Exception {
        Path ratings = Files.writeString(dir.resolve("ratings.csv"), parallelRatings(5));
        StringBuilder c = new StringBuilder("candidate,level,placement\n");
        for (int i = 0; i < 40; i++) {
            c.append('P').append(i).append(',').append(i % 4 < 2 ? "B1" : "B2").append(',').append(40 + i % 7)
                    .append('\n');
        }
        Path cands = Files.writeString(dir.resolve("candidates.csv"), c.toString());
        Path outDir = dir.resolve("report");
        assertEquals(0, run("--ratings", ratings.toString(), "--candidates", cands.toString(), "--pre-test",
                "placement", "--out", outDir.toString()), err.toString());
        assertEquals("pre_test", summary(outDir).get("comparison.adjusted.adjustment").asText());
        assertEquals(AnalyseCommand.INPUT_REFUSED, run("--ratings", ratings.toString(), "--candidates",
                cands.toString(), "--pre-test", "placment", "--out", dir.resolve("r2").toString()));
        assertTrue(err.toString().contains("--pre-test placment is not a numeric column"), err.toString());
        assertFalse(Files.exists(dir.resolve("r2")));
    }
}
