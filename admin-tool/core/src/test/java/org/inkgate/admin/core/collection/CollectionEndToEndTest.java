package org.inkgate.admin.core.collection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A simulated 200-seat sitting: a bundle built by the bundle builder, packages written by the
 * real ResponsePackageWriter, with tampered, duplicated, re-sent, conflicting, untrusted and
 * foreign packages mixed in. The expected rows follow from how the files were made.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class CollectionEndToEndTest {

    @Parameter
    StoreFixture.Kind kind;

    private static final int SEATS = 200;
    private static final int EVENTS = 40;

    private Path dir;
    private Sitting sitting;
    private Path packages;

    @BeforeAll
    void writeTheSitting(@TempDir Path tempDir) throws Exception {
        dir = tempDir;
        sitting = Sitting.make(dir, SEATS);
        packages = Files.createDirectories(dir.resolve("usb-stick"));
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        // C001-C197 sit normally; C198 and C199 never hand anything in; C200 hands in only a damaged file
        for (int i = 1; i <= 197; i++) {
            String c = String.format("C%03d", i);
            client.write(c, sitting.formOf(c), i, EVENTS, packages.resolve(c + ".inkresp"));
        }
        client.write("C200", sitting.formOf("C200"), 200, EVENTS, dir.resolve("C200.inkresp"));
        Files.write(packages.resolve("C200.inkresp"), flipped(Files.readAllBytes(dir.resolve("C200.inkresp"))));
        // a damaged second copy of C015
        Files.write(packages.resolve("C015-copy-damaged.inkresp"), flipped(Files.readAllBytes(packages.resolve("C015.inkresp"))));
        // the same file twice (C010), and C011 re-sent: same package id and content, encrypted again
        Files.copy(packages.resolve("C010.inkresp"), packages.resolve("C010-again.inkresp"));
        ResponseDocument c011 = client.document("C011", sitting.formOf("C011"), 11, packageId("C011", 11));
        client.write(c011, EVENTS, 11, packages.resolve("C011-resent.inkresp"));
        // C012 sat twice: a different package with other texts
        ResponseDocument c012 = client.document("C012", sitting.formOf("C012"), 9012, packageId("C012", 9012));
        client.write(c012, EVENTS, 9012, packages.resolve("C012-second-machine.inkresp"));
        // C013 from a client installation that was never enrolled
        new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(), TestKeys.OTHER_SIGNING,
                TestKeys.ownerEncryptionPublic()).write("C013", sitting.formOf("C013"), 13, EVENTS,
                packages.resolve("C013-unknown-machine.inkresp"));
        // C014 written from another bundle
        new SimulatedSitting(sitting.manifest(), "ab".repeat(32), TestKeys.INSTALLATION_SIGNING,
                TestKeys.ownerEncryptionPublic()).write("C014", sitting.formOf("C014"), 14, EVENTS,
                packages.resolve("C014-other-bundle.inkresp"));
        // C016's response edited to another form's tasks, then signed by the enrolled client
        ResponseDocument c016 = client.document("C016", sitting.formOf("C016"), 16, packageId("C016", 9016));
        List<TaskResponse> swapped = new ArrayList<>(c016.tasks());
        java.util.Collections.reverse(swapped);
        client.write(new ResponseDocument(c016.format(), c016.schemaVersion(), c016.packageId(), c016.examId(),
                c016.bundleManifestSha256(), c016.candidateNumber(), c016.seat(), c016.formId(), c016.clientVersion(),
                c016.startedAt(), c016.submittedAt(), swapped, c016.questionnaires()), EVENTS, 16,
                packages.resolve("C016-tasks-swapped.inkresp"));
    }

    private static String packageId(String candidate, long seed) {
        return java.util.UUID.nameUUIDFromBytes(("test-exam|" + candidate + "|" + seed)
                .getBytes(java.nio.charset.StandardCharsets.UTF_8)).toString();
    }

    private static byte[] flipped(byte[] bytes) {
        byte[] copy = bytes.clone();
        copy[copy.length / 2] ^= 0x40;
        return copy;
    }

    private Collector collector(ResultsStore store) {
        return new Collector(store, TestKeys.OWNER_ENCRYPTION, TestKeys.installations(),
                Map.of(sitting.manifestSha256(), sitting.manifest()), 2);
    }

    @Test
    void collect_mixedSitting_storesExactlyTheGoodPackagesAndNamesEachProblem() throws Exception {
        try (ResultsStore store = StoreFixture.create(kind, dir, "results-" + System.nanoTime() + ".db").results()) {
            store.registerBundle(sitting.manifest(), sitting.manifestSha256(), TestKeys.ownerFingerprint());
            store.registerRoster("test-exam", sitting.roster());
            List<Outcome> outcomes = collector(store).collect(Collector.packageFiles(List.of(packages)), o -> { });

            Map<String, String> byFile = new TreeMap<>();
            outcomes.forEach(o -> byFile.put(Path.of(o.file()).getFileName().toString(), switch (o) {
                case Outcome.Imported i -> "imported";
                case Outcome.AlreadyImported a -> "already";
                case Outcome.SameAsImported s -> "same";
                case Outcome.Refused r -> "refused:" + r.reason();
            }));
            assertEquals(205, byFile.size(), "197 + C200 + 7 extra files");
            // a flipped byte inside a stored entry fails its CRC first (APPNOTE 4.4.7), before decryption is tried
            assertEquals("refused:MalformedArchive", byFile.get("C200.inkresp"));
            assertEquals("refused:MalformedArchive", byFile.get("C015-copy-damaged.inkresp"));
            // files are taken in name order: "C010-again" comes before "C010.inkresp"
            assertEquals("imported", byFile.get("C010-again.inkresp"));
            assertEquals("already", byFile.get("C010.inkresp"));
            assertEquals("imported", byFile.get("C011-resent.inkresp"));
            assertEquals("same", byFile.get("C011.inkresp"));
            assertEquals("imported", byFile.get("C012-second-machine.inkresp"));
            assertEquals("refused:UntrustedSigner", byFile.get("C013-unknown-machine.inkresp"));
            assertEquals("refused:unknown-bundle", byFile.get("C014-other-bundle.inkresp"));
            assertEquals("refused:form-mismatch", byFile.get("C016-tasks-swapped.inkresp"));
            assertEquals(198, byFile.values().stream().filter("imported"::equals).count());

            Map<String, Long> counts = store.counts();
            assertEquals(198, counts.get("sittings"), "197 good packages and C012's second");
            assertEquals(198 * 2, counts.get("responses"), "two tasks per form");
            assertEquals(198L * EVENTS, counts.get("process_events"));
            assertEquals(198, counts.get("questionnaire_answers"), "one Likert item each");
            assertEquals(5, counts.get("refusals"), "C200, C015 damaged copy, C013, C014, C016");
            assertEquals(SEATS, counts.get("candidates"));
            assertEquals(SEATS, counts.get("candidate_personal"));

            List<Rows.Conflict> conflicts = store.conflicts("test-exam");
            assertEquals(List.of("C012", "C012"), conflicts.stream().map(Rows.Conflict::candidateNumber).toList());
            assertTrue(conflicts.stream().allMatch(c -> c.copies() == 2));

            MissingReport missing = MissingReport.of(store, "test-exam");
            List<String> absent = missing.byForm().values().stream().flatMap(List::stream)
                    .map(MissingReport.Missing::candidateNumber).sorted().toList();
            assertEquals(List.of("C198", "C199", "C200"), absent);
            assertTrue(missing.byForm().values().stream().flatMap(List::stream).allMatch(m -> m.taskId() == null));
            missing.byForm().forEach((form, list) -> list.forEach(m -> assertEquals(sitting.formOf(m.candidateNumber()), form)));

            // a rerun changes nothing
            List<Outcome> again = collector(store).collect(Collector.packageFiles(List.of(packages)), o -> { });
            assertEquals(counts, store.counts());
            assertEquals(0, again.stream().filter(o -> o instanceof Outcome.Imported).count());
        }
    }
}
