package org.inkgate.admin.cli;

import org.inkgate.packs.cli.StandardOptions;
import java.util.List;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code inkgate-admin} command line: one subcommand per step from exam source to results.
 * Every subcommand prints through picocli's writers and returns an exit code: 0 done, 1 the
 * input has problems (listed), 2 wrong usage, 3 done but something needs attention (refused
 * packages, conflicts, missing responses).
 */
@Command(name = "inkgate-admin", mixinStandardHelpOptions = true, versionProvider = org.inkgate.packs.cli.ReleaseVersion.class,
        description = "Prepare, bundle and collect Inkgate writing exams.")
public final class InkgateAdmin {

    public static final int OK = 0;
    public static final int PROBLEMS = 1;
    public static final int ATTENTION = 3;

    /** Reports the build's version. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = InkgateAdmin.class.getPackage().getImplementationVersion();
            return new String[] {"inkgate-admin " + (v == null ? "(development build)" : v)};
        }
    }

    /**
     * The subcommands, in the order {@code --help} lists them. Not in the {@code @Command}
     * annotation: picocli reads every command's annotations when it builds a tree, which took
     * about a third of a second before any command ran, so the launcher builds only the one that
     * runs ({@link #commandLineFor}); help, completion and man pages get the whole tree.
     */
    static final List<Class<?>> SUBCOMMANDS = List.of(
            // one line per command
            KeysCommand.class,
            ExamCommand.class,
            FormsCommand.class,
            RosterCommand.class,
            BundleCommand.class,
            InspectCommand.class,
            PreviewCommand.class,
            InstallationsCommand.class,
            CollectCommand.class,
            MissingCommand.class,
            ExportCommand.class,
            StoreCommand.class,
            RateCommand.class,
            QtiCommand.class,
            AnalyseCommand.class,
            PlanCommand.class,
            GuiCommand.class,
            org.inkgate.packs.cli.PackCommand.class,
            CommandLine.HelpCommand.class);

    /** The whole configured command tree: for help, completion, man pages and tests. */
    public static CommandLine commandLine() {
        return configured(SUBCOMMANDS);
    }

    /**
     * The command line the launcher runs {@code args} with: when the first argument names a
     * subcommand (other than {@code help}), a tree of the root and that subcommand only, which
     * parses, prints usage and errors and exits exactly as the whole tree does for that command;
     * otherwise (root options, {@code help}, no or an unknown command, where picocli lists or
     * suggests commands) the whole tree.
     */
    public static CommandLine commandLineFor(String... args) {
        if (args.length > 0) {
            for (Class<?> c : SUBCOMMANDS) {
                Command command = c.getAnnotation(Command.class);
                if (c != CommandLine.HelpCommand.class && names(command).contains(args[0])) {
                    return configured(List.of(c));
                }
            }
        }
        return commandLine();
    }

    private static List<String> names(Command command) {
        List<String> names = new java.util.ArrayList<>(List.of(command.aliases()));
        names.add(command.name());
        return names;
    }

    private static CommandLine configured(List<Class<?>> subcommands) {
        CommandLine root = new CommandLine(new InkgateAdmin());
        for (Class<?> c : subcommands) {
            root.addSubcommand(c);
        }
        CommandLine cl = StandardOptions.apply(root, "inkgate-admin");
        // every command prints through these: no control character from outside data reaches the terminal
        cl.setColorScheme(CommandLine.Help.defaultColorScheme(CommandLine.Help.Ansi.OFF));
        cl.setOut(TerminalText.guard(cl.getOut()));
        cl.setErr(TerminalText.guard(cl.getErr()));
        cl.setExecutionExceptionHandler((e, cmd, parsed) -> {
            // expected failures (files, keys, store) carry a message meant for people: no stack trace
            boolean expected = e instanceof java.io.IOException || e instanceof IllegalArgumentException
                    || e instanceof org.inkgate.admin.core.store.StoreException
                    || e instanceof org.inkgate.admin.core.keys.EncryptedKeys.WrongPassphraseException
                    || e instanceof org.inkgate.format.refusal.FormatRefusal;
            cmd.getErr().println("inkgate-admin " + cmd.getCommandName() + ": " + (expected ? "" : e.getClass().getName()
                    + ": ") + e.getMessage());
            if (!expected) {
                e.printStackTrace(cmd.getErr());
            }
            cmd.getErr().println("Nothing was changed by the step that failed.");
            return PROBLEMS;
        });
        return cl;
    }

    public static void main(String[] args) {
        org.inkgate.packs.cli.QuietJdkLogging.install();
        System.exit(commandLineFor(args).execute(args));
    }
}
