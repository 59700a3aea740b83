package org.inkgate.format.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.BundleWriter;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.PackRef;
import org.inkgate.format.trust.TrustPolicy;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.response.ResponsePackageWriter;
import org.inkgate.format.testutil.SampleExam;
import org.inkgate.format.testutil.SampleResponse;
import org.inkgate.format.testutil.TestKeys;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * How long the formats take: opening (verifying and unpacking) a bundle with a large pack, and
 * writing and opening a response package with a realistic event log. Results feed
 * docs/benchmarks.md; run with {@code mvn -q -Pbench -pl delivery-client/format -am process-test-classes}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class FormatBenchmarks {

    /** Size of the embedded pack in MiB: 0 for prompts only, 40 for about the size of a WordNet index. */
    @Param({"0", "40"})
    int packMiB;

    /** Events in the response package; issue 5 sizes collection for about 5,000 per package. */
    @Param({"5000"})
    int events;

    Path dir;
    Path bundle;
    Path responsePackage;
    List<ProcessEvent> log;
    ResponsePackageWriter packageWriter;
    ResponsePackageReader packageReader;
    BundleReader bundleReader;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        dir = Files.createTempDirectory("inkgate-bench-");
        Map<String, byte[]> contents = new LinkedHashMap<>(SampleExam.contents());
        BundleManifest manifest = SampleExam.manifest();
        if (packMiB > 0) {
            byte[] pack = new byte[packMiB << 20];
            new Random(42).nextBytes(pack);
            contents.put("packs/dictionary.inkpack", pack);
            manifest = new BundleManifest(manifest.format(), manifest.schemaVersion(), manifest.examId(), manifest.title(),
                    manifest.language(), manifest.instructionsFile(), manifest.tasks(), manifest.conditions(),
                    manifest.forms(), manifest.questionnaires(),
                    List.of(new PackRef("dict", "dictionary", "1", "packs/dictionary.inkpack", Sha256.hex(pack))),
                    manifest.roster(), manifest.ownerKeys(), null, null, true, Map.of());
        }
        bundle = dir.resolve("exam.inkexam");
        new BundleWriter(TestKeys.OWNER_SIGNING).write(manifest, contents, bundle);
        bundleReader = new BundleReader(TrustPolicy.trusting(java.util.Set.of(TestKeys.ownerFingerprint())));

        log = SampleResponse.events(events);
        packageWriter = new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        packageReader = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TestKeys.installations());
        responsePackage = dir.resolve("1001.inkresp");
        packageWriter.write(SampleResponse.document(), log, responsePackage);
    }

    @TearDown(Level.Trial)
    public void tearDown() throws Exception {
        try (var files = Files.walk(dir)) {
            files.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
    }

    /**
     * One guess at a release code or invigilator PIN: PBKDF2-HMAC-SHA256 at the iterations the
     * writers use. Its cost is what slows offline guessing (docs/formats.md).
     */
    @Benchmark
    public byte[] pbkdf2AtWriterIterations() {
        return org.inkgate.format.crypto.Pbkdf2.derive("river-lamp-42-x".toCharArray(), new byte[16],
                org.inkgate.format.crypto.Pbkdf2.ITERATIONS, 32);
    }

    @Benchmark
    public String openBundle() throws Exception {
        try (OpenedBundle opened = bundleReader.open(bundle)) {
            return opened.manifestSha256();
        }
    }

    @Benchmark
    public byte[] writeResponsePackage() throws Exception {
        return packageWriter.encode(SampleResponse.document(), log);
    }

    @Benchmark
    public OpenedResponse openResponsePackage() throws Exception {
        return packageReader.open(responsePackage);
    }
}
