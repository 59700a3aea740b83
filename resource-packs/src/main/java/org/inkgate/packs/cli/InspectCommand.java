package org.inkgate.packs.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.inkgate.packs.pack.PackFileEntry;
import org.inkgate.packs.pack.PackFiles;
import org.inkgate.packs.pack.PackManifest;
import org.inkgate.packs.pack.PackRefusal;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code pack inspect}: print the manifest (the contents are not hashed; use verify for that). */
@Command(name = "inspect", mixinStandardHelpOptions = true,
        description = "Show a pack's manifest: id, kind, version, languages, licence, entries, content SHA-256. "
                + "Does not check the contents against their digests; use 'verify' for that.")
final class InspectCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;
    @Parameters(paramLabel = "PACK", description = "the .inkpack file")
    Path pack;
    @Option(names = "--files", description = "also list every content file with size and SHA-256")
    boolean files;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        try {
            PackManifest m = PackFiles.readManifest(pack);
            out.printf("id:             %s%n", m.id());
            out.printf("kind:           %s%n", m.kind().name().toLowerCase(java.util.Locale.ROOT));
            out.printf("version:        %s%n", m.version());
            out.printf("title:          %s%n", m.title());
            out.printf("languages:      %s%n", String.join(", ", m.languages()));
            out.printf("licence:        %s%n", m.licence());
            out.printf("attribution:    %s%n", m.attribution());
            out.printf("entries:        %d%n", m.entryCount());
            out.printf("built at:       %s%n", m.builtAt());
            out.printf("content SHA-256 %s%n", m.contentSha256());
            out.printf("files:          %d (contents not checked here: run 'verify')%n", m.files().size());
            if (files) {
                for (PackFileEntry f : m.files()) {
                    out.printf("  %s %12d %s%n", f.sha256(), f.size(), f.path());
                }
            }
            out.flush();
            return ExitCodes.OK;
        } catch (PackRefusal e) {
            spec.commandLine().getErr().println("refused: " + e.getMessage());
            return ExitCodes.REFUSED;
        }
    }
}
