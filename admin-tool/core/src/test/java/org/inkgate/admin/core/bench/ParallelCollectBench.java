package org.inkgate.admin.core.bench;

import java.lang.management.ManagementFactory;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.inkgate.admin.core.collection.Collector;
import org.inkgate.admin.core.collection.Outcome;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.core.testutil.PostgresServer;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.format.trust.TrustPolicy;

/**
 * Bench command (not a test) for issue 19's performance figure: N simulated packages of E events,
 * split over P folders as if from P centres, collected by P separate collect processes at once into
 * one PostgreSQL store (the tests' embedded server on this machine), side by side with one process
 * collecting them all into a SQLite file. Each figure is the wall time from starting the processes
 * to the last one ending, JVM start included on both sides; every run checks that each package was
 * imported exactly once and every event stored.
 *
 * <p>Usage: {@code ParallelCollectBench <work folder> [packages=1000] [events=5000] [runs=3] [processes=4]}
 */
public final class ParallelCollectBench {

    private ParallelCollectBench() {
    }

    public static void main(String[] args) throws Exception {
        Path work = Path.of(args[0]);
        int packages = args.length > 1 ? Integer.parseInt(args[1]) : 1000;
        int events = args.length > 2 ? Integer.parseInt(args[2]) : 5000;
        int runs = args.length > 3 ? Integer.parseInt(args[3]) : 3;
        int processes = args.length > 4 ? Integer.parseInt(args[4]) : 4;
        Files.createDirectories(work);
        Sitting sitting = Sitting.make(work, packages);
        List<Path> centres = writePackages(work, sitting, events, processes);

        List<Double> server = new ArrayList<>();
        List<Double> file = new ArrayList<>();
        for (int run = 1; run <= runs; run++) {
            StoreLocation.Server pg = PostgresServer.freshStore("parallel_collect_" + run);
            try (ResultsStore store = Stores.openResults(pg)) { // the schema made once, as a first collect would
                store.registerBundle(sitting.manifest(), sitting.manifestSha256(), TestKeys.ownerFingerprint());
            }
            String address = "postgresql://postgres@localhost:" + pg.port() + "/" + pg.database();
            List<List<String>> perProcess = new ArrayList<>();
            for (Path centre : centres) {
                perProcess.add(List.of(address, sitting.bundle().toString(), "1", centre.toString()));
            }
            server.add(timed("PostgreSQL, " + processes + " processes at once", perProcess, packages, events, pg));

            Path db = work.resolve("parallel-" + run + ".db");
            for (String suffix : List.of("", "-wal", "-shm")) {
                Files.deleteIfExists(Path.of(db + suffix));
            }
            List<String> one = new ArrayList<>(List.of(db.toString(), sitting.bundle().toString(), "2"));
            centres.forEach(c -> one.add(c.toString()));
            file.add(timed("SQLite, one process (2 reading threads)", List.of(one), packages, events,
                    StoreLocation.file(db)));
        }
        Collections.sort(server);
        Collections.sort(file);
        System.out.printf("median over %d runs: PostgreSQL, %d processes: %.1f s; SQLite, one process: %.1f s%n", runs,
                processes, server.get(runs / 2), file.get(runs / 2));
    }

    /** Packages written round robin into {@code processes} folders, as if handed in at that many centres. */
    private static List<Path> writePackages(Path work, Sitting sitting, int events, int processes) throws Exception {
        List<Path> centres = new ArrayList<>();
        for (int c = 1; c <= processes; c++) {
            Path centre = work.resolve("centre-" + c);
            if (Files.exists(centre)) {
                try (var old = Files.list(centre)) {
                    for (Path p : old.toList()) {
                        Files.delete(p);
                    }
                }
            }
            centres.add(Files.createDirectories(centre));
        }
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        long t0 = System.nanoTime();
        ExecutorService pool = Executors.newFixedThreadPool(2);
        List<Future<?>> writes = new ArrayList<>();
        int i = 0;
        for (var r : sitting.roster()) {
            Path out = centres.get(i++ % processes).resolve(r.candidateNumber() + ".inkresp");
            writes.add(pool.submit(() -> client.write(r.candidateNumber(), sitting.formOf(r.candidateNumber()),
                    r.candidateNumber().hashCode(), events, out)));
        }
        for (Future<?> f : writes) {
            f.get();
        }
        pool.shutdown();
        System.out.printf("wrote %d packages of %d events into %d folders in %.1f s%n", sitting.roster().size(), events,
                processes, (System.nanoTime() - t0) / 1e9);
        return centres;
    }

    /** Starts one collect process per argument list at once; the wall time until all have ended, checked. */
    private static double timed(String what, List<List<String>> perProcess, int packages, int events,
            StoreLocation store) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        long start = System.nanoTime();
        List<Process> running = new ArrayList<>();
        for (List<String> a : perProcess) {
            // the bench's own JVM flags (e.g. the launcher's, docs/benchmarks.md) apply to every collect process too
            List<String> command = new ArrayList<>(List.of(java));
            command.addAll(ManagementFactory.getRuntimeMXBean().getInputArguments());
            command.addAll(List.of("-cp", System.getProperty("java.class.path"), OneCollect.class.getName()));
            command.addAll(a);
            running.add(new ProcessBuilder(command).redirectErrorStream(true).start());
        }
        long imported = 0;
        for (Process p : running) {
            String said = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            if (p.waitFor() != 0) {
                throw new IllegalStateException(what + ": a collect process failed: " + said);
            }
            imported += Long.parseLong(said.lines().filter(l -> l.startsWith("imported ")).findFirst()
                    .orElseThrow(() -> new IllegalStateException(what + ": no count in " + said)).substring(9).strip());
        }
        double seconds = (System.nanoTime() - start) / 1e9;
        long stored;
        try (ResultsStore s = Stores.openResultsForReading(store)) {
            stored = s.counts().get("process_events");
        }
        if (imported != packages || stored != (long) packages * events) {
            throw new IllegalStateException(what + ": imported " + imported + " of " + packages + ", " + stored
                    + " events stored");
        }
        System.out.printf("%s: %d packages (%d events) in %.1f s%n", what, packages, stored, seconds);
        return seconds;
    }

    /** One collect process: {@code <store> <bundle> <reading threads> <folder>...}; prints how many it imported. */
    /**
     * Writes the test keys the bench's packages are made with as an owner key folder, so that the real
     * command line can collect them: {@code ParallelCollectBench$KeyFolder <dir>} (passphrase in the
     * environment variable INKGATE_BENCH_PASSPHRASE), then
     * {@code INKGATE_BENCH_PASSPHRASE=... inkgate-admin collect --store s.db --bundle <work>/exam.inkexam --keys <dir>
     * --passphrase-env INKGATE_BENCH_PASSPHRASE --any-installation <work>/centre-*} (docs/benchmarks.md).
     */
    public static final class KeyFolder {
        public static void main(String[] args) throws Exception {
            char[] passphrase = System.getenv("INKGATE_BENCH_PASSPHRASE").toCharArray();
            new org.inkgate.admin.core.keys.OwnerKeyStore(Path.of(args[0])).init(passphrase,
                    new java.security.KeyPair(org.inkgate.format.crypto.Ed25519.publicOf(TestKeys.OWNER_SIGNING),
                            TestKeys.OWNER_SIGNING),
                    new java.security.KeyPair(TestKeys.ownerEncryptionPublic(), TestKeys.OWNER_ENCRYPTION));
        }
    }

    public static final class OneCollect {
        public static void main(String[] args) throws Exception {
            StoreLocation at = StoreLocation.parse(args[0]);
            List<Path> folders = new ArrayList<>();
            for (int i = 3; i < args.length; i++) {
                folders.add(Path.of(args[i]));
            }
            try (OpenedBundle b = new BundleReader(TrustPolicy.trusting(Set.of(TestKeys.ownerFingerprint())))
                    .open(Path.of(args[1])); ResultsStore store = Stores.openResults(at)) {
                store.registerBundle(b.manifest(), b.manifestSha256(), TestKeys.ownerFingerprint());
                List<Outcome> outcomes = new Collector(store, TestKeys.OWNER_ENCRYPTION, TestKeys.installations(),
                        Map.of(b.manifestSha256(), b.manifest()), Integer.parseInt(args[2]))
                        .collect(Collector.packageFiles(folders), o -> { });
                System.out.println("imported " + outcomes.stream().filter(o -> o instanceof Outcome.Imported).count());
            }
        }
    }
}
