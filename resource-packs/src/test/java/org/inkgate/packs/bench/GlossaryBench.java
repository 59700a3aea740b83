package org.inkgate.packs.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.inkgate.packs.glossary.Glossary;
import org.inkgate.packs.glossary.GlossaryEntry;
import org.inkgate.packs.glossary.GlossaryPacks;
import org.inkgate.packs.pack.PackFiles;
import org.inkgate.packs.pack.ScratchFolder;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/** Glossary search on a generated 100,000-entry bilingual term bank; sample time gives median and p99. */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx1g", "--enable-native-access=ALL-UNNAMED"})
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class GlossaryBench {
    private ScratchFolder scratch;
    private Glossary glossary;
    private final List<String> exact = new ArrayList<>();
    private final List<String> prefix = new ArrayList<>();
    private final List<String> fuzzy = new ArrayList<>();
    private int i;

    @Setup(Level.Trial)
    public void build() throws Exception {
        scratch = ScratchFolder.create(ScratchFolder.defaultParent(), "bench-glossary-");
        List<GlossaryEntry> entries = SyntheticGlossary.generate(100_000, 42);
        Path pack = scratch.path().resolve("g.inkpack");
        GlossaryPacks.build(entries, new GlossaryPacks.Metadata("bench", "1", "bench", "Apache-2.0", "", Instant.EPOCH), pack, scratch.path());
        glossary = Glossary.open(PackFiles.open(pack, scratch.path()), Clock.systemUTC());
        Random r = new Random(7);
        for (int k = 0; k < 1024; k++) {
            String term = entries.get(r.nextInt(entries.size())).languages().get(r.nextInt(2)).terms().get(0).text();
            exact.add(term);
            prefix.add(term.substring(0, Math.min(term.length(), 2 + r.nextInt(3))));
            char[] c = term.toCharArray();
            int at = 1 + r.nextInt(c.length - 1);
            c[at] = c[at] == 'x' ? 'y' : 'x'; // one substitution after the first letter
            fuzzy.add(new String(c));
        }
        System.err.println("glossary index files: " + Files.size(pack) + " bytes in the pack");
    }

    @TearDown(Level.Trial)
    public void close() {
        glossary.close();
        scratch.close();
    }

    @Benchmark
    public Object exact() {
        return glossary.search(exact.get(i++ & 1023), 10);
    }

    @Benchmark
    public Object prefix() {
        return glossary.search(prefix.get(i++ & 1023), 10);
    }

    @Benchmark
    public Object fuzzy() {
        return glossary.search(fuzzy.get(i++ & 1023), 10);
    }
}
