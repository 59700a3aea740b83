package org.inkgate.admin.core.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.inkgate.admin.core.collection.Collector;
import org.inkgate.admin.core.qti.QtiIdentifier;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.admin.core.testutil.QtiSchemas;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * QTI results through the real collection and rating stores, validated against the official 1EdTech
 * QTI 3.0 Results Reporting schema ({@code imsqti_resultv3p0_v1p0.xsd}, test resources
 * standards/qti3). Candidate numbers start with a digit (not an NCName), one text carries CR, CRLF
 * and characters XML 1.0 forbids, and a forged off-roster package carries {@code ../} in its number.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class QtiResultsExportTest {

    /**
     * XML 1.0 section 2.2 forbids U+0001 and U+FFFF; CR, LF and tab are allowed. (An unpaired surrogate
     * cannot travel in a response package's UTF-8 JSON; XmlOutTest covers it.)
     */
    private static final String AWKWARD = "line one\r\nline two\rthree\u0001four\uFFFFfive\tsix \uD83D\uDE00 <&>\"'";
    private static final String FORGED = "../escape";

    private Path dir;
    private Path db;
    private Sitting sitting;
    private QtiResultsExport.Written written;
    private Path out;

    @BeforeAll
    void collectRateAndExport(@TempDir Path tempDir) throws Exception {
        dir = tempDir;
        sitting = Sitting.make(dir, 8, "%04d");
        Path packages = Files.createDirectories(dir.resolve("packages"));
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        for (var r : sitting.roster()) {
            String number = r.candidateNumber();
            if (number.equals("0001")) {
                ResponseDocument d = client.document(number, sitting.formOf(number), 1, "6f1c2d3e-0000-4000-8000-000000000001");
                List<TaskResponse> tasks = new ArrayList<>();
                for (TaskResponse t : d.tasks()) {
                    tasks.add(new TaskResponse(t.taskId(), t.conditionId(), AWKWARD,
                            org.inkgate.format.response.WordCount.of(AWKWARD), t.startedAt(),
                            t.endedAt(), t.extraTimeSeconds(), t.policy(), t.toolsOffered(), t.toolUse(), t.endReason()));
                }
                client.write(new ResponseDocument(d.format(), d.schemaVersion(), d.packageId(), d.examId(),
                        d.bundleManifestSha256(), d.candidateNumber(), d.seat(), d.formId(), d.clientVersion(), d.startedAt(),
                        d.submittedAt(), tasks, d.questionnaires()), 20, 1, packages.resolve(number + ".inkresp"));
            } else {
                client.write(number, sitting.formOf(number), number.hashCode(), 20, packages.resolve(number + ".inkresp"));
            }
        }
        // a package whose candidate number tries to climb out of the output folder (off the roster): collect
        // refuses it now (candidate-number), but a store written before that rule may hold one, so it goes
        // into the store directly below and the export must still keep it inside the folder
        Path forged = dir.resolve("forged.inkresp");
        client.write(FORGED, sitting.formOf("0002"), 99, 20, forged);
        db = dir.resolve("results.db");
        try (ResultsStore store = StoreFixture.of(db).results()) {
            store.registerBundle(sitting.manifest(), sitting.manifestSha256(), TestKeys.ownerFingerprint());
            store.registerRoster("test-exam", sitting.roster());
            store.registerRubric("test-exam", sitting.exam().rubric());
            new Collector(store, TestKeys.OWNER_ENCRYPTION, TestKeys.installations(),
                    Map.of(sitting.manifestSha256(), sitting.manifest()), 2).collect(Collector.packageFiles(List.of(packages)), o -> { });
            var opened = new org.inkgate.format.response.ResponsePackageReader(TestKeys.OWNER_ENCRYPTION,
                    TestKeys.installations()).open(forged);
            store.importSitting(org.inkgate.admin.core.store.SittingRecord.of(opened, "forged-before-the-rule",
                    forged.toString()));
        }
        try (RatingStore rating = StoreFixture.of(db).rating("test-exam")) {
            rating.addRater("R01", "Invented rater one", null);
            rating.addRater("R02", "Invented rater two", null);
            rating.assign(2, 20261202L, true);
            // invented scores: R01 gives 4, R02 gives 7 (mean 5.5), except that R02 leaves its last item unrated
            for (String rater : List.of("R01", "R02")) {
                List<RatingDesk.QueueItem> queue = rating.queue(rater);
                for (int i = 0; i < queue.size() - (rater.equals("R02") ? 1 : 0); i++) {
                    rating.submit(rater, queue.get(i).blindId(),
                            new RatingDesk.RatingSheet(Map.of("content", rater.equals("R01") ? 4 : 7), ""));
                }
            }
            out = dir.resolve("qti-results");
            try (ResultsStore store = StoreFixture.of(db).results()) {
                written = QtiResultsExport.write(store, "test-exam", out,
                        new QtiResultsExport.Scoring(rating.rubric(), rating.scoresByResponse()));
            }
        }
    }

    private List<Path> files() throws IOException {
        try (Stream<Path> s = Files.list(out)) {
            return s.sorted().toList();
        }
    }

    private static Document parse(Path file) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        return f.newDocumentBuilder().parse(file.toFile());
    }

    @Test
    void everyFile_validatesAgainstTheOfficialResultsSchema() throws Exception {
        assertEquals(9, written.files(), "8 roster candidates and the forged package");
        assertEquals(9, files().size());
        for (Path file : files()) {
            assertEquals(List.of(), QtiSchemas.problems(QtiSchemas.RESULTS, file), file.getFileName().toString());
        }
    }

    @Test
    void identifiers_decodeToTheOriginalIds_whichAreAlsoKeptAsStrings() throws Exception {
        for (Path file : files()) {
            Element root = parse(file).getDocumentElement();
            Element context = (Element) root.getElementsByTagNameNS(QtiResultsExport.NAMESPACE, "context").item(0);
            String sourcedId = context.getAttribute("sourcedId");
            Map<String, String> vars = contextVariables(root);
            assertEquals(vars.get("CANDIDATE_NUMBER"), QtiIdentifier.decode(sourcedId).orElseThrow());
            assertEquals(sourcedId + ".xml", file.getFileName().toString(), "file named after the validated identifier");
            Element test = (Element) root.getElementsByTagNameNS(QtiResultsExport.NAMESPACE, "testResult").item(0);
            assertEquals("test-exam", QtiIdentifier.decode(test.getAttribute("identifier")).orElseThrow());
            if (!vars.get("CANDIDATE_NUMBER").equals(FORGED)) {
                assertEquals(sitting.formOf(vars.get("CANDIDATE_NUMBER")), vars.get("FORM_ID"));
            }
            Element session = (Element) root.getElementsByTagNameNS(QtiResultsExport.NAMESPACE, "sessionIdentifier").item(0);
            assertEquals(vars.get("PACKAGE_ID"), QtiIdentifier.decode(session.getAttribute("identifier")).orElseThrow());
        }
        assertTrue(Files.exists(out.resolve("_0001.xml")), "0001 is not an NCName; the rule prefixes _");
    }

    @Test
    void forgedNumberWithDotDotSlash_staysInsideTheOutputFolder() throws Exception {
        try (Stream<Path> all = Files.walk(dir)) {
            List<Path> xml = all.filter(p -> p.toString().endsWith(".xml")).toList();
            assertEquals(9, xml.size(), "no file was written anywhere but the output folder: " + xml);
            xml.forEach(p -> assertEquals(out, p.getParent()));
        }
        assertTrue(Files.exists(out.resolve("_.._2F_escape.xml")), "'../escape' by the rule: '/' is _2F_");
        IOException refused = assertThrows(IOException.class, () -> OutputFolder.file(out, "../escape.xml"));
        assertTrue(refused.getMessage().contains("may hold only letters, digits"), refused.getMessage());
        assertThrows(IOException.class, () -> OutputFolder.file(out, ".."));
        assertThrows(IOException.class, () -> OutputFolder.file(out, "a/b.xml"));
    }

    @Test
    void text_keepsCrThroughAStandardParser_andForbiddenCharactersNeverReachTheFile() throws Exception {
        Path file = out.resolve("_0001.xml");
        String raw = Files.readString(file);
        assertFalse(raw.chars().anyMatch(c -> c == 0x1 || c == 0xFFFF), "no forbidden character in the file");
        NodeList values = parse(file).getElementsByTagNameNS(QtiResultsExport.NAMESPACE, "value");
        String expected = "line one\r\nline two\rthree\uFFFDfour\uFFFDfive\tsix \uD83D\uDE00 <&>\"'";
        int found = 0;
        for (int i = 0; i < values.getLength(); i++) {
            if (values.item(i).getTextContent().startsWith("line one")) {
                assertEquals(expected, values.item(i).getTextContent(), "CR and CRLF survive; forbidden ones are U+FFFD");
                found++;
            }
        }
        assertEquals(2, found, "both tasks");
        assertEquals(4, written.replaced(), "two forbidden characters in each of two texts");
    }

    @Test
    void scores_areOutcomeVariablesWithTheRubricRange_perRaterAndFinal() throws Exception {
        Map<String, Integer> finals = new HashMap<>();
        int pending = 0;
        int items = 0;
        for (Path file : files()) {
            NodeList itemResults = parse(file).getElementsByTagNameNS(QtiResultsExport.NAMESPACE, "itemResult");
            for (int i = 0; i < itemResults.getLength(); i++) {
                items++;
                Map<String, Element> outcomes = new HashMap<>();
                NodeList vars = ((Element) itemResults.item(i)).getElementsByTagNameNS(QtiResultsExport.NAMESPACE,
                        "outcomeVariable");
                for (int v = 0; v < vars.getLength(); v++) {
                    Element e = (Element) vars.item(v);
                    outcomes.put(e.getAttribute("identifier"), e);
                    // the rubric written by ExamFolders: content scored 1-9
                    assertEquals("1", e.getAttribute("normalMinimum"));
                    assertEquals("9", e.getAttribute("normalMaximum"));
                    assertEquals("human", e.getAttribute("external-scored"));
                }
                assertEquals("4", outcomes.get("RATING_R01_content").getTextContent().strip());
                if (outcomes.containsKey("SCORE")) {
                    // mean of the two invented ratings, (4 + 7) / 2
                    assertEquals("5.5", outcomes.get("SCORE").getTextContent().strip());
                    assertEquals("5.5", outcomes.get("SCORE_content").getTextContent().strip());
                    assertEquals("7", outcomes.get("RATING_R02_content").getTextContent().strip());
                    assertTrue(outcomes.get("SCORE").getAttribute("interpretation").contains("mean-of-ratings"));
                    finals.merge("scored", 1, Integer::sum);
                } else {
                    assertFalse(outcomes.containsKey("RATING_R02_content"), "pending: R02 has not rated it");
                    pending++;
                }
            }
        }
        assertEquals(18, items, "9 packages x 2 tasks");
        assertEquals(1, pending, "the one response R02 left unrated");
        assertEquals(17, finals.get("scored"));
        assertEquals(17, written.scored());
    }

    @Test
    void withoutRatings_theFilesStillValidateAndCarryNoOutcomes() throws Exception {
        Path plain = dir.resolve("plain");
        try (ResultsStore store = StoreFixture.of(db).results()) {
            assertEquals(9, QtiResultsExport.write(store, "test-exam", plain).files());
            List<Rows.Response> rows = new ArrayList<>();
            store.forEachResponse("test-exam", rows::add);
            assertEquals(18, rows.size());
        }
        try (Stream<Path> s = Files.list(plain)) {
            for (Path file : s.toList()) {
                assertEquals(List.of(), QtiSchemas.problems(QtiSchemas.RESULTS, file));
                assertEquals(0, parse(file).getElementsByTagNameNS(QtiResultsExport.NAMESPACE, "outcomeVariable").getLength());
            }
        }
    }

    @Test
    void theOldLayout_isRefusedByTheSchema_soTheValidatorCanFail() throws Exception {
        Path old = dir.resolve("old.xml");
        Files.writeString(old, """
                <?xml version="1.0" encoding="UTF-8"?>
                <assessmentResult xmlns="http://www.imsglobal.org/xsd/imsqti_result_v3p0">
                  <context sourcedId="0001"/>
                  <testResult identifier="test-exam/F1" datestamp="2026-12-02T10:00:00Z"/>
                </assessmentResult>
                """);
        List<String> problems = QtiSchemas.problems(QtiSchemas.RESULTS, old);
        assertEquals(2, problems.stream().filter(p -> p.contains("NCName")).count(), String.join("\n", problems));
    }

    private static Map<String, String> contextVariables(Element root) {
        Map<String, String> out = new HashMap<>();
        NodeList vars = root.getElementsByTagNameNS(QtiResultsExport.NAMESPACE, "contextVariable");
        for (int i = 0; i < vars.getLength(); i++) {
            Element e = (Element) vars.item(i);
            out.put(e.getAttribute("identifier"), e.getTextContent().strip());
        }
        assertNotNull(out.get("CANDIDATE_NUMBER"));
        return out;
    }
}
