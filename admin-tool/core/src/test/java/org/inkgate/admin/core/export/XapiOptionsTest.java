package org.inkgate.admin.core.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.admin.core.collection.Collector;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.format.response.EventType;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.BeforeParameterizedClassInvocation;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/** The xAPI export's IRI base, verb displays and light form, over a collected store. */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class XapiOptionsTest {

    /** The same tests against a SQLite file and a PostgreSQL database. */
    @Parameter
    StoreFixture.Kind kind;

    private static final String OWN = "https://assessment.invented-owner.test/xapi";
    private Path dir;
    private StoreFixture db;

    @BeforeParameterizedClassInvocation // once per kind of store
    void collect(StoreFixture.Kind kindOfStore, @TempDir Path tempDir) throws Exception {
        dir = tempDir;
        Sitting sitting = Sitting.make(dir, 6);
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
            new Collector(store, TestKeys.OWNER_ENCRYPTION, TestKeys.installations(),
                    Map.of(sitting.manifestSha256(), sitting.manifest()), 2).collect(Collector.packageFiles(List.of(packages)), o -> { });
        }
    }

    private XapiExport.Written write(Path file, XapiExport.Options options) throws Exception {
        try (ResultsStore store = db.results()) {
            return XapiExport.write(store, "test-exam", file, options);
        }
    }

    @Test
    void iriBase_isTheOwnersInEveryIri() throws Exception {
        Path file = dir.resolve("own.jsonl");
        assertTrue(write(file, new XapiExport.Options(OWN, false)).statements() > 0);
        ObjectMapper m = new ObjectMapper();
        for (String line : Files.readAllLines(file)) {
            assertFalse(line.contains("inkgate.example"), line);
            JsonNode s = m.readTree(line);
            assertTrue(s.get("actor").get("account").get("homePage").asText().startsWith(OWN + "/candidates/"));
            assertTrue(s.get("object").get("id").asText().startsWith(OWN + "/exams/test-exam"));
            s.get("context").get("extensions").fieldNames().forEachRemaining(k -> assertTrue(k.startsWith(OWN + "/extensions/"), k));
        }
    }

    @Test
    void iriBase_thatIsNoHttpAddress_isRefusedWithAnExample() {
        for (String bad : List.of("ftp://owner.test/xapi/", "owner.test/xapi", "https:///xapi/", "https://owner.test/x?y=1",
                "https://owner.test/x#f", "https://owner test/", "")) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new XapiExport.Options(bad, false),
                    bad);
            assertTrue(e.getMessage().contains("e.g. https://") || e.getMessage().contains("like https://"), e.getMessage());
        }
    }

    @Test
    void verbDisplays_areInThePastTense() throws Exception {
        for (EventType t : EventType.values()) {
            if (XapiExport.mapping(t) instanceof XapiExport.Mapping.Statement(String verb)) {
                // every verb used is a regular English verb whose past tense ends in -ed (searched, opened, accessed...)
                assertTrue(XapiExport.display(verb).endsWith("ed"), t.wireName() + " -> " + XapiExport.display(verb));
            }
        }
        assertEquals("searched", XapiExport.display("http://activitystrea.ms/schema/1.0/search"));
        assertEquals("completed", XapiExport.display("http://adlnet.gov/expapi/verbs/completed"));
        Path file = dir.resolve("displays.jsonl");
        write(file, XapiExport.Options.DEFAULT);
        ObjectMapper m = new ObjectMapper();
        for (String line : Files.readAllLines(file)) {
            JsonNode verb = m.readTree(line).get("verb");
            assertEquals(XapiExport.display(verb.get("id").asText()), verb.get("display").get("en").asText());
        }
    }

    @Test
    void light_leavesOutOnlyTheKeystrokes() throws Exception {
        Path full = dir.resolve("full.jsonl");
        Path light = dir.resolve("light.jsonl");
        XapiExport.Written all = write(full, XapiExport.Options.DEFAULT);
        XapiExport.Written some = write(light, new XapiExport.Options(XapiExport.BASE, true));
        Map<String, Integer> fullTypes = types(full);
        Map<String, Integer> lightTypes = types(light);
        assertFalse(lightTypes.containsKey("text.insert") || lightTypes.containsKey("text.delete"), lightTypes.toString());
        int keystrokes = fullTypes.getOrDefault("text.insert", 0) + fullTypes.getOrDefault("text.delete", 0);
        assertTrue(keystrokes > 0);
        assertEquals(keystrokes, some.keystrokesLeftOut());
        assertEquals(all.statements(), some.statements() + keystrokes);
        fullTypes.remove("text.insert");
        fullTypes.remove("text.delete");
        assertEquals(fullTypes, lightTypes, "everything else is kept");
        System.out.printf("xAPI export of 6 simulated candidates x 300 events: full %d statements, %d bytes;"
                + " light %d statements, %d bytes%n", all.statements(), Files.size(full), some.statements(), Files.size(light));
    }

    private static Map<String, Integer> types(Path file) throws Exception {
        ObjectMapper m = new ObjectMapper();
        Map<String, Integer> out = new TreeMap<>();
        for (String line : Files.readAllLines(file)) {
            out.merge(m.readTree(line).get("context").get("extensions").get(XapiExport.BASE + "extensions/event-type")
                    .asText(), 1, Integer::sum);
        }
        return out;
    }
}
