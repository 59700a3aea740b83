package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Categorical candidate attributes through the real {@code analyse} command: declared with
 * {@code --attribute}, compared like levels (figures against R, see below), refused with how to
 * declare them when undeclared, and usable as Rasch bias columns exactly as the level column is.
 */
class AnalyseAttributesTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        CommandLine cl = new CommandLine(new AnalyseCommand());
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    /**
     * ToothGrowth (Crampton 1947, as in admin-tool/analysis/src/test/resources/reference), the first 10,
     * 8 and 6 guinea-pig pairs of doses 0.5, 1 and 2: pair = candidate, supplement = condition, dose =
     * the attribute (numbers declared as group names); the analysis module's r_attributes.R subset.
     */
    private static Path[] toothGrowth(Path dir) throws Exception {
        List<String> lines = Files.readAllLines(Path.of("../analysis/src/test/resources/reference/ToothGrowth.csv"));
        Map<String, Integer> keep = Map.of("0.5", 10, "1", 8, "2", 6);
        Map<String, Integer> seen = new HashMap<>();
        StringBuilder r = new StringBuilder("candidate,level,form,task,condition,rater,criterion,score\n");
        StringBuilder c = new StringBuilder("candidate,level,dose\n");
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",");
            int pair = seen.merge(f[1] + "/" + f[2], 1, Integer::sum);
            if (pair > keep.get(f[2])) {
                continue;
            }
            String id = "d" + f[2] + "-" + pair;
            r.append(id).append(",,,").append(f[1].equals("OJ") ? "t1" : "t2").append(',').append(f[1])
                    .append(",r1,overall,").append(f[0]).append('\n');
            if (f[1].equals("OJ")) {
                c.append(id).append(",B1,").append(f[2]).append('\n');
            }
        }
        return new Path[] {Files.writeString(dir.resolve("ratings.csv"), r), Files.writeString(dir.resolve("c.csv"), c)};
    }

    @Test
    void analyse_declaredAttribute_groupComparisonsMatchR_smallGroupsFlagged(@TempDir Path dir) throws Exception {
        Path[] in = toothGrowth(dir);
        Path report = dir.resolve("report");
        assertEquals(0, run("--ratings", in[0].toString(), "--candidates", in[1].toString(), "--attribute", "dose",
                "--out", report.toString()), err.toString());
        JsonNode s = new ObjectMapper().readTree(report.resolve("summary.json").toFile());
        // r_attributes.txt (R 4.2.2 aov / oneway.test): anova OJ, welch VC, interaction
        assertEquals(28.8060044288835, s.get("attributes.dose.oj.overall.f").asDouble(), 1e-10);
        assertEquals(38.949879149189, s.get("attributes.dose.vc.overall.welch_f").asDouble(), 1e-10);
        assertEquals(3.6436969619766, s.get("attributes.dose.interaction.overall.f").asDouble(), 1e-10);
        assertEquals(10, s.get("attributes.small_group_threshold").asInt());
        assertEquals("[\"1\",\"2\"]", s.get("attributes.dose.small_groups").toString());
        for (String table : List.of("attribute_dose_groups", "attribute_dose_anova", "attribute_dose_posthoc",
                "attribute_dose_interaction")) {
            assertTrue(Files.exists(report.resolve("tables/" + table + ".csv")), table);
        }
        String html = Files.readString(report.resolve("report.html"));
        assertTrue(html.contains("Candidate background"), "section in the report");
        assertTrue(html.contains("These comparisons are descriptive"));
    }

    @Test
    void analyse_undeclaredTextColumn_refusedWithRowAndHowToDeclare(@TempDir Path dir) throws Exception {
        Path[] in = toothGrowth(dir);
        Path cands = Files.writeString(dir.resolve("c2.csv"), "candidate,level,first_language\nd0.5-1,B1,Polish\n");
        assertEquals(AnalyseCommand.INPUT_REFUSED, run("--ratings", in[0].toString(), "--candidates", cands.toString(),
                "--out", dir.resolve("o").toString()));
        assertTrue(err.toString().contains("first_language"), err.toString());
        assertTrue(err.toString().contains("--attribute first_language"), err.toString());
        assertFalse(Files.exists(dir.resolve("o/report.html")));
        assertEquals(2, run("--ratings", in[0].toString(), "--attribute", "dose", "--out", dir.resolve("o").toString()),
                "--attribute without --candidates is a usage error");
    }

    /**
     * The simulated rating-scale set of the MFRM reference tests (100 candidates, 4 tasks, raters;
     * admin-tool/analysis/src/test/resources/mfrm/reference/reference.R), with tasks t1, t2 under
     * condition "with" and t3, t4 under "without", and an invented first language per candidate:
     * once in the ratings' level column, once as a declared attribute of the candidate table.
     */
    private static Path[] raschInput(Path dir, boolean languageAsLevel) throws Exception {
        List<String> lines;
        try (InputStream in = AnalyseAttributesTest.class.getResourceAsStream("/analysis/ratingscale-2000.csv")) {
            lines = new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().toList();
        }
        String[] languages = {"Polish", "Arabic", "Tagalog"};
        StringBuilder r = new StringBuilder("candidate,level,form,task,condition,rater,criterion,score\n");
        StringBuilder c = new StringBuilder("candidate,level,first_language\n");
        Map<String, String> languageOf = new HashMap<>();
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",");
            String language = languageOf.computeIfAbsent(f[0], k -> {
                String l = languages[languageOf.size() % 3];
                c.append(k).append(",B1,").append(l).append('\n');
                return l;
            });
            String condition = f[1].equals("t1") || f[1].equals("t2") ? "with" : "without";
            r.append(f[0]).append(',').append(languageAsLevel ? language : "").append(",,").append(f[1]).append(',')
                    .append(condition).append(',').append(f[2]).append(",overall,").append(f[3]).append('\n');
        }
        return new Path[] {Files.writeString(dir.resolve("r.csv"), r), Files.writeString(dir.resolve("c.csv"), c)};
    }

    @Test
    void analyse_mfrmBiasConditionByAttribute_equalsTheSamePairWithTheLevelColumn(@TempDir Path dir) throws Exception {
        Path[] asAttribute = raschInput(Files.createDirectories(dir.resolve("a")), false);
        Path[] asLevel = raschInput(Files.createDirectories(dir.resolve("l")), true);
        Path reportA = dir.resolve("ra");
        Path reportL = dir.resolve("rl");
        assertEquals(0, run("--ratings", asAttribute[0].toString(), "--candidates", asAttribute[1].toString(),
                "--attribute", "first_language", "--out", reportA.toString(), "--mfrm-facets", "task,rater",
                "--mfrm-bias", "condition:first_language"), err.toString());
        assertEquals(0, run("--ratings", asLevel[0].toString(), "--out", reportL.toString(), "--mfrm-facets",
                "task,rater", "--mfrm-bias", "condition:level"), err.toString());
        List<String> a = Files.readAllLines(reportA.resolve("tables/mfrm_bias_condition_first_language.csv"));
        List<String> l = Files.readAllLines(reportL.resolve("tables/mfrm_bias_condition_level.csv"));
        assertEquals(7, a.size(), "header + 2 conditions x 3 languages: " + a);
        assertTrue(a.stream().anyMatch(x -> x.contains("Tagalog")), a.toString());
        assertEquals(l.subList(1, l.size()), a.subList(1, a.size()),
                "an attribute is a grouping column exactly like level");
        JsonNode s = new ObjectMapper().readTree(reportA.resolve("summary.json").toFile());
        assertEquals("first_language", s.get("mfrm.bias").get(0).get("second").asText());
        assertEquals(2, run("--ratings", asAttribute[0].toString(), "--candidates", asAttribute[1].toString(),
                "--attribute", "first_language", "--out", dir.resolve("x").toString(), "--mfrm-facets",
                "rater,first_language"), "an attribute is not a facet");
        assertTrue(err.toString().contains("use it in --mfrm-bias"), err.toString());
    }

    @Test
    void analyse_mfrmBiasOnAnAttributeNobodyHas_refusesOnlyTheRaschSection(@TempDir Path dir) throws Exception {
        Path[] in = raschInput(dir, false);
        StringBuilder blank = new StringBuilder("candidate,level,first_language\n");
        Files.readAllLines(in[1]).stream().skip(1).forEach(l -> blank.append(l, 0, l.indexOf(',')).append(",B1,\n"));
        Path cands = Files.writeString(dir.resolve("blank.csv"), blank);
        Path report = dir.resolve("r");
        assertEquals(0, run("--ratings", in[0].toString(), "--candidates", cands.toString(), "--attribute",
                "first_language", "--out", report.toString(), "--mfrm-facets", "task,rater", "--mfrm-bias",
                "condition:first_language"), err.toString());
        JsonNode s = new ObjectMapper().readTree(report.resolve("summary.json").toFile());
        assertFalse(s.get("mfrm.available").asBoolean());
        assertTrue(s.get("mfrm.refusal").toString().contains("gives no 'first_language'"), s.get("mfrm.refusal").toString());
    }
}
