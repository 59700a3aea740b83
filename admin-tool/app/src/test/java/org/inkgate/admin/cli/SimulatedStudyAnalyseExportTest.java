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
import java.sql.DriverManager;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.inkgate.admin.core.bundling.BundleBuilder;
import org.inkgate.admin.core.collection.CollectionRun;
import org.inkgate.admin.core.csv.Csv;
import org.inkgate.admin.core.export.QuestionnaireCsv;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.FormDesigner;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.admin.testutil.DemoSource;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.response.QuestionnaireAnswers;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.response.ToolUse;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.format.trust.TrustPolicy;
import org.inkgate.packs.policy.Tool;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * The SIMULATED study of admin-tool/analysis/src/test/resources/reference/questionnaire_score_reference.R
 * (18 invented candidates in 3 levels, set.seed(20261202); not demo data; copies of its CSV files in
 * src/test/resources/analysis) carried through the real programs: an exam whose questionnaire asks
 * two Likert items and one free-text item, a bundle with each candidate's form, response packages
 * written by the real package writer with the study's answers and spelling-check use, collected
 * into a results store, rated through the rating store by four raters assigned by the real assigner
 * (the lower rater id of each response scores the study's first rating), then {@code analyse --store}
 * and {@code export}. Every figure R computed (Debian R 4.2.2, psych 2.2.9) must be in summary.json.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class SimulatedStudyAnalyseExportTest {

    private static final String EXAM = "demo-harbourside-placement";
    private static final String QUESTIONNAIRE = """
            questionnaires:
              - id: after-writing
                title: About your writing today
                items:
                  - id: help
                    text: The writing tools helped me.
                    kind: likert
                    labels: [Strongly disagree, Disagree, Neither agree nor disagree, Agree, Strongly agree]
                  - id: time
                    text: I had enough time.
                    kind: likert
                    labels: [Not at all, A little, Mostly, Completely]
                  - id: comments
                    text: Anything else you want to tell us?
                    kind: free-text

            """;

    private Path dir;
    private Path store;
    private final List<Map<String, String>> candidates = new ArrayList<>();

    @BeforeAll
    void collectAndRateTheSimulatedStudy(@TempDir Path tempDir) throws Exception {
        dir = tempDir;
        Path source = DemoSource.copyExam(dir.resolve("exam-source"));
        String yaml = Files.readString(source.resolve("exam.yaml"));
        yaml = yaml.substring(0, yaml.indexOf("questionnaires:")) + QUESTIONNAIRE + yaml.substring(yaml.indexOf("rubric:"));
        Files.writeString(source.resolve("exam.yaml"), yaml);
        ExamSource exam = ExamSourceReader.read(source);
        candidates.addAll(rows("study_candidates.csv"));

        // each candidate's form: the designed form whose first task and condition are the study's
        List<FormSpec> forms = FormDesigner.forms(exam);
        List<RosterCandidate> roster = new ArrayList<>();
        List<Assignment.Row> assigned = new ArrayList<>();
        StringBuilder rosterCsv = new StringBuilder("candidate_number,level,first_language,extra_time_percent,large_print,"
                + "high_contrast\n");
        for (Map<String, String> c : candidates) {
            String form = forms.stream().filter(f -> f.slots().get(0).taskId().equals(c.get("first_task"))
                    && f.slots().get(0).conditionId().equals(c.get("first_condition"))).findFirst().orElseThrow().id();
            roster.add(new RosterCandidate(c.get("candidate"), c.get("level"), "", 0, false, false, Map.of()));
            assigned.add(new Assignment.Row(c.get("candidate"), c.get("level"), form));
            rosterCsv.append(c.get("candidate")).append(',').append(c.get("level")).append(",,0,no,no\n");
        }
        Path rosterFile = Files.writeString(dir.resolve("roster.csv"), rosterCsv.toString());
        Path bundle = dir.resolve("study.inkexam");
        BundleBuilder.build(exam, roster, new Assignment(20261202L, assigned), TestKeys.ownerKeys(), TestKeys.OWNER_SIGNING,
                "invented-pin-2468".toCharArray(), false, bundle);
        Path packages = Files.createDirectories(dir.resolve("packages"));
        try (OpenedBundle b = new BundleReader(TrustPolicy.trusting(Set.of(TestKeys.ownerFingerprint()))).open(bundle)) {
            SimulatedSitting client = new SimulatedSitting(b.manifest(), b.manifestSha256(), TestKeys.INSTALLATION_SIGNING,
                    TestKeys.ownerEncryptionPublic());
            long seed = 1;
            for (int i = 0; i < candidates.size(); i++) {
                Map<String, String> c = candidates.get(i);
                String form = assigned.get(i).formId();
                ResponseDocument d = client.document(c.get("candidate"), form, seed, java.util.UUID.nameUUIDFromBytes(
                        c.get("candidate").getBytes(StandardCharsets.UTF_8)).toString());
                client.write(withStudy(d, c), 20, seed++, packages.resolve(c.get("candidate") + ".inkresp"));
            }
        }
        store = dir.resolve("results.db");
        CollectionRun.run(new CollectionRun.Request(store, List.of(bundle), List.of(packages), TestKeys.OWNER_ENCRYPTION,
                TestKeys.ownerFingerprint(), TestKeys.installations(), rosterFile, exam, null, 1), n -> { }, o -> { });
        rate();
    }

    /** The simulated document with the study's spelling-check use and questionnaire answers instead of random ones. */
    private static ResponseDocument withStudy(ResponseDocument d, Map<String, String> c) {
        List<TaskResponse> tasks = new ArrayList<>();
        for (TaskResponse t : d.tasks()) {
            Map<Tool, ToolUse> use = new EnumMap<>(Tool.class);
            if (t.toolsOffered().contains(Tool.SPELLING)) {
                int accepted = Integer.parseInt(c.get("spelling_accepted"));
                int ignored = Integer.parseInt(c.get("spelling_ignored"));
                use.put(Tool.SPELLING, new ToolUse(0, 0, 0, accepted + ignored, accepted, ignored, 0));
            }
            tasks.add(new TaskResponse(t.taskId(), t.conditionId(), t.text(), t.wordCount(), t.startedAt(), t.endedAt(),
                    t.extraTimeSeconds(), t.policy(), t.toolsOffered(), use, t.endReason()));
        }
        Map<String, String> answers = new TreeMap<>();
        for (String item : List.of("help", "time", "comments")) {
            if (!c.get(item).isEmpty()) {
                answers.put(item, c.get(item)); // an unanswered item is left out, as the client does
            }
        }
        return new ResponseDocument(d.format(), d.schemaVersion(), d.packageId(), d.examId(), d.bundleManifestSha256(),
                d.candidateNumber(), d.seat(), d.formId(), d.clientVersion(), d.startedAt(), d.submittedAt(), tasks,
                List.of(new QuestionnaireAnswers("after-writing", answers)));
    }

    /** Four raters, two per response by the real assigner; the lower rater id gives the study's first rating. */
    private void rate() throws Exception {
        Map<String, Map<String, int[]>> scores = new HashMap<>(); // candidate|task -> criterion -> {first, second}
        for (Map<String, String> r : rows("study_ratings.csv")) {
            scores.computeIfAbsent(r.get("candidate") + "|" + r.get("task"), k -> new LinkedHashMap<>())
                    .put(r.get("criterion"), new int[] {Integer.parseInt(r.get("first")), Integer.parseInt(r.get("second"))});
        }
        try (RatingStore rating = StoreFixture.of(store).rating(EXAM)) {
            for (String r : List.of("R1", "R2", "R3", "R4")) {
                rating.addRater(r, "", null);
            }
            rating.assign(2, 20261202L, false);
            Map<String, List<String[]>> byResponse = new TreeMap<>(); // response -> {rater, blind id}, rater order
            try (var c = DriverManager.getConnection("jdbc:sqlite:" + store); var st = c.createStatement();
                    var rs = st.executeQuery("SELECT s.candidate_number, a.task_id, a.rater_id, a.blind_id FROM"
                            + " rating_assignments a JOIN sittings s ON s.sitting_id = a.sitting_id ORDER BY a.rater_id")) {
                while (rs.next()) {
                    byResponse.computeIfAbsent(rs.getString(1) + "|" + rs.getString(2), k -> new ArrayList<>())
                            .add(new String[] {rs.getString(3), rs.getString(4)});
                }
            }
            assertEquals(36, byResponse.size(), "18 candidates x 2 tasks");
            for (var e : byResponse.entrySet()) {
                assertEquals(2, e.getValue().size(), e.getKey());
                for (int which = 0; which < 2; which++) {
                    Map<String, Integer> sheet = new HashMap<>();
                    for (var crit : scores.get(e.getKey()).entrySet()) {
                        sheet.put(crit.getKey(), crit.getValue()[which]);
                    }
                    String[] rater = e.getValue().get(which);
                    rating.submit(rater[0], rater[1], new RatingDesk.RatingSheet(sheet, ""));
                }
            }
        }
    }

    private int run(StringWriter out, StringWriter err, Object command, String... args) {
        CommandLine cl = new CommandLine(command);
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    private static void assertSummaryMatchesR(Path summaryJson) throws Exception {
        JsonNode s = new ObjectMapper().readTree(summaryJson.toFile());
        int compared = 0;
        for (Map<String, String> ref : rows("questionnaire_score_reference.csv")) {
            String key = ref.get("key");
            JsonNode got = s.get(key);
            if (ref.get("value").equals("NA")) {
                assertTrue(got == null || got.isNull(), key + " is undefined in R: " + got);
            } else {
                assertTrue(got != null && got.isNumber(), key + " missing from summary.json: " + got);
                assertEquals(Double.parseDouble(ref.get("value")), got.asDouble(), 1e-9, key);
            }
            compared++;
        }
        assertTrue(compared > 300, "questionnaire and reported-score keys compared: " + compared);
    }

    @Test
    void analyseStore_simulatedStudy_everyQuestionnaireAndReportedScoreFigureMatchesR() throws Exception {
        StringWriter out = new StringWriter(), err = new StringWriter();
        Path report = dir.resolve("report");
        assertEquals(0, run(out, err, new AnalyseCommand(), "--store", store.toString(), "--out", report.toString()),
                err.toString());
        assertSummaryMatchesR(report.resolve("summary.json"));
        String html = Files.readString(report.resolve("report.html"));
        assertTrue(html.contains("The suggestions came too late, I had already moved on."), "free text listed");
        assertFalse(html.contains("<script>alert"), "a candidate's text never becomes markup");
        assertTrue(html.contains("A correlation over few candidates, not an effect"));
        assertTrue(html.contains("Agreement on the reported score (mean over criteria)"));
        List<Csv.Row> icc = Csv.parse(Files.readString(report.resolve("tables/raters_score_icc.csv")));
        assertEquals(List.of("level", "scope", "form"), icc.get(0).fields().subList(0, 3));
        assertEquals(1 + 6 * 5, icc.size(), "six forms for all responses, two tasks and two conditions");
    }

    @Test
    void export_questionnaireCsv_readsBackWithTheStudysAnswersAndTheContractsScales() throws Exception {
        StringWriter out = new StringWriter(), err = new StringWriter();
        Path exported = dir.resolve("export");
        assertEquals(0, run(out, err, new ExportCommand(), "--store", store.toString(), "--out", exported.toString()),
                err.toString());
        assertTrue(out.toString().contains("csv/questionnaire_answers.csv 54 rows"), out.toString());
        Path csv = exported.resolve(EXAM).resolve("csv").resolve(QuestionnaireCsv.FILE_NAME);
        List<QuestionnaireCsv.Row> rows;
        try (var in = Files.newBufferedReader(csv)) {
            rows = QuestionnaireCsv.read(csv.getFileName().toString(), in);
        }
        assertEquals(18 * 3, rows.size(), "one row per candidate and item asked, answered or not");
        List<Csv.Row> raw = Csv.parse(Files.readString(csv));
        assertEquals(QuestionnaireCsv.COLUMNS, raw.get(0).fields());
        Map<String, Map<String, String>> study = new HashMap<>();
        candidates.forEach(c -> study.put(c.get("candidate"), c));
        List<String> packageIds = new ArrayList<>();
        for (Csv.Row r : Csv.parse(Files.readString(exported.resolve(EXAM).resolve("csv/responses.csv"))).subList(1, 37)) {
            packageIds.add(r.fields().get(4));
        }
        for (QuestionnaireCsv.Row r : rows) {
            Map<String, String> c = study.get(r.candidateNumber());
            assertEquals(c.get(r.itemId()), r.answer(), r.candidateNumber() + " " + r.itemId());
            assertEquals(c.get("level"), r.level());
            assertEquals(c.get("conditions"), r.conditions());
            assertEquals("after", r.timing());
            assertTrue(packageIds.contains(r.packageId()), "package_id joins responses.csv");
            switch (r.itemId()) {
                case "help" -> {
                    assertEquals("likert", r.kind());
                    assertEquals(5, r.labels().size());
                    assertEquals(1, r.itemPosition());
                    if (r.answered()) {
                        assertEquals(r.labels().get(Integer.parseInt(r.answer()) - 1), r.answerLabel());
                    }
                }
                case "time" -> assertEquals(List.of("Not at all", "A little", "Mostly", "Completely"), r.labels());
                case "comments" -> assertEquals("free-text", r.kind());
                default -> throw new AssertionError(r.itemId());
            }
        }
        assertTrue(Files.readString(csv).contains("\"<script>alert('x')</script> & \"\"quoted\"\", with commas\""),
                "RFC 4180 quoting of a free-text answer");

        // the exported table fed back to analyse gives the same figures as the store
        Path report = dir.resolve("report-from-csv");
        assertEquals(0, run(out, err, new AnalyseCommand(), "--store", store.toString(), "--questionnaire", csv.toString(),
                "--out", report.toString()), err.toString());
        assertSummaryMatchesR(report.resolve("summary.json"));
    }

    @Test
    void analyse_badQuestionnaireCell_isRefusedWithRowAndColumn() throws Exception {
        Path csv = dir.resolve("bad-questionnaire.csv");
        Files.writeString(csv, String.join(",", QuestionnaireCsv.COLUMNS) + "\r\n"
                + "e,S01,A2,f,p1,with-resources without-resources,after-writing,after,1,help,likert,5,"
                + "\"[\"\"a\"\",\"\"b\"\",\"\"c\"\",\"\"d\"\",\"\"e\"\"]\",Helped?,7,\r\n");
        StringWriter out = new StringWriter(), err = new StringWriter();
        assertEquals(AnalyseCommand.INPUT_REFUSED, run(out, err, new AnalyseCommand(), "--store", store.toString(),
                "--questionnaire", csv.toString(), "--out", dir.resolve("refused").toString()));
        assertTrue(err.toString().contains("bad-questionnaire.csv, row 2, column answer: '7' is not a point of this"
                + " Likert item"), err.toString());
        assertFalse(Files.exists(dir.resolve("refused")));
    }

    private static List<Map<String, String>> rows(String file) throws Exception {
        String text;
        try (InputStream in = SimulatedStudyAnalyseExportTest.class.getResourceAsStream("/analysis/" + file)) {
            text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        List<Csv.Row> parsed = Csv.parse(text);
        List<String> header = parsed.get(0).fields();
        List<Map<String, String>> out = new ArrayList<>();
        for (Csv.Row r : parsed.subList(1, parsed.size())) {
            Map<String, String> row = new LinkedHashMap<>();
            for (int i = 0; i < header.size(); i++) {
                row.put(header.get(i), r.fields().get(i));
            }
            out.add(row);
        }
        return out;
    }
}
