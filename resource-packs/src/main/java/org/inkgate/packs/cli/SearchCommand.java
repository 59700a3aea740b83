package org.inkgate.packs.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.packs.dictionary.Dictionary;
import org.inkgate.packs.dictionary.DictionaryEntry;
import org.inkgate.packs.dictionary.LemmaLink;
import org.inkgate.packs.dictionary.Lookup;
import org.inkgate.packs.dictionary.Sense;
import org.inkgate.packs.event.Timed;
import org.inkgate.packs.glossary.Glossary;
import org.inkgate.packs.glossary.GlossaryHit;
import org.inkgate.packs.pack.OpenedPack;
import org.inkgate.packs.pack.PackFiles;
import org.inkgate.packs.pack.PackRefusal;
import org.inkgate.packs.pack.ScratchFolder;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code pack search}: query a glossary or dictionary pack as a candidate would (the pack is verified first). */
@Command(name = "search", mixinStandardHelpOptions = true,
        description = "Verify a pack, then search it: glossary hits ranked exact > prefix > stemmed > fuzzy, "
                + "or a dictionary lookup that accepts inflected forms.")
final class SearchCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;
    @Parameters(index = "0", paramLabel = "PACK", description = "the .inkpack file")
    Path pack;
    @Parameters(index = "1", paramLabel = "QUERY", description = "what to look up")
    String query;
    @Option(names = "--limit", defaultValue = "10", description = "most glossary hits to show (1-50; default ${DEFAULT-VALUE})")
    int limit;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        try {
            OpenedPack opened = PackFiles.open(pack, ScratchFolder.defaultParent());
            switch (opened.manifest().kind()) {
                case GLOSSARY -> {
                    try (Glossary g = Glossary.open(opened, Clock.systemUTC())) {
                        Timed<List<GlossaryHit>> r = g.search(query, limit);
                        for (GlossaryHit h : r.value()) {
                            out.printf("%-8s %s [%s]%s  (entry %s)%s%n", h.match().name().toLowerCase(java.util.Locale.ROOT), h.term(),
                                    h.language(), h.partOfSpeech() == null ? "" : " " + h.partOfSpeech(), h.entryId(),
                                    h.equivalents().isEmpty() ? "" : "  = " + String.join("; ",
                                            h.equivalents().stream().map(e -> e.term() + " [" + e.language() + "]").toList()));
                        }
                        out.printf("%d hits in %d us%n", r.value().size(), r.event().elapsedMicros());
                    }
                }
                case DICTIONARY -> {
                    try (Dictionary d = Dictionary.open(opened, Clock.systemUTC())) {
                        Timed<Lookup> r = d.lookup(query);
                        print(out, r.value());
                        out.printf("%d entries in %d us%n", r.value().entries().size(), r.event().elapsedMicros());
                    }
                }
            }
            out.flush();
            return ExitCodes.OK;
        } catch (PackRefusal e) {
            spec.commandLine().getErr().println("refused: " + e.getMessage());
            return ExitCodes.REFUSED;
        }
    }

    private static void print(PrintWriter out, Lookup lookup) {
        if (lookup.entries().isEmpty()) {
            out.printf("no entry for \"%s\"%s%n", lookup.query(),
                    lookup.suggestions().isEmpty() ? "" : "; did you mean: " + String.join(", ", lookup.suggestions()));
        }
        for (DictionaryEntry e : lookup.entries()) {
            out.printf("%s (%s)%n", e.lemma(), e.partOfSpeech().label());
            for (Sense s : e.senses()) {
                out.printf("  %d. %s%n", s.number(), s.gloss());
                for (String ex : s.examples()) {
                    out.printf("       \"%s\"%n", ex);
                }
                if (!s.synonyms().isEmpty()) {
                    out.printf("       synonyms: %s%n", String.join(", ", s.synonyms()));
                }
                for (LemmaLink l : s.links()) {
                    out.printf("       %s: %s (%s)%n", l.kind().name().toLowerCase(java.util.Locale.ROOT), l.lemma(), l.partOfSpeech().label());
                }
            }
        }
    }
}
