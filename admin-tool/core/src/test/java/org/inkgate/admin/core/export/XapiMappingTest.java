package org.inkgate.admin.core.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.inkgate.admin.core.collection.Collector;
import org.inkgate.admin.core.collection.Outcome;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.admin.core.testutil.EveryEventType;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.ResponsePackageWriter;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/** Every event type is exported with a published verb, or listed as not exported with a reason. */
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class XapiMappingTest {

    /** The same tests against a SQLite file and a PostgreSQL database. */
    @Parameter
    StoreFixture.Kind kind;

    /** ADL's xAPI verb vocabulary (http://adlnet.gov/expapi/verbs/; this list is from memory of the ADL vocabulary). */
    private static final Set<String> ADL_VERBS = Set.of("answered", "asked", "attempted", "attended", "commented",
            "completed", "exited", "experienced", "failed", "imported", "initialized", "interacted", "launched",
            "mastered", "passed", "preferred", "progressed", "registered", "responded", "resumed", "scored", "shared",
            "suspended", "terminated", "voided");
    /** Activity Streams 1.0 base schema verbs used here (checked in activitystreams/activity-schema, "Verbs"). */
    private static final Set<String> AS_VERBS = Set.of("accept", "access", "close", "experience", "ignore", "insert",
            "open", "search");

    @Test
    void mapping_everyEventType_isAPublishedVerbOrNotExportedWithAReason() {
        for (EventType t : EventType.values()) {
            switch (XapiExport.mapping(t)) {
                case XapiExport.Mapping.Statement(String verb) -> {
                    String name = verb.substring(verb.lastIndexOf('/') + 1);
                    boolean published = verb.startsWith("http://adlnet.gov/expapi/verbs/") ? ADL_VERBS.contains(name)
                            : verb.startsWith("http://activitystrea.ms/schema/1.0/") && AS_VERBS.contains(name);
                    assertTrue(published, t.wireName() + " -> " + verb);
                }
                case XapiExport.Mapping.NotExported(String why) -> assertFalse(why.isBlank(), t.wireName());
            }
        }
        // the client's own and the invigilator's events never become the candidate's statements
        assertInstanceOf(XapiExport.Mapping.NotExported.class, XapiExport.mapping(EventType.TIME_ADDED));
        assertInstanceOf(XapiExport.Mapping.NotExported.class, XapiExport.mapping(EventType.PAUSE_START));
        // the resource panel and an entry opened in it are different statements
        assertEquals(new XapiExport.Mapping.Statement("http://activitystrea.ms/schema/1.0/access"),
                XapiExport.mapping(EventType.PANEL_OPEN));
        assertEquals(new XapiExport.Mapping.Statement("http://activitystrea.ms/schema/1.0/open"),
                XapiExport.mapping(EventType.TOOL_OPEN));
    }

    @Test
    void dataDictionary_verbTable_saysWhatTheMappingDoes() throws Exception {
        List<String> lines = Files.readAllLines(Path.of(System.getProperty("user.dir")).resolve("../../docs/data-dictionary.md"));
        Map<String, String> documented = new java.util.LinkedHashMap<>();
        boolean inTable = false;
        for (String line : lines) {
            if (line.equals("| event type | verb |")) {
                inTable = true;
            } else if (inTable && line.startsWith("| `")) {
                String[] cells = line.split("\\|");
                documented.put(cells[1].trim().replace("`", ""), cells[2].trim().replace("`", ""));
            } else if (inTable && !line.startsWith("| ---")) {
                break;
            }
        }
        Map<String, String> defined = new java.util.LinkedHashMap<>();
        for (EventType t : EventType.values()) {
            defined.put(t.wireName(), switch (XapiExport.mapping(t)) {
                case XapiExport.Mapping.NotExported x -> "not exported";
                case XapiExport.Mapping.Statement(String verb) -> (verb.startsWith("http://adlnet.gov/") ? "ADL "
                        : "Activity Streams ") + verb.substring(verb.lastIndexOf('/') + 1);
            });
        }
        assertEquals(defined, documented, "docs/data-dictionary.md, xAPI verb table");
    }

    @Test
    void write_storeWithEveryEventType_exportsExactlyTheMappedTypes(@TempDir Path dir) throws Exception {
        Sitting sitting = Sitting.make(dir, 3);
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        ResponseDocument d = client.document("C001", sitting.formOf("C001"), 1, "9a3c55b0-0000-4000-8000-000000000001");
        Path packages = Files.createDirectories(dir.resolve("packages"));
        new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic())
                .write(d, EveryEventType.log(d), packages.resolve("C001.inkresp"));
        Path out = dir.resolve("statements.jsonl");
        try (ResultsStore store = StoreFixture.create(kind, dir).results()) {
            store.registerBundle(sitting.manifest(), sitting.manifestSha256(), TestKeys.ownerFingerprint());
            List<Outcome> outcomes = new Collector(store, TestKeys.OWNER_ENCRYPTION, TestKeys.installations(),
                    Map.of(sitting.manifestSha256(), sitting.manifest()), 1).collect(List.of(packages.resolve("C001.inkresp")), o -> { });
            assertInstanceOf(Outcome.Imported.class, outcomes.get(0), outcomes.get(0).toString());
            XapiExport.Written written = XapiExport.write(store, "test-exam", out);
            Set<String> exported = new TreeSet<>();
            ObjectMapper m = new ObjectMapper();
            for (String line : Files.readAllLines(out)) {
                exported.add(m.readTree(line).get("context").get("extensions")
                        .get(XapiExport.BASE + "extensions/event-type").asText());
            }
            Set<String> mapped = new TreeSet<>(Arrays.stream(EventType.values())
                    .filter(t -> XapiExport.mapping(t) instanceof XapiExport.Mapping.Statement).map(EventType::wireName).toList());
            assertEquals(mapped, exported);
            assertEquals(EventType.values().length - mapped.size(), written.notExported());
            assertEquals(mapped.size(), written.statements());
            assertEquals(0, written.unknownType());
        }
    }
}
