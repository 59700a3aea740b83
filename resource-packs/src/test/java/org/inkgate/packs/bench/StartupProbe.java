package org.inkgate.packs.bench;

import java.lang.management.ManagementFactory;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import org.inkgate.packs.dictionary.Dictionary;
import org.inkgate.packs.glossary.Glossary;
import org.inkgate.packs.pack.PackFiles;
import org.inkgate.packs.pack.ScratchFolder;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.spelling.EnglishVariant;
import org.inkgate.packs.spelling.SpellingEngine;

/**
 * Start-up of each tool in a fresh JVM and the heap with all three loaded (a bench command, not
 * a test). Run: {@code java -cp <test classpath> org.inkgate.packs.bench.StartupProbe <packs dir> pack|extjwnl}.
 * Heap is "used" after three System.gc() calls, so it is approximate.
 */
public final class StartupProbe {
    private StartupProbe() {
    }

    public static void main(String[] args) throws Exception {
        Path packs = Path.of(args[0]);
        boolean extjwnl = args.length > 1 && args[1].equals("extjwnl");
        ScratchFolder scratch = ScratchFolder.create(ScratchFolder.defaultParent(), "probe-");
        long heap0 = usedHeap();
        Object dictionary;
        long t0 = System.nanoTime();
        if (extjwnl) {
            var d = net.sf.extjwnl.dictionary.Dictionary.getDefaultResourceInstance();
            d.lookupAllIndexWords("geese");
            dictionary = d;
        } else {
            Dictionary d = Dictionary.open(PackFiles.open(packs.resolve("wordnet-3.1-en.inkpack"), scratch.path()), Clock.systemUTC());
            d.lookup("geese");
            dictionary = d;
        }
        long dictMs = (System.nanoTime() - t0) / 1_000_000;
        long heapDict = usedHeap() - heap0;
        if (extjwnl) {
            report("dictionary=extjwnl openAndFirstLookupMs=" + dictMs + " heapMB=" + heapDict / 1_048_576, dictionary);
            return;
        }
        t0 = System.nanoTime();
        Glossary g = Glossary.open(PackFiles.open(packs.resolve("demo-ferry-en-es.inkpack"), scratch.path()), Clock.systemUTC());
        g.search("ferry", 10);
        long glossMs = (System.nanoTime() - t0) / 1_000_000;
        t0 = System.nanoTime();
        SpellingEngine e = SpellingEngine.create(EnglishVariant.EN_GB, SpellingMode.SPELLING_AND_GRAMMAR, List.of(), Clock.systemUTC());
        e.warmUp().join();
        long warmMs = (System.nanoTime() - t0) / 1_000_000;
        long heapAll = usedHeap() - heap0;
        report("dictionary=pack openAndFirstLookupMs=" + dictMs + " heapMB=" + heapDict / 1_048_576
                + " glossaryOpenAndFirstSearchMs=" + glossMs + " spellingWarmUpMs=" + warmMs
                + " heapAllThreeMB=" + heapAll / 1_048_576 + " heapTotalUsedMB=" + usedHeap() / 1_048_576, List.of(g, e, dictionary));
        e.close();
        g.close();
        ((Dictionary) dictionary).close();
        scratch.close();
    }

    private static void report(String line, Object keepAlive) {
        System.out.println(line + (keepAlive == null ? "" : ""));
    }

    private static long usedHeap() {
        for (int i = 0; i < 3; i++) {
            System.gc();
        }
        return ManagementFactory.getMemoryMXBean().getHeapMemoryUsage().getUsed();
    }
}
