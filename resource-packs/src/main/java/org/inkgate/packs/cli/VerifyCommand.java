package org.inkgate.packs.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.packs.pack.PackFiles;
import org.inkgate.packs.pack.PackManifest;
import org.inkgate.packs.pack.PackRefusal;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code pack verify}: check every content file of each pack against the manifest. */
@Command(name = "verify", mixinStandardHelpOptions = true,
        description = "Check every file of each pack against the size and SHA-256 in its manifest. "
                + "Exit 0 only when all packs are intact.")
final class VerifyCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;
    @Parameters(paramLabel = "PACK", arity = "1..*", description = "the .inkpack files")
    List<Path> packs;

    @Override
    public Integer call() {
        int code = ExitCodes.OK;
        for (Path p : packs) {
            try {
                PackManifest m = PackFiles.verify(p);
                spec.commandLine().getOut().printf("intact: %s (%s %s, content SHA-256 %s)%n", p, m.id(), m.version(), m.contentSha256());
            } catch (PackRefusal e) {
                spec.commandLine().getErr().println("REFUSED: " + e.getMessage());
                code = ExitCodes.REFUSED;
            }
        }
        spec.commandLine().getOut().flush();
        return code;
    }
}
