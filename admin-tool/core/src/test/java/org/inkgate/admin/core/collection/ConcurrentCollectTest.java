package org.inkgate.admin.core.collection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.SittingRecord;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Two collects into one store at once, each with its own connection, taking the same packages (the
 * same stick copied to two admin machines): every package is stored exactly once, and each file is
 * reported as imported by one collect and as already there by the other, never refused or failed.
 */
@ParameterizedClass(name = "{0}")
@MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
class ConcurrentCollectTest {

    private static final int SEATS = 24;

    @Parameter
    StoreFixture.Kind kind;

    @TempDir
    Path dir;

    private Sitting sitting;

    private Path packages() throws Exception {
        sitting = Sitting.make(dir, SEATS);
        Path packages = Files.createDirectories(dir.resolve("packages"));
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        for (var r : sitting.roster()) {
            client.write(r.candidateNumber(), sitting.formOf(r.candidateNumber()), r.candidateNumber().hashCode(), 200,
                    packages.resolve(r.candidateNumber() + ".inkresp"));
        }
        return packages;
    }

    private Collector collector(ResultsStore store) {
        return new Collector(store, TestKeys.OWNER_ENCRYPTION, TestKeys.installations(),
                Map.of(sitting.manifestSha256(), sitting.manifest()), 2);
    }

    @Test
    void twoCollectsAtOnce_sameFiles_storeEachPackageOnce_andReportItOnceAsImported() throws Exception {
        Path packages = packages();
        StoreFixture store = StoreFixture.create(kind, dir);
        try (ResultsStore s = store.results()) {
            s.registerBundle(sitting.manifest(), sitting.manifestSha256(), TestKeys.ownerFingerprint());
        }
        List<Path> files = Collector.packageFiles(List.of(packages));
        CountDownLatch start = new CountDownLatch(1);
        ExecutorService machines = Executors.newFixedThreadPool(2);
        List<Future<List<Outcome>>> runs = new ArrayList<>();
        try {
            for (int m = 0; m < 2; m++) {
                List<Path> order = new ArrayList<>(files);
                if (m == 1) {
                    java.util.Collections.reverse(order); // the second machine meets the first one's packages midway
                }
                runs.add(machines.submit(() -> {
                    try (ResultsStore s = store.results()) {
                        start.await();
                        return collector(s).collect(order, o -> { });
                    }
                }));
            }
            start.countDown();
            Map<String, List<String>> byFile = new HashMap<>();
            for (Future<List<Outcome>> run : runs) {
                for (Outcome o : run.get()) {
                    byFile.computeIfAbsent(Path.of(o.file()).getFileName().toString(), k -> new ArrayList<>())
                            .add(o.getClass().getSimpleName());
                }
            }
            assertEquals(SEATS, byFile.size());
            byFile.forEach((file, kinds) -> {
                assertEquals(2, kinds.size(), file);
                assertEquals(1, kinds.stream().filter("Imported"::equals).count(), file + " " + kinds);
                assertTrue(kinds.contains("AlreadyImported"), file + " " + kinds);
            });
        } finally {
            machines.shutdown();
        }
        try (ResultsStore s = store.results()) {
            assertEquals(SEATS, s.counts().get("sittings"));
            assertEquals(SEATS * 200L, s.counts().get("process_events"));
        }
    }

    /** The store's half of it, without timing: an import of a package already stored gives no sitting, and no failure. */
    @Test
    void importSitting_packageAlreadyStored_givesNoSittingAndStoresNothing() throws Exception {
        Path packages = packages();
        Path file = packages.resolve(sitting.roster().get(0).candidateNumber() + ".inkresp");
        var opened = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TestKeys.installations()).open(file);
        SittingRecord record = SittingRecord.of(opened, Collector.contentSha256(opened), file.toString());
        StoreFixture store = StoreFixture.create(kind, dir);
        try (ResultsStore first = store.results(); ResultsStore second = store.results()) {
            first.registerBundle(sitting.manifest(), sitting.manifestSha256(), TestKeys.ownerFingerprint());
            Optional<Long> stored = first.importSitting(record);
            assertTrue(stored.isPresent());
            Map<String, Long> counts = second.counts();
            assertEquals(Optional.empty(), second.importSitting(record), "the other collect's copy is not stored again");
            assertEquals(counts, second.counts());
        }
    }
}
