package org.inkgate.admin.core.collection;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.response.EventContract;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.format.trust.TrustPolicy;

/**
 * Bench command (not a test): one package's steps on a collect's reading thread, once the JIT has compiled them
 * (the steady state, beside a fresh collect's warming up): the file's SHA-256, opening it, writing its stored log and
 * content digest, the event contract. One package of the bench's (written with the test keys, as
 * {@code ParallelCollectBench} writes them), R rounds after R rounds of warm-up, thread CPU time, medians. In the
 * collection package because the stored log's writing ({@link Collector#record}) is package-private.
 *
 * <p>Usage: {@code CollectStepsBench <package.inkresp> [rounds=800]}; run it with the launcher's
 * {@code -XX:CompileCommand=CompileThresholdScaling,com.sun.crypto.provider.G*::*,0.01} so that AES-GCM is compiled
 * within the warm-up.
 */
public final class CollectStepsBench {

    private CollectStepsBench() {
    }

    public static void main(String[] args) throws Exception {
        byte[] bytes = Files.readAllBytes(Path.of(args[0]));
        int rounds = args.length > 1 ? Integer.parseInt(args[1]) : 800;
        ResponsePackageReader reader = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TrustPolicy.anySigner());
        ThreadMXBean cpu = ManagementFactory.getThreadMXBean();
        String[] names = {"SHA-256 of the file", "open (decrypt, unzip, check, read the events)",
            "stored log and content digest (Collector.record)", "event contract"};
        long[][] times = new long[names.length][rounds];
        for (int pass = 0; pass < 2; pass++) { // the first pass warms up
            for (int i = 0; i < rounds; i++) {
                long t0 = cpu.getCurrentThreadCpuTime();
                String sha = Sha256.hex(bytes);
                long t1 = cpu.getCurrentThreadCpuTime();
                OpenedResponse opened = reader.open("bench.inkresp", bytes, sha);
                long t2 = cpu.getCurrentThreadCpuTime();
                Collector.record(opened, "bench.inkresp");
                long t3 = cpu.getCurrentThreadCpuTime();
                EventContract.check(opened.response(), opened.events());
                long t4 = cpu.getCurrentThreadCpuTime();
                times[0][i] = t1 - t0;
                times[1][i] = t2 - t1;
                times[2][i] = t3 - t2;
                times[3][i] = t4 - t3;
            }
        }
        for (int k = 0; k < names.length; k++) {
            Arrays.sort(times[k]);
            System.out.printf("%-50s median %6.3f ms (p10 %.3f, p90 %.3f)%n", names[k], times[k][rounds / 2] / 1e6,
                    times[k][rounds / 10] / 1e6, times[k][rounds * 9 / 10] / 1e6);
        }
    }
}
