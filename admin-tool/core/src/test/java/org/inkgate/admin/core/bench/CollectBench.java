package org.inkgate.admin.core.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.inkgate.admin.core.collection.Collector;
import org.inkgate.admin.core.collection.Outcome;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.format.testutil.TestKeys;

/**
 * Bench command (not a test): writes N simulated packages of E events with the real writer, then
 * times R complete collections, each into a fresh results store, and prints the median. A whole
 * collection takes tens of seconds, far above timer resolution and JIT warm-up, so a plain
 * wall-clock median over runs is adequate here (JMH suits the format's millisecond operations).
 *
 * <p>Usage: {@code CollectBench <work folder> [packages=1000] [events=5000] [runs=3] [threads=2]}
 */
public final class CollectBench {

    private static final java.lang.management.ThreadMXBean THREADS = java.lang.management.ManagementFactory.getThreadMXBean();

    private CollectBench() {
    }

    private static long processCpuNanos() {
        return ((com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }

    public static void main(String[] args) throws Exception {
        Path work = Path.of(args[0]);
        int packages = args.length > 1 ? Integer.parseInt(args[1]) : 1000;
        int events = args.length > 2 ? Integer.parseInt(args[2]) : 5000;
        int runs = args.length > 3 ? Integer.parseInt(args[3]) : 3;
        int threads = args.length > 4 ? Integer.parseInt(args[4]) : 2;
        Files.createDirectories(work);
        Sitting sitting = Sitting.make(work, packages);
        // the bundle gets a fresh PIN salt each time, so packages written for an earlier one would be refused
        Path folder = work.resolve("packages");
        if (Files.exists(folder)) {
            try (var old = Files.list(folder)) {
                for (Path p : old.toList()) {
                    Files.delete(p);
                }
            }
        }
        Files.createDirectories(folder);
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        long t0 = System.nanoTime();
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        List<Future<?>> writes = new ArrayList<>();
        for (var r : sitting.roster()) {
            Path out = folder.resolve(r.candidateNumber() + ".inkresp");
            writes.add(pool.submit(() -> client.write(r.candidateNumber(), sitting.formOf(r.candidateNumber()),
                    r.candidateNumber().hashCode(), events, out)));
        }
        for (Future<?> f : writes) {
            f.get();
        }
        pool.shutdown();
        long bytes = 0;
        try (var s = Files.list(folder)) {
            for (Path p : s.toList()) {
                bytes += Files.size(p);
            }
        }
        System.out.printf("wrote %d packages of %d events (%.1f MB) in %.1f s%n", packages, events, bytes / 1e6,
                (System.nanoTime() - t0) / 1e9);
        List<Double> seconds = new ArrayList<>();
        for (int run = 0; run < runs; run++) {
            Path db = work.resolve("bench-" + run + ".db");
            for (String suffix : List.of("", "-wal", "-shm")) {
                Files.deleteIfExists(Path.of(db + suffix));
            }
            long start = System.nanoTime();
            long processCpu = processCpuNanos();
            long writerCpu = THREADS.getCurrentThreadCpuTime();
            long imported;
            try (ResultsStore store = StoreFixture.of(db).results()) {
                store.registerBundle(sitting.manifest(), sitting.manifestSha256(), TestKeys.ownerFingerprint());
                List<Outcome> outcomes = new Collector(store, TestKeys.OWNER_ENCRYPTION, TestKeys.installations(),
                        Map.of(sitting.manifestSha256(), sitting.manifest()), threads)
                        .collect(Collector.packageFiles(List.of(folder)), o -> { });
                imported = outcomes.stream().filter(o -> o instanceof Outcome.Imported).count();
                if (imported != packages || store.counts().get("process_events") != (long) packages * events) {
                    throw new IllegalStateException("imported " + imported + " of " + packages);
                }
            }
            double s = (System.nanoTime() - start) / 1e9;
            seconds.add(s);
            // CPU time is less sensitive than wall time to other work on a shared machine: the process's
            // (reading threads, writer, garbage collector, JIT) and the calling thread's, which stores
            double process = (processCpuNanos() - processCpu) / 1e6 / packages;
            double writer = (THREADS.getCurrentThreadCpuTime() - writerCpu) / 1e6 / packages;
            System.out.printf("run %d: collected %d packages (%d events) in %.1f s; CPU per package: process %.1f ms,"
                    + " storing thread %.1f ms%n", run + 1, imported, (long) packages * events, s, process, writer);
        }
        Collections.sort(seconds);
        System.out.printf("median %.1f s over %d runs%n", seconds.get(seconds.size() / 2), runs);
    }
}
