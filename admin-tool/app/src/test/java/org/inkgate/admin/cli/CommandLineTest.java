package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Runs the real command line in separate processes, as a test owner would, over the invented demo
 * exam source: keys, exam check, forms, roster, bundle, simulated sitting, collect, missing, export.
 */
class CommandLineTest {

    private static final Path DEMO = Path.of("src/demo");

    @TempDir
    Path dir;

    /** Output and exit code of one run. */
    record Run(int code, String out) {
    }

    private Run run(String mainClass, String... args) throws Exception {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "--enable-native-access=ALL-UNNAMED", "-cp", System.getProperty("java.class.path"), mainClass));
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command).redirectErrorStream(true);
        pb.environment().put("TEST_PASSPHRASE", "invented passphrase for the demo");
        pb.environment().put("TEST_PIN", "invented-pin-8642");
        Process p = pb.start();
        String out = new String(p.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS));
        return new Run(p.exitValue(), out);
    }

    private Run admin(String... args) throws Exception {
        return run(InkgateAdmin.class.getName(), args);
    }

    @Test
    void demoWalkthrough_emptyFolderToCollectedStore_reportsTheMissingCandidate() throws Exception {
        String keys = dir.resolve("keys").toString();
        Run init = admin("keys", "init", "--keys", keys, "--passphrase-env", "TEST_PASSPHRASE");
        assertEquals(0, init.code(), init.out());
        assertTrue(init.out().contains("signing key (Ed25519)"), init.out());

        Run check = admin("exam", "check", DEMO.resolve("exam-source").toString());
        assertEquals(0, check.code(), check.out());
        assertTrue(check.out().contains("no problems found"));

        String assignment = dir.resolve("assignment.csv").toString();
        Run forms = admin("forms", DEMO.resolve("exam-source").toString(), "--roster", DEMO.resolve("roster.csv").toString(),
                "--seed", "20261202", "--out", assignment);
        assertEquals(0, forms.code(), forms.out());
        assertTrue(forms.out().contains("ferry-complaint:  with-resources=6  without-resources=6"), forms.out());
        assertTrue(forms.out().contains("design: latin-square (within candidates): 2 tasks, 2 conditions"), forms.out());

        String bundle = dir.resolve("demo.inkexam").toString();
        Run built = admin("bundle", DEMO.resolve("exam-source").toString(), "--out", bundle, "--keys", keys,
                "--roster", DEMO.resolve("roster.csv").toString(), "--assignment", assignment,
                "--passphrase-env", "TEST_PASSPHRASE", "--pin-env", "TEST_PIN");
        assertEquals(0, built.code(), built.out());

        Run inspect = admin("inspect", bundle, "--keys", keys);
        assertEquals(0, inspect.code(), inspect.out());
        assertTrue(inspect.out().contains("matches your signing key"), inspect.out());

        String responses = dir.resolve("responses").toString();
        Run simulated = run("org.inkgate.admin.demo.SimulateDemoSitting", bundle, "--keys", keys, "--out", responses,
                "--leave-out", "H1004", "--events", "100");
        assertEquals(0, simulated.code(), simulated.out());

        String store = dir.resolve("results.db").toString();
        Run collect = admin("collect", responses, "--store", store, "--bundle", bundle, "--keys", keys,
                "--installations", Path.of(responses, "installations.txt").toString(),
                "--roster", DEMO.resolve("roster.csv").toString(), "--exam", DEMO.resolve("exam-source").toString(),
                "--assignment", assignment, "--passphrase-env", "TEST_PASSPHRASE");
        assertEquals(InkgateAdmin.ATTENTION, collect.code(), collect.out());
        assertTrue(collect.out().contains("Imported 11,"), collect.out());
        assertTrue(collect.out().contains("candidate H1004 (level B1): no response package"), collect.out());

        Run again = admin("collect", responses, "--store", store, "--bundle", bundle, "--keys", keys,
                "--installations", Path.of(responses, "installations.txt").toString(), "--passphrase-env", "TEST_PASSPHRASE");
        assertTrue(again.out().contains("Imported 0, already imported (same file) 11"), again.out());

        try (var c = java.sql.DriverManager.getConnection("jdbc:sqlite:" + store); var st = c.createStatement();
                var rs = st.executeQuery("SELECT seed FROM form_assignment_runs")) {
            assertTrue(rs.next());
            assertEquals(20261202L, rs.getLong(1), "the seed given to forms is recorded in the store");
        }
        try (var c = java.sql.DriverManager.getConnection("jdbc:sqlite:" + store); var st = c.createStatement();
                var rs = st.executeQuery("SELECT design FROM exams")) {
            assertTrue(rs.next());
            assertEquals("latin-square", rs.getString(1), "the bundle's declared design is recorded in the store");
        }

        Run missing = admin("missing", "--store", store);
        assertEquals(InkgateAdmin.ATTENTION, missing.code());
        assertTrue(missing.out().contains("H1004"));

        Run export = admin("export", "--store", store, "--out", dir.resolve("export").toString());
        assertEquals(0, export.code(), export.out());
        assertTrue(Files.exists(dir.resolve("export/demo-harbourside-placement/csv/responses.csv")));
        assertEquals(11, Files.list(dir.resolve("export/demo-harbourside-placement/qti-results")).count());
        assertTrue(export.out().contains("csv/questionnaire_answers.csv 22 rows"), "11 sittings x 2 items: " + export.out());

        // an export killed while moving its exam folders in (as StagedFolderKillTest leaves one: the hidden
        // folder with its publishing note and the exams not yet moved): the next export finishes it first and says so
        Path killed = Files.createDirectories(dir.resolve("export/.export.partial/demo-other-exam"));
        Files.writeString(killed.resolve("responses.csv"), "left by a killed export");
        Files.writeString(dir.resolve("export/.export.partial/.publishing"), "moving");
        Run afterKill = admin("export", "--store", store, "--out", dir.resolve("export").toString());
        assertEquals(0, afterKill.code(), afterKill.out());
        assertTrue(afterKill.out().contains("NOTE: an earlier run into") && afterKill.out().contains("(demo-other-exam)"),
                afterKill.out());
        assertTrue(Files.exists(dir.resolve("export/demo-other-exam/responses.csv")));
        assertFalse(Files.exists(dir.resolve("export/.export.partial")));

        // ratings come from a CSV (the rating desk comes later); levels, tool use and process events from the store
        Path ratings = dir.resolve("ratings.csv");
        Files.writeString(ratings, inventedRatings(dir.resolve("export/demo-harbourside-placement/csv/responses.csv")));
        Path report = dir.resolve("report");
        Run analyse = admin("analyse", "--ratings", ratings.toString(), "--store", store, "--out", report.toString());
        assertEquals(0, analyse.code(), analyse.out());
        String summary = Files.readString(report.resolve("summary.json"));
        assertTrue(summary.contains("\"usage."), "tool use read from the store: " + summary.substring(0, 400));
        assertTrue(summary.contains("\"process."), "process events read from the store");
        assertTrue(summary.contains("\"questionnaire.after_writing.time_enough.all.answered\" : 11"),
                "questionnaire answers read from the store");

        rateThroughToAnalysis(store);
    }

    /**
     * Rating with the real commands: three invented raters, a seeded assignment, sheets filled with
     * invented scores (R01 harsh, R02 middling, R03 lenient, so R01-R03 pairs disagree), a rule, the
     * adjudicator's sheet, exports read back by the analysis's reader, and analyse --store with no
     * --ratings file.
     */
    private void rateThroughToAnalysis(String store) throws Exception {
        for (String r : List.of("R01", "R02", "R03")) {
            Run add = admin("rate", "raters", "add", r, "--label", "Invented rater " + r, "--store", store);
            assertEquals(0, add.code(), add.out());
        }
        Run assign = admin("rate", "assign", "--store", store, "--seed", "20261202");
        assertEquals(0, assign.code(), assign.out());
        assertTrue(assign.out().contains("Assigned 22 responses to 2 rater(s) each, seed 20261202"), assign.out());
        assertTrue(assign.out().contains("Rater links: connected"), assign.out());

        Run early = admin("analyse", "--store", store, "--out", dir.resolve("early").toString());
        assertEquals(AnalyseCommand.INPUT_REFUSED, early.code(), early.out());
        assertTrue(early.out().contains("holds no ratings"), early.out());

        Map<String, Integer> harshness = Map.of("R01", 3, "R02", 5, "R03", 8);
        for (String r : harshness.keySet()) {
            Path sheet = dir.resolve("sheets/" + r + ".csv");
            Run exported = admin("rate", "sheet", "export", "--rater", r, "--out", sheet.toString(), "--store", store);
            assertEquals(0, exported.code(), exported.out());
            Files.writeString(sheet, fill(Files.readString(sheet), harshness.get(r)));
        }
        // a bad cell is refused with its row and column, and nothing of the sheet is stored
        Path bad = dir.resolve("sheets/bad.csv");
        List<String> lines = new ArrayList<>(Files.readAllLines(dir.resolve("sheets/R01.csv")));
        lines.set(2, lines.get(2).replaceFirst(",3,3,", ",3,12,"));
        Files.write(bad, lines);
        Run refused = admin("rate", "sheet", "import", "--rater", "R01", bad.toString(), "--store", store);
        assertEquals(InkgateAdmin.PROBLEMS, refused.code(), refused.out());
        assertTrue(refused.out().contains("bad.csv row 3, column language-control: score 12 is out of range"), refused.out());

        for (String r : harshness.keySet()) {
            Run imported = admin("rate", "sheet", "import", "--rater", r, dir.resolve("sheets/" + r + ".csv").toString(),
                    "--store", store);
            assertEquals(0, imported.code(), imported.out());
        }
        Run again = admin("rate", "sheet", "import", "--rater", "R01", dir.resolve("sheets/R01.csv").toString(),
                "--store", store);
        assertTrue(again.out().contains(": 0 ratings stored"), "re-import is idempotent: " + again.out());

        // 3 (band 1-3) against 8 (band 7-9) is two bands apart: flagged; the adjudicator can only be R02
        Run rule = admin("rate", "rule", "--criterion-gap", "1", "--store", store);
        assertEquals(0, rule.code(), rule.out());
        Run flags = admin("rate", "flags", "--store", store);
        assertEquals(InkgateAdmin.ATTENTION, flags.code(), flags.out());
        assertTrue(flags.out().contains("awaiting adjudicator R02"), flags.out());
        Path adjudication = dir.resolve("sheets/R02-adjudication.csv");
        assertEquals(0, admin("rate", "sheet", "export", "--rater", "R02", "--out", adjudication.toString(), "--store",
                store).code());
        Files.writeString(adjudication, fill(Files.readString(adjudication), 5));
        assertEquals(0, admin("rate", "sheet", "import", "--rater", "R02", adjudication.toString(), "--store", store).code());
        Run settled = admin("rate", "flags", "--store", store);
        assertEquals(0, settled.code(), settled.out());
        assertTrue(settled.out().contains("settled (closest-pair-mean)"), settled.out());
        Run progress = admin("rate", "progress", "--store", store);
        assertEquals(0, progress.code(), progress.out());
        assertTrue(progress.out().contains("Every assigned response has a final score."), progress.out());

        Path ratings = dir.resolve("rating-export");
        Run export = admin("rate", "export", "--out", ratings.toString(), "--store", store);
        assertEquals(0, export.code(), export.out());
        // round trip: the analysis's own reader takes the export; scores are the ones typed into the sheets
        List<org.inkgate.analysis.data.Rating> read;
        try (var in = Files.newBufferedReader(ratings.resolve("ratings.csv"))) {
            read = org.inkgate.analysis.data.RatingsReader.read("ratings.csv", in);
        }
        List<String> exported = Files.readAllLines(ratings.resolve("ratings.csv"));
        assertTrue(exported.get(0).endsWith(",rated_at,design"), exported.get(0));
        assertTrue(exported.stream().skip(1).allMatch(line -> line.endsWith(",latin-square")), exported.get(1));
        long flaggedPairs = read.stream().filter(x -> x.rater().equals("R02")).count();
        assertTrue(read.size() >= 88, "22 responses x 2 raters x 2 criteria, plus adjudications: " + read.size());
        for (var x : read) {
            assertEquals(harshness.get(x.rater()).doubleValue(), x.score(), "rater " + x.rater());
        }
        assertTrue(flaggedPairs > 0);
        String finals = Files.readString(ratings.resolve("final-scores.csv"));
        assertTrue(finals.startsWith("candidate,level,form,task,condition,criterion,score,method,rule,raters,decided_at"));
        // R01 (3+3 = 6) and R03 (8+8 = 16) flagged, R02 adjudicates 5+5 = 10: closest pair R01-R02, mean (3+5)/2 = 4
        assertTrue(finals.contains(",4,closest-pair-mean,"), finals);

        Path report = dir.resolve("report-from-store");
        Run analyse = admin("analyse", "--store", store, "--out", report.toString());
        assertEquals(0, analyse.code(), analyse.out());
        assertTrue(analyse.out().contains("(" + read.size() + " ratings;"), analyse.out());

        exportWithScores(store);
    }

    /**
     * After rating, export writes the scores into the QTI results; every file validates against the
     * official QTI 3.0 results schema (test resources of the admin core, standards/qti3).
     */
    private void exportWithScores(String store) throws Exception {
        Path out = dir.resolve("export-rated");
        Run export = admin("export", "--store", store, "--out", out.toString(), "--xapi-base",
                "https://assessment.invented-owner.test/xapi", "--xapi-light");
        assertEquals(0, export.code(), export.out());
        assertTrue(export.out().contains("keystroke events left out (--xapi-light)"), export.out());
        String statements = Files.readString(out.resolve("demo-harbourside-placement/xapi-statements.jsonl"));
        assertTrue(statements.contains("https://assessment.invented-owner.test/xapi/exams/")
                && !statements.contains("inkgate.example") && !statements.contains("\"text.insert\""));
        Run badBase = admin("export", "--store", store, "--out", dir.resolve("never").toString(), "--xapi-base", "ftp://x/");
        assertEquals(InkgateAdmin.PROBLEMS, badBase.code(), badBase.out());
        assertTrue(badBase.out().contains("must be an http(s) address"), badBase.out());
        assertTrue(export.out().contains("qti-results/ 11 assessmentResult files (22 task results with a final score)"),
                export.out());
        List<Path> files;
        try (var s = Files.list(out.resolve("demo-harbourside-placement/qti-results"))) {
            files = s.sorted().toList();
        }
        assertEquals(11, files.size());
        for (Path file : files) {
            assertEquals(List.of(), org.inkgate.admin.core.testutil.QtiSchemas.problems(
                    org.inkgate.admin.core.testutil.QtiSchemas.RESULTS, file));
            String xml = Files.readString(file);
            assertTrue(xml.contains("<outcomeVariable identifier=\"SCORE\""), file + " carries the final score");
            assertTrue(xml.contains("identifier=\"RATING_R01_") || xml.contains("identifier=\"RATING_R02_")
                    || xml.contains("identifier=\"RATING_R03_"), file + " carries the raters' scores");
        }
    }

    /** Fills every criterion of every row of a sheet with one invented score, keeping rows already scored. */
    private static String fill(String sheet, int score) {
        StringBuilder out = new StringBuilder();
        String[] lines = sheet.split("\r\n");
        out.append(lines[0]).append("\r\n");
        for (String line : java.util.Arrays.asList(lines).subList(1, lines.length)) {
            String[] f = line.split(",", -1);
            if (f[2].isEmpty()) {
                f[2] = String.valueOf(score);
                f[3] = String.valueOf(score);
            }
            out.append(String.join(",", f)).append("\r\n");
        }
        return out.toString();
    }

    /** Two raters, two criteria, invented scores for every response in the export (not check values). */
    private static String inventedRatings(Path responsesCsv) throws Exception {
        List<String> lines = Files.readAllLines(responsesCsv);
        List<String> header = List.of(lines.get(0).split(","));
        int cand = header.indexOf("candidate_number");
        int task = header.indexOf("task_id");
        int cond = header.indexOf("condition_id");
        int form = header.indexOf("form_id");
        StringBuilder out = new StringBuilder("candidate,level,form,task,condition,rater,criterion,score\n");
        int n = 0;
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",", -1);
            if (f.length <= Math.max(Math.max(cand, task), Math.max(cond, form)) || !f[cand].matches("[A-Z0-9]+")) {
                continue;
            }
            for (String rater : List.of("R1", "R2")) {
                for (String criterion : List.of("content", "language")) {
                    int score = 3 + (n++ * 7 + rater.hashCode()) % 5;
                    out.append(f[cand]).append(",,").append(f[form]).append(',').append(f[task]).append(',')
                            .append(f[cond]).append(',').append(rater).append(',').append(criterion).append(',')
                            .append(score).append('\n');
                }
            }
        }
        return out.toString();
    }

    @Test
    void examCheck_brokenSource_exitsOneAndListsProblemsWithLines() throws Exception {
        Path src = dir.resolve("broken");
        Files.createDirectories(src);
        Files.writeString(src.resolve("exam.yaml"), "id: x\ntitle: Invented\nlanguage: en-GB\ntasks: []\nconditions: []\n");
        Run check = admin("exam", "check", src.toString());
        assertEquals(InkgateAdmin.PROBLEMS, check.code(), check.out());
        assertTrue(check.out().contains("exam.yaml:4:8: tasks: lists no task"), check.out());
        assertTrue(check.out().contains("design: is missing"), check.out());
    }

    @Test
    void collect_wrongPassphrase_saysSoWithoutAStackTrace() throws Exception {
        String keys = dir.resolve("keys").toString();
        assertEquals(0, admin("keys", "init", "--keys", keys, "--passphrase-env", "TEST_PASSPHRASE").code());
        Run bad = admin("inspect", DEMO.resolve("roster.csv").toString());
        assertEquals(2, bad.code(), bad.out());
        Run wrong = admin("collect", dir.toString(), "--store", dir.resolve("r.db").toString(), "--bundle",
                dir.resolve("none.inkexam").toString(), "--keys", keys, "--any-installation", "--passphrase-env", "TEST_PIN");
        assertEquals(InkgateAdmin.PROBLEMS, wrong.code(), wrong.out());
        assertTrue(wrong.out().contains("the passphrase does not open this key"), wrong.out());
        assertTrue(!wrong.out().contains("\tat "), "no stack trace: " + wrong.out());
    }
}
