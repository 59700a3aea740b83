package org.inkgate.packs.cli;

import picocli.CommandLine;

/**
 * Gives every command of a picocli tree {@code --help} and {@code --version}, whatever its
 * annotations say: a command with required options still prints its usage for {@code --help}
 * (picocli checks help requests before required options), and no command can be added later
 * that forgets them. The completion script and the man pages are generated from the same tree.
 */
public final class StandardOptions {

    private StandardOptions() {
    }

    /** Adds the help and version options to {@code root} and every command below it; returns {@code root}. */
    public static CommandLine apply(CommandLine root, String program) {
        ReleaseVersion version = new ReleaseVersion(program);
        walk(root, version);
        return root;
    }

    private static void walk(CommandLine command, ReleaseVersion version) {
        CommandLine.Model.CommandSpec spec = command.getCommandSpec();
        spec.mixinStandardHelpOptions(true);
        spec.versionProvider(version);
        for (CommandLine sub : command.getSubcommands().values()) {
            if (sub.getCommandSpec().userObject() instanceof CommandLine.HelpCommand) {
                continue;
            }
            walk(sub, version);
        }
    }
}
