package org.inkgate.packs.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.packs.dictionary.WordNetPackBuilder;
import org.inkgate.packs.glossary.GlossaryEntry;
import org.inkgate.packs.glossary.GlossaryImportException;
import org.inkgate.packs.glossary.GlossaryPacks;
import org.inkgate.packs.pack.PackManifest;
import org.inkgate.packs.pack.PackRefusal;
import org.inkgate.packs.pack.ScratchFolder;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code pack build glossary|dictionary}. */
@Command(name = "build", mixinStandardHelpOptions = true,
        description = "Build a pack: a glossary from a TBX, CSV or TSV term bank, or the WordNet 3.1 dictionary.",
        subcommands = {BuildCommand.Glossary.class, BuildCommand.Dictionary.class})
final class BuildCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getErr());
        return ExitCodes.USAGE;
    }

    static void report(PrintWriter out, Path target, PackManifest m) {
        out.printf("built %s: %s pack %s version %s, %d entries, languages %s%n", target, m.kind().name().toLowerCase(java.util.Locale.ROOT),
                m.id(), m.version(), m.entryCount(), String.join(", ", m.languages()));
        out.printf("content SHA-256 %s%n", m.contentSha256());
        out.flush();
    }

    static Instant builtAt(String value) {
        return value == null ? Instant.now() : Instant.parse(value);
    }

    @Command(name = "glossary", mixinStandardHelpOptions = true,
            description = "Import a term bank (.tbx/.xml as TBX, .tsv as TSV, anything else as CSV) and write a glossary pack.")
    static final class Glossary implements Callable<Integer> {
        @Spec
        CommandSpec spec;
        @Option(names = "--source", required = true, description = "the term bank file")
        Path source;
        @Option(names = "--out", required = true, description = "the .inkpack to write (replaced only when the build succeeds)")
        Path out;
        @Option(names = "--id", required = true, description = "pack id a task policy names: a-z, 0-9, '.', '_', '-'")
        String id;
        @Option(names = "--pack-version", required = true, description = "your version of the term bank, e.g. 1.0")
        String version;
        @Option(names = "--title", required = true, description = "title shown to test owners")
        String title;
        @Option(names = "--licence", required = true, description = "licence of the term bank (SPDX id or its name)")
        String licence;
        @Option(names = "--attribution", defaultValue = "", description = "attribution line the licence asks for")
        String attribution;
        @Option(names = "--built-at", description = "build time to record (ISO-8601 UTC, e.g. 2026-01-01T00:00:00Z); default now")
        String builtAt;

        @Override
        public Integer call() {
            PrintWriter err = spec.commandLine().getErr();
            // the indexing is one library call, so the counter shows stages, not entries
            try (ProgressReporter progress = ProgressReporter.onStandardError(err, "pack build", "stages", 2)) {
                progress.stepTo(0, "reading the term bank");
                List<GlossaryEntry> entries = GlossaryPacks.importFile(source);
                progress.stepTo(1, "indexing " + entries.size() + " entries and writing the pack");
                PackManifest m = GlossaryPacks.build(entries,
                        new GlossaryPacks.Metadata(id, version, title, licence, attribution, builtAt(builtAt)),
                        out, ScratchFolder.defaultParent());
                progress.stepTo(2, "");
                progress.close();
                report(spec.commandLine().getOut(), out, m);
                return ExitCodes.OK;
            } catch (GlossaryImportException e) {
                err.println("term bank refused, no pack written: " + e.getMessage());
                return ExitCodes.BAD_SOURCE;
            } catch (PackRefusal e) {
                err.println("pack not written: " + e.getMessage());
                return ExitCodes.BAD_SOURCE;
            } catch (IOException e) {
                err.println("cannot read or write a file: " + e.getMessage());
                return ExitCodes.IO;
            }
        }
    }

    /** extJWNL is an optional dependency: the admin tool and the client leave it out. */
    static boolean wordNetOnClassPath() {
        try {
            Class.forName("net.sf.extjwnl.dictionary.Dictionary", false, BuildCommand.class.getClassLoader());
            return BuildCommand.class.getClassLoader().getResource("net/sf/extjwnl/data/wordnet/wn31/index.sense") != null;
        } catch (ClassNotFoundException e) {
            return false;
        }
    }

    @Command(name = "dictionary", mixinStandardHelpOptions = true,
            description = "Write the WordNet 3.1 English dictionary pack (needs extJWNL and its WordNet data on the class path).")
    static final class Dictionary implements Callable<Integer> {
        @Spec
        CommandSpec spec;
        @Option(names = "--out", required = true, description = "the .inkpack to write")
        Path out;
        @Option(names = "--built-at", description = "build time to record (ISO-8601 UTC); default now")
        String builtAt;

        @Override
        public Integer call() {
            if (!wordNetOnClassPath()) {
                spec.commandLine().getErr().println("pack not written: the dictionary pack is made from WordNet 3.1"
                        + " (extJWNL and its data), which this program does not carry. Build it from the source tree"
                        + " with  mvn -q -B -pl resource-packs package  (it writes"
                        + " resource-packs/target/packs/wordnet-3.1-en.inkpack), then name that file in exam.yaml.");
                return ExitCodes.BAD_SOURCE;
            }
            // WordNet's entry count is known only at the end: a running counter
            try (ProgressReporter progress = ProgressReporter.onStandardError(spec.commandLine().getErr(), "pack build",
                    "dictionary entries", 0)) {
                PackManifest m = WordNetPackBuilder.build(out, ScratchFolder.defaultParent(), builtAt(builtAt),
                        n -> progress.stepTo(n, ""));
                progress.close();
                report(spec.commandLine().getOut(), out, m);
                return ExitCodes.OK;
            } catch (PackRefusal e) {
                spec.commandLine().getErr().println("pack not written: " + e.getMessage());
                return ExitCodes.BAD_SOURCE;
            } catch (IOException e) {
                spec.commandLine().getErr().println("cannot build the dictionary: " + e.getMessage());
                return ExitCodes.IO;
            }
        }
    }
}
