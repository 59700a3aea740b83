package org.inkgate.packs.bench;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.time.Clock;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.spelling.EnglishVariant;
import org.inkgate.packs.spelling.SpellingEngine;
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
 * Spelling/grammar checks of a 400-word essay (invented text) after warm-up. Every invocation
 * changes a number in every sentence ({@code full}) or in one sentence of one paragraph
 * ({@code oneParagraph}), so neither our paragraph cache nor LanguageTool's sentence cache can
 * answer the changed parts; {@code sentencesFromCache} adds a tiny new sentence to each paragraph.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx1g", "--enable-native-access=ALL-UNNAMED"})
@Warmup(iterations = 3, time = 4)
@Measurement(iterations = 5, time = 4)
public class SpellingBench {
    @Param({"SPELLING_AND_GRAMMAR", "SUGGESTIONS"})
    public SpellingMode mode;
    private SpellingEngine engine;
    private String essay;
    private int n;

    @Setup(Level.Trial)
    public void start() throws Exception {
        try (InputStream in = SpellingBench.class.getResourceAsStream("essay-400.txt")) {
            essay = new String(in.readAllBytes(), StandardCharsets.UTF_8).strip().replace("\n\n", "\n");
        }
        engine = SpellingEngine.create(EnglishVariant.EN_GB, mode, List.of(), Clock.systemUTC());
        engine.warmUp().join();
    }

    @TearDown(Level.Trial)
    public void stop() {
        engine.close();
    }

    @Benchmark
    public Object full() {
        int k = n++;
        // a new number in every sentence: nothing is cached
        return engine.check(essay.replace(". ", " in " + k + " ways. ")).join();
    }

    /**
     * Every sentence of the essay answered from LanguageTool's sentence cache (the path of issue
     * 13's lost flags), plus one new two-character sentence per paragraph so our paragraph cache
     * cannot answer: what a re-check costs when the candidate has only added a few characters.
     */
    @Benchmark
    public Object sentencesFromCache() {
        int k = n++;
        return engine.check(essay.replace("\n", " " + (k + 10) + ".\n")).join();
    }

    @Benchmark
    public Object oneParagraph() {
        int k = n++;
        // the first sentence of the third paragraph changes; the other paragraphs come from the cache
        return engine.check(essay.replace("However, I believe", "However, in " + k + " ways I believe")).join();
    }
}
