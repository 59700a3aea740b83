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
import org.inkgate.admin.testutil.AdminCommand;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

class AnalyseCommandTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        CommandLine cl = new CommandLine(new AnalyseCommand());
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    /** Shrout & Fleiss (1979) Table 2: 6 targets x 4 judges, as tidy ratings of one criterion. */
    private static Path shroutFleissRatings(Path dir) throws Exception {
        int[][] t = {{9, 2, 5, 8}, {6, 1, 3, 2}, {8, 4, 6, 8}, {7, 1, 2, 6}, {10, 5, 6, 9}, {6, 2, 4, 7}};
        StringBuilder b = new StringBuilder("candidate,level,form,task,condition,rater,criterion,score\n");
        for (int i = 0; i < 6; i++) {
            for (int j = 0; j < 4; j++) {
                b.append("T").append(i + 1).append(",,,t1,plain,J").append(j + 1).append(",overall,").append(t[i][j])
                        .append('\n');
            }
        }
        Path f = dir.resolve("ratings.csv");
        Files.writeString(f, b.toString());
        return f;
    }

    @Test
    void analyse_shroutFleissRatings_writesReportWithKrippendorffAndRaterTables(@TempDir Path dir) throws Exception {
        Path ratings = shroutFleissRatings(dir);
        Path outDir = dir.resolve("report");
        assertEquals(0, run("--ratings", ratings.toString(), "--out", outDir.toString()), err.toString());
        assertTrue(Files.exists(outDir.resolve("report.html")));
        assertTrue(Files.exists(outDir.resolve("tables/raters_icc.csv")));
        JsonNode s = new ObjectMapper().readTree(outDir.resolve("summary.json").toFile());
        assertEquals(24, s.get("input.ratings").asInt());
        assertEquals(6, s.get("raters.pairs").asInt());
        // one condition: the paired comparison says it cannot run
        assertFalse(s.get("comparison.available").asBoolean());
        assertTrue(out.toString().contains("Report written"));
    }

    @Test
    void analyse_allFourInputs_writeUsageProcessAndSurveySections(@TempDir Path dir) throws Exception {
        // invented rows, structure only (no check values): two conditions, two levels, one tool
        StringBuilder r = new StringBuilder("candidate,level,form,task,condition,rater,criterion,score\n");
        StringBuilder c = new StringBuilder("candidate,level,felt_rushed\n");
        StringBuilder u = new StringBuilder("candidate,task,tool,uses,empty_queries,suggestions_accepted,suggestions_ignored\n");
        StringBuilder p = new StringBuilder("candidate,task,time_ms,type,position,text\n");
        for (int i = 0; i < 12; i++) {
            String id = "K" + i;
            c.append(id).append(',').append(i % 2 == 0 ? "low" : "high").append(',').append(1 + i % 5).append('\n');
            for (String task : new String[] {"a", "b"}) {
                String cond = task.equals("a") ? "none" : "tools";
                for (String rater : new String[] {"R1", "R2"}) {
                    for (String crit : new String[] {"ideas", "language"}) {
                        r.append(id).append(",,,").append(task).append(',').append(cond).append(',').append(rater)
                                .append(',').append(crit).append(',').append((i + task.length() + rater.length()
                                        + crit.length() * (rater.equals("R1") ? 1 : 2)) % 6).append('\n');
                    }
                }
                p.append(id).append(',').append(task).append(",0,text.insert,0,Hello\n");
                p.append(id).append(',').append(task).append(",2500,text.insert,5, world\n");
            }
            u.append(id).append(",b,dictionary,").append(i % 3).append(",0,,\n");
        }
        Path ratings = Files.writeString(dir.resolve("ratings.csv"), r.toString());
        Path cands = Files.writeString(dir.resolve("candidates.csv"), c.toString());
        Path usage = Files.writeString(dir.resolve("usage.csv"), u.toString());
        Path process = Files.writeString(dir.resolve("process.csv"), p.toString());
        Path outDir = dir.resolve("out");
        assertEquals(0, run("--ratings", ratings.toString(), "--candidates", cands.toString(), "--tool-usage",
                usage.toString(), "--process", process.toString(), "--out", outDir.toString(), "--baseline", "none",
                "--score-rule", "SUM", "--pause-ms", "2000"), err.toString());
        JsonNode s = new ObjectMapper().readTree(outDir.resolve("summary.json").toFile());
        assertEquals("sum", s.get("input.score_rule").asText());
        assertEquals("none", s.get("comparison.baseline").asText());
        assertTrue(s.has("usage.tool.dictionary.level.low.share_using"));
        assertEquals(1.0, s.get("process.tools.all_levels.pauses.mean").asDouble());
        assertTrue(s.has("survey.felt_rushed.high.mean"));
        assertTrue(Files.exists(outDir.resolve("tables/levels_posthoc.csv")));
    }

    @Test
    void analyse_badScoreAndMissingCell_reportsRowAndColumnAndWritesNothing(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("bad.csv");
        Files.writeString(f, "candidate,level,form,task,condition,rater,criterion,score\n"
                + "C1,B1,,t1,none,R1,content,3\n"
                + "C1,B1,,t1,none,R2,content,three\n"
                + ",B1,,t1,none,R1,grammar,2\n");
        Path outDir = dir.resolve("report");
        assertEquals(AnalyseCommand.INPUT_REFUSED, run("--ratings", f.toString(), "--out", outDir.toString()));
        String e = err.toString();
        assertTrue(e.contains("bad.csv, row 3, column score: 'three' is not a number"), e);
        assertTrue(e.contains("bad.csv, row 4, column candidate: empty"), e);
        assertFalse(Files.exists(outDir));
    }

    @Test
    void analyse_missingColumn_namesIt(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("short.csv");
        Files.writeString(f, "candidate,task,condition,rater,score\nC1,t1,none,R1,3\n");
        assertEquals(AnalyseCommand.INPUT_REFUSED, run("--ratings", f.toString(), "--out", dir.resolve("o").toString()));
        assertTrue(err.toString().contains("required column 'criterion' is missing"), err.toString());
    }

    @Test
    void analyse_unknownBaseline_listsTheConditions(@TempDir Path dir) throws Exception {
        Path ratings = shroutFleissRatings(dir);
        assertEquals(AnalyseCommand.INPUT_REFUSED, run("--ratings", ratings.toString(), "--out",
                dir.resolve("o").toString(), "--baseline", "nothing"));
        assertTrue(err.toString().contains("[plain]"), err.toString());
    }

    /**
     * The simulated rating-scale set of the MFRM reference tests (candidate x task x rater, invented
     * parameters; admin-tool/analysis/src/test/resources/mfrm/reference/reference.R), rewritten as the
     * tidy ratings table with one condition and one criterion.
     */
    private static Path referenceRatings(Path dir) throws Exception {
        StringBuilder b = new StringBuilder("candidate,level,form,task,condition,rater,criterion,score\n");
        List<String> lines = resourceLines("ratingscale-2000.csv");
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",");
            b.append(f[0]).append(",,,").append(f[1]).append(",plain,").append(f[2]).append(",overall,").append(f[3])
                    .append('\n');
        }
        return Files.writeString(dir.resolve("ratings.csv"), b.toString());
    }

    private static List<String> resourceLines(String name) throws Exception {
        try (InputStream in = AnalyseCommandTest.class.getResourceAsStream("/analysis/" + name)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().toList();
        }
    }

    @Test
    void analyse_mfrmOnConnectedDesign_addsSectionAndSummaryMatchingVgam(@TempDir Path dir) throws Exception {
        Path outDir = dir.resolve("out");
        assertEquals(0, run("--ratings", referenceRatings(dir).toString(), "--out", outDir.toString(),
                "--mfrm-facets", "task,rater", "--mfrm-bias", "rater:task", "--mfrm-max-iterations", "500"),
                err.toString());
        JsonNode s = new ObjectMapper().readTree(outDir.resolve("summary.json").toFile());
        assertTrue(s.get("mfrm.available").asBoolean());
        assertTrue(s.get("mfrm.convergence").get("converged").asBoolean());
        assertEquals(500, s.get("mfrm.convergence").get("maxIterations").asInt());
        assertEquals(2000, s.get("mfrm.model").get("ratings").asInt());
        assertEquals("rater", s.get("mfrm.bias").get(0).get("first").asText());
        // the classical sections are still there
        assertEquals(2000, s.get("input.ratings").asInt());
        // rater and task measures and thresholds against VGAM's adjacent-category logit fit of the same
        // data (vglm acat(parallel = TRUE), R 4.2.2, VGAM 1.1.7; ratingscale-2000-vgam.csv by reference.R);
        // limit 0.005 logits as in the analysis module's EquivalenceTest
        Map<String, Double> ref = new HashMap<>();
        List<String> vgam = resourceLines("ratingscale-2000-vgam.csv");
        for (String line : vgam.subList(1, vgam.size())) {
            String[] f = line.split(",");
            ref.put(f[0] + "/" + f[1], Double.parseDouble(f[2]));
        }
        int compared = 0;
        for (JsonNode facet : s.get("mfrm.facets")) {
            for (JsonNode e : facet.get("elements")) {
                Double expected = ref.get(facet.get("name").asText() + "/" + e.get("label").asText());
                assertTrue(expected != null, facet.get("name") + " " + e.get("label"));
                assertEquals(expected, e.get("measure").asDouble(), 0.005, e.get("label").asText());
                compared++;
            }
        }
        JsonNode cats = s.get("mfrm.scales").get(0).get("categories");
        for (int k = 1; k < cats.size(); k++) {
            assertEquals(ref.get("threshold/F" + k), cats.get(k).get("threshold").asDouble(), 0.005, "F" + k);
            compared++;
        }
        assertEquals(ref.size(), compared, "every reference value compared");
        String html = Files.readString(outDir.resolve("report.html"));
        assertTrue(html.contains("<section id=\"mfrm\">"), "MFRM section present");
        assertTrue(html.contains("Wright map"));
        assertTrue(html.contains("Convergence: reached after"));
        // issue 18: sizes with the main effects held fixed, both columns modelled: the report says so
        assertTrue(html.contains("Applies to rater x task: both columns are modelled facets"), "absorption note");
        assertTrue(Files.exists(outDir.resolve("tables/mfrm_facets.csv")));
        assertTrue(Files.exists(outDir.resolve("tables/mfrm_elements_rater.csv")));
        assertTrue(Files.exists(outDir.resolve("tables/mfrm_bias_rater_task.csv")));
        assertFalse(err.toString().contains("refused"), err.toString());
    }

    @Test
    void analyse_mfrmPartialCreditByTask_thresholdsMatchVgam(@TempDir Path dir) throws Exception {
        Path outDir = dir.resolve("out");
        assertEquals(0, run("--ratings", referenceRatings(dir).toString(), "--out", outDir.toString(),
                "--mfrm-facets", "task,rater", "--mfrm-structure", "partial-credit:task"), err.toString());
        JsonNode s = new ObjectMapper().readTree(outDir.resolve("summary.json").toFile());
        assertEquals("partial credit by task", s.get("mfrm.model").get("structure").asText());
        // VGAM acat(parallel = TRUE ~ candidate + rater - 1): one threshold set per task
        // (ratingscale-2000-pcm-vgam.csv by reference-pcm.R, R 4.2.2, VGAM 1.1.7); limit 0.005 logits
        Map<String, Double> ref = new HashMap<>();
        List<String> vgam = resourceLines("ratingscale-2000-pcm-vgam.csv");
        for (String line : vgam.subList(1, vgam.size())) {
            String[] f = line.split(",");
            ref.put(f[0] + "/" + f[1], Double.parseDouble(f[2]));
        }
        int compared = 0;
        for (JsonNode scale : s.get("mfrm.scales")) {
            JsonNode cats = scale.get("categories");
            for (int k = 1; k < cats.size(); k++) {
                String key = "threshold/" + scale.get("label").asText() + ":F" + k;
                assertEquals(ref.get(key), cats.get(k).get("threshold").asDouble(), 0.005, key);
                compared++;
            }
        }
        assertEquals(16, compared, "4 tasks x 4 thresholds");
        assertTrue(Files.readString(outDir.resolve("report.html")).contains("F_k(task)"));
        // joint SEs of the centred parametrisation (issue 18): survival::clogit over each rating's
        // categories, SEs through the contrast matrices (mfrm_clogit_pcm.R, R 4.2.2, survival 3.5.3)
        Map<String, Double> se = new HashMap<>();
        List<String> clogit = resourceLines("mfrm_clogit_pcm.csv");
        for (String line : clogit.subList(1, clogit.size())) {
            String[] f = line.split(",");
            se.put(f[0] + "/" + f[1], Double.parseDouble(f[f[0].equals("task_summary") ? 2 : 3]));
        }
        JsonNode task = s.get("mfrm.facets").get(1);
        for (JsonNode e : task.get("elements")) {
            assertEquals(se.get("task/" + e.get("label").asText()), e.get("jointSe").asDouble(), 1e-5, e.toString());
        }
        assertEquals(se.get("task_summary/separation"), task.get("summaryJointSe").get("separation").asDouble(), 1e-3);
        // adjusted scores (issue 18): mfrm_adjusted_scores.R, expected scores from the VGAM fit (R 4.2.2)
        Map<String, Double> adjusted = new HashMap<>();
        List<String> adj = resourceLines("mfrm_adjusted_scores.csv");
        for (String line : adj.subList(1, adj.size())) {
            String[] f = line.split(",");
            if (f[0].equals("partial_credit_task")) {
                adjusted.put(f[1] + "/" + f[2], Double.parseDouble(f[3]));
            }
        }
        int adjustedCompared = 0;
        for (JsonNode facet : s.get("mfrm.facets")) {
            for (JsonNode e : facet.get("elements")) {
                String key = facet.get("name").asText() + "/" + e.get("label").asText();
                assertEquals(adjusted.get(key), e.get("adjustedScore").asDouble(), 1e-3, key);
                adjustedCompared++;
            }
        }
        assertEquals(adjusted.size(), adjustedCompared);
        assertTrue(Files.readAllLines(outDir.resolve("tables/mfrm_elements_task.csv")).get(0).contains("adjusted"),
                "the adjusted score is a column of the elements' CSV");
    }

    @Test
    void analyse_mfrmOnConfoundedDesign_writesClassicalReportAndRefusalText(@TempDir Path dir) throws Exception {
        // invented rows, structure only: task a always under condition none, task b always under tools
        StringBuilder r = new StringBuilder("candidate,level,form,task,condition,rater,criterion,score\n");
        for (int i = 0; i < 20; i++) {
            for (String task : new String[] {"a", "b"}) {
                for (String rater : new String[] {"R1", "R2"}) {
                    r.append("K").append(i).append(",,,").append(task).append(',')
                            .append(task.equals("a") ? "none" : "tools").append(',').append(rater).append(",ideas,")
                            .append((i * 7 + task.length() + rater.hashCode()) % 5).append('\n');
                }
            }
        }
        Path ratings = Files.writeString(dir.resolve("ratings.csv"), r.toString());
        Path outDir = dir.resolve("out");
        assertEquals(0, run("--ratings", ratings.toString(), "--out", outDir.toString(), "--mfrm-facets",
                "task,condition,rater"), err.toString());
        // the refusal reason of DesignCheck (docs/analysis.md, "two confounded facets")
        assertTrue(err.toString().contains("warning: the many-facet Rasch analysis was refused"), err.toString());
        assertTrue(err.toString().contains("each task occurs with only one condition"), err.toString());
        String html = Files.readString(outDir.resolve("report.html"));
        assertTrue(html.contains("NOT RUN. The many-facet Rasch analysis was refused"), "refusal stated");
        assertTrue(html.contains("each task occurs with only one condition"), "reason given in the section");
        JsonNode s = new ObjectMapper().readTree(outDir.resolve("summary.json").toFile());
        assertFalse(s.get("mfrm.available").asBoolean());
        assertTrue(s.get("mfrm.refusal").get(0).asText().contains("confounded"), s.get("mfrm.refusal").toString());
        assertEquals(80, s.get("input.ratings").asInt());
        assertTrue(s.has("comparison.overall.t"), "the classical comparison still runs");
        assertFalse(Files.exists(outDir.resolve("tables/mfrm_facets.csv")));
    }

    @Test
    void analyse_mfrmWithDecimalScores_refusesOnlyTheRaschSection(@TempDir Path dir) throws Exception {
        Path f = Files.writeString(dir.resolve("ratings.csv"), "candidate,level,form,task,condition,rater,criterion,score\n"
                + "C1,,,t1,none,R1,content,2.5\nC1,,,t1,none,R2,content,3\nC2,,,t1,none,R1,content,1\n"
                + "C2,,,t1,none,R2,content,2\n");
        Path outDir = dir.resolve("out");
        assertEquals(0, run("--ratings", f.toString(), "--out", outDir.toString(), "--mfrm-facets", "rater"),
                err.toString());
        JsonNode s = new ObjectMapper().readTree(outDir.resolve("summary.json").toFile());
        assertFalse(s.get("mfrm.available").asBoolean());
        assertTrue(s.get("mfrm.refusal").get(0).asText().startsWith("rating 1 (candidate C1"), s.toString());
        assertTrue(s.get("mfrm.refusal").get(0).asText().contains("score 2.5 is not a whole number"));
    }

    @Test
    void analyse_badMfrmOptions_areUsageErrors(@TempDir Path dir) throws Exception {
        Path ratings = shroutFleissRatings(dir);
        String o = dir.resolve("o").toString();
        assertEquals(2, run("--ratings", ratings.toString(), "--out", o, "--mfrm-facets", "rater,judge"));
        assertTrue(err.toString().contains("'judge' is not a ratings column"), err.toString());
        assertEquals(2, run("--ratings", ratings.toString(), "--out", o, "--mfrm-facets", "rater",
                "--mfrm-structure", "partial-credit:task"), err.toString());
        assertTrue(err.toString().contains("partial credit by 'task'"), err.toString());
        assertEquals(2, run("--ratings", ratings.toString(), "--out", o, "--mfrm-facets", "rater",
                "--mfrm-bias", "rater-task"));
        assertTrue(err.toString().contains("is not COLUMN:COLUMN"), err.toString());
        assertEquals(2, run("--ratings", ratings.toString(), "--out", o, "--mfrm-bias", "rater:task"));
        assertFalse(Files.exists(dir.resolve("o")));
    }

    @Test
    void analyse_candidateWithLevelOnSomeRowsAndEmptyOnOthers_isNotRefused(@TempDir Path dir) throws Exception {
        // issue 18: invented rows, structure only. Each candidate's level is written on task a's
        // rows and left empty on task b's; docs/analysis.md: an empty level is filled (here the
        // candidate table agrees), so this is one level per candidate, not two.
        StringBuilder r = new StringBuilder("candidate,level,form,task,condition,rater,criterion,score\n");
        StringBuilder c = new StringBuilder("candidate,level\n");
        for (int i = 0; i < 16; i++) {
            String level = i % 2 == 0 ? "low" : "high";
            c.append('K').append(i).append(',').append(level).append('\n');
            for (String task : new String[] {"a", "b"}) {
                for (String rater : new String[] {"R1", "R2"}) {
                    r.append('K').append(i).append(',').append(task.equals("a") ? level : "").append(",,").append(task)
                            .append(',').append(i % 4 < 2 == task.equals("a") ? "none" : "tools").append(',')
                            .append(rater).append(",ideas,").append((i + (task.equals("a") ? 0 : 2) + (rater.equals("R1") ? 0 : 1)) % 4)
                            .append('\n');
                }
            }
        }
        Path ratings = Files.writeString(dir.resolve("ratings.csv"), r.toString());
        Path candidates = Files.writeString(dir.resolve("candidates.csv"), c.toString());
        Path outDir = dir.resolve("out");
        assertEquals(0, run("--ratings", ratings.toString(), "--candidates", candidates.toString(), "--out",
                outDir.toString(), "--mfrm-facets", "task,rater", "--mfrm-bias", "rater:level"), err.toString());
        JsonNode s = new ObjectMapper().readTree(outDir.resolve("summary.json").toFile());
        assertTrue(s.get("mfrm.available").asBoolean(), s.toString());
        int lowRatings = 0;
        for (JsonNode cell : s.get("mfrm.bias").get(0).get("cells")) {
            if (cell.get("second").asText().equals("low")) {
                lowRatings += cell.get("count").asInt();
            }
        }
        assertEquals(8 * 4, lowRatings, "every rating of the 8 low candidates, with or without a level written");
    }

    @Test
    void analyse_mfrmBiasEstimatedJointly_matchesConditionalLogitAndIsNamedInTheReport(@TempDir Path dir) throws Exception {
        // mfrm_clogit_interaction.R (R 4.2.2, survival 3.5.3): each rater x task term with the main effects
        StringBuilder b = new StringBuilder("candidate,level,form,task,condition,rater,criterion,score\n");
        List<String> lines = resourceLines("mfrm_interaction_ratings.csv");
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",");
            b.append(f[0]).append(",,,").append(f[1]).append(",plain,").append(f[2]).append(",overall,").append(f[3])
                    .append('\n');
        }
        Path ratings = Files.writeString(dir.resolve("ratings.csv"), b.toString());
        Path outDir = dir.resolve("out");
        assertEquals(0, run("--ratings", ratings.toString(), "--out", outDir.toString(), "--mfrm-facets", "task,rater",
                "--mfrm-bias", "rater:task", "--mfrm-bias-estimation", "joint"), err.toString());
        JsonNode pair = new ObjectMapper().readTree(outDir.resolve("summary.json").toFile()).get("mfrm.bias").get(0);
        assertEquals("joint", pair.get("estimation").asText());
        Map<String, JsonNode> cells = new HashMap<>();
        for (JsonNode c : pair.get("cells")) {
            cells.put(c.get("first").asText() + "/" + c.get("second").asText(), c);
        }
        List<String> ref = resourceLines("mfrm_clogit_interaction.csv");
        for (String line : ref.subList(1, ref.size())) {
            String[] f = line.split(",");
            JsonNode c = cells.get(f[0] + "/" + f[1]);
            assertEquals(Double.parseDouble(f[3]), c.get("size").asDouble(), 1e-4, line);
            assertEquals(Double.parseDouble(f[4]), c.get("se").asDouble(), 1e-4, line);
        }
        String html = Files.readString(outDir.resolve("report.html"));
        assertTrue(html.contains("jointly with the main effects"), "the estimation is named in the report");
        assertEquals(2, run("--ratings", ratings.toString(), "--out", outDir.toString(), "--mfrm-facets", "task,rater",
                "--mfrm-bias", "rater:task", "--mfrm-bias-estimation", "both"));
        assertTrue(err.toString().contains("use fixed or joint"), err.toString());
    }

    @Test
    void analyse_mfrmAnchors_equalConditionalLogitWithAnchorsFixed_andWriteTheNextAnchorFile(@TempDir Path dir)
            throws Exception {
        // mfrm_clogit_anchored.R (R 4.2.2, survival 3.5.3): tasks and thresholds fixed at mfrm_anchors.csv
        Path ratings = referenceRatings(dir);
        Path anchors = Files.write(dir.resolve("anchors.csv"), resourceLines("mfrm_anchors.csv"));
        Path outDir = dir.resolve("out");
        assertEquals(0, run("--ratings", ratings.toString(), "--out", outDir.toString(), "--mfrm-facets", "task,rater",
                "--mfrm-anchors", anchors.toString()), err.toString());
        JsonNode s = new ObjectMapper().readTree(outDir.resolve("summary.json").toFile());
        Map<String, Double> ref = new HashMap<>();
        List<String> r = resourceLines("mfrm_clogit_anchored.csv");
        for (String line : r.subList(1, r.size())) {
            String[] f = line.split(",");
            ref.put(f[0] + "/" + f[1], Double.parseDouble(f[2]));
        }
        int compared = 0;
        for (JsonNode facet : s.get("mfrm.facets")) {
            String name = facet.get("name").asText();
            for (JsonNode e : facet.get("elements")) {
                String label = e.get("label").asText();
                if (name.equals("task")) {
                    assertEquals("anchored", e.get("status").asText().toLowerCase(java.util.Locale.ROOT));
                    assertEquals(ref.get("displacement/" + label), e.get("displacement").asDouble(), 1e-3, label);
                    compared++;
                } else if (e.get("status").asText().equalsIgnoreCase("estimated")) {
                    assertEquals(ref.get(name + "/" + label), e.get("measure").asDouble(), 1e-3, name + " " + label);
                    compared++;
                }
            }
        }
        assertTrue(compared > 100, "candidates, raters and the four tasks compared: " + compared);
        assertTrue(Files.readString(outDir.resolve("report.html")).contains("Status anchored"));
        // the anchor file this run wrote is read by the next: same scale, nothing displaced
        Path written = outDir.resolve("mfrm_anchors.csv");
        assertTrue(Files.readString(written).startsWith("kind,facet,element,step,score,measure"));
        Path next = dir.resolve("next");
        assertEquals(0, run("--ratings", ratings.toString(), "--out", next.toString(), "--mfrm-facets", "task,rater",
                "--mfrm-anchors", written.toString()), err.toString());
        assertFalse(err.toString().contains("displaced"), err.toString());
        // an anchor far from what these data say earns the displacement warning naming it
        List<String> far = new java.util.ArrayList<>(resourceLines("mfrm_anchors.csv"));
        far.replaceAll(x -> x.startsWith("element,task,t4,") ? "element,task,t4,,,2.5" : x);
        Path farFile = Files.write(dir.resolve("far.csv"), far);
        assertEquals(0, run("--ratings", ratings.toString(), "--out", dir.resolve("far").toString(), "--mfrm-facets",
                "task,rater", "--mfrm-anchors", farFile.toString()), err.toString());
        JsonNode w = new ObjectMapper().readTree(dir.resolve("far/summary.json").toFile()).get("mfrm.warnings");
        assertTrue(w.toString().contains("displaced by more than 0.5 logit") && w.toString().contains("task t4 -"),
                w.toString());
        // a bad anchor file is refused with its row and column, nothing written
        Path bad = Files.writeString(dir.resolve("bad.csv"), "kind,facet,element,step,score,measure\nelement,task,t1,,,x\n");
        assertEquals(1, run("--ratings", ratings.toString(), "--out", dir.resolve("bad").toString(), "--mfrm-facets",
                "task,rater", "--mfrm-anchors", bad.toString()));
        assertTrue(err.toString().contains("row 2, column measure"), err.toString());
        assertFalse(Files.exists(dir.resolve("bad")));
    }

    @Test
    void analyse_reportStartsWithProvenance_whoseCommandLineReproducesTheRun(@TempDir Path dir) throws Exception {
        Path ratings = shroutFleissRatings(dir);
        Path outDir = dir.resolve("report");
        // through the real command line, as typed: the recorded command names the subcommand once
        AdminCommand.Run firstRun = AdminCommand.admin("analyse", "--ratings", ratings.toString(), "--out", outDir.toString(),
                "--title", "Judges' ratings");
        assertEquals(0, firstRun.code(), firstRun.all());
        ObjectMapper json = new ObjectMapper();
        JsonNode s = json.readTree(outDir.resolve("summary.json").toFile());
        // SHA-256 of the input as the system's sha256sum (GNU coreutils, FIPS 180-4) computes it
        Process p = new ProcessBuilder("sha256sum", ratings.toString()).redirectErrorStream(true).start();
        String sum = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).split(" ")[0];
        assertEquals(0, p.waitFor());
        assertEquals(sum, s.get("provenance.inputs").get("--ratings").get("sha256").asText());
        assertEquals(Files.size(ratings), s.get("provenance.inputs").get("--ratings").get("bytes").asLong());
        assertTrue(s.get("provenance.exam").isNull(), "no store: the exam is not known");
        // POSIX shell quoting of a single quote: 'Judges'\'' ratings'
        assertTrue(s.get("provenance.command_line").asText().contains("--title 'Judges'\\'' ratings'"),
                s.get("provenance.command_line").asText());
        assertTrue(s.get("provenance.command_line").asText().startsWith("inkgate-admin analyse --ratings "),
                s.get("provenance.command_line").asText());
        String html = Files.readString(outDir.resolve("report.html"));
        assertTrue(html.indexOf("id=\"provenance\"") < html.indexOf("id=\"descriptives\""), "provenance comes first");
        // the recorded arguments, run again, give the same figures; only the date and time differ
        List<String> args = new java.util.ArrayList<>();
        s.get("provenance.arguments").forEach(a -> args.add(a.asText()));
        Files.move(outDir.resolve("summary.json"), dir.resolve("first.json"));
        AdminCommand.Run rerun = AdminCommand.admin(AdminCommand.concat(new String[] {"analyse"}, args.toArray(String[]::new)));
        assertEquals(0, rerun.code(), rerun.all());
        com.fasterxml.jackson.databind.node.ObjectNode first = (com.fasterxml.jackson.databind.node.ObjectNode)
                json.readTree(dir.resolve("first.json").toFile());
        com.fasterxml.jackson.databind.node.ObjectNode again = (com.fasterxml.jackson.databind.node.ObjectNode)
                json.readTree(outDir.resolve("summary.json").toFile());
        first.remove("provenance.date_time_utc");
        again.remove("provenance.date_time_utc");
        assertEquals(first, again);
    }

    @Test
    void analyse_missingRatingsOption_isUsageError() {
        assertEquals(2, run("--out", "x"));
        assertTrue(err.toString().contains("--ratings"));
    }
}
