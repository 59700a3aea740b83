package org.inkgate.format.bundle;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import com.fasterxml.jackson.databind.JsonNode;
import org.inkgate.format.json.Json;
import org.inkgate.format.json.SchemaCheck;
import org.inkgate.format.refusal.InvalidContent;
import org.inkgate.format.refusal.MalformedJson;
import org.inkgate.format.refusal.UnsupportedSchema;
import org.inkgate.format.testutil.SampleExam;
import org.inkgate.format.testutil.SignedBundles;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.format.trust.TrustPolicy;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The declared study design in the manifest: parallel and three-condition bundles write, read and keep their rules. */
class StudyDesignBundleTest {

    @TempDir
    Path dir;

    private final BundleReader reader = new BundleReader(TrustPolicy.anySigner());

    /** Three conditions (none / spelling check only / spelling with word count), each form one of them for both tasks. */
    static BundleManifest parallelThreeConditions() {
        BundleManifest sample = SampleExam.manifest();
        List<ConditionSpec> conditions = List.of(new ConditionSpec("none", "No tools"),
                new ConditionSpec("spelling", "Spelling check only"), new ConditionSpec("full", "Spelling and more"));
        ResourcePolicy[] policies = {ResourcePolicy.noTools(),
            new ResourcePolicy(SpellingMode.UNDERLINE_ONLY, null, null, false, false, PastePolicy.NONE),
            SampleExam.WITH_TOOLS};
        List<FormSpec> forms = new ArrayList<>();
        for (int c = 0; c < 3; c++) {
            String id = conditions.get(c).id();
            forms.add(new FormSpec("P" + c, List.of(new FormSlot("t1", id, policies[c]), new FormSlot("t2", id,
                    policies[c])), null, "after", 0));
        }
        List<RosterEntry> roster = List.of(new RosterEntry("1001", "P0", 0, false, false),
                new RosterEntry("1002", "P1", 0, false, false), new RosterEntry("1003", "P2", 0, false, false));
        return new BundleManifest(sample.format(), sample.schemaVersion(), sample.examId(), sample.title(),
                sample.language(), sample.instructionsFile(), sample.tasks(), conditions, forms, sample.questionnaires(),
                sample.packs(), roster, sample.ownerKeys(), null, null, true, Map.of(), StudyDesign.PARALLEL);
    }

    @Test
    void writeAndOpen_parallelBundleWithThreeConditions_keepsTheDesignAndEveryForm() throws Exception {
        Path file = dir.resolve("parallel.inkexam");
        new BundleWriter(TestKeys.OWNER_SIGNING).write(parallelThreeConditions(), SampleExam.contents(), file);
        assertTrue(new String(SignedBundles.entry(file, "manifest.json"), StandardCharsets.UTF_8)
                .contains("\"design\" : \"parallel\""));
        try (OpenedBundle b = reader.open(file)) {
            assertEquals(StudyDesign.PARALLEL, b.manifest().design());
            assertEquals(3, b.manifest().conditions().size());
            assertEquals("spelling", b.manifest().form("P1").orElseThrow().slots().get(1).conditionId());
        }
    }

    @Test
    void write_bundleWithADesign_isSchemaVersion2_whichAVersion1ReaderRefusesByItsNumber() throws Exception {
        Path file = dir.resolve("parallel.inkexam");
        new BundleWriter(TestKeys.OWNER_SIGNING).write(parallelThreeConditions(), SampleExam.contents(), file);
        JsonNode tree = Json.mapper().readTree(SignedBundles.entry(file, "manifest.json"));
        assertEquals(2, tree.path("schemaVersion").asInt());

        // the check a version-1 reader makes after the signature (BundleReader with SCHEMA_VERSION = 1, before
        // this field): it refuses by the number, naming both versions, before it could trip over the unknown key
        UnsupportedSchema refusal = assertThrows(UnsupportedSchema.class, () -> SchemaCheck.requireVersion(
                "parallel.inkexam", tree, 1, "bundle", "Install the client version the test owner names for this exam."));
        assertTrue(refusal.getMessage().contains("uses schema version 2, newer than the 1 this version reads. Install the"
                + " client version the test owner names"), refusal.getMessage());
    }

    @Test
    void write_bundleWithoutADesign_staysSchemaVersion1_soEarlierClientsStillOpenIt() throws Exception {
        JsonNode tree = Json.mapper().readTree(SignedBundles.entry(SignedBundles.good(dir), "manifest.json"));
        assertEquals(1, tree.path("schemaVersion").asInt());
        assertTrue(tree.path("design").isMissingNode());
    }

    @Test
    void open_version1ManifestDeclaringADesign_isRefusedSayingWhichVersionHoldsIt() throws Exception {
        ObjectNode tree = (ObjectNode) Json.mapper().readTree(SignedBundles.entry(SignedBundles.good(dir), "manifest.json"));
        tree.put("design", "crossover");
        InvalidContent refusal = assertThrows(InvalidContent.class, () -> reader.open(SignedBundles.signedWith(dir,
                "v1-with-design.inkexam", Json.write(tree), Map.of())).close());
        assertTrue(refusal.getMessage().contains("declares design \"crossover\" under schemaVersion 1, which has no design"
                + " field"), refusal.getMessage());
    }

    @Test
    void open_bundleWithoutADesign_readsAsUndeclared() throws Exception {
        try (OpenedBundle b = reader.open(SignedBundles.good(dir))) {
            assertNull(b.manifest().design());
        }
    }

    @Test
    void write_parallelDesignWhoseFormMixesConditions_isRefusedSayingWhy() {
        BundleManifest mixed = SampleExam.manifest().withDesign(StudyDesign.PARALLEL);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new BundleWriter(
                TestKeys.OWNER_SIGNING).write(mixed, SampleExam.contents(), dir.resolve("mixed.inkexam")));
        assertTrue(e.getMessage().contains("form \"A\" mixes conditions [with, without], but the bundle declares a"
                + " parallel design"), e.getMessage());
    }

    @Test
    void open_signedParallelManifestWhoseFormMixesConditions_isRefusedAsInvalidContent() throws Exception {
        ObjectNode tree = (ObjectNode) Json.mapper().readTree(SignedBundles.entry(SignedBundles.good(dir), "manifest.json"));
        tree.put("schemaVersion", 2).put("design", "parallel");
        InvalidContent refusal = assertThrows(InvalidContent.class, () -> reader.open(SignedBundles.signedWith(dir,
                "mixed.inkexam", Json.write(tree), Map.of())).close());
        assertTrue(refusal.getMessage().contains("mixes conditions"), refusal.getMessage());
    }

    @Test
    void open_unknownDesign_isRefusedNamingTheField() throws Exception {
        ObjectNode tree = (ObjectNode) Json.mapper().readTree(SignedBundles.entry(SignedBundles.good(dir), "manifest.json"));
        tree.put("schemaVersion", 2).put("design", "between");
        MalformedJson refusal = assertThrows(MalformedJson.class, () -> reader.open(SignedBundles.signedWith(dir,
                "unknown.inkexam", Json.write(tree), Map.of())).close());
        assertTrue(refusal.getMessage().contains("design"), refusal.getMessage());
    }
}
