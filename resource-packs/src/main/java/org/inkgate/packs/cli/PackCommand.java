package org.inkgate.packs.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code pack}: build, inspect, verify and search resource packs. Embeddable as a subcommand of the admin CLI. */
@Command(name = "pack",
        mixinStandardHelpOptions = true,
        description = "Build, inspect, verify and search .inkpack resource packs (glossaries and dictionaries).",
        subcommands = {BuildCommand.class, InspectCommand.class, VerifyCommand.class, SearchCommand.class},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
                "0:done; for verify, every pack is intact",
                "1:internal error (a bug; please report it with the message)",
                "2:wrong command line",
                "3:a pack was refused (not a pack, damaged, altered, newer version, wrong kind)",
                "4:the source term bank has an error (file, line or row, and column are named)",
                "5:a file could not be read or written"})
public final class PackCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getErr());
        return ExitCodes.USAGE;
    }

    /** A command line for {@code pack}; picocli's defaults give 2 for usage errors and 1 for unexpected exceptions. */
    public static CommandLine commandLine() {
        return StandardOptions.apply(new CommandLine(new PackCommand()), "inkgate pack");
    }
}
