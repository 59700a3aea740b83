package org.inkgate.packs.bench;

import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.concurrent.TimeUnit;
import net.sf.extjwnl.data.IndexWord;
import net.sf.extjwnl.data.Synset;
import org.inkgate.packs.dictionary.Dictionary;
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

/**
 * Dictionary lookups of inflected and misspelled input over all of WordNet 3.1: the built
 * Lucene pack (what the client uses) against extJWNL at run time (the alternative measured).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(value = 1, jvmArgs = {"-Xmx1g", "--enable-native-access=ALL-UNNAMED"})
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class DictionaryBench {
    /** Inflected forms (regular and irregular), base forms and two misspellings. */
    static final List<String> WORDS = List.of("geese", "running", "went", "better", "children", "studies", "looked up",
            "boxes", "happier", "leaves", "bank", "set", "ran", "mice", "stopped", "recieve", "definately", "women",
            "churches", "biggest", "lying", "black holes", "dishes", "saw", "taken", "wrote", "ferries", "crossing",
            "harbours", "sailed", "quays", "timetables");
    private ScratchFolder scratch;
    private Dictionary pack;
    private net.sf.extjwnl.dictionary.Dictionary extjwnl;
    private int i;

    @Setup(Level.Trial)
    public void open() throws Exception {
        scratch = ScratchFolder.create(ScratchFolder.defaultParent(), "bench-dictionary-");
        Path file = Path.of(System.getProperty("inkgate.packs.dir", "target/packs"), "wordnet-3.1-en.inkpack");
        pack = Dictionary.open(PackFiles.open(file, scratch.path()), Clock.systemUTC());
        extjwnl = net.sf.extjwnl.dictionary.Dictionary.getDefaultResourceInstance();
    }

    @TearDown(Level.Trial)
    public void close() throws Exception {
        pack.close();
        extjwnl.close();
        scratch.close();
    }

    @Benchmark
    public Object packLookup() {
        return pack.lookup(WORDS.get(i++ % WORDS.size()));
    }

    /** Same work through extJWNL: all parts of speech, morphology, and every sense's gloss and words. */
    @Benchmark
    public int extjwnlLookup() throws Exception {
        int n = 0;
        for (IndexWord w : extjwnl.lookupAllIndexWords(WORDS.get(i++ % WORDS.size())).getIndexWordArray()) {
            for (Synset s : w.getSenses()) {
                n += s.getGloss().length() + s.getWords().size();
            }
        }
        return n;
    }
}
