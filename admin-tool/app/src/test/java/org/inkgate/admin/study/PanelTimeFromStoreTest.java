package org.inkgate.admin.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.inkgate.admin.core.bundling.BundleBuilder;
import org.inkgate.admin.core.collection.CollectionRun;
import org.inkgate.admin.core.collection.Outcome;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.FormAssigner;
import org.inkgate.admin.core.forms.FormDesigner;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.roster.RosterReader;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.admin.testutil.DemoSource;
import org.inkgate.analysis.data.ProcessEvent;
import org.inkgate.analysis.process.ProcessMeasures;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.ResponsePackageWriter;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.format.trust.TrustPolicy;
import org.inkgate.packs.glossary.GlossaryPacks;
import org.inkgate.packs.policy.Tool;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Time in the resource panel and time on task computed from a real results store: a package whose
 * log is written in the client's vocabulary and order (docs/formats.md: the first tool page comes
 * into view after task.start, a tab switch is a close and an open, the workspace logs its last
 * page's close just after task.end), collected by the collection service, read back by the
 * store-to-analysis mapping, measured by ProcessMeasures. The expected figures follow from the
 * script below by the definitions in docs/analysis.md.
 */
class PanelTimeFromStoreTest {

    @Test
    void measuresFromStore_panelSpansAndEntryOpenings_givePanelTimeFromPanelEventsOnly(@TempDir Path dir) throws Exception {
        ExamSource exam = ExamSourceReader.read(withGlossary(DemoSource.copyExam(dir.resolve("exam-source"))));
        List<RosterCandidate> roster = RosterReader.read(DemoSource.DEMO.resolve("roster.csv"));
        Assignment assignment = FormAssigner.assign(roster.stream()
                .map(r -> new FormAssigner.Candidate(r.candidateNumber(), r.level())).toList(),
                FormDesigner.forms(exam), FormDesigner.blockSize(exam), 20261202L);
        Path bundle = dir.resolve("demo.inkexam");
        BundleBuilder.build(exam, roster, assignment, TestKeys.ownerKeys(), TestKeys.OWNER_SIGNING,
                "invented-pin-2468".toCharArray(), false, bundle);
        Path packages = Files.createDirectories(dir.resolve("packages"));
        String candidate = roster.get(0).candidateNumber();
        ResponseDocument d;
        try (OpenedBundle b = new BundleReader(TrustPolicy.trusting(Set.of(TestKeys.ownerFingerprint()))).open(bundle)) {
            d = new SimulatedSitting(b.manifest(), b.manifestSha256(), TestKeys.INSTALLATION_SIGNING,
                    TestKeys.ownerEncryptionPublic()).document(candidate, assignment.formByCandidate().get(candidate), 1,
                            "5b1f0c4e-0000-4000-8000-00000000a001");
        }
        TaskResponse task = d.tasks().stream().filter(t -> t.toolsOffered().contains(Tool.GLOSSARY)).findFirst()
                .orElseThrow(() -> new AssertionError("the form has no task with the glossary"));
        Script s = new Script(task.taskId(), d.startedAt());
        s.at(0, EventType.TASK_START, "policy", "{}", "tools", "glossary,spelling", "condition", task.conditionId(),
                "resumed", false);
        s.at(100, EventType.PANEL_OPEN, "tool", "spelling");   // the first page in view when the task opens
        s.at(1_000, EventType.TEXT_INSERT, "pos", 0, "len", 4, "text", "The ", "source", "typing");
        s.at(5_000, EventType.PANEL_CLOSE, "tool", "spelling"); // tab switch at 5 s
        s.at(5_000, EventType.PANEL_OPEN, "tool", "glossary");
        s.at(6_000, EventType.TOOL_QUERY, "tool", "glossary", "pack", "test-glossary", "query", "mooring", "hits", 1,
                "micros", 40);
        s.at(7_000, EventType.TOOL_OPEN, "tool", "glossary", "pack", "test-glossary", "entry", "g2");
        s.at(8_000, EventType.TOOL_INSERT, "tool", "glossary", "entry", "g2", "pos", 4, "text", "mooring");
        s.at(8_000, EventType.TEXT_INSERT, "pos", 4, "len", 7, "text", "mooring", "source", "panel");
        s.at(20_000, EventType.TEXT_INSERT, "pos", 11, "len", 5, "text", " left", "source", "typing");
        s.at(60_000, EventType.TASK_END, "reason", "submitted", "words", 3);
        s.at(60_200, EventType.PANEL_CLOSE, "tool", "glossary"); // the workspace closes after the task ended
        new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic())
                .write(d, s.events, packages.resolve(candidate + ".inkresp"));

        Path store = dir.resolve("results.db");
        CollectionRun.Report report = CollectionRun.run(new CollectionRun.Request(store, List.of(bundle), List.of(packages),
                TestKeys.OWNER_ENCRYPTION, TestKeys.ownerFingerprint(), TestKeys.installations(), null, exam, null, 1),
                n -> { }, o -> { });
        assertInstanceOf(Outcome.Imported.class, report.outcomes().get(0), report.outcomes().toString());

        List<ProcessEvent> log;
        try (ResultsStore results = StoreFixture.of(store).results()) {
            log = StoreStudyInput.read(results, exam.examId()).processLog().stream()
                    .filter(e -> e.task().equals(task.taskId())).toList();
        }
        ProcessMeasures m = ProcessMeasures.of(log, ProcessMeasures.Parameters.DEFAULT);
        // suggestions page 0.1-5 s, glossary page 5 s to the task's end at 60 s: 4.9 + 55 = 59.9 s; opening the
        // glossary entry at 7 s is not the panel (the old reading of tool.open as the panel, without task bounds,
        // gave 20 - 7 = 13 s and a time on task of 20 - 1 = 19 s, worked by hand)
        assertEquals(59.9, m.panelTimeS(), 1e-9);
        assertEquals(60.0, m.timeOnTaskS(), 1e-9, "task.start to task.end");
        assertEquals(1, m.lookups());
        assertEquals(1, m.lookupsUsed(), "\"mooring\" inserted 2 s after it was looked up");
        assertEquals(16, m.charsInserted());
    }

    /** The demo exam with an invented two-entry glossary added to its condition with resources. */
    private static Path withGlossary(Path examSource) throws Exception {
        Path packs = Files.createDirectories(examSource.resolve("packs"));
        Path csv = packs.resolve("glossary-source.csv");
        Files.writeString(csv, """
                entry_id,language,term,part_of_speech,definition,example,subject_field,note
                g1,en,harbour master,noun,An invented definition for tests.,,invented,
                g2,en,mooring,noun,Another invented definition.,,invented,
                """);
        GlossaryPacks.build(GlossaryPacks.importFile(csv), new GlossaryPacks.Metadata("test-glossary", "0.1",
                "Invented test glossary", "invented for tests", "invented for tests", Instant.parse("2026-01-01T00:00:00Z")),
                packs.resolve("test-glossary.inkpack"), packs);
        Files.delete(csv);
        Path yaml = examSource.resolve("exam.yaml");
        String y = Files.readString(yaml);
        String withTools = y.replaceFirst("      spelling: suggestions\n", "      spelling: suggestions\n      glossary: test-glossary\n")
                + "\npacks:\n  - id: test-glossary\n    kind: glossary\n    version: \"0.1\"\n    file: packs/test-glossary.inkpack\n";
        if (withTools.equals(y)) {
            throw new AssertionError("the demo exam's condition with resources is no longer \"spelling: suggestions\"");
        }
        Files.writeString(yaml, withTools);
        return examSource;
    }

    /** A task's log in the order written, on a clock of milliseconds since the task started. */
    private static final class Script {
        final List<org.inkgate.format.response.ProcessEvent> events = new ArrayList<>();
        private final String task;
        private final Instant start;

        Script(String task, Instant start) {
            this.task = task;
            this.start = start;
        }

        void at(long ms, EventType type, Object... keyValue) {
            Map<String, Object> data = new java.util.LinkedHashMap<>();
            for (int i = 0; i < keyValue.length; i += 2) {
                data.put((String) keyValue[i], keyValue[i + 1]);
            }
            long seq = events.size() + 1;
            events.add(new org.inkgate.format.response.ProcessEvent(seq, start.plusMillis(ms), 5_000_000_000L + ms * 1_000_000L,
                    type, task, data));
        }
    }
}
