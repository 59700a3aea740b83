package org.inkgate.admin.core.export;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.CancellationException;
import java.util.stream.Stream;
import org.inkgate.admin.core.collection.Collector;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 15 §2, "every long step can be cancelled without leaving half a result", for the export
 * that the command and the window both run: a cancel injected at every step of a real export over
 * a real collected store (each part's start, and the moment just before the files move into place)
 * leaves the export folder and its parent byte for byte as they were, with no hidden staging
 * folder; a cancel that comes after the commit point is refused and the export is whole.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class StagedExportCancelTest {

    private static final String EXAM = "test-exam";
    private Path dir;
    private Path db;

    @BeforeAll
    void collectASmallSitting(@TempDir Path tempDir) throws Exception {
        dir = tempDir;
        Sitting sitting = Sitting.make(dir, 6);
        Path packages = Files.createDirectories(dir.resolve("packages"));
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        for (var r : sitting.roster()) {
            client.write(r.candidateNumber(), sitting.formOf(r.candidateNumber()), r.candidateNumber().hashCode(), 60,
                    packages.resolve(r.candidateNumber() + ".inkresp"));
        }
        db = dir.resolve("results.db");
        try (ResultsStore store = StoreFixture.of(db).results()) {
            store.registerBundle(sitting.manifest(), sitting.manifestSha256(), TestKeys.ownerFingerprint());
            store.registerRoster(EXAM, sitting.roster());
            new Collector(store, TestKeys.OWNER_ENCRYPTION, TestKeys.installations(),
                    Map.of(sitting.manifestSha256(), sitting.manifest()), 1)
                    .collect(Collector.packageFiles(List.of(packages)), o -> { });
        }
    }

    /** Where a test cancels: at the start of step N, or just before the commit point. */
    private record CancelAt(long step, boolean beforePublish) {
        @Override
        public String toString() {
            return beforePublish ? "just before the move" : "at step " + step;
        }
    }

    private static List<CancelAt> everyPoint() {
        List<CancelAt> points = new ArrayList<>();
        for (long s = 0; s < StoreExport.steps(1); s++) {
            points.add(new CancelAt(s, false));
        }
        points.add(new CancelAt(-1, true));
        return points;
    }

    @Test
    void cancel_atEveryStep_overAnEarlierExport_leavesTheFolderByteIdenticalAndNoStaging() throws Exception {
        for (CancelAt at : everyPoint()) {
            Path place = Files.createDirectories(dir.resolve("over-earlier-" + at.toString().replace(' ', '-')));
            Path out = place.resolve("export");
            export(out, Progress.NONE, new Cancellation());
            Files.writeString(out.resolve("notes.txt"), "the test owner's own notes beside the export");
            Map<String, byte[]> before = files(place);

            Cancellation cancellation = new Cancellation();
            assertThrows(CancellationException.class, () -> export(out, cancelling(at, cancellation), cancellation),
                    at.toString());

            assertSame(before, files(place), at.toString());
            assertEquals(List.of(), hidden(place), "staging left after a cancel " + at);
        }
    }

    @Test
    void cancel_atEveryStep_ofAFirstExport_leavesNoFolderAndNoStaging() throws Exception {
        for (CancelAt at : everyPoint()) {
            Path place = Files.createDirectories(dir.resolve("first-" + at.toString().replace(' ', '-')));
            Path out = place.resolve("export");
            Cancellation cancellation = new Cancellation();
            assertThrows(CancellationException.class, () -> export(out, cancelling(at, cancellation), cancellation),
                    at.toString());
            assertFalse(Files.exists(out), "export folder made by a cancelled export " + at);
            assertEquals(List.of(), hidden(place), "staging left after a cancel " + at);
        }
    }

    @Test
    void cancel_afterTheCommitPoint_isRefusedAndTheExportIsWhole() throws Exception {
        Path place = Files.createDirectories(dir.resolve("late"));
        Path out = place.resolve("export");
        Cancellation cancellation = new Cancellation();
        boolean[] refused = new boolean[1];
        List<StoreExport.Written> written = export(out, new Progress() {
            @Override
            public void publishing() {
                refused[0] = !cancellation.cancel();
            }
        }, cancellation);
        assertTrue(refused[0], "a cancel after the commit point must be refused");
        assertFalse(cancellation.cancelled());
        assertEquals(out.toAbsolutePath().resolve(EXAM), written.get(0).folder());
        assertTrue(Files.isRegularFile(out.resolve(EXAM).resolve("xapi-statements.jsonl")));
        assertTrue(Files.isRegularFile(out.resolve(EXAM).resolve("csv").resolve("responses.csv")));
        assertEquals(List.of(), hidden(place));
    }

    @Test
    void export_overAnEarlierOne_replacesTheExamFolderWholeAndKeepsOtherFiles() throws Exception {
        Path place = Files.createDirectories(dir.resolve("replace"));
        Path out = place.resolve("export");
        export(out, Progress.NONE, new Cancellation());
        Path stale = out.resolve(EXAM).resolve("qti-results").resolve("left-from-an-earlier-roster.xml");
        Files.writeString(stale, "<stale/>");
        Files.writeString(out.resolve("notes.txt"), "kept");
        export(out, Progress.NONE, new Cancellation());
        assertFalse(Files.exists(stale), "an earlier export's file mixed into the new one");
        assertEquals("kept", Files.readString(out.resolve("notes.txt")));
        assertEquals(List.of(), hidden(place));
        assertEquals(List.of(), hidden(out));
    }

    @Test
    void progress_countsEveryPartThenTheMove() throws Exception {
        Path out = dir.resolve("progress").resolve("export");
        List<String> steps = new ArrayList<>();
        export(out, new Progress() {
            @Override
            public void step(long done, long total, String what) {
                steps.add(done + "/" + total + " " + what);
            }
        }, new Cancellation());
        assertEquals(List.of("0/4 " + EXAM + ": tidy CSV", "1/4 " + EXAM + ": QTI results",
                "2/4 " + EXAM + ": xAPI statements", "3/4 moving the files into " + out, "4/4 done"), steps);
    }

    private abstract static class Progress implements StoreExport.Progress {
        static final Progress NONE = new Progress() { };

        @Override
        public void step(long done, long total, String what) {
        }
    }

    private static Progress cancelling(CancelAt at, Cancellation cancellation) {
        return new Progress() {
            @Override
            public void step(long done, long total, String what) {
                if (!at.beforePublish() && done == at.step()) {
                    assertTrue(cancellation.cancel(), "a cancel before the commit point must win");
                }
            }

            @Override
            public void beforePublish() {
                if (at.beforePublish()) {
                    assertTrue(cancellation.cancel(), "a cancel before the commit point must win");
                }
            }
        };
    }

    private List<StoreExport.Written> export(Path out, StoreExport.Progress progress, Cancellation cancellation)
            throws Exception {
        try (ResultsStore store = StoreFixture.of(db).results()) {
            return StoreExport.write(org.inkgate.admin.core.store.StoreLocation.file(db), store, List.of(EXAM), out, new XapiExport.Options(XapiExport.BASE, false), false,
                    progress, cancellation);
        }
    }

    private static void assertSame(Map<String, byte[]> before, Map<String, byte[]> after, String when) {
        assertEquals(before.keySet(), after.keySet(), "files changed by a cancel " + when);
        before.forEach((name, bytes) -> assertArrayEquals(bytes, after.get(name), name + " changed by a cancel " + when));
    }

    /** Every file and folder under {@code root} (hidden ones too), folders with no bytes. */
    private static Map<String, byte[]> files(Path root) throws Exception {
        Map<String, byte[]> all = new TreeMap<>();
        try (Stream<Path> s = Files.walk(root)) {
            for (Path p : s.toList()) {
                all.put(root.relativize(p).toString(), Files.isRegularFile(p) ? Files.readAllBytes(p) : new byte[0]);
            }
        }
        return all;
    }

    private static List<String> hidden(Path folder) throws Exception {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> n.startsWith(".")).toList();
        }
    }
}
