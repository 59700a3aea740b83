package org.inkgate.admin.core.collection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.UnaryOperator;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.admin.core.testutil.EveryEventType;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.ResponsePackageWriter;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Packages whose process log breaks the event contract (docs/formats.md, "Event types"), written by
 * the format's real writer and signed by an enrolled test installation, so that only the contract
 * can refuse them, collected through the collection service the collect command runs.
 */
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class EventContractCollectTest {

    /** The same tests against a SQLite file and a PostgreSQL database. */
    @Parameter
    StoreFixture.Kind kind;

    @TempDir
    Path dir;

    private StoreFixture store;

    /** This test's store, made on first use. */
    private StoreFixture store() {
        if (store == null) {
            store = StoreFixture.create(kind, dir);
        }
        return store;
    }

    private Sitting sitting;
    private Path packages;
    private final ResponsePackageWriter writer = new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING,
            TestKeys.ownerEncryptionPublic());

    private ResponseDocument document(String candidate) {
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        return client.document(candidate, sitting.formOf(candidate), candidate.hashCode(),
                java.util.UUID.nameUUIDFromBytes(candidate.getBytes(java.nio.charset.StandardCharsets.UTF_8)).toString());
    }

    /** The candidate's simulated log with event {@code seq} replaced by {@code edit}'s result. */
    private Path write(String candidate, String file, long seq, UnaryOperator<ProcessEvent> edit) throws Exception {
        ResponseDocument d = document(candidate);
        List<ProcessEvent> events = new ArrayList<>(SimulatedSitting.events(d, 60, 7));
        if (seq > 0) {
            events.set((int) seq - 1, edit.apply(events.get((int) seq - 1)));
        }
        Path out = packages.resolve(file);
        writer.write(d, events, out);
        return out;
    }

    private static ProcessEvent with(ProcessEvent e, String type, String task, Map<String, Object> data) {
        return new ProcessEvent(e.seq(), e.at(), e.mono(), type, task, data);
    }

    private CollectionRun.Report collect() throws Exception {
        return CollectionRun.run(new CollectionRun.Request(store().location(), List.of(sitting.bundle()),
                List.of(packages), TestKeys.OWNER_ENCRYPTION, TestKeys.ownerFingerprint(), TestKeys.installations(),
                null, null, null, 2), n -> { }, o -> { });
    }

    @Test
    void collect_logsBreakingTheContract_areRefusedNamingFileSeqAndTypeAndNothingIsCounted() throws Exception {
        sitting = Sitting.make(dir, 6);
        packages = Files.createDirectories(dir.resolve("usb-stick"));
        write("C001", "C001-good.inkresp", 0, e -> e);
        // event 5 of the simulated log is a text.insert of the first task
        write("C002", "C002-unknown-type.inkresp", 5, e -> with(e, "tool.close", e.task(), Map.of("tool", "glossary")));
        write("C003", "C003-missing-key.inkresp", 5, e -> with(e, "text.insert", e.task(),
                Map.of("pos", 0, "len", 1, "source", "typing")));
        write("C004", "C004-foreign-task.inkresp", 5, e -> with(e, e.type(), "t-not-in-form", e.data()));
        write("C005", "C005-task-event-without-task.inkresp", 5, e -> with(e, e.type(), null, e.data()));
        ResponseDocument every = document("C006");
        writer.write(every, EveryEventType.log(every), packages.resolve("C006-every-type.inkresp"));

        CollectionRun.Report report = collect();

        Map<String, String> byFile = new TreeMap<>();
        report.outcomes().forEach(o -> byFile.put(Path.of(o.file()).getFileName().toString(), switch (o) {
            case Outcome.Imported i -> "imported";
            case Outcome.AlreadyImported a -> "already";
            case Outcome.SameAsImported s -> "same";
            case Outcome.Refused r -> "refused:" + r.reason();
        }));
        assertEquals(Map.of("C001-good.inkresp", "imported", "C002-unknown-type.inkresp", "refused:event-contract",
                "C003-missing-key.inkresp", "refused:event-contract", "C004-foreign-task.inkresp", "refused:event-contract",
                "C005-task-event-without-task.inkresp", "refused:event-contract", "C006-every-type.inkresp", "imported"),
                byFile);
        Map<String, String> messages = new TreeMap<>();
        report.refused().forEach(r -> messages.put(Path.of(r.file()).getFileName().toString(), r.message()));
        assertContains(messages.get("C002-unknown-type.inkresp"), "C002-unknown-type.inkresp",
                "event 5 (tool.close): not an event type");
        assertContains(messages.get("C003-missing-key.inkresp"), "event 5 (text.insert): data key \"text\" missing");
        assertContains(messages.get("C004-foreign-task.inkresp"),
                "event 5 (text.insert): names task \"t-not-in-form\", which is not one of the response's tasks");
        assertContains(messages.get("C005-task-event-without-task.inkresp"), "event 5 (text.insert): a task-level event without a task");
        messages.values().forEach(m -> assertContains(m, "keep the file and report it"));

        try (ResultsStore store = store().results()) {
            // only C001's and C006's events are in the store; the refusals are recorded with their reason
            List<String> candidates = new ArrayList<>();
            store.forEachEvent("test-exam", e -> candidates.add(e.candidateNumber()));
            assertEquals(List.of("C001", "C006"), candidates.stream().distinct().sorted().toList());
            assertEquals(4, store.refusals().stream().filter(r -> r.reason().equals("event-contract")).count());
        }
    }

    @Test
    void contractBreaches_manyBrokenEvents_listsFiveAndCountsTheRest() throws Exception {
        sitting = Sitting.make(dir, 6);
        ResponseDocument d = document("C001");
        List<ProcessEvent> events = new ArrayList<>();
        for (int i = 1; i <= 8; i++) {
            events.add(new ProcessEvent(i, Instant.parse("2026-06-15T09:00:00Z").plusSeconds(i), i, "key.typed",
                    d.tasks().get(0).taskId(), Map.of()));
        }
        String text = Collector.contractBreaches(d, events);
        assertContains(text, "breaks the event contract 8 times: event 1 (key.typed)");
        assertContains(text, "event 5 (key.typed)");
        assertContains(text, "; and 3 more");
        assertTrue(!text.contains("event 6 (key.typed)"), text);
    }

    private static void assertContains(String text, String... parts) {
        for (String p : parts) {
            assertTrue(text != null && text.contains(p), "expected \"" + p + "\" in: " + text);
        }
    }
}
