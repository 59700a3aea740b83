package org.inkgate.admin.core.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.UUID;
import javax.xml.parsers.DocumentBuilderFactory;
import org.inkgate.admin.core.collection.Collector;
import org.inkgate.admin.core.csv.Csv;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.Node;
import org.junit.jupiter.params.BeforeParameterizedClassInvocation;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Exports checked against the standards' structure as condensed in the team's STANDARDS.md (QTI 3.0
 * results; xAPI 1.0.3 statement rules) and against RFC 4180 by reading the CSV back.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class ExportsTest {

    /** The same tests against a SQLite file and a PostgreSQL database. */
    @Parameter
    StoreFixture.Kind kind;

    private static final String QTI = "http://www.imsglobal.org/xsd/imsqti_result_v3p0";
    private Path dir;
    private StoreFixture db;
    private Sitting sitting;

    @BeforeParameterizedClassInvocation // once per kind of store
    void collectASmallSitting(StoreFixture.Kind kindOfStore, @TempDir Path tempDir) throws Exception {
        dir = tempDir;
        sitting = Sitting.make(dir, 12);
        Path packages = Files.createDirectories(dir.resolve("packages"));
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        for (var r : sitting.roster()) {
            client.write(r.candidateNumber(), sitting.formOf(r.candidateNumber()), r.candidateNumber().hashCode(), 300,
                    packages.resolve(r.candidateNumber() + ".inkresp"));
        }
        db = StoreFixture.create(kindOfStore, dir);
        try (ResultsStore store = db.results()) {
            store.registerBundle(sitting.manifest(), sitting.manifestSha256(), TestKeys.ownerFingerprint());
            store.registerRoster("test-exam", sitting.roster());
            new Collector(store, TestKeys.OWNER_ENCRYPTION, TestKeys.installations(),
                    Map.of(sitting.manifestSha256(), sitting.manifest()), 2).collect(Collector.packageFiles(List.of(packages)), o -> { });
        }
    }

    @Test
    void tidyCsv_readBackAsRfc4180_givesOneRowPerResponseWithTheStoredValues() throws Exception {
        Path out = dir.resolve("csv");
        try (ResultsStore store = db.results()) {
            long[] rows = TidyCsvExport.write(store, "test-exam", out);
            assertEquals(24, rows[0], "12 candidates x 2 tasks");
            List<Rows.Response> stored = new ArrayList<>();
            store.forEachResponse("test-exam", stored::add);
            List<Csv.Row> read = Csv.parse(Files.readString(out.resolve("responses.csv"), StandardCharsets.UTF_8));
            assertEquals(TidyCsvExport.RESPONSE_COLUMNS, read.get(0).fields());
            assertEquals(25, read.size());
            int text = TidyCsvExport.RESPONSE_COLUMNS.indexOf("text");
            int candidate = TidyCsvExport.RESPONSE_COLUMNS.indexOf("candidate_number");
            for (int i = 0; i < stored.size(); i++) {
                assertEquals(stored.get(i).text(), read.get(i + 1).fields().get(text));
                assertEquals(stored.get(i).candidateNumber(), read.get(i + 1).fields().get(candidate));
            }
            String all = Files.readString(out.resolve("responses.csv"));
            assertFalse(all.contains("Invented Person"), "personal roster fields never leave the store");
            List<Csv.Row> events = Csv.parse(Files.readString(out.resolve("events.csv")));
            assertEquals(12 * 300 + 1, events.size());
            assertEquals(TidyCsvExport.EVENT_COLUMNS.size(), events.get(1).fields().size());
            new ObjectMapper().readTree(events.get(1).fields().get(TidyCsvExport.EVENT_COLUMNS.indexOf("data_json")));
        }
    }

    @Test
    void qtiResults_followTheResultsElementStructure() throws Exception {
        Path out = dir.resolve("qti");
        try (ResultsStore store = db.results()) {
            assertEquals(12, QtiResultsExport.write(store, "test-exam", out).files());
        }
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        File[] files = out.toFile().listFiles();
        assertNotNull(files);
        for (File file : files) {
            Document doc = f.newDocumentBuilder().parse(file);
            Element root = doc.getDocumentElement();
            // STANDARDS.md: assessmentResult > context@sourcedId > itemResult(identifier, sequenceIndex, datestamp,
            // sessionStatus) > responseVariable > candidateResponse > value, camelCase names in the results namespace
            assertEquals(QTI, root.getNamespaceURI());
            assertEquals("assessmentResult", root.getLocalName());
            List<Element> children = elements(root);
            assertEquals("context", children.get(0).getLocalName(), "context comes first");
            String candidate = children.get(0).getAttribute("sourcedId");
            assertEquals(file.getName(), candidate + ".xml");
            assertEquals("test-exam", children.get(1).getAttribute("identifier"), "the exam id; the form is a context variable");
            List<Element> items = children.stream().filter(e -> e.getLocalName().equals("itemResult")).toList();
            assertEquals(2, items.size());
            for (int i = 0; i < items.size(); i++) {
                Element item = items.get(i);
                assertEquals(String.valueOf(i + 1), item.getAttribute("sequenceIndex"));
                assertEquals("final", item.getAttribute("sessionStatus"));
                OffsetDateTime.parse(item.getAttribute("datestamp")); // xs:dateTime with zone
                assertEquals(sitting.manifest().form(sitting.formOf(candidate)).orElseThrow().slots().get(i).taskId(),
                        item.getAttribute("identifier"));
                Element variable = elements(item).get(0);
                assertEquals("responseVariable", variable.getLocalName());
                assertEquals("single", variable.getAttribute("cardinality"));
                assertEquals("string", variable.getAttribute("baseType"));
                Element response = elements(variable).get(0);
                assertEquals("candidateResponse", response.getLocalName());
                Element value = elements(response).get(0);
                assertEquals("value", value.getLocalName());
                assertTrue(value.getTextContent().startsWith("(Simulated response"));
            }
        }
    }

    @Test
    void xapiStatements_keepTheStatementRules() throws Exception {
        Path out = dir.resolve("statements.jsonl");
        try (ResultsStore store = db.results()) {
            assertEquals(12 * 300, XapiExport.write(store, "test-exam", out).statements());
        }
        ObjectMapper m = new ObjectMapper();
        Set<String> ids = new HashSet<>();
        List<String> lines = Files.readAllLines(out);
        assertEquals(12 * 300, lines.size(), "one statement per line (JSON lines)");
        for (String line : lines) {
            JsonNode s = m.readTree(line);
            // xAPI 1.0.3 Data 2.4: id is a UUID; actor is an Agent with exactly one identifier (account{homePage,name})
            assertTrue(ids.add(UUID.fromString(s.get("id").asText()).toString()), "statement ids are unique");
            JsonNode actor = s.get("actor");
            int identifiers = 0;
            for (String ifi : List.of("mbox", "mbox_sha1sum", "openid", "account")) {
                identifiers += actor.has(ifi) ? 1 : 0;
            }
            assertEquals(1, identifiers);
            assertTrue(actor.get("account").get("homePage").asText().startsWith("https://"));
            assertFalse(actor.get("account").get("name").asText().isEmpty());
            // verb id is an IRI, display a language map; object an Activity with an IRI id
            assertTrue(s.get("verb").get("id").asText().matches("https?://.+"));
            assertTrue(s.get("verb").get("display").has("en"));
            assertEquals("Activity", s.get("object").get("objectType").asText());
            assertTrue(s.get("object").get("id").asText().matches("https?://.+"));
            // context.registration is a UUID; timestamp is ISO 8601 with a zone
            UUID.fromString(s.get("context").get("registration").asText());
            OffsetDateTime.parse(s.get("timestamp").asText());
            s.get("context").get("extensions").fieldNames().forEachRemaining(k -> assertTrue(k.startsWith("https://"),
                    "extension keys are IRIs"));
        }
        assertEquals(ids.size(), lines.size());
    }

    private static List<Element> elements(Element parent) {
        List<Element> out = new ArrayList<>();
        for (Node n = parent.getFirstChild(); n != null; n = n.getNextSibling()) {
            if (n instanceof Element e) {
                out.add(e);
            }
        }
        return out;
    }
}
