package org.inkgate.admin.core.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.collection.Collector;
import org.inkgate.admin.core.csv.Csv;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.QuestionItem;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.response.QuestionnaireAnswers;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.BeforeParameterizedClassInvocation;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The questionnaire table: written from a store filled by the real collector (invented sitting of
 * testutil.Sitting: one 3-point Likert item "q1"), read back by the same class (RFC 4180 by
 * {@link Csv}), and the reader's refusals with row and column.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class QuestionnaireCsvTest {

    /** The same tests against a SQLite file and a PostgreSQL database. */
    @Parameter
    StoreFixture.Kind kind;

    private static final String HEADER = String.join(",", QuestionnaireCsv.COLUMNS) + "\r\n";
    private StoreFixture db;
    private Sitting sitting;
    private final Map<String, String> answered = new HashMap<>();

    @BeforeParameterizedClassInvocation // once per kind of store
    void collect(StoreFixture.Kind kindOfStore, @TempDir Path dir) throws Exception {
        sitting = Sitting.make(dir, 6);
        Path packages = Files.createDirectories(dir.resolve("packages"));
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        int i = 0;
        for (var r : sitting.roster()) {
            String c = r.candidateNumber();
            ResponseDocument d = client.document(c, sitting.formOf(c), 7 + i, "00000000-0000-0000-0000-00000000000" + i);
            // C001 leaves the item unanswered (the client then stores nothing for it)
            Map<String, String> a = i == 0 ? Map.of() : Map.of("q1", String.valueOf(1 + i % 3));
            answered.put(c, a.getOrDefault("q1", ""));
            client.write(new ResponseDocument(d.format(), d.schemaVersion(), d.packageId(), d.examId(),
                    d.bundleManifestSha256(), d.candidateNumber(), d.seat(), d.formId(), d.clientVersion(), d.startedAt(),
                    d.submittedAt(), d.tasks(), List.of(new QuestionnaireAnswers("after", a))), 30, i,
                    packages.resolve(c + ".inkresp"));
            i++;
        }
        db = StoreFixture.create(kindOfStore, dir);
        try (ResultsStore store = db.results()) {
            store.registerBundle(sitting.manifest(), sitting.manifestSha256(), TestKeys.ownerFingerprint());
            store.registerRoster("test-exam", sitting.roster());
            new Collector(store, TestKeys.OWNER_ENCRYPTION, TestKeys.installations(),
                    Map.of(sitting.manifestSha256(), sitting.manifest()), 1).collect(Collector.packageFiles(List.of(packages)),
                    o -> { });
        }
    }

    @Test
    void write_collectedStore_oneRowPerSittingAndItem_readBackWithTheBundlesScale() throws Exception {
        StringWriter out = new StringWriter();
        try (ResultsStore store = db.results()) {
            assertEquals(6, QuestionnaireCsv.write(store, "test-exam", out));
        }
        List<Csv.Row> raw = Csv.parse(out.toString());
        assertEquals(QuestionnaireCsv.COLUMNS, raw.get(0).fields());
        List<QuestionnaireCsv.Row> rows = QuestionnaireCsv.read("q.csv", new StringReader(out.toString()));
        assertEquals(6, rows.size());
        List<String> labels = sitting.manifest().questionnaire("after").orElseThrow().items().get(0).labels();
        for (QuestionnaireCsv.Row r : rows) {
            assertEquals(answered.get(r.candidateNumber()), r.answer(), r.candidateNumber());
            assertEquals("likert", r.kind(), "the contract's wire name of QuestionItem.Kind.LIKERT");
            assertEquals(labels, r.labels());
            assertEquals(sitting.formOf(r.candidateNumber()), r.formId());
            assertEquals(2, r.conditions().split(" ").length, "both conditions, in the order sat");
            assertEquals("after", r.timing());
        }
        QuestionnaireCsv.Row unanswered = rows.stream().filter(r -> r.candidateNumber().equals("C001")).findFirst()
                .orElseThrow();
        assertTrue(!unanswered.answered() && unanswered.answerLabel().isEmpty(), "asked, not answered");
        assertEquals(labels.get(1), rows.stream().filter(r -> r.answer().equals("2")).findFirst().orElseThrow().answerLabel());
    }

    @Test
    void registerBundle_changedItemUnderTheSameId_isRefusedAndChangesNothing() throws Exception {
        BundleManifest m = sitting.manifest();
        QuestionnaireSpec q = m.questionnaires().get(0);
        QuestionItem changed = new QuestionItem(q.items().get(0).id(), q.items().get(0).text(), QuestionItem.Kind.LIKERT,
                List.of("no", "yes"));
        BundleManifest other = new BundleManifest(m.format(), m.schemaVersion(), m.examId(), m.title(), m.language(),
                m.instructionsFile(), m.tasks(), m.conditions(), m.forms(),
                List.of(new QuestionnaireSpec(q.id(), q.title(), List.of(changed))), m.packs(), m.roster(), m.ownerKeys(),
                m.invigilatorPin(), m.seal(), m.practice(), m.entries());
        try (ResultsStore store = db.results()) {
            StoreException e = assertThrows(StoreException.class,
                    () -> store.registerBundle(other, "0".repeat(64), TestKeys.ownerFingerprint()));
            assertTrue(e.getMessage().contains("differs from the item of that id"), e.getMessage());
            assertTrue(!store.hasBundle("0".repeat(64)), "nothing of the refused bundle was stored");
        }
    }

    private static List<String> problems(String csv) {
        QuestionnaireCsv.Refused e = assertThrows(QuestionnaireCsv.Refused.class,
                () -> QuestionnaireCsv.read("q.csv", new StringReader(csv)));
        List<String> out = new ArrayList<>();
        e.problems().forEach(p -> out.add(p.describe()));
        return out;
    }

    private static String row(String candidate, String item, String kind, String points, String labels, String answer) {
        return String.join(",", "e", candidate, "B1", "F1", "p-" + candidate, "with without", "after", "after", "1", item,
                kind, points, labels, "Invented?", answer, "") + "\r\n";
    }

    @Test
    void read_badRows_refusedWithRowAndColumn() {
        String labels = "\"[\"\"no\"\",\"\"yes\"\"]\"";
        List<String> p = problems(HEADER + row("C1", "q1", "likert", "2", labels, "3")
                + row("C2", "q1", "scale", "", "", "x")
                + row("C3", "q1", "likert", "3", labels, "1")
                + row("C4", "q2", "likert", "2", labels, "1") + row("C4", "q2", "likert", "2", labels, "2")
                + row("", "q3", "free-text", "", "", "hello"));
        assertTrue(p.contains("q.csv, row 2, column answer: '3' is not a point of this Likert item; give a whole number"
                + " from 1 to 2, or leave it empty (not answered)"), p.toString());
        assertTrue(p.contains("q.csv, row 3, column kind: 'scale' is not a kind; use likert, free-text or leave it empty"
                + " (no definition)"), p.toString());
        assertTrue(p.contains("q.csv, row 4, column scale_labels_json: holds 2 labels for 3 points; give one label per"
                + " point, lowest first"), p.toString());
        assertTrue(p.stream().anyMatch(x -> x.startsWith("q.csv, row 6, column item_id: package p-C4 has a second row")),
                p.toString());
        assertTrue(p.contains("q.csv, row 7, column candidate_number: empty; every row needs a candidate_number"),
                p.toString());
    }

    @Test
    void read_controlCharactersInACell_neverReachTheMessage() {
        List<String> p = problems(HEADER + row("C1", "q1", "lik\u001b[2Jert", "", "", "1"));
        assertTrue(p.get(0).contains("'lik?[2Jert' is not a kind"), p.toString());
    }

    @Test
    void read_missingColumn_namesIt() {
        List<String> p = problems("candidate_number,item_id\r\nC1,q1\r\n");
        assertTrue(p.get(0).contains("required column 'level' is missing"), p.toString());
    }
}
