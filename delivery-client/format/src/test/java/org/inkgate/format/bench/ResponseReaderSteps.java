package org.inkgate.format.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.format.crypto.AesGcm;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.response.EventChain;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.response.ResponsePackageWriter;
import org.inkgate.format.testutil.SampleResponse;
import org.inkgate.format.testutil.TestKeys;

/**
 * Bench command (not a test): where the response reader's time goes, step by step, as thread CPU
 * time (so other processes on a shared machine inflate it less than wall time). One package of
 * E events (the sample response), each step repeated R times after as many warm-up rounds;
 * prints the median per step. The steps are the reader's own work redone through public APIs,
 * so they add up to about the whole {@code open}, not exactly.
 *
 * <p>Usage: {@code ResponseReaderSteps [events=5000] [rounds=200]}
 */
public final class ResponseReaderSteps {

    private ResponseReaderSteps() {
    }

    interface Step {
        Object run() throws Exception;
    }

    public static void main(String[] args) throws Exception {
        int events = args.length > 0 ? Integer.parseInt(args[0]) : 5000;
        int rounds = args.length > 1 ? Integer.parseInt(args[1]) : 200;
        Path dir = Files.createTempDirectory("inkgate-reader-steps-");
        List<ProcessEvent> log = SampleResponse.events(events);
        Path file = dir.resolve("1001.inkresp");
        new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic())
                .write(SampleResponse.document(), log, file);
        byte[] bytes = Files.readAllBytes(file);
        byte[] encodedLog = EventChain.encode(log);
        byte[] key = new byte[AesGcm.KEY_BYTES];
        byte[] sealed = AesGcm.seal(key, Arrays.copyOf(encodedLog, bytes.length), new byte[16]);
        ResponsePackageReader reader = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TestKeys.installations());
        Map<String, Step> steps = new LinkedHashMap<>();
        steps.put("whole open (bytes in memory)", () -> reader.open("1001.inkresp", bytes));
        steps.put("SHA-256 of the package file", () -> Sha256.hex(bytes));
        steps.put("AES-256-GCM open, package-sized", () -> AesGcm.open(key, sealed, new byte[16]));
        steps.put("event log: parse + hash chain (EventChain.decodeWithHead)",
                () -> EventChain.decodeWithHead("f", "events.jsonl", encodedLog));
        ThreadMXBean cpu = ManagementFactory.getThreadMXBean();
        System.out.printf("package %d bytes, event log %d bytes, %d events, %d rounds%n", bytes.length, encodedLog.length,
                events, rounds);
        for (Map.Entry<String, Step> s : steps.entrySet()) {
            for (int i = 0; i < rounds; i++) {
                s.getValue().run();
            }
            List<Long> times = new ArrayList<>();
            for (int i = 0; i < rounds; i++) {
                long t0 = cpu.getCurrentThreadCpuTime();
                s.getValue().run();
                times.add(cpu.getCurrentThreadCpuTime() - t0);
            }
            times.sort(null);
            System.out.printf("%-62s median %7.2f ms  (p10 %.2f, p90 %.2f)%n", s.getKey(), times.get(rounds / 2) / 1e6,
                    times.get(rounds / 10) / 1e6, times.get(rounds * 9 / 10) / 1e6);
        }
        Files.delete(file);
        Files.delete(dir);
    }
}
